package org.cohesa.core.hsp;

/**
 * Flory–Huggins interaction parameter between two liquids estimated from Hansen parameters.
 *
 * <p>χ₁₂ = α · (V₁ / RT) · [(δD₁ − δD₂)² + ¼(δP₁ − δP₂)² + ¼(δH₁ − δH₂)²] = α · V₁ · Ra² / (4RT)
 * (Hansen 2007, ch. 2; Lindvig, Th., Michelsen, M. L., Kontogeorgis, G. M., "A Flory–Huggins model based
 * on the Hansen solubility parameters", <i>Fluid Phase Equilibria</i> 203 (2002) 247–260, who fit the
 * correction α = 0.6 to activity-coefficient data). V₁ in cm³/mol, δ in MPa^½, so V₁·δ² is J/mol; χ is
 * dimensionless and referred to the volume V₁.
 */
public final class FloryHugginsChi {

    /** Lindvig et al. (2002) correction factor fitted to solvent–polymer activity data. */
    public static final double LINDVIG_ALPHA = 0.6;

    private FloryHugginsChi() {
    }

    /**
     * @param a               parameters of liquid 1, MPa^½
     * @param b               parameters of liquid 2, MPa^½
     * @param molarVolumeCm3  molar volume V₁ of liquid 1 (the reference volume), cm³/mol, &gt; 0
     * @param kelvin          temperature, K, &gt; 0
     * @param alpha           empirical correction factor (1 for Hansen's form, {@link #LINDVIG_ALPHA} for Lindvig's)
     */
    public static double chi(HansenParameters a, HansenParameters b, double molarVolumeCm3, double kelvin, double alpha) {
        if (!Double.isFinite(molarVolumeCm3) || molarVolumeCm3 <= 0) {
            throw new IllegalArgumentException("molar volume must be a positive number, got " + molarVolumeCm3);
        }
        if (!Double.isFinite(kelvin) || kelvin <= 0) {
            throw new IllegalArgumentException("temperature must be above 0 K, got " + kelvin);
        }
        if (!Double.isFinite(alpha) || alpha <= 0) {
            throw new IllegalArgumentException("alpha must be a positive number, got " + alpha);
        }
        double ra2 = HansenDistance.raSquared(a.dD(), a.dP(), a.dH(), b.dD(), b.dP(), b.dH());
        return alpha * molarVolumeCm3 * ra2 / (4.0 * CohesiveEnergy.GAS_CONSTANT * kelvin);
    }
}
