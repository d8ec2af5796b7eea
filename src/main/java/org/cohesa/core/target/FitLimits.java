package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.MultivariateFunction;
import org.apache.commons.math3.optim.PointValuePair;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * What limits the likelihood fit's centre error on a lab-sized series (issue 14): every trial's series is fitted as
 * the program does, and then again with one thing changed, so that each candidate cause is measured on the same
 * series:
 * <ul>
 * <li><b>optimiser</b>: 48 instead of 12 starts; the classic desirability fit ({@link DesirabilityFitter}) as one more
 * start, kept when it reaches a higher likelihood; and the log-likelihood of the fitted sphere minus that of the true one
 * (a local optimum would show as a fit worse than the truth);</li>
 * <li><b>radius–centre trade-off</b>: the centre fitted with R0 fixed at the true radius;</li>
 * <li><b>geometry of the list</b>: the whole pool scored instead of {@code size} of it;</li>
 * <li><b>softness</b>: s = 0.03 instead of 0.1 (nearer the hard surface the synthetic results are scored by);</li>
 * <li><b>prior</b>: a weak empirical prior from the other published spheres of the library — independent normal
 * distributions on δD, δP, δH and ln R0 with the mean and standard deviation of every library sphere except the
 * one being tested (leave-one-out, so the prior never holds the truth; Gelman et al., <i>Bayesian Data Analysis</i>,
 * 3rd ed., 2013, ch. 5, hierarchical models estimated from related units) — maximised with the likelihood (MAP).</li>
 * </ul>
 * The classic fit itself is listed beside them as the baseline.
 * Errors are the plain |Δ(δD, δP, δH)| of issue 14 and, beside it, per axis, so that the Ra metric's double weight
 * on δD (Ra² = 4ΔδD² + ΔδP² + ΔδH², Hansen 2007, ch. 1) can be read off. The figures are recorded in
 * docs/methods.md; {@code cohesa bench fit-checks --limits} prints them.
 */
public final class FitLimits {

    /** One estimator's median errors over the trials, MPa^½. */
    public record Line(String what, double centreMedian, double centreMean, double r0Median, double dDMedian, double dPMedian, double dHMedian) {
    }

    /** One true sphere's median centre error under the program's fit, and its signed mean offsets (fit − truth). */
    public record PerSphere(SolubilitySphere truth, int trials, double centreMedian, double meanOffsetDD, double meanOffsetDP,
                            double meanOffsetDH, double meanOffsetR0) {
    }

    /**
     * @param logLikelihoodGapMedian median of ℓ(fitted) − ℓ(true sphere), nats; never below 0 when the optimiser finds the maximum
     * @param fitWorseThanTruth      trials in which the fitted sphere's likelihood was below the true sphere's
     * @param classicStartHigher     trials in which a search started at the classic fit found a higher likelihood than the fit
     */
    public record Figures(FitValidation.Scenario scenario, int trials, List<Line> lines, double logLikelihoodGapMedian, int fitWorseThanTruth,
                          int classicStartHigher, List<PerSphere> perSphere) {
    }

    static final int MORE_STARTS = 48;
    static final double SHARP_SOFTNESS = 0.03;

    private FitLimits() {
    }

    /**
     * @param truths  spheres scoring the series, taken in turn
     * @param library every published sphere the leave-one-out prior may draw on (the truth itself is left out by value)
     * @param pool    the fixed list of test liquids
     */
    public static Figures run(List<SolubilitySphere> truths, List<SolubilitySphere> library, List<NamedPoint> pool, FitValidation.Scenario s,
                              int trials, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        Map<String, List<double[]>> est = new LinkedHashMap<>();
        List<Double> gaps = new ArrayList<>();
        int worse = 0;
        int classicHigher = 0;
        Map<SolubilitySphere, List<double[]>> offsets = new LinkedHashMap<>();
        for (int t = 0; t < trials; t++) {
            SolubilitySphere truth = truths.get(t % truths.size());
            double[] tr = vector(truth);
            SyntheticSeries series = FitValidation.usable(truth, pool, s, rng);
            SyntheticSeries whole = FitValidation.usable(truth, pool, new FitValidation.Scenario(pool.size(), s.flips(), s.graded()), rng);
            FitOptions o = new FitOptions(seed + t, 0, 12, 0);
            double[] fit = vector(SphereFitter.fit(series.results(), List.of(), o).sphere());
            add(est, "likelihood fit (as the program runs it)", fit, tr);
            offsets.computeIfAbsent(truth, k -> new ArrayList<>()).add(new double[] {fit[0] - tr[0], fit[1] - tr[1], fit[2] - tr[2], fit[3] - tr[3]});

            SphereFitter.Data data = SphereFitter.Data.of(series.results());
            LikelihoodObjective f = new LikelihoodObjective(data, null, DissolutionModel.DEFAULT, null);
            double gap = f.logPosterior(fit) - f.logPosterior(tr);
            gaps.add(gap);
            worse += gap < -1e-6 ? 1 : 0;

            add(est, "optimiser: " + MORE_STARTS + " starts instead of 12",
                    vector(SphereFitter.fit(series.results(), List.of(), new FitOptions(seed + t, 0, MORE_STARTS, 0)).sphere()), tr);

            double r0 = truth.r0();
            MultivariateFunction fixedR0 = p -> f.value(new double[] {p[0], p[1], p[2], r0});
            double[] c = LocalSearch.minimise(fixedR0, new double[] {fit[0], fit[1], fit[2], r0}).getPoint();
            add(est, "radius-centre trade-off: R0 fixed at the true radius", new double[] {c[0], c[1], c[2], r0}, tr);

            add(est, "geometry: all " + pool.size() + " liquids of the list scored",
                    vector(SphereFitter.fit(whole.results(), List.of(), o).sphere()), tr);

            add(est, "softness: s = " + SHARP_SOFTNESS + " instead of " + DissolutionModel.DEFAULT_SOFTNESS,
                    vector(SphereFitter.fit(series.results(), List.of(), o.withModel(new DissolutionModel(SHARP_SOFTNESS, DissolutionModel.DEFAULT_LAPSE))).sphere()), tr);

            LibraryPrior prior = LibraryPrior.leavingOut(library, truth);
            MultivariateFunction post = p -> f.value(p) - prior.logDensity(p);
            PointValuePair a = LocalSearch.minimise(post, fit);
            PointValuePair b = LocalSearch.minimise(post, prior.mode());
            add(est, "prior: leave-one-out library spheres (MAP)", (a.getValue() <= b.getValue() ? a : b).getPoint(), tr);
            // the classic desirability fit as one more start (a Hansen-style fit as starting point)
            double[] cl = vector(SphereFitter.fit(series.results(), List.of(), o.withMethod(FitMethod.CLASSIC).withResamples(0)).sphere());
            PointValuePair fromClassic = LocalSearch.minimise(f, cl);
            boolean higher = fromClassic.getValue() < f.value(fit) - 1e-9;
            classicHigher += higher ? 1 : 0;
            add(est, "optimiser: the classic fit as one more start", higher ? fromClassic.getPoint() : fit, tr);
            add(est, "classic desirability fit itself (baseline)", cl, tr);
        }
        List<Line> lines = new ArrayList<>();
        for (var e : est.entrySet()) {
            List<double[]> v = e.getValue();
            lines.add(new Line(e.getKey(), median(v, 0), v.stream().mapToDouble(x -> x[0]).average().orElse(Double.NaN), median(v, 1),
                    median(v, 2), median(v, 3), median(v, 4)));
        }
        List<PerSphere> per = new ArrayList<>();
        for (var e : offsets.entrySet()) {
            List<double[]> v = e.getValue();
            List<Double> err = v.stream().map(x -> Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2])).toList();
            per.add(new PerSphere(e.getKey(), v.size(), FitValidation.median(err), mean(v, 0), mean(v, 1), mean(v, 2), mean(v, 3)));
        }
        return new Figures(s, trials, lines, FitValidation.median(gaps), worse, classicHigher, per);
    }

    /**
     * Normal distributions on δD, δP, δH and ln R0 fitted (mean, sample standard deviation) to published spheres;
     * the density of R0 carries the 1/R0 of the change of variable.
     */
    record LibraryPrior(double[] mean, double[] sd) {

        static LibraryPrior leavingOut(List<SolubilitySphere> library, SolubilitySphere truth) {
            List<double[]> xs = new ArrayList<>();
            for (SolubilitySphere s : library) {
                if (!s.equals(truth)) {
                    double[] v = vector(s);
                    v[3] = Math.log(v[3]);
                    xs.add(v);
                }
            }
            if (xs.size() < 3) {
                throw new IllegalArgumentException("a library prior needs at least 3 other spheres, got " + xs.size());
            }
            double[] m = new double[4];
            double[] sd = new double[4];
            for (double[] x : xs) {
                for (int k = 0; k < 4; k++) {
                    m[k] += x[k] / xs.size();
                }
            }
            for (double[] x : xs) {
                for (int k = 0; k < 4; k++) {
                    sd[k] += (x[k] - m[k]) * (x[k] - m[k]) / (xs.size() - 1);
                }
            }
            for (int k = 0; k < 4; k++) {
                sd[k] = Math.sqrt(sd[k]);
            }
            return new LibraryPrior(m, sd);
        }

        double logDensity(double[] p) {
            if (!(p[3] > 0)) {
                return Double.NEGATIVE_INFINITY;
            }
            double out = -Math.log(p[3]);
            for (int k = 0; k < 4; k++) {
                double z = ((k == 3 ? Math.log(p[3]) : p[k]) - mean[k]) / sd[k];
                out -= z * z / 2;
            }
            return out;
        }

        double[] mode() {
            return new double[] {mean[0], mean[1], mean[2], Math.exp(mean[3])};
        }
    }

    private static void add(Map<String, List<double[]>> est, String what, double[] p, double[] truth) {
        double dd = p[0] - truth[0];
        double dp = p[1] - truth[1];
        double dh = p[2] - truth[2];
        est.computeIfAbsent(what, k -> new ArrayList<>())
                .add(new double[] {Math.sqrt(dd * dd + dp * dp + dh * dh), Math.abs(p[3] - truth[3]), Math.abs(dd), Math.abs(dp), Math.abs(dh)});
    }

    private static double median(List<double[]> v, int k) {
        return FitValidation.median(v.stream().map(x -> x[k]).toList());
    }

    private static double mean(List<double[]> v, int k) {
        return v.stream().mapToDouble(x -> x[k]).average().orElse(Double.NaN);
    }

    static double[] vector(SolubilitySphere s) {
        return new double[] {s.centre().dD(), s.centre().dP(), s.centre().dH(), s.r0()};
    }
}
