package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.SplittableRandom;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * Measures the fits on seeded synthetic series ({@link SyntheticSeries}) scored against known spheres: centre and
 * R0 error, coverage of the 95 % region, detection of flipped results, and the benefit of the suggested next
 * tests. Used by the checks (few trials) and by {@code cohesa bench fit-checks} (many); the figures are recorded
 * in docs/methods.md. Centre error is the plain distance |Δ(δD, δP, δH)| in MPa^½, as in issue 14.
 */
public final class FitValidation {

    /** Size of the series and how many results go wrong near the surface. */
    public record Scenario(int size, int flips, int graded) {
    }

    /**
     * Figures of one scenario for the likelihood fit and the classic baseline.
     *
     * @param regionCovered  trials whose 95 % likelihood region holds the true sphere (centre and R0)
     * @param boxCovered     trials whose box (region extent) holds the true centre
     * @param detected       trials (with flips) where every flipped result is among the three least likely
     * @param bounded        trials whose region the data close
     * @param classicBoxCovered trials whose classic bootstrap box holds the true centre (-1 when not measured)
     * @param classicDetected trials where every flipped result is among the classic fit's three worst misfits
     */
    public record Figures(Scenario scenario, int trials, double centreMedian, double centreMax, double r0Median, int regionCovered,
                          int boxCovered, int detected, int bounded, double classicCentreMedian, double classicR0Median,
                          int classicBoxCovered, int classicDetected) {
    }

    /** A known sphere with a prior on its centre (e.g. a drug substance's centre estimated from its structure). */
    public record PriorCase(String name, SolubilitySphere truth, CentrePrior prior) {
    }

    /**
     * The same series fitted without and with the prior: median centre and R0 error of both, the prior's own centre
     * error, and how often the (penalised) 95 % region holds the true sphere.
     */
    public record PriorFigures(int size, int trials, double plainCentreMedian, double priorCentreMedian, double plainR0Median,
                               double priorR0Median, double priorGuessMedian, int plainCovered, int priorCovered) {
    }

    /** Median centre error after adding k = 0..n tests: the suggested batch and random common liquids. */
    public record DesignCurve(int trials, int startSize, double[] suggested, double[] random) {
    }

    private FitValidation() {
    }

    /**
     * @param classicResamples bootstrap resamples of the classic fit's box (0: its coverage is not measured)
     */
    public static Figures run(List<SolubilitySphere> truths, List<NamedPoint> pool, Scenario s, int trials, long seed, boolean classic,
                              int classicResamples) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<Double> ce = new ArrayList<>();
        List<Double> re = new ArrayList<>();
        List<Double> cce = new ArrayList<>();
        List<Double> cre = new ArrayList<>();
        int covered = 0;
        int box = 0;
        int detected = 0;
        int bounded = 0;
        int cbox = 0;
        int cdet = 0;
        for (int t = 0; t < trials; t++) {
            SolubilitySphere truth = truths.get(t % truths.size());
            SyntheticSeries series = usable(truth, pool, s, rng);
            FitOptions o = new FitOptions(seed + t, 0, 12, 0);
            FitResult f = SphereFitter.fit(series.results(), List.of(), o);
            ce.add(plain(f.sphere(), truth));
            re.add(Math.abs(f.sphere().r0() - truth.r0()));
            covered += LikelihoodFitter.regionHolds(f, series.results(), truth) ? 1 : 0;
            box += f.confidence().containsCentre(truth.centre()) ? 1 : 0;
            bounded += f.region().bounded() ? 1 : 0;
            if (s.flips() > 0) {
                List<String> low = f.probabilities().stream().limit(3).map(ResultProbability::name).toList();
                detected += low.containsAll(series.flipped()) ? 1 : 0;
            }
            if (classic) {
                FitResult c = SphereFitter.fit(series.results(), List.of(), o.withMethod(FitMethod.CLASSIC).withResamples(classicResamples));
                cce.add(plain(c.sphere(), truth));
                cre.add(Math.abs(c.sphere().r0() - truth.r0()));
                cbox += c.confidence().containsCentre(truth.centre()) ? 1 : 0;
                if (s.flips() > 0) {
                    List<String> worst = c.quality().misfits().stream().limit(3).map(Misfit::name).toList();
                    cdet += worst.containsAll(series.flipped()) ? 1 : 0;
                }
            }
        }
        return new Figures(s, trials, median(ce), Collections.max(ce), median(re), covered, box, detected, bounded,
                classic ? median(cce) : Double.NaN, classic ? median(cre) : Double.NaN, classic && classicResamples > 0 ? cbox : -1,
                classic ? cdet : -1);
    }

    /**
     * Next-test benefit: a clean series of {@code startSize} common liquids is fitted; then (a) the {@code added}
     * suggested tests (one batch from that fit, chosen among {@code candidates}) or (b) as many random untested
     * common liquids are scored against the truth and added one by one, refitting after each ({@code fullCurve};
     * otherwise only after the last, and the other points of the curve are NaN).
     */
    public static DesignCurve nextTestBenefit(List<SolubilitySphere> truths, List<NamedPoint> pool, List<NamedPoint> candidates, int startSize,
                                              int added, int trials, long seed, boolean fullCurve) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<List<Double>> sug = new ArrayList<>();
        List<List<Double>> rnd = new ArrayList<>();
        for (int k = 0; k <= added; k++) {
            sug.add(new ArrayList<>());
            rnd.add(new ArrayList<>());
        }
        for (int t = 0; t < trials; t++) {
            SolubilitySphere truth = truths.get(t % truths.size());
            SyntheticSeries start = usable(truth, pool, new Scenario(startSize, 0, 0), rng);
            FitOptions o = new FitOptions(seed + t, 0, 12, added);
            FitResult first = SphereFitter.fit(start.results(), candidates, o);
            double e0 = plain(first.sphere(), truth);
            sug.get(0).add(e0);
            rnd.get(0).add(e0);
            SyntheticSeries a = start;
            for (int k = 1; k <= added; k++) {
                String name = first.nextTests().get(k - 1).name();
                NamedPoint p = candidates.stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow();
                a = a.plus(p);
                sug.get(k).add(fullCurve || k == added ? plain(SphereFitter.fit(a.results(), List.of(), o.withNextTests(0)).sphere(), truth) : Double.NaN);
            }
            SyntheticSeries b = start;
            List<NamedPoint> left = new ArrayList<>(start.untested());
            for (int k = 1; k <= added; k++) {
                b = b.plus(left.remove(rng.nextInt(left.size())));
                rnd.get(k).add(fullCurve || k == added ? plain(SphereFitter.fit(b.results(), List.of(), o.withNextTests(0)).sphere(), truth) : Double.NaN);
            }
        }
        double[] s = new double[added + 1];
        double[] r = new double[added + 1];
        for (int k = 0; k <= added; k++) {
            s[k] = median(sug.get(k));
            r[k] = median(rnd.get(k));
        }
        return new DesignCurve(trials, startSize, s, r);
    }

    /** Clean series of {@code size} common liquids for each case in turn, fitted without and with the case's prior. */
    public static PriorFigures priorBenefit(List<PriorCase> cases, List<NamedPoint> pool, int size, int trials, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<Double> plain = new ArrayList<>();
        List<Double> withPrior = new ArrayList<>();
        List<Double> plainR0 = new ArrayList<>();
        List<Double> priorR0 = new ArrayList<>();
        List<Double> guess = new ArrayList<>();
        int plainCovered = 0;
        int priorCovered = 0;
        for (int t = 0; t < trials; t++) {
            PriorCase c = cases.get(t % cases.size());
            SyntheticSeries series = usable(c.truth(), pool, new Scenario(size, 0, 0), rng);
            FitOptions o = new FitOptions(seed + t, 0, 12, 0);
            FitResult a = SphereFitter.fit(series.results(), List.of(), o);
            FitResult b = SphereFitter.fit(series.results(), List.of(), o.withPrior(c.prior()));
            plain.add(plain(a.sphere(), c.truth()));
            withPrior.add(plain(b.sphere(), c.truth()));
            plainR0.add(Math.abs(a.sphere().r0() - c.truth().r0()));
            priorR0.add(Math.abs(b.sphere().r0() - c.truth().r0()));
            guess.add(plain(c.prior().centre(), c.truth().centre()));
            plainCovered += LikelihoodFitter.regionHolds(a, series.results(), c.truth()) ? 1 : 0;
            priorCovered += LikelihoodFitter.regionHolds(b, series.results(), c.truth()) ? 1 : 0;
        }
        return new PriorFigures(size, trials, median(plain), median(withPrior), median(plainR0), median(priorR0), median(guess), plainCovered,
                priorCovered);
    }

    /**
     * A series with exactly the requested flips and results scored 0.5, and at least 3 dissolving and 3 non-dissolving
     * results (redrawn until so).
     */
    public static SyntheticSeries usable(SolubilitySphere truth, List<NamedPoint> pool, Scenario s, SplittableRandom rng) {
        for (int attempt = 0; attempt < 1000; attempt++) {
            SyntheticSeries series = SyntheticSeries.draw(truth, pool, s.size(), s.flips(), s.graded(), rng);
            long good = series.results().stream().filter(TestResult::good).count();
            if (series.flipped().size() == s.flips() && series.graded().size() == s.graded() && good >= 3 && series.results().size() - good >= 3) {
                return series;
            }
        }
        throw new IllegalArgumentException("no usable series of " + s.size() + " liquids for " + truth);
    }

    /** |Δ(δD, δP, δH)|, MPa^½. */
    public static double plain(SolubilitySphere a, SolubilitySphere b) {
        return plain(a.centre(), b.centre());
    }

    static double plain(HansenParameters x, HansenParameters y) {
        return Math.sqrt(Math.pow(x.dD() - y.dD(), 2) + Math.pow(x.dP() - y.dP(), 2) + Math.pow(x.dH() - y.dH(), 2));
    }

    static double median(List<Double> v) {
        List<Double> s = new ArrayList<>(v);
        Collections.sort(s);
        int n = s.size();
        return n % 2 == 1 ? s.get(n / 2) : (s.get(n / 2 - 1) + s.get(n / 2)) / 2;
    }
}
