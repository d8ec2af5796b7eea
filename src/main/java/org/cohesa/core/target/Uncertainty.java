package org.cohesa.core.target;

import java.util.Arrays;
import java.util.List;

/**
 * The confidence region of a fit: for each of δD, δP, δH and R0 the union of two intervals,
 * <ul>
 * <li>the bootstrap percentile interval of the refitted best spheres (Efron, B., Tibshirani, R. J., <i>An
 *     Introduction to the Bootstrap</i>, Chapman &amp; Hall, 1993, ch. 13), which shows how much the fit leans on
 *     individual results, and</li>
 * <li>the interval of the consensus weights ({@link Consensus}), which covers every sphere that sorts the results
 *     as well as the best one: with clean data the results cannot tell these spheres apart, and a bootstrap
 *     alone (about a third of the results left out per resample, but the same liquids near the surface in most)
 *     can come out narrower than that set.</li>
 * </ul>
 * The three centre intervals are Bonferroni-corrected so the box as a whole keeps the nominal level. The
 * recovery test measures the coverage.
 */
final class Uncertainty {

    private Uncertainty() {
    }

    /**
     * Percentile interval of parameter {@code k} over the bootstrap fits, widened to include the best fit; just the
     * best value when there are no resamples.
     */
    static Interval bootstrapInterval(double[] best, List<double[]> boots, int k, double level) {
        double lo = best[k];
        double hi = best[k];
        if (!boots.isEmpty()) {
            double[] v = new double[boots.size()];
            for (int b = 0; b < v.length; b++) {
                v[b] = boots.get(b)[k];
            }
            Arrays.sort(v);
            lo = Math.min(lo, percentile(v, tail(k, level)));
            hi = Math.max(hi, percentile(v, 1 - tail(k, level)));
        }
        return new Interval(lo, hi);
    }

    static ConfidenceRegion region(SphereFitter.Data data, double[] best, List<double[]> boots, Consensus.Summary posterior,
                                   List<TestResult> results, List<NamedPoint> untested, double level) {
        Interval[] iv = new Interval[4];
        for (int k = 0; k < 4; k++) {
            Interval boot = bootstrapInterval(best, boots, k, level);
            double lo = boot.low();
            double hi = boot.high();
            lo = Math.min(lo, posterior.percentile(k, tail(k, level)));
            hi = Math.max(hi, posterior.percentile(k, 1 - tail(k, level)));
            iv[k] = new Interval(lo, hi);
        }
        List<String> warnings = BoundsCheck.warnings(data, best, iv, results, untested);
        return new ConfidenceRegion(level, boots.size(), iv[0], iv[1], iv[2], iv[3], warnings);
    }

    /**
     * One-sided tail probability of each interval: the three centre intervals share the miss rate 1 − level
     * (Bonferroni), so the box holds the centre at least at the nominal level if each interval holds its
     * coordinate; R0 has its own interval.
     */
    static double tail(int k, double level) {
        return k < 3 ? (1 - level) / 6 : (1 - level) / 2;
    }

    /** Linear-interpolated percentile of sorted values, q in [0, 1]. */
    static double percentile(double[] sorted, double q) {
        if (sorted.length == 1) {
            return sorted[0];
        }
        double pos = q * (sorted.length - 1);
        int i = (int) Math.floor(pos);
        int j = Math.min(i + 1, sorted.length - 1);
        return sorted[i] + (pos - i) * (sorted[j] - sorted[i]);
    }
}
