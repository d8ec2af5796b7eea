package org.cohesa.core.blend;

import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.VapourPressure;

/**
 * Vapour pressure at 25 °C as a proxy for how fast a solvent evaporates (a higher vapour pressure
 * evaporates faster; the proxy ignores molar mass, activity coefficients and air flow). The pressure comes
 * from {@link VapourPressure}: the Antoine equation log₁₀(P/Pa) = A − B/(T/K + C) (Poling, Prausnitz,
 * O'Connell, <i>The Properties of Gases and Liquids</i>, 5th ed., McGraw-Hill, 2000) where the library has
 * it, else the Clausius–Clapeyron estimate from the boiling point and ΔHvap.
 */
public final class Evaporation {

    /** 25 °C in kelvin. */
    public static final double T25 = 298.15;

    private Evaporation() {
    }

    /** Vapour pressure at 25 °C in kPa, or 0 when the library has no vapour-pressure correlation nor Tb and ΔHvap (treated as non-volatile). */
    public static double vapourPressureKpa(Solvent s) {
        return VapourPressure.of(s).map(v -> v.pressurePa(T25) / 1000.0).orElse(0.0);
    }

    /** True when the library gives a vapour pressure (measured constants or an estimate). */
    public static boolean hasData(Solvent s) {
        return VapourPressure.of(s).isPresent();
    }
}
