package org.cohesa.core.hsp;

/**
 * A solubility sphere: the centre (the solute's own parameters) and the interaction radius R0.
 *
 * <p>Liquids with Ra &lt; R0 are expected to dissolve the solute; the relative energy difference
 * RED = Ra / R0 is below 1 inside, 1 on the surface and above 1 outside (Hansen, C. M., <i>Hansen
 * Solubility Parameters: A User's Handbook</i>, 2nd ed., CRC Press, 2007, ch. 1).
 *
 * @param centre the solute's parameters, MPa^½
 * @param r0     interaction radius R0, MPa^½, &gt; 0
 */
public record SolubilitySphere(HansenParameters centre, double r0) {

    public SolubilitySphere {
        if (centre == null) {
            throw new IllegalArgumentException("centre is required");
        }
        if (!Double.isFinite(r0) || r0 <= 0) {
            throw new IllegalArgumentException("R0 must be a positive number, got " + r0);
        }
    }

    public static SolubilitySphere of(double dD, double dP, double dH, double r0) {
        return new SolubilitySphere(new HansenParameters(dD, dP, dH), r0);
    }

    /** Ra from the centre to {@code point}, MPa^½. */
    public double ra(HansenParameters point) {
        return HansenDistance.ra(centre, point);
    }

    /** Relative energy difference RED = Ra / R0 (dimensionless; Hansen 2007). */
    public double red(HansenParameters point) {
        return ra(point) / r0;
    }

    /** True when RED &lt; 1, i.e. the liquid is predicted to dissolve the solute. */
    public boolean contains(HansenParameters point) {
        return red(point) < 1.0;
    }
}
