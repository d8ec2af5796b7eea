package org.cohesa.core.hsp;

/**
 * The three Hansen solubility parameters of a liquid or a solute, in MPa^½.
 *
 * <p>Hansen split the Hildebrand parameter into dispersion (δD), polar (δP) and hydrogen-bonding (δH)
 * parts with δt² = δD² + δP² + δH² (Hansen, C. M., <i>Hansen Solubility Parameters: A User's
 * Handbook</i>, 2nd ed., CRC Press, 2007, ch. 1). Values are non-negative by definition:
 * each part is the square root of a cohesive energy density.
 *
 * @param dD dispersion parameter δD, MPa^½, ≥ 0
 * @param dP polar parameter δP, MPa^½, ≥ 0
 * @param dH hydrogen-bonding parameter δH, MPa^½, ≥ 0
 */
public record HansenParameters(double dD, double dP, double dH) {

    public HansenParameters {
        requireParameter("dD", dD);
        requireParameter("dP", dP);
        requireParameter("dH", dH);
    }

    public static HansenParameters of(double dD, double dP, double dH) {
        return new HansenParameters(dD, dP, dH);
    }

    /** Total (Hildebrand-equivalent) parameter δt = √(δD² + δP² + δH²), MPa^½ (Hansen 2007). */
    public double total() {
        return Math.sqrt(dD * dD + dP * dP + dH * dH);
    }

    /** Hansen distance Ra to another point, MPa^½; see {@link HansenDistance#ra}. */
    public double distanceTo(HansenParameters other) {
        return HansenDistance.ra(this, other);
    }

    /** The point as an array {δD, δP, δH}, for numerical code. */
    public double[] toArray() {
        return new double[] {dD, dP, dH};
    }

    private static void requireParameter(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number, got " + value);
        }
        if (value < 0) {
            throw new IllegalArgumentException(field + " must not be negative (a Hansen parameter is the square root of an energy density), got " + value);
        }
    }
}
