package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.ToDoubleFunction;

/**
 * Random-walk Metropolis sampling (Metropolis et al., <i>J. Chem. Phys.</i> 21 (1953) 1087) of the tempered
 * likelihood L(θ)^(1/T) over the search box, T = {@value #TEMPERATURE}: the tempering spreads the chain out to the
 * edge of the χ²₄ region (where untempered samples are rare). The proposal steps adapt during burn-in towards an
 * acceptance rate of 0.2–0.4 (Gelman, Roberts, Gilks, in <i>Bayesian Statistics 5</i>, 1996, 599) and are frozen
 * afterwards.
 */
final class RegionSampler {

    static final double TEMPERATURE = 2.0;
    private static final int BURN_IN = 1200;
    private static final int THIN = 3;
    private static final double[] FIRST_STEPS = {0.25, 0.5, 0.5, 0.5};

    /** Sampled spheres {δD, δP, δH, R0} with their log-likelihoods. */
    record Chain(List<double[]> points, List<Double> logL) {
    }

    private RegionSampler() {
    }

    static Chain run(LikelihoodObjective f, double[] start, int kept, SplittableRandom rng) {
        return run(f::logPosterior, start, kept, TEMPERATURE, rng);
    }

    /**
     * The same sampler for any log density (up to a constant) over the search box, at {@code temperature} (1: the
     * density itself, as the diagnostics of {@link FitLimits} use it for posterior means).
     */
    static Chain run(ToDoubleFunction<double[]> logDensity, double[] start, int kept, double temperature, SplittableRandom rng) {
        double[] x = start.clone();
        double lx = logDensity.applyAsDouble(x);
        double[] step = FIRST_STEPS.clone();
        List<double[]> pts = new ArrayList<>(kept);
        List<Double> ls = new ArrayList<>(kept);
        int accepted = 0;
        int total = BURN_IN + kept * THIN;
        double[] y = new double[4];
        for (int it = 0; it < total; it++) {
            for (int k = 0; k < 4; k++) {
                y[k] = x[k] + step[k] * rng.nextGaussian();
            }
            double ly = inBounds(y) ? logDensity.applyAsDouble(y) : Double.NEGATIVE_INFINITY;
            if (ly > Double.NEGATIVE_INFINITY && Math.log(rng.nextDouble()) < (ly - lx) / temperature) {
                System.arraycopy(y, 0, x, 0, 4);
                lx = ly;
                accepted++;
            }
            if (it < BURN_IN && (it + 1) % 100 == 0) {
                double rate = accepted / 100.0;
                double factor = rate > 0.4 ? 1.6 : rate < 0.2 ? 0.6 : 1.0;
                for (int k = 0; k < 4; k++) {
                    step[k] *= factor;
                }
                accepted = 0;
            }
            if (it >= BURN_IN && (it - BURN_IN) % THIN == 0) {
                pts.add(x.clone());
                ls.add(lx);
            }
        }
        return new Chain(pts, ls);
    }

    static boolean inBounds(double[] p) {
        for (int k = 0; k < 4; k++) {
            if (p[k] < LocalSearch.LOWER[k] || p[k] > LocalSearch.UPPER[k]) {
                return false;
            }
        }
        return true;
    }
}
