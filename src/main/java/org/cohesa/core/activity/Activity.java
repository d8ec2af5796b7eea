package org.cohesa.core.activity;

/** Input checks shared by the activity models. */
final class Activity {

    /** Tolerance on Σx = 1 for mole fractions handed to a model. */
    static final double SUM_TOLERANCE = 1e-6;

    private Activity() {
    }

    static void requireComposition(double[] x, int n) {
        if (x == null || x.length != n) {
            throw new IllegalArgumentException("expected " + n + " mole fractions, got " + (x == null ? "none" : x.length));
        }
        double sum = 0;
        for (double v : x) {
            if (!Double.isFinite(v) || v < 0) {
                throw new IllegalArgumentException("mole fraction must be a number ≥ 0, got " + v);
            }
            sum += v;
        }
        if (Math.abs(sum - 1) > SUM_TOLERANCE) {
            throw new IllegalArgumentException("mole fractions must sum to 1, got " + sum);
        }
    }

    static void requireTemperature(double kelvin) {
        if (!Double.isFinite(kelvin) || kelvin <= 0) {
            throw new IllegalArgumentException("temperature must be above 0 K, got " + kelvin);
        }
    }
}
