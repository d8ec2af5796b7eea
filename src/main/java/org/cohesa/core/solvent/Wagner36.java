package org.cohesa.core.solvent;

import java.util.List;

/**
 * Wagner vapour-pressure equation, 3–6 form: ln(P/Pc) = (A·τ + B·τ^1.5 + C·τ^3 + D·τ^6)/Tr,
 * τ = 1 − T/Tc, Tr = T/Tc.
 *
 * <p>Coefficients from J. McGarry, "Correlation and Prediction of the Vapor Pressures of Pure Liquids over Large Pressure
 * Ranges", <i>Ind. Eng. Chem. Process Des. Dev.</i> 22 (1983) 313–322 (the original Wagner form; the source gives a
 * lower limit only, the upper end is Tc). At and above Tc the curve is held at Pc.
 *
 * @param a A; b B; c C; d D (all dimensionless); tcK critical temperature, K; pcPa critical pressure, Pa
 */
public record Wagner36(double a, double b, double c, double d, Double tcK, Double pcPa, Double tminK, Double tmaxK, String source)
        implements VapourCorrelation {

    public static final String EQUATION = "wagner-3-6";

    public Wagner36 {
        if (tcK == null || pcPa == null) {
            throw new IllegalArgumentException("the Wagner equation needs Tc and Pc");
        }
        VapourCorrelation.checkCommon("Wagner", tminK, tmaxK, a, b, c, d);
        VapourCorrelation.checkCritical("Wagner", tcK, pcPa);
        source = VapourCorrelation.cleanSource(source);
    }

    @Override
    public double pressurePa(double kelvin) {
        double tr = kelvin / tcK;
        double tau = Math.max(0.0, 1.0 - tr);
        return pcPa * Math.exp((a * tau + b * Math.pow(tau, 1.5) + c * Math.pow(tau, 3) + d * Math.pow(tau, 6)) / tr);
    }

    @Override
    public String equation() {
        return EQUATION;
    }

    @Override
    public String equationName() {
        return "Wagner equation (3–6 form)";
    }

    @Override
    public List<Double> coefficients() {
        return java.util.Arrays.asList(a, b, c, d, null);
    }
}
