package org.cohesa.core.target;

import java.util.Objects;

/**
 * Settings of a sphere fit.
 *
 * @param seed        seed of every random choice (starts, resamples, region sampler): same seed, same result
 * @param resamples   bootstrap resamples for the confidence box of the classic and consensus fits (0 switches the
 *                    bootstrap off); the likelihood fit's region comes from the likelihood itself and ignores it
 * @param starts      local searches of the global stage (≥ 1)
 * @param nextTests   how many next tests to suggest
 * @param method      how the sphere is fitted (default {@link FitMethod#LIKELIHOOD})
 * @param model       observation model of the likelihood fit
 * @param prior       optional centre prior of the likelihood fit (null: none)
 */
public record FitOptions(long seed, int resamples, int starts, int nextTests, FitMethod method, DissolutionModel model, CentrePrior prior) {

    /** Seed used when the user gives none. */
    public static final long DEFAULT_SEED = 20_070_101L;

    public FitOptions {
        if (resamples < 0 || resamples > 10_000) {
            throw new IllegalArgumentException("bootstrap resamples must lie between 0 and 10000, got " + resamples);
        }
        if (starts < 1 || starts > 1000) {
            throw new IllegalArgumentException("starts must lie between 1 and 1000, got " + starts);
        }
        if (nextTests < 0 || nextTests > 100) {
            throw new IllegalArgumentException("next tests must lie between 0 and 100, got " + nextTests);
        }
        method = Objects.requireNonNullElse(method, FitMethod.LIKELIHOOD);
        model = Objects.requireNonNullElse(model, DissolutionModel.DEFAULT);
    }

    /** The default method (likelihood) with the default model and no prior. */
    public FitOptions(long seed, int resamples, int starts, int nextTests) {
        this(seed, resamples, starts, nextTests, FitMethod.LIKELIHOOD, DissolutionModel.DEFAULT, null);
    }

    /** 200 resamples, 12 starts, 5 suggestions, the likelihood fit. */
    public static FitOptions defaults(long seed) {
        return new FitOptions(seed, 200, 12, 5);
    }

    public FitOptions withResamples(int n) {
        return new FitOptions(seed, n, starts, nextTests, method, model, prior);
    }

    public FitOptions withMethod(FitMethod m) {
        return new FitOptions(seed, resamples, starts, nextTests, m, model, prior);
    }

    public FitOptions withPrior(CentrePrior p) {
        return new FitOptions(seed, resamples, starts, nextTests, method, model, p);
    }

    public FitOptions withModel(DissolutionModel m) {
        return new FitOptions(seed, resamples, starts, nextTests, method, m, prior);
    }

    public FitOptions withNextTests(int n) {
        return new FitOptions(seed, resamples, starts, n, method, model, prior);
    }
}
