package org.cohesa.core.solvent;

import java.util.Locale;
import java.util.Optional;

/**
 * A liquid's saturation vapour pressure as a function of temperature, with the basis that gives it.
 *
 * <p>Where the library stores a correlation for the solvent ({@link Solvent#vapourPressure()}: a published
 * equation with its coefficients, range and source, or a stored estimate) it is used. Otherwise, when the normal
 * boiling point Tb and the enthalpy of vaporisation at 25 °C are known, the integrated Clausius–Clapeyron equation
 * with constant ΔHvap is used, anchored at Tb: ln(P/101325 Pa) = −(ΔHvap/R)(1/T − 1/Tb) (Clapeyron 1834,
 * Clausius 1850; e.g. Atkins, <i>Physical Chemistry</i>, "The Clausius–Clapeyron equation"). Because ΔHvap falls
 * with temperature, that fallback runs low below Tb (measured in {@code VapourPressureTest} and {@code docs/methods.md}).
 * The basis is always reported, so that results built on an estimate or an extrapolation say so.
 *
 * @param solvent the liquid
 * @param curve   the curve used
 */
public record VapourPressure(Solvent solvent, VapourCorrelation curve) {

    /** Standard atmosphere, Pa. */
    public static final double ATMOSPHERE_PA = 101_325.0;

    /** Source key of the run-time fallback estimate (Tb and ΔHvap at 25 °C of the library, constant ΔHvap). */
    public static final String FALLBACK_SOURCE = "estimate-clausius-clapeyron-tb-hvap298";

    /** How trustworthy the value at a given temperature is. */
    public enum Kind {
        /** a correlation fitted to measured data, used inside its range */
        CORRELATION,
        /** a correlation fitted to measured data, used outside its range */
        EXTRAPOLATED,
        /** an estimated curve */
        ESTIMATE
    }

    /**
     * What a value rests on at one temperature.
     *
     * @param kind  correlation inside its range, extrapolated, or estimate
     * @param label the equation, its source key and, where it applies, "extrapolated below/above its range"
     */
    public record Basis(Kind kind, String label) {
    }

    public VapourPressure {
        if (solvent == null || curve == null) {
            throw new IllegalArgumentException("a vapour-pressure curve needs a solvent and a correlation");
        }
    }

    /** The best available curve for {@code s}, or empty when the library has neither a correlation nor Tb and ΔHvap. */
    public static Optional<VapourPressure> of(Solvent s) {
        if (s.vapourPressure() != null) {
            return Optional.of(new VapourPressure(s, s.vapourPressure()));
        }
        if (s.boilingPointC() != null && s.hvapKjPerMol() != null) {
            return Optional.of(new VapourPressure(s, ClapeyronEstimate.atBoilingPoint(s.boilingPointC() + 273.15,
                    s.hvapKjPerMol() * 1000.0, FALLBACK_SOURCE)));
        }
        return Optional.empty();
    }

    /** Saturation pressure at {@code kelvin}, Pa. */
    public double pressurePa(double kelvin) {
        return curve.pressurePa(kelvin);
    }

    /** Temperature where the saturation pressure equals {@code pa}, K. */
    public double temperatureAtPressure(double pa) {
        return curve.temperatureAtPressure(pa);
    }

    /** The basis in force at {@code kelvin}: an estimate, a correlation inside its range, or one extrapolated outside it. */
    public Basis methodAt(double kelvin) {
        String src = curve.source() == null ? "no source key" : "source " + curve.source();
        String name = curve.equationName() + " (" + src + ")";
        if (curve.isEstimate()) {
            String where = curve.isValidAt(kelvin, 0) ? "" : extrapolation(kelvin);
            return new Basis(Kind.ESTIMATE, "estimated: " + name + where);
        }
        if (!curve.isValidAt(kelvin, 0)) {
            return new Basis(Kind.EXTRAPOLATED, name + extrapolation(kelvin));
        }
        return new Basis(Kind.CORRELATION, name);
    }

    /** True when the value at {@code kelvin} is an estimate or an extrapolation rather than a fitted measurement inside its range. */
    public boolean isEstimate(double kelvin) {
        return methodAt(kelvin).kind() != Kind.CORRELATION;
    }

    private String extrapolation(double kelvin) {
        if (curve.tminK() != null && kelvin < curve.tminK()) {
            return String.format(Locale.ROOT, ", extrapolated below its range (%.0f K under its Tmin, range %s)",
                    curve.tminK() - kelvin, curve.rangeText());
        }
        return String.format(Locale.ROOT, ", extrapolated above its range (%.0f K over its Tmax, range %s)",
                kelvin - curve.tmaxK(), curve.rangeText());
    }
}
