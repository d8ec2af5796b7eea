package org.cohesa.core.solvent;

import java.util.Optional;
import org.cohesa.core.hsp.CohesiveEnergy;

/**
 * A liquid's saturation vapour pressure as a function of temperature, with the method that gives it.
 *
 * <p>Where the library holds Antoine constants (Poling, Prausnitz, O'Connell, <i>The Properties of Gases and
 * Liquids</i>, 5th ed., 2000) they are used. Otherwise, when the normal boiling point Tb and the enthalpy of
 * vaporisation at 25 °C are known, the integrated Clausius–Clapeyron equation with constant ΔHvap is used,
 * anchored at Tb: ln(P/101325 Pa) = −(ΔHvap/R)(1/T − 1/Tb) (Clapeyron 1834, Clausius 1850; e.g. Atkins,
 * <i>Physical Chemistry</i>, "The Clausius–Clapeyron equation"). Because ΔHvap falls with temperature, the
 * estimate runs a little low below Tb: on the 37 library solvents that have Antoine constants as well, it is
 * within a median of 9 % (90th percentile 20 %) of the Antoine value at 25 °C (measured in {@code VapourPressureTest}). The method is always
 * reported so that results built on an estimate say so.
 */
public record VapourPressure(Solvent solvent, Method method) {

    /** Standard atmosphere, Pa. */
    public static final double ATMOSPHERE_PA = 101_325.0;

    /** How the pressure is obtained. */
    public enum Method {
        ANTOINE("Antoine equation (Poling et al. 2000)"),
        ANTOINE_EXTRAPOLATED("Antoine equation outside its fitted range (Poling et al. 2000)"),
        CLAUSIUS_CLAPEYRON("estimated from boiling point and ΔHvap (Clausius–Clapeyron)");

        private final String label;

        Method(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** The best available curve for {@code s}, or empty when the library has neither Antoine constants nor Tb and ΔHvap. */
    public static Optional<VapourPressure> of(Solvent s) {
        if (s.antoine() != null) {
            return Optional.of(new VapourPressure(s, Method.ANTOINE));
        }
        if (s.boilingPointC() != null && s.hvapKjPerMol() != null) {
            return Optional.of(new VapourPressure(s, Method.CLAUSIUS_CLAPEYRON));
        }
        return Optional.empty();
    }

    /** Saturation pressure at {@code kelvin}, Pa. */
    public double pressurePa(double kelvin) {
        if (method == Method.CLAUSIUS_CLAPEYRON) {
            double tb = solvent.boilingPointC() + 273.15;
            double h = solvent.hvapKjPerMol() * 1000.0;
            return ATMOSPHERE_PA * Math.exp(-h / CohesiveEnergy.GAS_CONSTANT * (1.0 / kelvin - 1.0 / tb));
        }
        return solvent.antoine().pressurePa(kelvin);
    }

    /** The method in force at {@code kelvin} (Antoine turns into "extrapolated" more than 10 K outside its range). */
    public Method methodAt(double kelvin) {
        if (method == Method.ANTOINE && !solvent.antoine().isValidAt(kelvin, 10.0)) {
            return Method.ANTOINE_EXTRAPOLATED;
        }
        return method;
    }

    /** True when the value is an estimate rather than a fitted measurement. */
    public boolean isEstimate(double kelvin) {
        return methodAt(kelvin) != Method.ANTOINE;
    }
}
