package org.cohesa.core.solvent;

import java.util.Locale;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.TemperatureShift;

/**
 * A solvent's Hansen parameters at a process temperature: the library's values (taken at 25 °C) moved with the
 * Hansen–Beerbower relations ({@link TemperatureShift}: dδD/dT = −1.25αδD, dδP/dT = −0.5αδP,
 * dδH/dT = −δH(1.22·10⁻³ K⁻¹ + 0.5α), δ in MPa^½, T in K, α in K⁻¹).
 *
 * <p>The liquid's volumetric expansion coefficient α = (1/V)(dV/dT) comes from the modified Rackett equation
 * V = (R·Tc/Pc)·Z_RA^[1 + (1 − T/Tc)^(2/7)] (Spencer, C. F., Danner, R. P., <i>J. Chem. Eng. Data</i> 17 (1972) 236):
 * <pre>
 *   α = −(2/7) · ln Z_RA · (1 − T/Tc)^(−5/7) / Tc
 * </pre>
 * with Tc from the library's Wagner vapour-pressure curve where it has one, else Guldberg's rule Tc ≈ 1.5·Tb
 * (common practice, no source), and Z_RA from the library's density at 25 °C where Tc and Pc are both known, else
 * the typical organic-liquid value {@value #TYPICAL_Z_RA} (Spencer and Danner's table spans about 0.23–0.29). Checked
 * against handbook expansion coefficients: within 5 % for toluene, about 30 % high for ethanol (alcohols fit the
 * Rackett form worst); over a 45 K shift that is about 2 % of δD. Water's
 * expansion is anomalous and the Rackett form overstates it fourfold: its measured α at 25 °C,
 * {@value #WATER_ALPHA} K⁻¹ (CRC Handbook, from memory), is used instead. The material's sphere is not shifted: it
 * is taken as measured.
 */
public final class HansenAtTemperature {

    /** Reference temperature of the library's Hansen parameters, K. */
    public static final double REFERENCE_KELVIN = 298.15;
    /** Rackett compressibility used when the library lacks the critical constants. */
    public static final double TYPICAL_Z_RA = 0.26;
    /** Water's volumetric expansion coefficient at 25 °C, 1/K (CRC Handbook; from memory). */
    public static final double WATER_ALPHA = 2.57e-4;
    private static final double R = 8.314462618;

    private HansenAtTemperature() {
    }

    /**
     * @param kelvin process temperature, K (the shift is meant for about −40 … 150 °C and must stay below the
     *               solvent's critical temperature)
     * @throws InvalidInputException when the solvent has no Hansen parameters, or neither Tc nor a boiling point
     */
    public static HansenParameters at(Solvent s, double kelvin) {
        if (!s.hasHansen()) {
            throw new InvalidInputException("solvent", s.name(), "has no Hansen parameters to shift");
        }
        if (Math.abs(kelvin - REFERENCE_KELVIN) < 1e-9) {
            return s.hansen();
        }
        expansionCoefficient(s, kelvin); // refuses a temperature near the critical point
        // α at the middle of the interval: the exponential integration holds α constant
        double alpha = expansionCoefficient(s, 0.5 * (kelvin + REFERENCE_KELVIN));
        return TemperatureShift.shift(s.hansen(), alpha, REFERENCE_KELVIN, kelvin);
    }

    /** α = (1/V)(dV/dT) of the liquid at {@code kelvin}, 1/K (see the class comment). */
    public static double expansionCoefficient(Solvent s, double kelvin) {
        if ("7732-18-5".equals(s.cas())) {
            return WATER_ALPHA;
        }
        double tc;
        Double pc = null;
        if (s.vapourPressure() instanceof Wagner25 w && w.tcK() != null) {
            tc = w.tcK();
            pc = w.pcPa();
        } else if (s.vapourPressure() instanceof Wagner36 w && w.tcK() != null) {
            tc = w.tcK();
            pc = w.pcPa();
        } else if (s.boilingPointC() != null) {
            tc = 1.5 * (s.boilingPointC() + 273.15);
        } else {
            throw new InvalidInputException("solvent", s.name(), "has neither a critical temperature nor a boiling point in the library, "
                    + "so its thermal expansion cannot be estimated");
        }
        if (kelvin >= 0.95 * tc) {
            throw new InvalidInputException("temperature", String.format(Locale.ROOT, "%.1f °C", kelvin - 273.15),
                    "too close to the critical temperature of " + s.name() + " for the temperature shift");
        }
        double zra = TYPICAL_Z_RA;
        if (pc != null && s.molarMass() != null && s.density() != null) {
            double v = s.molarMass() / s.density() * 1e-6; // m³/mol
            double z = Math.exp(Math.log(pc * v / (R * tc)) / (1 + Math.pow(1 - REFERENCE_KELVIN / tc, 2.0 / 7)));
            if (z > 0.2 && z < 0.32) {
                zra = z;
            }
        }
        return -(2.0 / 7) * Math.log(zra) * Math.pow(1 - kelvin / tc, -5.0 / 7) / tc;
    }
}
