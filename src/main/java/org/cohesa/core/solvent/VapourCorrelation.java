package org.cohesa.core.solvent;

import java.util.List;
import java.util.Locale;

/**
 * A saturation-vapour-pressure curve of one pure liquid: one published equation form with its coefficients,
 * its range of validity and the source key of the coefficients (cited in {@code solvent-db/SOURCES.md}).
 * T in K, P in Pa throughout.
 *
 * <p>The forms and the files they are written as ({@code vp_equation} column of {@code solvent-db/solvents.csv}):
 * <ul>
 * <li>{@link Antoine} — {@code antoine-log10}: log₁₀(P/Pa) = A − B/(T + C) (Poling, Prausnitz, O'Connell, 2000);</li>
 * <li>{@link AntoineLn} — {@code antoine-ln}: ln(P/Pa) = A − B/(T + C) (Landolt–Börnstein IV/20 sets, converted);</li>
 * <li>{@link Dippr101} — {@code dippr-101}: ln(P/Pa) = C1 + C2/T + C3·ln T + C4·T^C5 (Perry's Handbook, 8th ed.);</li>
 * <li>{@link Wagner25} — {@code wagner-2.5-5}: ln(P/Pc) = (Aτ + Bτ^1.5 + Cτ^2.5 + Dτ^5)/Tr (VDI Heat Atlas; Poling);</li>
 * <li>{@link Wagner36} — {@code wagner-3-6}: ln(P/Pc) = (Aτ + Bτ^1.5 + Cτ^3 + Dτ^6)/Tr (McGarry 1983);</li>
 * <li>{@link ClapeyronEstimate} — {@code clapeyron}: an estimate, integrated Clausius–Clapeyron with constant ΔCp.</li>
 * </ul>
 */
public sealed interface VapourCorrelation permits Antoine, AntoineLn, Dippr101, Wagner25, Wagner36, ClapeyronEstimate {

    /** Saturation pressure at {@code kelvin}, Pa. Outside {@link #tminK()}..{@link #tmaxK()} the value is an extrapolation. */
    double pressurePa(double kelvin);

    /** Lower end of the published range, K, or null when the source gives none. */
    Double tminK();

    /** Upper end of the published range, K, or null when the source gives none. */
    Double tmaxK();

    /** Source key of the coefficients ({@code poling-2000-antoine}, {@code estimate-…}), or null when unknown. */
    String source();

    /** The equation key as written in the CSV files, e.g. {@code dippr-101}. */
    String equation();

    /** The equation in words, e.g. "DIPPR 101". */
    String equationName();

    /** Coefficients c1…c5 as written in the CSV columns {@code vp_c1…vp_c5} (unused ones null). */
    List<Double> coefficients();

    /** Critical temperature, K, for the forms that need it; else null. */
    default Double tcK() {
        return null;
    }

    /** Critical pressure, Pa, for the forms that need it; else null. */
    default Double pcPa() {
        return null;
    }

    /** True for an estimated curve (not fitted to measured data). */
    default boolean isEstimate() {
        return false;
    }

    /** True when {@code kelvin} lies within the published range widened by {@code marginK} on each side (an open end counts as inside). */
    default boolean isValidAt(double kelvin, double marginK) {
        return (tminK() == null || kelvin >= tminK() - marginK) && (tmaxK() == null || kelvin <= tmaxK() + marginK);
    }

    /**
     * Temperature at which the saturation pressure equals {@code pa}, K: the curve inverted by bisection on ln P
     * between 100 K and 1500 K (every form here rises monotonically with T there).
     */
    default double temperatureAtPressure(double pa) {
        if (!(pa > 0)) {
            throw new IllegalArgumentException("pressure must be positive, got " + pa);
        }
        double lo = tminK() != null ? Math.min(tminK(), 150.0) : 100.0;
        double hi = tcK() != null ? tcK() : 1500.0;
        double target = Math.log(pa);
        for (int i = 0; i < 200 && hi - lo > 1e-10; i++) {
            double mid = 0.5 * (lo + hi);
            double f = Math.log(pressurePa(mid)) - target;
            if (!Double.isFinite(f) || f > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** The range as text, e.g. "276.5–369.5 K", "from 293 K", or "no range given". */
    default String rangeText() {
        if (tminK() != null && tmaxK() != null) {
            return String.format(Locale.ROOT, "%.1f–%.1f K", tminK(), tmaxK());
        }
        if (tminK() != null) {
            return String.format(Locale.ROOT, "from %.1f K", tminK());
        }
        if (tmaxK() != null) {
            return String.format(Locale.ROOT, "up to %.1f K", tmaxK());
        }
        return "no range given";
    }

    /**
     * Builds a correlation from its file form. {@code c} holds c1…c5 (unused ones may be null).
     *
     * @throws IllegalArgumentException naming what is wrong: unknown equation, missing or non-finite coefficient, bad range
     */
    static VapourCorrelation of(String equation, List<Double> c, Double tminK, Double tmaxK, Double tcK, Double pcPa, String source) {
        if (equation == null || equation.isBlank()) {
            throw new IllegalArgumentException("vp_equation is required when coefficients are given");
        }
        return switch (equation.strip()) {
            case Antoine.EQUATION -> new Antoine(need(c, 0), need(c, 1), need(c, 2), tminK, tmaxK, source);
            case AntoineLn.EQUATION -> new AntoineLn(need(c, 0), need(c, 1), need(c, 2), tminK, tmaxK, source);
            case Dippr101.EQUATION -> new Dippr101(need(c, 0), need(c, 1), need(c, 2), need(c, 3), need(c, 4), tminK, tmaxK, source);
            case Wagner25.EQUATION -> new Wagner25(need(c, 0), need(c, 1), need(c, 2), need(c, 3), needCritical(tcK, "vp_tc_k"),
                    needCritical(pcPa, "vp_pc_pa"), tminK, tmaxK, source);
            case Wagner36.EQUATION -> new Wagner36(need(c, 0), need(c, 1), need(c, 2), need(c, 3), needCritical(tcK, "vp_tc_k"),
                    needCritical(pcPa, "vp_pc_pa"), tminK, tmaxK, source);
            case ClapeyronEstimate.EQUATION -> new ClapeyronEstimate(need(c, 0), need(c, 1), need(c, 2), need(c, 3), tminK, tmaxK, source);
            default -> throw new IllegalArgumentException("unknown vapour-pressure equation '" + equation + "'; known: "
                    + String.join(", ", Antoine.EQUATION, AntoineLn.EQUATION, Dippr101.EQUATION, Wagner25.EQUATION,
                    Wagner36.EQUATION, ClapeyronEstimate.EQUATION));
        };
    }

    private static double need(List<Double> c, int i) {
        if (c == null || c.size() <= i || c.get(i) == null) {
            throw new IllegalArgumentException("coefficient vp_c" + (i + 1) + " is required by this equation");
        }
        return c.get(i);
    }

    private static double needCritical(Double v, String column) {
        if (v == null) {
            throw new IllegalArgumentException(column + " is required by the Wagner equation");
        }
        return v;
    }

    /** Checks shared by every form: finite coefficients, a positive and ordered range. */
    static void checkCommon(String form, Double tminK, Double tmaxK, double... coefficients) {
        for (double x : coefficients) {
            if (!Double.isFinite(x)) {
                throw new IllegalArgumentException(form + " coefficients must be finite numbers");
            }
        }
        if ((tminK != null && !(tminK > 0 && Double.isFinite(tminK))) || (tmaxK != null && !(tmaxK > 0 && Double.isFinite(tmaxK)))) {
            throw new IllegalArgumentException(form + " range limits must be positive temperatures in K, got " + tminK + ".." + tmaxK);
        }
        if (tminK != null && tmaxK != null && !(tmaxK > tminK)) {
            throw new IllegalArgumentException(form + " range must satisfy Tmin < Tmax, got " + tminK + ".." + tmaxK + " K");
        }
    }

    /** Checks of the Wagner forms: positive critical constants. */
    static void checkCritical(String form, double tcK, double pcPa) {
        if (!(tcK > 0 && Double.isFinite(tcK) && pcPa > 0 && Double.isFinite(pcPa))) {
            throw new IllegalArgumentException(form + " needs a positive critical temperature and pressure, got Tc " + tcK + " K, Pc " + pcPa + " Pa");
        }
    }

    /** Source key or null, stripped. */
    static String cleanSource(String source) {
        return source == null || source.isBlank() ? null : source.strip();
    }
}
