package org.cohesa.core.target;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SplittableRandom;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Recovery of known spheres by the consensus fit ({@link FitMethod#CONSENSUS}) over the real bundled solvent library (issue 3): random spheres, every searchable
 * library solvent scored 1 inside and 0 outside, fitted, compared with the truth. The truth is outside the
 * method (drawn independently), the library values are published ones (solvent-db/SOURCES.md).
 *
 * <p>Spheres: centre uniform in δD 15.5–20.5, δP 1–16, δH 1–18 MPa^½ and R0 uniform in 4–10 MPa^½ (the range of
 * most published polymer spheres), kept when at least 10 library solvents lie inside and 10 outside.
 * Centre error is reported both as the plain distance |Δ(δD, δP, δH)| and as the Hansen distance Ra (δD counted
 * twice); the limits are checked on the plain distance, and the Ra values are printed and recorded in
 * docs/methods.md.
 */
class SphereRecoveryTest {

    private static final int TRIALS = 20;
    private static final List<Trial> TRIALS_RUN = new ArrayList<>();

    record Trial(SolubilitySphere truth, List<TestResult> results, FitResult fit, FitResult flippedFit, Set<String> flipped,
                 SolubilitySphere baseline) {
    }

    @BeforeAll
    static void run() {
        List<Solvent> lib = BundledLibrary.searchable();
        SplittableRandom rng = new SplittableRandom(2026);
        while (TRIALS_RUN.size() < TRIALS) {
            SolubilitySphere truth = SolubilitySphere.of(15.5 + 5 * rng.nextDouble(), 1 + 15 * rng.nextDouble(),
                    1 + 17 * rng.nextDouble(), 4 + 6 * rng.nextDouble());
            long inside = lib.stream().filter(s -> truth.contains(s.hansen())).count();
            if (inside < 10 || lib.size() - inside < 10) {
                continue;
            }
            List<TestResult> results = new ArrayList<>();
            for (Solvent s : lib) {
                results.add(TestResult.of(s.name(), s.hansen(), truth.contains(s.hansen()) ? 1 : 0));
            }
            int n = TRIALS_RUN.size();
            FitResult fit = SphereFitter.fit(results, List.of(), FitOptions.defaults(n).withMethod(FitMethod.CONSENSUS));
            // two flipped results, drawn among liquids clearly on one side (RED < 0.8, or 1.25 < RED < 2): a flip
            // right at the surface is indistinguishable from a slightly different sphere, and one far outside
            // (RED > 2) is too far away to bear on the fit at all
            List<Integer> clear = new ArrayList<>();
            for (int i = 0; i < results.size(); i++) {
                double red = truth.red(results.get(i).liquid());
                if (red < 0.8 || (red > 1.25 && red < 2.0)) {
                    clear.add(i);
                }
            }
            Collections.shuffle(clear, new java.util.Random(n));
            List<TestResult> flippedResults = new ArrayList<>(results);
            Set<String> flipped = new HashSet<>();
            for (int k = 0; k < 2; k++) {
                TestResult r = results.get(clear.get(k));
                flippedResults.set(clear.get(k), TestResult.of(r.label(), r.liquid(), 1 - r.score()));
                flipped.add(r.label());
            }
            FitResult flippedFit = SphereFitter.fit(flippedResults, List.of(), FitOptions.defaults(n).withResamples(0).withMethod(FitMethod.CONSENSUS));
            SolubilitySphere baseline = DesirabilityFitter.fit(results, n, 6);
            TRIALS_RUN.add(new Trial(truth, results, fit, flippedFit, flipped, baseline));
        }
        System.out.printf(Locale.ROOT, "recovery over %d library solvents, %d spheres%n", lib.size(), TRIALS);
        System.out.printf(Locale.ROOT, "  centre error |Δδ|: median %.2f max %.2f; Ra: median %.2f max %.2f; R0 error median %.2f%n",
                median(plain(t -> t.fit().sphere())), max(plain(t -> t.fit().sphere())), median(ra(t -> t.fit().sphere())),
                max(ra(t -> t.fit().sphere())), median(TRIALS_RUN.stream().map(t -> Math.abs(t.fit().sphere().r0() - t.truth().r0())).toList()));
        System.out.printf(Locale.ROOT, "  coverage of the confidence box: %d of %d%n",
                TRIALS_RUN.stream().filter(t -> t.fit().confidence().containsCentre(t.truth().centre())).count(), TRIALS);
        System.out.printf(Locale.ROOT, "  two flipped results: centre error |Δδ| median %.2f (Ra %.2f)%n",
                median(plain(t -> t.flippedFit().sphere())), median(ra(t -> t.flippedFit().sphere())));
        System.out.printf(Locale.ROOT, "  published approach (desirability, smallest sphere): |Δδ| median %.2f max %.2f; Ra median %.2f max %.2f%n",
                median(plain(Trial::baseline)), max(plain(Trial::baseline)), median(ra(Trial::baseline)), max(ra(Trial::baseline)));
    }

    private static List<Double> plain(java.util.function.Function<Trial, SolubilitySphere> f) {
        return TRIALS_RUN.stream().map(t -> {
            HansenParameters a = f.apply(t).centre();
            HansenParameters b = t.truth().centre();
            return Math.sqrt(Math.pow(a.dD() - b.dD(), 2) + Math.pow(a.dP() - b.dP(), 2) + Math.pow(a.dH() - b.dH(), 2));
        }).toList();
    }

    private static List<Double> ra(java.util.function.Function<Trial, SolubilitySphere> f) {
        return TRIALS_RUN.stream().map(t -> f.apply(t).centre().distanceTo(t.truth().centre())).toList();
    }

    static double median(List<Double> v) {
        List<Double> s = new ArrayList<>(v);
        Collections.sort(s);
        int n = s.size();
        return n % 2 == 1 ? s.get(n / 2) : (s.get(n / 2 - 1) + s.get(n / 2)) / 2;
    }

    static double max(List<Double> v) {
        return v.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
    }

    @Test
    void cleanResultsAreAllSortedCorrectly() {
        for (Trial t : TRIALS_RUN) {
            assertTrue(t.fit().quality().misfits().isEmpty(), t.truth() + ": misfits " + t.fit().quality().misfits());
        }
    }

    @Test
    void centreAndRadiusAreRecovered() {
        assertTrue(median(plain(t -> t.fit().sphere())) <= 0.5, "centre error median");
        assertTrue(max(plain(t -> t.fit().sphere())) <= 1.5, "centre error max");
        List<Double> r0 = TRIALS_RUN.stream().map(t -> Math.abs(t.fit().sphere().r0() - t.truth().r0())).toList();
        assertTrue(median(r0) <= 0.5, "R0 error median " + median(r0));
    }

    @Test
    void confidenceBoxHoldsTheTrueCentreInAtLeastNinetyPercentOfTrials() {
        long covered = TRIALS_RUN.stream().filter(t -> t.fit().confidence().containsCentre(t.truth().centre())).count();
        assertTrue(covered >= Math.ceil(0.9 * TRIALS), "coverage " + covered + " of " + TRIALS);
    }

    @Test
    void flippedResultsAreReportedAsMisfitsAndTheCentreHolds() {
        for (Trial t : TRIALS_RUN) {
            Set<String> misfits = new HashSet<>();
            t.flippedFit().quality().misfits().forEach(m -> misfits.add(m.name()));
            assertTrue(misfits.containsAll(t.flipped()), t.truth() + ": flipped " + t.flipped() + ", misfits " + misfits);
        }
        assertTrue(median(plain(t -> t.flippedFit().sphere())) <= 1.0, "centre error median with two flipped results");
    }

    @Test
    void beatsThePublishedApproachOnTheSameData() {
        // the published approach (desirability fit, smallest perfect sphere) misses by about 1 MPa^½ (issue 3)
        assertTrue(median(ra(t -> t.fit().sphere())) < median(ra(Trial::baseline)),
                "consensus fit should miss less than the smallest-sphere fit");
    }

    @Test
    void sameSeedSameFit() {
        Trial t = TRIALS_RUN.get(0);
        FitResult again = SphereFitter.fit(t.results(), List.of(), FitOptions.defaults(0).withMethod(FitMethod.CONSENSUS));
        assertEquals(t.fit().sphere(), again.sphere());
        assertEquals(t.fit().confidence(), again.confidence());
    }
}
