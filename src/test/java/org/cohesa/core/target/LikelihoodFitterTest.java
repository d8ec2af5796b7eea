package org.cohesa.core.target;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.structure.StructureEstimator;
import org.cohesa.core.structure.StructureParser;
import org.junit.jupiter.api.Test;

class LikelihoodFitterTest {

    private static List<TestResult> scored(SolubilitySphere truth, List<NamedPoint> liquids) {
        List<TestResult> out = new ArrayList<>();
        for (NamedPoint p : liquids) {
            out.add(TestResult.of(p.name(), p.point(), truth.contains(p.point()) ? 1 : 0));
        }
        return out;
    }

    private static List<NamedPoint> common() {
        return CommonTestLiquids.resolve(BundledLibrary.get());
    }

    @Test
    void probabilityFallsThroughOneHalfOnTheSurface() {
        DissolutionModel m = DissolutionModel.DEFAULT;
        // worked by hand from P = ε + (1 − 2ε)/(1 + e^−(1 − RED)/s), s = 0.1, ε = 0.02:
        // RED 1 → 0.02 + 0.96·0.5 = 0.5; RED 0.8 → 0.02 + 0.96/(1 + e^−2) = 0.8656; RED 1.25 → 0.02 + 0.96/(1 + e^2.5) = 0.0928
        assertEquals(0.5, m.pDissolves(1.0), 1e-12);
        assertEquals(0.8656, m.pDissolves(0.8), 1e-4);
        assertEquals(0.0928, m.pDissolves(1.25), 1e-4);
        // far from the surface only the lapse rate remains
        assertEquals(0.98, m.pDissolves(0.0), 1e-3);
        assertEquals(0.02, m.pDissolves(3.0), 1e-6);
        // band with 0.1 < P < 0.9: RED 1 ± s·ln(q/(1 − q)), q = (0.9 − ε)/(1 − 2ε) = 0.9167 → ±0.240
        assertEquals(0.240, m.noiseBand(), 1e-3);
        // a graded 0.5 is best explained on the surface: its log-likelihood peaks at P = 0.5
        assertTrue(DissolutionModel.logLikelihood(0.5, 0.5) > DissolutionModel.logLikelihood(0.5, 0.7));
        assertTrue(DissolutionModel.logLikelihood(0.5, 0.5) > DissolutionModel.logLikelihood(0.5, 0.3));
    }

    @Test
    void regionThresholdIsTheChiSquareQuantileWithFourDegreesOfFreedom() {
        // χ²₄ at 0.95 = 9.488 (NIST/SEMATECH e-Handbook of Statistical Methods, table 1.3.6.7.4, critical values of χ²)
        assertEquals(9.488, LikelihoodFitter.threshold(0.95), 1e-3);
    }

    @Test
    void aWrongResultFarFromTheSurfaceIsNamedWithItsProbability() {
        SolubilitySphere truth = SolubilitySphere.of(18.0, 8.0, 7.0, 8.0);
        List<TestResult> r = new ArrayList<>(scored(truth, common()));
        // tetrahydrofuran (16.8, 5.7, 8.0) lies at RED 0.39 of the truth; scored 0 it is a slip, not noise
        int i = r.indexOf(r.stream().filter(x -> x.label().equals("tetrahydrofuran")).findFirst().orElseThrow());
        r.set(i, TestResult.of("tetrahydrofuran", r.get(i).liquid(), 0));
        FitResult f = SphereFitter.fit(r, List.of(), FitOptions.defaults(3).withNextTests(0));
        ResultProbability least = f.probabilities().get(0);
        assertEquals("tetrahydrofuran", least.name());
        assertTrue(least.likelyMisfit() && least.probability() < 0.1, least.toString());
        assertFalse(least.nearSurface());
        assertEquals(List.of(least), f.likelyMisfits());
        assertTrue(f.sphere().centre().distanceTo(truth.centre()) < 2.5, "one slip does not pull the centre away: " + f.sphere());
    }

    @Test
    void theTrueSphereIsInsideTheRegionAndTheRegionHasASize() {
        SolubilitySphere truth = SolubilitySphere.of(18.0, 8.0, 7.0, 8.0);
        List<TestResult> r = scored(truth, common());
        FitResult f = SphereFitter.fit(r, List.of(), FitOptions.defaults(5).withNextTests(0));
        assertTrue(LikelihoodFitter.regionHolds(f, r, truth));
        assertTrue(LikelihoodFitter.regionHolds(f, r, f.sphere()));
        assertFalse(LikelihoodFitter.regionHolds(f, r, SolubilitySphere.of(16.0, 2.0, 2.0, 4.0)), "a sphere around the alkanes is far outside");
        LikelihoodRegion reg = f.region();
        assertTrue(reg.bounded(), reg.boundedNote());
        assertTrue(reg.centreRadius() > 0.2 && reg.centreRadius() < 10, "size " + reg.centreRadius());
        assertTrue(reg.r0().contains(f.sphere().r0()));
        assertTrue(reg.samples().size() > 50 && reg.samples().size() <= 200);
        assertTrue(f.confidence().containsCentre(f.sphere().centre()));
    }

    @Test
    void withoutNonDissolvingLiquidsTheSphereIsNotBounded() {
        List<TestResult> r = new ArrayList<>();
        for (NamedPoint p : common().subList(0, 8)) {
            r.add(TestResult.of(p.name(), p.point(), 1));
        }
        FitResult f = SphereFitter.fit(r, List.of(), FitOptions.defaults(1).withNextTests(0));
        assertFalse(f.region().bounded());
        assertTrue(f.confidence().warnings().get(0).startsWith("not bounded"), f.confidence().warnings().toString());
    }

    @Test
    void aPriorFromARelatedSpherePullsAThinSeriesAndIsSaid() {
        SolubilitySphere truth = SolubilitySphere.of(18.6, 10.5, 7.5, 8.6);
        List<NamedPoint> few = common().subList(0, 12);
        List<TestResult> r = scored(truth, few);
        FitResult plain = SphereFitter.fit(r, List.of(), FitOptions.defaults(2).withNextTests(0));
        CentrePrior prior = CentrePrior.inRa(HansenParameters.of(18.2, 10.0, 7.0), 2.0, "a related sphere (test value)");
        FitResult withPrior = SphereFitter.fit(r, List.of(), FitOptions.defaults(2).withNextTests(0).withPrior(prior));
        assertTrue(withPrior.sphere().centre().distanceTo(prior.centre()) < plain.sphere().centre().distanceTo(prior.centre()));
        assertTrue(withPrior.region().withPrior());
        assertTrue(withPrior.region().centreRadius() < plain.region().centreRadius(), "the prior narrows the region");
        assertTrue(withPrior.notes().stream().anyMatch(n -> n.startsWith("prior:")), withPrior.notes().toString());
    }

    @Test
    void aStructurePriorTakesItsSpreadsFromTheRoutesMeasuredErrorAndPullsAThinSeries() {
        // paracetamol: SMILES from PubChem (CID 1983, from memory); centre 17.8/10.5/13.9 from Alshehri et al., AIChE J. 68
        // (2022) e17469 (the bundled drug substance), R0 7.0 the bundled default screening radius
        StructureEstimate e = StructureEstimator.estimate(StructureParser.parse("smiles", "CC(=O)Nc1ccc(O)cc1"), null);
        CentrePrior prior = CentrePrior.fromStructure(e);
        assertEquals(CentrePrior.Kind.STRUCTURE, prior.kind());
        assertEquals(e.hansen(), prior.centre());
        // an amide: each sd is the larger of the route's (MAE·√(π/2), P90/1.645; normal distribution: mean |error| =
        // sd·√(2/π), 90 % within 1.6449 sd) and the amide family's MAE·√(π/2) on the published table (EstimateErrors:
        // δD 1.03, δP 3.16, δH 2.43 on the combined group route)
        double[] family = StructureEstimator.muchWorseFamilyError("amide");
        assertEquals(3.16, family[1], 1e-9);
        org.cohesa.core.structure.EstimatedValue[] v = {e.dD(), e.dP(), e.dH()};
        double[] sd = {prior.sdD(), prior.sdP(), prior.sdH()};
        for (int k = 0; k < 3; k++) {
            double route = Math.max(v[k].expectedMae() * Math.sqrt(Math.PI / 2), v[k].expectedP90() / 1.6449);
            assertEquals(Math.max(route, family[k] * Math.sqrt(Math.PI / 2)), sd[k], 1e-9);
        }
        assertEquals(3.16 * Math.sqrt(Math.PI / 2), prior.sdP(), 1e-9);
        assertTrue(prior.source().contains("CC(=O)Nc1ccc(O)cc1") && prior.source().contains("Mathieu 2018"), prior.source());
        assertFalse(prior.cautions().isEmpty(), "the amide warning travels with the prior");

        SolubilitySphere truth = SolubilitySphere.of(17.8, 10.5, 13.9, 7.0);
        // every other common test liquid: 18 of the 35
        List<NamedPoint> all = common();
        List<NamedPoint> half = new ArrayList<>();
        for (int i = 0; i < all.size(); i += 2) {
            half.add(all.get(i));
        }
        List<TestResult> r = scored(truth, half);
        FitResult plain = SphereFitter.fit(r, List.of(), FitOptions.defaults(3).withNextTests(0));
        FitResult withPrior = SphereFitter.fit(r, List.of(), FitOptions.defaults(3).withNextTests(0).withPrior(prior));
        assertTrue(withPrior.region().centreRadius() < plain.region().centreRadius(), "the prior narrows the region");
        assertTrue(LikelihoodFitter.regionHolds(withPrior, r, truth), "the penalised region still holds the true sphere");
        assertTrue(withPrior.notes().stream().anyMatch(n -> n.startsWith("prior: the centre was pulled towards") && n.contains("estimated from the structure")),
                withPrior.notes().toString());
        assertTrue(withPrior.notes().stream().anyMatch(n -> n.startsWith("prior caution:")), withPrior.notes().toString());
    }

    @Test
    void aPriorInTheRaMetricHalvesTheDispersionSpread() {
        // Ra² = 4ΔδD² + ΔδP² + ΔδH² (Hansen 2007, ch. 1): a Gaussian of spread s in Ra has sd s/2 on δD
        CentrePrior p = CentrePrior.inRa(HansenParameters.of(18, 8, 6), 3.0, "test value");
        assertEquals(1.5, p.sdD(), 1e-12);
        assertEquals(3.0, p.sdP(), 1e-12);
        assertEquals(3.0, p.sdH(), 1e-12);
        assertEquals(CentrePrior.Kind.RELATED_MATERIAL, p.kind());
    }

    @Test
    void nextTestsAreAnUntestedBatchWithGrowingExpectedShrinkage() {
        SolubilitySphere truth = SolubilitySphere.of(18.0, 8.0, 7.0, 8.0);
        List<TestResult> r = scored(truth, common().subList(0, 15));
        List<NamedPoint> candidates = BundledLibrary.searchable().stream().map((Solvent s) -> new NamedPoint(s.name(), s.hansen())).toList();
        FitResult f = SphereFitter.fit(r, candidates, FitOptions.defaults(4));
        assertEquals(5, f.nextTests().size());
        double last = 0;
        for (NextTest t : f.nextTests()) {
            assertTrue(r.stream().noneMatch(x -> x.label().equals(t.name())), t.name() + " was tested already");
            assertTrue(t.expectedShrinkage() > last, "shrinkage grows with the batch: " + f.nextTests());
            last = t.expectedShrinkage();
        }
        assertTrue(last < 1);
    }

    @Test
    void gradedScoresSitOnTheSurface() {
        SolubilitySphere truth = SolubilitySphere.of(18.0, 8.0, 7.0, 8.0);
        List<TestResult> r = new ArrayList<>(scored(truth, common()));
        FitResult f = SphereFitter.fit(r, List.of(), FitOptions.defaults(6).withNextTests(0));
        // a graded result counts half either way: probability 0.5 wherever the liquid lies
        List<TestResult> g = new ArrayList<>(r);
        g.add(TestResult.of("graded", HansenParameters.of(18.0, 8.0, 7.0), 0.5));
        FitResult fg = SphereFitter.fit(g, List.of(), FitOptions.defaults(6).withNextTests(0));
        ResultProbability graded = fg.probabilities().stream().filter(p -> p.name().equals("graded")).findFirst().orElseThrow();
        assertEquals(0.5, graded.probability(), 1e-9);
        assertFalse(graded.likelyMisfit());
        assertTrue(f.region() != null && fg.region() != null);
    }
}
