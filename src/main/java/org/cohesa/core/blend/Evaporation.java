package org.cohesa.core.blend;

import org.cohesa.core.solvent.Solvent;

/**
 * Vapour pressure at 25 °C as a proxy for how fast a solvent evaporates (a higher vapour pressure
 * evaporates faster; the proxy ignores molar mass, activity coefficients and air flow).
 * From the Antoine equation log₁₀(P/Pa) = A − B/(T/K + C) (Poling, Prausnitz, O'Connell, <i>The
 * Properties of Gases and Liquids</i>, 5th ed., McGraw-Hill, 2000), used only within its fitted range
 * (widened by {@value #RANGE_MARGIN_K} K).
 */
public final class Evaporation {

    /** 25 °C in kelvin. */
    public static final double T25 = 298.15;

    /** How far outside the fitted range the equation is still trusted, K. */
    public static final double RANGE_MARGIN_K = 10;

    private Evaporation() {
    }

    /** Vapour pressure at 25 °C in kPa, or 0 when the library has no usable Antoine equation (treated as non-volatile). */
    public static double vapourPressureKpa(Solvent s) {
        return hasData(s) ? s.antoine().pressurePa(T25) / 1000.0 : 0.0;
    }

    /** True when an Antoine equation valid near 25 °C is known. */
    public static boolean hasData(Solvent s) {
        return s.antoine() != null && s.antoine().isValidAt(T25, RANGE_MARGIN_K);
    }
}
