package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.optim.PointValuePair;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * Fits a solubility sphere to dissolving tests, with quality, a bootstrap confidence region, warnings and the most
 * useful next tests. See docs/methods.md ("Sphere fit") for the method and why it departs from the published
 * approach.
 *
 * <p>Global stage: a coarse grid of centres over the region of the dissolving liquids, each scored by how well the
 * best radius for it sorts the results ({@link Consensus}). Local stage: Nelder–Mead ({@link LocalSearch}) on the
 * soft-margin loss ({@link SoftMarginObjective}) from the best cells and seeded jitter around them; the best
 * sphere found anchors the bootstrap. Reported sphere: the consensus (weighted mean) over a fine grid around the
 * cells that sort the results best.
 * Everything random draws from one {@link SplittableRandom} seeded by {@link FitOptions#seed()}, so a seed
 * fixes the result.
 */
public final class SphereFitter {

    /** Nominal level of the confidence intervals. */
    public static final double LEVEL = 0.95;

    private SphereFitter() {
    }

    /**
     * @param results    the test series (at least 3 results, at least one dissolving)
     * @param candidates library liquids that could be tested next (tested ones are skipped)
     * @param options    seed, bootstrap size, starts
     */
    public static FitResult fit(List<TestResult> results, List<NamedPoint> candidates, FitOptions options) {
        return switch (options.method()) {
            case LIKELIHOOD -> LikelihoodFitter.fit(results, candidates, options);
            case CLASSIC -> classic(results, candidates, options);
            case CONSENSUS -> consensus(results, candidates, options);
        };
    }

    /**
     * The published desirability fit ({@link DesirabilityFitter}) with a bootstrap percentile box of its refits
     * (Bonferroni-corrected as in {@link Uncertainty}) and next tests by how evenly the refits split on a liquid.
     */
    static FitResult classic(List<TestResult> results, List<NamedPoint> candidates, FitOptions options) {
        requireUsable(results);
        Data data = Data.of(results);
        int starts = Math.max(1, options.starts() / 2);
        SolubilitySphere sphere = DesirabilityFitter.fit(results, options.seed(), starts);
        double[] best = {sphere.centre().dD(), sphere.centre().dP(), sphere.centre().dH(), sphere.r0()};
        SplittableRandom rng = new SplittableRandom(options.seed() ^ 0x5DEECE66DL);
        List<double[]> boots = new ArrayList<>();
        int m = results.size();
        for (int b = 0; b < options.resamples(); b++) {
            List<TestResult> re = new ArrayList<>(m);
            for (int k = 0; k < m; k++) {
                re.add(results.get(rng.nextInt(m)));
            }
            if (re.stream().noneMatch(TestResult::good) || re.size() < 3) {
                continue;
            }
            SolubilitySphere s = DesirabilityFitter.fit(re, rng.nextLong(), starts);
            boots.add(new double[] {s.centre().dD(), s.centre().dP(), s.centre().dH(), s.r0()});
        }
        Interval[] iv = new Interval[4];
        for (int k = 0; k < 4; k++) {
            iv[k] = Uncertainty.bootstrapInterval(best, boots, k, LEVEL);
        }
        List<NamedPoint> untested = untested(results, candidates);
        ConfidenceRegion confidence = new ConfidenceRegion(LEVEL, boots.size(), iv[0], iv[1], iv[2], iv[3],
                BoundsCheck.warnings(data, best, iv, results, untested));
        List<NextTest> next = NextTestAdvisor.suggest(sphere, boots, untested, confidence, options.nextTests());
        return new FitResult(sphere, quality(results, sphere), confidence, next, results.size(), FitMethod.CLASSIC);
    }

    /** The consensus fit of issue 3 (see the class comment). */
    static FitResult consensus(List<TestResult> results, List<NamedPoint> candidates, FitOptions options) {
        requireUsable(results);
        Data data = Data.of(results);
        SplittableRandom rng = new SplittableRandom(options.seed());
        double[] ones = new double[data.size()];
        Arrays.fill(ones, 1.0);
        List<Consensus.Cell> coarse = Consensus.coarse(data, ones);
        double[] mode = localStage(data, ones, coarse, options.starts(), rng);
        Consensus.Summary posterior = Consensus.summarise(Consensus.fine(data, ones, coarse));
        double[] best = consensusSphere(data, ones, posterior);
        SolubilitySphere sphere = SolubilitySphere.of(best[0], best[1], best[2], best[3]);
        FitQuality quality = quality(results, sphere);
        List<double[]> boots = bootstrap(data, mode, options.resamples(), rng);
        List<NamedPoint> untested = untested(results, candidates);
        ConfidenceRegion confidence = Uncertainty.region(data, best, boots, posterior, results, untested, LEVEL);
        List<NextTest> next = NextTestAdvisor.suggest(sphere, boots, untested, confidence, options.nextTests());
        return new FitResult(sphere, quality, confidence, next, results.size(), FitMethod.CONSENSUS);
    }

    /**
     * The weighted mean sphere; should the mean itself sort the results worse than the best spheres do (the set of
     * best spheres need not be convex), the best-sorting grid sphere nearest the mean is taken instead.
     */
    static double[] consensusSphere(Data data, double[] w, Consensus.Summary posterior) {
        double[] mean = posterior.mean();
        double least = posterior.cells().stream().mapToDouble(Consensus.Cell::minCost).min().orElseThrow();
        if (cost(data, w, mean) <= least + 1e-9) {
            return mean;
        }
        Consensus.Cell nearest = null;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (Consensus.Cell c : posterior.cells()) {
            if (c.minCost() > least + 1e-9) {
                continue;
            }
            double dx = c.sx() - 2 * mean[0];
            double dy = c.sy() - mean[1];
            double dz = c.sz() - mean[2];
            double dist = dx * dx + dy * dy + dz * dz;
            if (dist < bestDistance) {
                bestDistance = dist;
                nearest = c;
            }
        }
        return new double[] {nearest.sx() / 2, nearest.sy(), nearest.sz(), nearest.bestR()};
    }

    /** Misfit cost of a sphere {δD, δP, δH, R0} (see {@link Consensus}). */
    static double cost(Data data, double[] w, double[] sphere) {
        double[] c = {sphere[0], sphere[1], sphere[2]};
        double sum = 0;
        for (int i = 0; i < data.size(); i++) {
            boolean inside = Data.ra(data.points[i], c) < sphere[3];
            sum += w[i] * (inside ? 1 - data.scores[i] : data.scores[i]);
        }
        return sum;
    }

    /**
     * Local stage: Nelder–Mead on the soft-margin loss from the best coarse cells and from seeded jitter around
     * them; returns the best sphere found (the mode the bootstrap starts from).
     */
    static double[] localStage(Data data, double[] w, List<Consensus.Cell> coarse, int starts, SplittableRandom rng) {
        SoftMarginObjective f = new SoftMarginObjective(data.scaled, data.scores, w);
        List<Consensus.Cell> ranked = new ArrayList<>(coarse);
        ranked.sort(Comparator.comparingDouble(c -> -c.logZ()));
        List<double[]> startPoints = new ArrayList<>();
        int top = Math.max(1, (starts + 1) / 2);
        for (int i = 0; i < top && i < ranked.size(); i++) {
            Consensus.Cell c = ranked.get(i);
            startPoints.add(new double[] {c.sx() / 2, c.sy(), c.sz(), c.bestR()});
        }
        while (startPoints.size() < starts) {
            double[] base = startPoints.get(rng.nextInt(top));
            startPoints.add(new double[] {base[0] + rng.nextGaussian() * 0.5, base[1] + rng.nextGaussian(),
                    base[2] + rng.nextGaussian(), base[3] * (0.8 + 0.4 * rng.nextDouble())});
        }
        PointValuePair best = null;
        for (double[] s : startPoints) {
            PointValuePair p = LocalSearch.minimise(f, s);
            if (best == null || p.getValue() < best.getValue()) {
                best = p;
            }
        }
        return best.getPoint();
    }

    /** How {@code sphere} sorts {@code results}: counts and misfits (worst first). */
    public static FitQuality quality(List<TestResult> results, SolubilitySphere sphere) {
        int goodIn = 0;
        int good = 0;
        int badOut = 0;
        int bad = 0;
        List<Misfit> misfits = new ArrayList<>();
        for (TestResult r : results) {
            double red = sphere.red(r.liquid());
            if (r.good()) {
                good++;
                if (red < 1) {
                    goodIn++;
                } else {
                    misfits.add(new Misfit(r.label(), r.score(), red));
                }
            } else {
                bad++;
                if (red >= 1) {
                    badOut++;
                } else {
                    misfits.add(new Misfit(r.label(), r.score(), red));
                }
            }
        }
        misfits.sort(Comparator.comparingDouble((Misfit m) -> -Math.abs(Math.log(m.red()))));
        return new FitQuality(goodIn, good, badOut, bad, misfits);
    }

    static void requireUsable(List<TestResult> results) {
        if (results == null || results.size() < 3) {
            throw new InvalidInputException("results", String.valueOf(results == null ? 0 : results.size()),
                    "a sphere fit needs at least 3 test results (20–40 liquids are usual)");
        }
        if (results.size() > Consensus.MAX_RESULTS) {
            throw new InvalidInputException("results", String.valueOf(results.size()),
                    "at most " + Consensus.MAX_RESULTS + " test results per fit");
        }
        if (results.stream().noneMatch(TestResult::good)) {
            throw new InvalidInputException("score", "all below 0.5",
                    "no liquid dissolved the material, so there is no sphere to fit; test liquids closer to its expected parameters");
        }
    }

    /** Refits on {@code n} resamples (drawn with replacement, as counts per result), each by a local search from the full fit's best sphere. */
    static List<double[]> bootstrap(Data data, double[] full, int n, SplittableRandom rng) {
        List<double[]> out = new ArrayList<>(n);
        int m = data.size();
        for (int b = 0; b < n; b++) {
            double[] w = new double[m];
            for (int k = 0; k < m; k++) {
                w[rng.nextInt(m)] += 1;
            }
            if (data.goodIndices(w).length == 0) {
                continue;
            }
            SoftMarginObjective f = new SoftMarginObjective(data.scaled, data.scores, w);
            out.add(LocalSearch.minimise(f, full, 0.5).getPoint());
        }
        return out;
    }

    static List<NamedPoint> untested(List<TestResult> results, List<NamedPoint> candidates) {
        List<NamedPoint> out = new ArrayList<>();
        for (NamedPoint c : candidates) {
            boolean tested = results.stream().anyMatch(r -> r.label().equalsIgnoreCase(c.name())
                    || HansenParameters.of(r.liquid().dD(), r.liquid().dP(), r.liquid().dH()).distanceTo(c.point()) < 1e-9);
            if (!tested) {
                out.add(c);
            }
        }
        return out;
    }

    /** The test series as arrays: points {δD, δP, δH}, scaled points {2δD, δP, δH}, scores. */
    static final class Data {
        final double[][] points;
        final double[][] scaled;
        final double[] scores;

        private Data(double[][] points, double[][] scaled, double[] scores) {
            this.points = points;
            this.scaled = scaled;
            this.scores = scores;
        }

        static Data of(List<TestResult> results) {
            int n = results.size();
            double[][] p = new double[n][];
            double[][] s = new double[n][];
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                HansenParameters h = results.get(i).liquid();
                p[i] = new double[] {h.dD(), h.dP(), h.dH()};
                s[i] = new double[] {2 * h.dD(), h.dP(), h.dH()};
                y[i] = results.get(i).score();
            }
            return new Data(p, s, y);
        }

        int size() {
            return scores.length;
        }

        /** The same liquids with other scores (a resampled series). */
        Data withScores(double[] y) {
            if (y.length != scores.length) {
                throw new IllegalArgumentException("expected " + scores.length + " scores, got " + y.length);
            }
            return new Data(points, scaled, y.clone());
        }

        int[] goodIndices(double[] w) {
            return java.util.stream.IntStream.range(0, size()).filter(i -> w[i] > 0 && scores[i] >= TestResult.GOOD_THRESHOLD).toArray();
        }

        /** Score-weighted centroid of the dissolving liquids, {δD, δP, δH}. */
        double[] goodCentroid(double[] w) {
            double[] c = new double[3];
            double sum = 0;
            for (int i : goodIndices(w)) {
                double wi = w[i] * scores[i];
                for (int k = 0; k < 3; k++) {
                    c[k] += wi * points[i][k];
                }
                sum += wi;
            }
            for (int k = 0; k < 3; k++) {
                c[k] /= sum;
            }
            return c;
        }

        /** Largest Ra from {@code centre} to a dissolving liquid (at least 1), MPa^½: a radius that holds them all. */
        double goodReach(double[] centre, double[] w) {
            double reach = 1.0;
            for (int i : goodIndices(w)) {
                reach = Math.max(reach, ra(points[i], centre));
            }
            return reach;
        }

        static double ra(double[] p, double[] c) {
            double d = p[0] - c[0];
            double q = p[1] - c[1];
            double h = p[2] - c[2];
            return Math.sqrt(4 * d * d + q * q + h * h);
        }
    }
}
