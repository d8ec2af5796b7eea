package org.cohesa.core.hsp;

import java.util.List;

/**
 * Hansen parameters of a liquid blend by the volume-fraction mixing rule.
 *
 * <p>δ_blend = Σ φᵢ δᵢ for each of δD, δP, δH, with φᵢ the volume fractions (Hansen, C. M., <i>Hansen
 * Solubility Parameters: A User's Handbook</i>, 2nd ed., CRC Press, 2007, ch. 1; the rule assumes no
 * volume change on mixing).
 */
public final class VolumeMixing {

    /** Tolerance on Σφ = 1. */
    public static final double FRACTION_SUM_TOLERANCE = 1e-6;

    private VolumeMixing() {
    }

    /**
     * Mixes components by volume fraction.
     *
     * @param fractions volume fractions φᵢ, each ≥ 0, summing to 1 within {@value #FRACTION_SUM_TOLERANCE}
     * @param components parameters of each component, MPa^½
     * @return the blend's parameters, MPa^½
     */
    public static HansenParameters mix(double[] fractions, List<HansenParameters> components) {
        if (fractions.length != components.size() || fractions.length == 0) {
            throw new IllegalArgumentException("a blend needs one volume fraction per component, got "
                    + fractions.length + " fractions for " + components.size() + " components");
        }
        requireFractions(fractions);
        double d = 0;
        double p = 0;
        double h = 0;
        for (int i = 0; i < fractions.length; i++) {
            HansenParameters c = components.get(i);
            d += fractions[i] * c.dD();
            p += fractions[i] * c.dP();
            h += fractions[i] * c.dH();
        }
        return new HansenParameters(d, p, h);
    }

    /** Rejects fractions that are negative, not finite, or do not sum to 1 within the tolerance. */
    public static void requireFractions(double[] fractions) {
        double sum = 0;
        for (double f : fractions) {
            if (!Double.isFinite(f) || f < 0) {
                throw new IllegalArgumentException("volume fraction must be a number ≥ 0, got " + f);
            }
            sum += f;
        }
        if (Math.abs(sum - 1.0) > FRACTION_SUM_TOLERANCE) {
            throw new IllegalArgumentException("volume fractions must sum to 1, got " + sum);
        }
    }
}
