package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.function.ToDoubleFunction;
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
 * The classic fit itself is listed beside them as the baseline. Then the estimators tried against the fit to lower the
 * centre error (issue 14's follow-up; {@link #bayes}): posterior means and spatial medians under a flat prior, a
 * leave-one-out prior on ln R0 and on all four parameters; the softness integrated out per series and per result;
 * a partial result read as a near-surface band ({@link #bandLogLikelihood}); and a parametric-bootstrap bias correction
 * ({@link #biasCorrected}). Each line also gives its centre error paired with the program's fit on the same series.
 * Errors are the plain |Δ(δD, δP, δH)| of issue 14 and, beside it, per axis, so that the Ra metric's double weight
 * on δD (Ra² = 4ΔδD² + ΔδP² + ΔδH², Hansen 2007, ch. 1) can be read off. The figures are recorded in
 * docs/methods.md; {@code cohesa bench fit-checks --limits} prints them.
 */
public final class FitLimits {

    /**
     * One estimator's median errors over the trials, MPa^½, and its centre error paired with the program's fit on the
     * same series: the mean of (this − program fit) and its standard error (sd/√n), so that a change smaller than the
     * trials' spread of medians can still be told from noise.
     */
    public record Line(String what, double centreMedian, double centreMean, double r0Median, double dDMedian, double dPMedian, double dHMedian,
                       double pairedMeanDifference, double pairedStandardError) {
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
            FitResult programFit = SphereFitter.fit(series.results(), List.of(), o);
            double[] fit = vector(programFit.sphere());
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
            bayes(est, series, f, programFit, fit, prior, tr, new SplittableRandom(seed * 31 + t));
        }
        List<Line> lines = new ArrayList<>();
        List<double[]> program = est.values().iterator().next();
        for (var e : est.entrySet()) {
            List<double[]> v = e.getValue();
            double[] d = new double[v.size()];
            for (int i = 0; i < d.length; i++) {
                d[i] = v.get(i)[0] - program.get(i)[0];
            }
            double dm = java.util.Arrays.stream(d).average().orElse(Double.NaN);
            double ss = 0;
            for (double x : d) {
                ss += (x - dm) * (x - dm);
            }
            double se = d.length > 1 ? Math.sqrt(ss / (d.length - 1) / d.length) : Double.NaN;
            lines.add(new Line(e.getKey(), median(v, 0), v.stream().mapToDouble(x -> x[0]).average().orElse(Double.NaN), median(v, 1),
                    median(v, 2), median(v, 3), median(v, 4), dm, se));
        }
        List<PerSphere> per = new ArrayList<>();
        for (var e : offsets.entrySet()) {
            List<double[]> v = e.getValue();
            List<Double> err = v.stream().map(x -> Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2])).toList();
            per.add(new PerSphere(e.getKey(), v.size(), FitValidation.median(err), mean(v, 0), mean(v, 1), mean(v, 2), mean(v, 3)));
        }
        return new Figures(s, trials, lines, FitValidation.median(gaps), worse, classicHigher, per);
    }

    /** Kept samples of each posterior chain (thinned as {@link RegionSampler} does). */
    static final int POSTERIOR_SAMPLES = 2000;
    /** Nodes of the softness integral: log-spaced over one decade, 0.03–0.3 RED units. */
    static final double[] SOFTNESS_NODES = logSpaced(0.03, 0.3, 7);

    /**
     * Bayes estimators instead of the maximum of the likelihood (this round; docs/methods.md): the posterior mean, which
     * minimises the expected squared error (Bayesian decision theory: Berger, <i>Statistical Decision Theory and
     * Bayesian Analysis</i>, 2nd ed., Springer 1985, §4.4), and the spatial median of the centre, which minimises the
     * expected plain distance |Δ(δD, δP, δH)| — the error the issue measures (Haldane, <i>Biometrika</i> 35 (1948) 414;
     * computed by Weiszfeld's iteration, <i>Tohoku Math. J.</i> 43 (1937) 355); under a flat prior on the search box,
     * under the leave-one-out library prior on ln R0 alone and on all four; and the softness s treated as a nuisance
     * parameter integrated out under a log-uniform prior on 0.03–0.3 (the scale-invariant prior of a scale parameter:
     * Jeffreys, <i>Theory of Probability</i>, 3rd ed., OUP 1961, §3.1), on seven log-spaced nodes with equal weights;
     * the same integral per result instead of per series (each result with its own softness: a scale mixture of
     * logistic links, over three ranges); a partial result as a band observation; the bias correction.
     * Posteriors are sampled at temperature 1 by {@link RegionSampler} from their maximum.
     */
    private static void bayes(Map<String, List<double[]>> est, SyntheticSeries series, LikelihoodObjective f, FitResult programFit, double[] fit,
                              LibraryPrior prior, double[] tr, SplittableRandom rng) {
        add(est, "Bayes: posterior mean, flat prior (the region's samples re-weighted)", vector(programFit.region().posteriorMean()), tr);

        ToDoubleFunction<double[]> withR0 = p -> f.logPosterior(p) + prior.logDensityR0(p);
        double[] mapR0 = LocalSearch.minimise(p -> -withR0.applyAsDouble(p), fit).getPoint();
        add(est, "Bayes: MAP, library prior on ln R0", mapR0, tr);
        List<double[]> r0Samples = RegionSampler.run(withR0, mapR0, POSTERIOR_SAMPLES, 1.0, rng).points();
        add(est, "Bayes: posterior mean, library prior on ln R0", mean(r0Samples), tr);
        add(est, "Bayes: posterior spatial median, library prior on ln R0", spatialMedian(r0Samples), tr);

        ToDoubleFunction<double[]> withAll = p -> f.logPosterior(p) + prior.logDensity(p);
        PointValuePair a = LocalSearch.minimise(p -> -withAll.applyAsDouble(p), fit);
        PointValuePair b = LocalSearch.minimise(p -> -withAll.applyAsDouble(p), prior.mode());
        double[] mapAll = (a.getValue() <= b.getValue() ? a : b).getPoint();
        List<double[]> allSamples = RegionSampler.run(withAll, mapAll, POSTERIOR_SAMPLES, 1.0, rng).points();
        add(est, "Bayes: posterior mean, library prior on all four", mean(allSamples), tr);
        add(est, "Bayes: posterior spatial median, library prior on all four", spatialMedian(allSamples), tr);

        SphereFitter.Data data = SphereFitter.Data.of(series.results());
        List<LikelihoodObjective> nodes = new ArrayList<>();
        for (double sn : SOFTNESS_NODES) {
            nodes.add(new LikelihoodObjective(data, null, new DissolutionModel(sn, DissolutionModel.DEFAULT_LAPSE), null));
        }
        ToDoubleFunction<double[]> marginal = p -> {
            double[] l = new double[nodes.size()];
            double top = Double.NEGATIVE_INFINITY;
            for (int j = 0; j < l.length; j++) {
                l[j] = nodes.get(j).logPosterior(p);
                top = Math.max(top, l[j]);
            }
            if (top == Double.NEGATIVE_INFINITY) {
                return top;
            }
            double sum = 0;
            for (double x : l) {
                sum += Math.exp(x - top);
            }
            return top + Math.log(sum / l.length);
        };
        double[] mapS = LocalSearch.minimise(p -> -marginal.applyAsDouble(p), fit).getPoint();
        add(est, "Bayes: softness integrated out (maximum)", mapS, tr);
        ToDoubleFunction<double[]> marginalR0 = p -> marginal.applyAsDouble(p) + prior.logDensityR0(p);
        double[] mapSR0 = LocalSearch.minimise(p -> -marginalR0.applyAsDouble(p), mapS).getPoint();
        List<double[]> sSamples = RegionSampler.run(marginalR0, mapSR0, POSTERIOR_SAMPLES, 1.0, rng).points();
        add(est, "Bayes: softness integrated out, prior on ln R0, posterior mean", mean(sSamples), tr);
        add(est, "Bayes: softness integrated out, prior on ln R0, spatial median", spatialMedian(sSamples), tr);

        // the softness integrated out per result rather than per series: a scale mixture of logistic links
        for (double[] range : new double[][] {{0.03, 0.3}, {0.01, 0.1}, {0.05, 0.5}}) {
            double[] sn = logSpaced(range[0], range[1], 7);
            ToDoubleFunction<double[]> mixed = p -> mixtureLogLikelihood(data, p, sn);
            double[] mapMixed = LocalSearch.minimise(p -> -mixed.applyAsDouble(p), fit).getPoint();
            add(est, "Bayes: softness integrated out per result, s " + range[0] + "-" + range[1] + " (maximum)", mapMixed, tr);
        }

        ToDoubleFunction<double[]> banded = p -> bandLogLikelihood(data, p, PARTIAL_BAND, DissolutionModel.DEFAULT);
        add(est, "graded scores: a partial result as an observation of RED " + (1 - PARTIAL_BAND) + "-" + (1 + PARTIAL_BAND) + " (maximum)",
                LocalSearch.minimise(p -> -banded.applyAsDouble(p), fit).getPoint(), tr);

        add(est, "bias-corrected by parametric bootstrap, scores drawn from the fitted model", biasCorrected(data, fit, false, rng), tr);
        add(est, "bias-corrected by parametric bootstrap, scores exact at the fitted sphere", biasCorrected(data, fit, true, rng), tr);
    }

    static final int BIAS_RESAMPLES = 30;
    /** Half-width of the near-surface band a partial result is read as (issue 14's band for near-surface results, RED 0.8–1.25). */
    static final double PARTIAL_BAND = 0.2;

    /**
     * Log-likelihood with a graded score read as an interval observation: a partial result (0 &lt; y &lt; 1) says the
     * liquid lies within RED 1 ± {@code band}, P(partial) = ε + (1 − 2ε)·[σ((1 + band − RED)/s) − σ((1 − band − RED)/s)]
     * (an ordered-category link: McCullagh, <i>J. R. Stat. Soc. B</i> 42 (1980) 109); yes/no results as in the fit.
     */
    static double bandLogLikelihood(SphereFitter.Data data, double[] p, double band, DissolutionModel m) {
        return sumOverResults(data, p, (red, y) -> {
            if (y > 0 && y < 1) {
                double s = m.softness();
                double in = 1 / (1 + Math.exp(-(1 + band - red) / s)) - 1 / (1 + Math.exp(-(1 - band - red) / s));
                return Math.log(m.lapse() + (1 - 2 * m.lapse()) * in);
            }
            return DissolutionModel.logLikelihood(y, m.pDissolves(red));
        });
    }

    /** Σ over the results of {@code term(RED, score)} at the sphere {@code p}; −∞ for a radius that is not positive. */
    private static double sumOverResults(SphereFitter.Data data, double[] p, java.util.function.DoubleBinaryOperator term) {
        double r = p[3];
        if (!(r > 0)) {
            return Double.NEGATIVE_INFINITY;
        }
        double sum = 0;
        for (int i = 0; i < data.size(); i++) {
            sum += term.applyAsDouble(SphereFitter.Data.ra(data.points[i], p) / r, data.scores[i]);
        }
        return sum;
    }

    static double[] logSpaced(double lo, double hi, int n) {
        double[] out = new double[n];
        for (int j = 0; j < n; j++) {
            out[j] = Math.exp(Math.log(lo) + (Math.log(hi) - Math.log(lo)) * j / (n - 1));
        }
        return out;
    }

    static double mixtureLogLikelihood(SphereFitter.Data data, double[] p, double[] nodes) {
        return sumOverResults(data, p, (red, y) -> {
            double q = 0;
            for (double sn : nodes) {
                q += 1 / (1 + Math.exp(-(1 - red) / sn));
            }
            double pd = DissolutionModel.DEFAULT_LAPSE + (1 - 2 * DissolutionModel.DEFAULT_LAPSE) * q / nodes.length;
            return DissolutionModel.logLikelihood(y, pd);
        });
    }

    /**
     * Parametric-bootstrap bias correction, θ̃ = 2θ̂ − mean(θ̂*): series of the same liquids scored by the fitted sphere
     * (each result drawn from the fitted model's P, or exactly inside/outside), each refitted from θ̂ (Efron, Tibshirani,
     * <i>An Introduction to the Bootstrap</i>, 1993, ch. 10; MacKinnon, Smith, <i>J. Econometrics</i> 85 (1998) 205).
     */
    static double[] biasCorrected(SphereFitter.Data data, double[] fit, boolean exact, SplittableRandom rng) {
        double[] m = new double[4];
        int n = 0;
        for (int b = 0; b < BIAS_RESAMPLES; b++) {
            double[] y = new double[data.size()];
            int good = 0;
            for (int i = 0; i < y.length; i++) {
                double red = SphereFitter.Data.ra(data.points[i], fit) / fit[3];
                y[i] = exact ? (red < 1 ? 1 : 0) : (rng.nextDouble() < DissolutionModel.DEFAULT.pDissolves(red) ? 1 : 0);
                good += (int) y[i];
            }
            if (good == 0 || good == y.length) {
                continue;
            }
            double[] p = LocalSearch.minimise(new LikelihoodObjective(data.withScores(y), null, DissolutionModel.DEFAULT, null), fit).getPoint();
            for (int k = 0; k < 4; k++) {
                m[k] += p[k];
            }
            n++;
            if (exact) {
                break;
            }
        }
        double[] out = new double[4];
        for (int k = 0; k < 4; k++) {
            out[k] = n == 0 ? fit[k] : Math.max(LocalSearch.LOWER[k], Math.min(LocalSearch.UPPER[k], 2 * fit[k] - m[k] / n));
        }
        return out;
    }

    static double[] mean(List<double[]> xs) {
        double[] m = new double[4];
        for (double[] x : xs) {
            for (int k = 0; k < 4; k++) {
                m[k] += x[k] / xs.size();
            }
        }
        return m;
    }

    /**
     * Spatial (geometric) median of the centres in the plain metric by Weiszfeld's iteration, started at the mean;
     * R0 is the plain median of the radii.
     */
    static double[] spatialMedian(List<double[]> xs) {
        double[] m = mean(xs);
        for (int it = 0; it < 200; it++) {
            double[] num = new double[3];
            double den = 0;
            for (double[] x : xs) {
                double d = Math.sqrt(sq(x[0] - m[0]) + sq(x[1] - m[1]) + sq(x[2] - m[2]));
                double w = 1 / Math.max(d, 1e-9);
                for (int k = 0; k < 3; k++) {
                    num[k] += w * x[k];
                }
                den += w;
            }
            double shift = 0;
            for (int k = 0; k < 3; k++) {
                double n = num[k] / den;
                shift += sq(n - m[k]);
                m[k] = n;
            }
            if (shift < 1e-12) {
                break;
            }
        }
        m[3] = FitValidation.median(xs.stream().map(x -> x[3]).toList());
        return m;
    }

    private static double sq(double x) {
        return x * x;
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

        /** The log density of the ln R0 part alone (a prior on the radius only), with its 1/R0. */
        double logDensityR0(double[] p) {
            if (!(p[3] > 0)) {
                return Double.NEGATIVE_INFINITY;
            }
            double z = (Math.log(p[3]) - mean[3]) / sd[3];
            return -Math.log(p[3]) - z * z / 2;
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
