package org.cohesa.core.target;

/**
 * Settings of a sphere fit.
 *
 * @param seed        seed of every random choice (starts, bootstrap resamples): same seed, same result
 * @param resamples   bootstrap resamples for the confidence region (0 switches the bootstrap off)
 * @param starts      local searches of the global stage (≥ 1)
 * @param nextTests   how many next tests to suggest
 */
public record FitOptions(long seed, int resamples, int starts, int nextTests) {

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
    }

    /** 200 resamples, 12 starts, 5 suggestions. */
    public static FitOptions defaults(long seed) {
        return new FitOptions(seed, 200, 12, 5);
    }

    public FitOptions withResamples(int n) {
        return new FitOptions(seed, n, starts, nextTests);
    }
}
