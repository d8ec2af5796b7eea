package org.cohesa.core.target;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.MultivariateFunction;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The published approach, kept as the baseline our fit is measured against (Hansen, C. M., <i>Hansen Solubility
 * Parameters: A User's Handbook</i>, 2nd ed., CRC Press, 2007, ch. 1–2).
 *
 * <p>In Hansen's method each liquid gets a desirability A: 1 when it is on the correct side of the surface,
 * e^−(Ra − R0) for a dissolving liquid that lies outside, e^−(R0 − Ra) for a non-dissolving one inside. The fit
 * maximises the geometric mean of the A values; among spheres that place every liquid correctly (all equal to 1)
 * the smallest radius is taken. Here that is: minimise the mean wrong-side distance plus a tiny weight on R0,
 * with the same starts and the same local search as {@link SphereFitter}. Scores are read as good (≥ 0.5) or
 * bad; the method has no graded form.
 */
public final class DesirabilityFitter {

    /** Weight of R0, per MPa^½: only breaks the tie between perfect spheres in favour of the smallest. */
    static final double RADIUS_WEIGHT = 1e-4;

    private DesirabilityFitter() {
    }

    public static SolubilitySphere fit(List<TestResult> results, long seed, int starts) {
        SphereFitter.requireUsable(results);
        SphereFitter.Data data = SphereFitter.Data.of(results);
        double[] ones = new double[data.size()];
        Arrays.fill(ones, 1.0);
        MultivariateFunction f = p -> {
            double[] c = {p[0], p[1], p[2]};
            double sum = 0;
            for (int i = 0; i < data.size(); i++) {
                double m = p[3] - SphereFitter.Data.ra(data.points[i], c);
                boolean good = data.scores[i] >= TestResult.GOOD_THRESHOLD;
                if (good && m < 0) {
                    sum -= m;
                } else if (!good && m > 0) {
                    sum += m;
                }
            }
            return sum / data.size() + RADIUS_WEIGHT * p[3];
        };
        SplittableRandom rng = new SplittableRandom(seed);
        double[] centroid = data.goodCentroid(ones);
        double reach = data.goodReach(centroid, ones);
        double[] best = null;
        double bestValue = Double.POSITIVE_INFINITY;
        for (int s = 0; s < starts; s++) {
            double[] start = s == 0 ? new double[] {centroid[0], centroid[1], centroid[2], reach}
                    : new double[] {centroid[0] + rng.nextGaussian() * 0.5, centroid[1] + rng.nextGaussian(),
                            centroid[2] + rng.nextGaussian(), reach * (0.5 + rng.nextDouble())};
            var p = LocalSearch.minimise(f, start);
            if (p.getValue() < bestValue) {
                bestValue = p.getValue();
                best = p.getPoint();
            }
        }
        return SolubilitySphere.of(best[0], best[1], best[2], best[3]);
    }
}
