package org.cohesa.core.target;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

class SphereFitterTest {

    /** Every library solvent scored against {@code truth}; scores from the RED (1 inside, 0 outside). */
    private static List<TestResult> scored(SolubilitySphere truth) {
        List<TestResult> out = new ArrayList<>();
        for (Solvent s : BundledLibrary.searchable()) {
            out.add(TestResult.of(s.name(), s.hansen(), truth.contains(s.hansen()) ? 1 : 0));
        }
        return out;
    }

    private static List<NamedPoint> candidates() {
        return BundledLibrary.searchable().stream().map(s -> new NamedPoint(s.name(), s.hansen())).toList();
    }

    @Test
    void qualityCountsAndMisfitsFollowTheDefinitionOfRed() {
        // RED = Ra/R0 (Hansen 2007, ch. 1): toluene (18.0, 1.4, 2.0) lies at Ra = √(4·0² + 1.4² + 2²) = 2.44 from
        // (18, 0, 0), so RED 0.61 for R0 4; ethanol (15.8, 8.8, 19.4) at Ra = √(4·2.2² + 8.8² + 19.4²) = 21.75, RED 5.4
        SolubilitySphere s = SolubilitySphere.of(18, 0, 0, 4);
        List<TestResult> r = List.of(
                TestResult.of("toluene", HansenParameters.of(18.0, 1.4, 2.0), 1),
                TestResult.of("ethanol", HansenParameters.of(15.8, 8.8, 19.4), 1),
                TestResult.of("hexane", HansenParameters.of(14.9, 0, 0), 0));
        FitQuality q = SphereFitter.quality(r, s);
        assertEquals(1, q.goodInside());
        assertEquals(2, q.goodTotal());
        assertEquals(1, q.badOutside());
        assertEquals(1, q.badTotal());
        assertEquals("ethanol", q.misfits().get(0).name());
        assertEquals(21.75 / 4, q.misfits().get(0).red(), 0.01);
    }

    @Test
    void gradedScoresPutHalfSwellingLiquidsNearTheSurface() {
        SolubilitySphere truth = SolubilitySphere.of(18.0, 8.0, 7.0, 7.0);
        List<TestResult> results = new ArrayList<>();
        for (TestResult r : scored(truth)) {
            double red = truth.red(r.liquid());
            // partial swelling for liquids right at the surface, as a lab would score them
            double score = Math.abs(red - 1) < 0.05 ? 0.5 : r.score();
            results.add(new TestResult(r.label(), r.liquid(), score, null));
        }
        FitResult f = SphereFitter.fit(results, List.of(), FitOptions.defaults(3).withResamples(0));
        for (TestResult r : results) {
            if (r.score() == 0.5) {
                double red = f.sphere().red(r.liquid());
                assertTrue(Math.abs(red - 1) < 0.15, r.label() + " scored 0.5 should sit near the surface, RED " + red);
            }
        }
        assertTrue(f.sphere().centre().distanceTo(truth.centre()) < 1.0);
    }

    @Test
    void nextTestsAreUntestedLibraryLiquidsNearTheSurface() {
        SolubilitySphere truth = SolubilitySphere.of(18.5, 9.0, 7.5, 7.0);
        List<TestResult> all = scored(truth);
        // a lab's first round: every third liquid of the library
        List<TestResult> firstRound = new ArrayList<>();
        for (int i = 0; i < all.size(); i += 3) {
            firstRound.add(all.get(i));
        }
        FitResult f = SphereFitter.fit(firstRound, candidates(), FitOptions.defaults(11).withResamples(100));
        assertEquals(5, f.nextTests().size());
        for (NextTest t : f.nextTests()) {
            assertTrue(firstRound.stream().noneMatch(r -> r.label().equals(t.name())), t.name() + " was already tested");
            assertTrue(t.red() > 0.6 && t.red() < 1.6, t.name() + " should lie near the fitted surface, RED " + t.red());
        }
        // the suggestions split the resampled fits more evenly than a liquid far inside would
        assertTrue(f.nextTests().get(0).insideShare() > 0.05 && f.nextTests().get(0).insideShare() < 0.95);
    }

    @Test
    void openDataRaiseAPlainWarning() {
        // only liquids that dissolve the material, all in one region: nothing bounds R0 from outside
        List<TestResult> r = List.of(
                TestResult.of("toluene", HansenParameters.of(18.0, 1.4, 2.0), 1),
                TestResult.of("xylene", HansenParameters.of(17.6, 1.0, 3.1), 1),
                TestResult.of("chloroform", HansenParameters.of(17.8, 3.1, 5.7), 1),
                TestResult.of("tetrahydrofuran", HansenParameters.of(16.8, 5.7, 8.0), 1));
        FitResult f = SphereFitter.fit(r, candidates(), FitOptions.defaults(1).withResamples(50));
        assertFalse(f.confidence().bounded());
        assertTrue(f.confidence().warnings().stream().anyMatch(w -> w.contains("no liquid failed to dissolve")), f.confidence().warnings().toString());
    }

    @Test
    void unusableSeriesAreRefusedNamingTheProblem() {
        List<TestResult> none = List.of(
                TestResult.of("water", HansenParameters.of(15.5, 16.0, 42.3), 0),
                TestResult.of("hexane", HansenParameters.of(14.9, 0, 0), 0),
                TestResult.of("methanol", HansenParameters.of(15.1, 12.3, 22.3), 0));
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> SphereFitter.fit(none, List.of(), FitOptions.defaults(1)));
        assertEquals("score", e.field());
        assertThrows(InvalidInputException.class, () -> SphereFitter.fit(none.subList(0, 2), List.of(), FitOptions.defaults(1)));
        assertThrows(IllegalArgumentException.class, () -> TestResult.of("x", HansenParameters.of(18, 1, 1), 1.5));
    }

    @Test
    void differentSeedsGiveTheSameSphereOnCleanData() {
        List<TestResult> r = scored(SolubilitySphere.of(17.5, 6.0, 9.0, 6.5));
        FitResult a = SphereFitter.fit(r, List.of(), FitOptions.defaults(1).withResamples(0).withMethod(FitMethod.CONSENSUS));
        FitResult b = SphereFitter.fit(r, List.of(), FitOptions.defaults(99).withResamples(0).withMethod(FitMethod.CONSENSUS));
        assertEquals(a.sphere().centre().dD(), b.sphere().centre().dD(), 1e-9, "the consensus does not depend on the starts");
        // the likelihood fit's multi-start lands on the same optimum within the simplex tolerance
        FitResult c = SphereFitter.fit(r, List.of(), FitOptions.defaults(1).withNextTests(0));
        FitResult d = SphereFitter.fit(r, List.of(), FitOptions.defaults(99).withNextTests(0));
        assertEquals(c.sphere().centre().dD(), d.sphere().centre().dD(), 0.02);
        assertEquals(c.sphere().r0(), d.sphere().r0(), 0.05);
    }

    @Test
    void hotTestsAreFlagged() {
        List<TestResult> r = new ArrayList<>();
        for (TestResult t : scored(SolubilitySphere.of(18.0, 8.0, 7.0, 7.0))) {
            r.add(new TestResult(t.label(), t.liquid(), t.score(), 60.0));
        }
        FitResult f = SphereFitter.fit(r, List.of(), FitOptions.defaults(2).withResamples(0));
        assertTrue(f.confidence().warnings().stream().anyMatch(w -> w.startsWith("tests ran at 60 °C")), f.confidence().warnings().toString());
    }
}
