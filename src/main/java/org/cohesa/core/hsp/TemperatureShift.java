package org.cohesa.core.hsp;

/**
 * Temperature dependence of the Hansen parameters of a liquid.
 *
 * <p>Hansen and Beerbower's relations (Hansen, C. M., Beerbower, A., "Solubility parameters", in
 * <i>Kirk-Othmer Encyclopedia of Chemical Technology</i>, Suppl. Vol., 2nd ed., Wiley, 1971, 889–910;
 * restated in Hansen 2007, ch. 1):
 * <pre>
 *   dδD/dT = −1.25 α δD
 *   dδP/dT = −0.5 α δP
 *   dδH/dT = −δH (1.22·10⁻³ + 0.5 α)
 * </pre>
 * with α the liquid's volumetric thermal expansion coefficient (1/K) and T in K. Integrated at constant α,
 * each relation gives an exponential, which we use rather than the linear step so that large shifts stay
 * positive; over ±30 K the two agree to better than 0.1 %.
 */
public final class TemperatureShift {

    /** Temperature-independent part of dlnδH/dT, 1/K (Hansen 2007). */
    public static final double HYDROGEN_BOND_LOSS_PER_K = 1.22e-3;

    private TemperatureShift() {
    }

    /**
     * Parameters at {@code toKelvin}, from parameters known at {@code fromKelvin}.
     *
     * @param p          parameters at the reference temperature, MPa^½
     * @param alphaPerK  volumetric thermal expansion coefficient α, 1/K, 0 ≤ α &lt; 0.01
     * @param fromKelvin reference temperature, K, &gt; 0
     * @param toKelvin   target temperature, K, &gt; 0
     */
    public static HansenParameters shift(HansenParameters p, double alphaPerK, double fromKelvin, double toKelvin) {
        if (!Double.isFinite(alphaPerK) || alphaPerK < 0 || alphaPerK >= 0.01) {
            throw new IllegalArgumentException("thermal expansion coefficient must be in [0, 0.01) 1/K, got " + alphaPerK);
        }
        if (!(fromKelvin > 0) || !(toKelvin > 0)) {
            throw new IllegalArgumentException("temperatures must be above 0 K, got " + fromKelvin + " and " + toKelvin);
        }
        double dt = toKelvin - fromKelvin;
        return new HansenParameters(
                p.dD() * Math.exp(-1.25 * alphaPerK * dt),
                p.dP() * Math.exp(-0.5 * alphaPerK * dt),
                p.dH() * Math.exp(-(HYDROGEN_BOND_LOSS_PER_K + 0.5 * alphaPerK) * dt));
    }
}
