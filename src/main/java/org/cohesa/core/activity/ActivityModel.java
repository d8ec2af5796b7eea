package org.cohesa.core.activity;

/**
 * A liquid-phase activity-coefficient model for one fixed list of components.
 *
 * <p>Implementations are immutable and safe to share between threads; they precompute what depends
 * only on the components so that {@link #gamma} is cheap enough for an ODE right-hand side.
 */
public interface ActivityModel {

    /** Human-readable model name, e.g. "UNIFAC (original)", shown in outputs so users know which model served. */
    String name();

    /**
     * Activity coefficients γᵢ (dimensionless, mole-fraction convention, pure-liquid standard state).
     *
     * @param moleFractions mole fractions xᵢ in the order of the components, each ≥ 0, summing to 1
     * @param kelvin        temperature, K, &gt; 0
     * @return γᵢ in the same order
     */
    double[] gamma(double[] moleFractions, double kelvin);

    /** Number of components the model was built for. */
    int size();

    /** Why this model was chosen when it is a fallback (e.g. "no UNIFAC groups for X"); empty otherwise. */
    default String note() {
        return "";
    }

    /** ln γᵢ; the default takes the logarithm of {@link #gamma}. */
    default double[] lnGamma(double[] moleFractions, double kelvin) {
        double[] g = gamma(moleFractions, kelvin);
        double[] out = new double[g.length];
        for (int i = 0; i < g.length; i++) {
            out[i] = Math.log(g[i]);
        }
        return out;
    }
}
