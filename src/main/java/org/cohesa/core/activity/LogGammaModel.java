package org.cohesa.core.activity;

/**
 * Base of the models that compute ln γ directly (UNIFAC, Flory–Huggins): γ is its exponential, so each
 * model writes the logarithmic form only.
 */
abstract class LogGammaModel implements ActivityModel {

    @Override
    public abstract double[] lnGamma(double[] moleFractions, double kelvin);

    @Override
    public final double[] gamma(double[] moleFractions, double kelvin) {
        double[] g = lnGamma(moleFractions, kelvin);
        for (int i = 0; i < g.length; i++) {
            g[i] = Math.exp(g[i]);
        }
        return g;
    }
}
