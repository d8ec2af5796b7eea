package org.cohesa.core.hsp;

/**
 * The Hansen distance between two points in parameter space.
 *
 * <p>Ra² = 4(δD₁ − δD₂)² + (δP₁ − δP₂)² + (δH₁ − δH₂)², Ra in MPa^½ (Hansen, C. M., <i>Hansen
 * Solubility Parameters: A User's Handbook</i>, 2nd ed., CRC Press, 2007, ch. 1 and ch. 2).
 * The factor 4 on the dispersion term is empirical: with it, solubility regions plotted with a doubled
 * δD axis become spheres rather than spheroids (Skaarup, as reported by Hansen 2007, ch. 1).
 */
public final class HansenDistance {

    /** Weight of the squared δD difference in Ra² (Hansen 2007). */
    public static final double DISPERSION_WEIGHT = 4.0;

    private HansenDistance() {
    }

    /** Ra between {@code a} and {@code b}, MPa^½. Symmetric; zero for identical points. */
    public static double ra(HansenParameters a, HansenParameters b) {
        return Math.sqrt(raSquared(a.dD(), a.dP(), a.dH(), b.dD(), b.dP(), b.dH()));
    }

    /** Ra² from raw coordinates, (MPa^½)², for hot loops that avoid allocating records. */
    public static double raSquared(double dD1, double dP1, double dH1, double dD2, double dP2, double dH2) {
        double d = dD1 - dD2;
        double p = dP1 - dP2;
        double h = dH1 - dH2;
        return DISPERSION_WEIGHT * d * d + p * p + h * h;
    }
}
