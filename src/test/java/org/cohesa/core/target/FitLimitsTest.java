package org.cohesa.core.target;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.store.BundledData;
import org.cohesa.store.MaterialCsv;
import org.junit.jupiter.api.Test;

/**
 * The diagnostics of what limits the centre error ({@link FitLimits}, {@code bench fit-checks --limits}). Truth: the
 * five spheres of issue 14 from the bundled solvent-db/materials.csv (Hansen 2007, Table A.2, recalled from memory);
 * liquids: {@link CommonTestLiquids} with the bundled table's published parameters.
 */
class FitLimitsTest {

    @Test
    void theFitIsNeverLessLikelyThanTheTrueSphereAndEachVariantChangesOnlyItsOwnPart() throws Exception {
        BundledData b = BundledData.resource("materials.csv");
        List<Material> all = MaterialCsv.read(b.name(), new InputStreamReader(new ByteArrayInputStream(b.bytes()), StandardCharsets.UTF_8), false);
        List<String> five = List.of("polystyrene", "poly(methyl methacrylate)", "polycarbonate", "cellulose acetate butyrate", "ethyl cellulose");
        List<SolubilitySphere> truths = all.stream().filter(m -> five.contains(m.name())).map(Material::sphere).toList();
        List<SolubilitySphere> library = all.stream().filter(m -> m.kind() != MaterialKind.DRUG).map(Material::sphere).toList();
        List<NamedPoint> pool = CommonTestLiquids.resolve(BundledLibrary.get());
        FitLimits.Figures f = FitLimits.run(truths, library, pool, new FitValidation.Scenario(30, 0, 0), 10, 77);
        // the maximum of the likelihood is at least as likely as the sphere that scored the series (definition of a
        // maximum, common practice, no source): a fit below the truth would mean the optimiser stopped short
        assertEquals(0, f.fitWorseThanTruth(), "fits less likely than the true sphere");
        assertTrue(f.logLikelihoodGapMedian() >= 0, "median gap " + f.logLikelihoodGapMedian());
        FitLimits.Line fixed = f.lines().stream().filter(l -> l.what().startsWith("radius")).findFirst().orElseThrow();
        assertEquals(0, fixed.r0Median(), 1e-12, "R0 held at the truth");
        assertEquals(23, f.lines().size(), "program fit, more starts, R0 known, whole list, sharper softness, library prior, classic start, classic fit, "
                + "and the 15 estimators tried against the fit");
        FitLimits.Line program = f.lines().get(0);
        assertEquals(0, program.pairedMeanDifference(), 1e-12, "the program's fit against itself");
        // a mean of paired differences is the difference of the means (linearity of the mean, common practice, no source)
        assertEquals(fixed.centreMean() - program.centreMean(), fixed.pairedMeanDifference(), 1e-9);
        // without partial results the banded reading of graded scores is the plain likelihood, so it stays at the fit
        FitLimits.Line banded = f.lines().stream().filter(l -> l.what().startsWith("graded scores")).findFirst().orElseThrow();
        assertEquals(program.centreMedian(), banded.centreMedian(), 0.05, "no partial results in a clean series");
        assertTrue(f.classicStartHigher() <= f.trials());
        assertEquals(5, f.perSphere().size(), "each of the five spheres reported");
        for (FitLimits.Line l : f.lines().stream().filter(l -> !l.what().startsWith("classic desirability") && !l.what().contains("flat prior")).toList()) {
            // every variant stays within the measured range of the 30-liquid fits (bench fit-checks --limits:
            // medians 0.76-1.07 on the five); a variant that broke would land far away
            assertTrue(l.centreMedian() < 2.0, l.what() + ": centre median " + l.centreMedian());
        }
    }

    @Test
    void theSpatialMedianIsTheMiddlePointOnALineAndTheCentreOfASymmetricSet() {
        // in one dimension the point minimising the summed distance is the ordinary median; for a set symmetric about a
        // point it is that point (Haldane, Biometrika 35 (1948) 414; worked by hand)
        double[] m = FitLimits.spatialMedian(List.of(new double[] {0, 0, 0, 1}, new double[] {1, 0, 0, 2}, new double[] {10, 0, 0, 9}));
        assertEquals(1, m[0], 1e-3);
        assertEquals(0, m[1], 1e-9);
        assertEquals(2, m[3], 1e-12, "R0: the plain median");
        double[] c = FitLimits.spatialMedian(List.of(new double[] {18, 5, 5, 8}, new double[] {20, 5, 5, 8}, new double[] {19, 8, 5, 8},
                new double[] {19, 2, 5, 8}, new double[] {19, 5, 12, 8}, new double[] {19, 5, -2, 8}));
        assertEquals(19, c[0], 1e-6);
        assertEquals(5, c[1], 1e-6);
        assertEquals(5, c[2], 1e-6);
        double[] mean = FitLimits.mean(List.of(new double[] {1, 2, 3, 4}, new double[] {3, 4, 5, 6}));
        assertEquals(2, mean[0], 1e-12);
        assertEquals(5, mean[3], 1e-12);
    }

    @Test
    void theSoftnessNodesSpanTheirRangeEvenlyInLogAndAMixtureOfOneSoftnessIsTheModel() {
        double[] n = FitLimits.logSpaced(0.03, 0.3, 7);
        assertEquals(0.03, n[0], 1e-12);
        assertEquals(0.3, n[6], 1e-12);
        // log-spaced: the middle node is the geometric mean of the ends, √(0.03·0.3) (worked by hand)
        assertEquals(Math.sqrt(0.03 * 0.3), n[3], 1e-12);
        SphereFitter.Data d = SphereFitter.Data.of(List.of(TestResult.of("a", new org.cohesa.core.hsp.HansenParameters(18, 5, 5), 1.0),
                TestResult.of("b", new org.cohesa.core.hsp.HansenParameters(15, 15, 15), 0.0),
                TestResult.of("c", new org.cohesa.core.hsp.HansenParameters(19, 7, 8), 0.5)));
        double[] p = {18, 6, 6, 8};
        double plain = new LikelihoodObjective(d, null, DissolutionModel.DEFAULT, null).logPosterior(p);
        // a mixture over one softness is that softness's logistic link
        assertEquals(plain, FitLimits.mixtureLogLikelihood(d, p, new double[] {0.1, 0.1}), 1e-12);
        // the band reading changes only the partial result: with its band shrunk to nothing it is ln ε
        double yesNo = new LikelihoodObjective(d.withScores(new double[] {1, 0, 1}), null, DissolutionModel.DEFAULT, null).logPosterior(p)
                - Math.log(DissolutionModel.DEFAULT.pDissolves(SphereFitter.Data.ra(new double[] {19, 7, 8}, p) / 8));
        assertEquals(yesNo + Math.log(DissolutionModel.DEFAULT_LAPSE), FitLimits.bandLogLikelihood(d, p, 0, DissolutionModel.DEFAULT), 1e-9);
    }

    @Test
    void theLibraryPriorLeavesTheTestedSphereOut() {
        SolubilitySphere a = SolubilitySphere.of(18, 4, 6, 8);
        SolubilitySphere b = SolubilitySphere.of(17, 10, 2, 6);
        SolubilitySphere c = SolubilitySphere.of(19, 7, 10, 10);
        SolubilitySphere tested = SolubilitySphere.of(30, 30, 30, 30);
        FitLimits.LibraryPrior p = FitLimits.LibraryPrior.leavingOut(List.of(a, b, tested, c), tested);
        // sample mean and standard deviation of the three others, worked by hand (common practice, no source):
        // δD 18, 7, 6; sd of δD = 1, of δP = 3, of δH = 4; ln R0 mean = ln(480)/3
        assertEquals(18, p.mean()[0], 1e-12);
        assertEquals(7, p.mean()[1], 1e-12);
        assertEquals(6, p.mean()[2], 1e-12);
        assertEquals(Math.log(480) / 3, p.mean()[3], 1e-12);
        assertEquals(1, p.sd()[0], 1e-12);
        assertEquals(3, p.sd()[1], 1e-12);
        assertEquals(4, p.sd()[2], 1e-12);
        assertTrue(p.logDensity(new double[] {18, 7, 6, 8}) > p.logDensity(new double[] {30, 30, 30, 30}), "the held-out sphere is improbable");
        // the ln R0 part alone: −ln R0 − z²/2 with z = (ln R0 − mean)/sd (log-normal density up to a constant)
        double z = (Math.log(8) - Math.log(480) / 3) / p.sd()[3];
        assertEquals(-Math.log(8) - z * z / 2, p.logDensityR0(new double[] {0, 0, 0, 8}), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> FitLimits.LibraryPrior.leavingOut(List.of(a, tested), tested));
    }
}
