package org.cohesa.core.solvent;

/**
 * Antoine vapour-pressure equation, log₁₀(P/Pa) = A − B/(T/K + C), with its range of validity.
 *
 * <p>Form and coefficients as tabulated in Poling, B. E., Prausnitz, J. M., O'Connell, J. P., <i>The
 * Properties of Gases and Liquids</i>, 5th ed., McGraw-Hill, 2000, appendix A (converted to Pa and K).
 *
 * @param a    A, dimensionless
 * @param b    B, K
 * @param c    C, K
 * @param tminK lower end of the fitted range, K
 * @param tmaxK upper end of the fitted range, K
 */
public record Antoine(double a, double b, double c, double tminK, double tmaxK) {

    public Antoine {
        if (!(Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c))) {
            throw new IllegalArgumentException("Antoine coefficients must be finite numbers");
        }
        if (!(tminK > 0 && tmaxK > tminK)) {
            throw new IllegalArgumentException("Antoine range must satisfy 0 < Tmin < Tmax, got " + tminK + ".." + tmaxK + " K");
        }
    }

    /** Saturation pressure at {@code kelvin}, Pa. Outside the fitted range the value is an extrapolation; see {@link #isValidAt}. */
    public double pressurePa(double kelvin) {
        return Math.pow(10.0, a - b / (kelvin + c));
    }

    /** True when {@code kelvin} lies within the fitted range (extended by {@code marginK} either side). */
    public boolean isValidAt(double kelvin, double marginK) {
        return kelvin >= tminK - marginK && kelvin <= tmaxK + marginK;
    }

    /** Temperature at which the saturation pressure equals {@code pa}, K (the equation inverted). */
    public double temperatureAtPressure(double pa) {
        if (!(pa > 0)) {
            throw new IllegalArgumentException("pressure must be positive, got " + pa);
        }
        return b / (a - Math.log10(pa)) - c;
    }
}
