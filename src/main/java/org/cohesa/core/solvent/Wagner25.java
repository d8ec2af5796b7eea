package org.cohesa.core.solvent;

import java.util.List;

/**
 * Wagner vapour-pressure equation, 2.5–5 form: ln(P/Pc) = (A·τ + B·τ^1.5 + C·τ^2.5 + D·τ^5)/Tr,
 * τ = 1 − T/Tc, Tr = T/Tc.
 *
 * <p>Coefficients from VDI e.V. (ed.), <i>VDI Heat Atlas</i>, 2nd ed., Springer, 2010 (PPDS coefficients), and Poling,
 * Prausnitz, O'Connell, <i>The Properties of Gases and Liquids</i>, 5th ed., 2000, appendix A; valid from the melting
 * point to Tc. At and above Tc the curve is held at Pc.
 *
 * @param a A; b B; c C; d D (all dimensionless); tcK critical temperature, K; pcPa critical pressure, Pa
 */
public record Wagner25(double a, double b, double c, double d, Double tcK, Double pcPa, Double tminK, Double tmaxK, String source)
        implements VapourCorrelation {

    public static final String EQUATION = "wagner-2.5-5";

    public Wagner25 {
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
        return pcPa * Math.exp((a * tau + b * Math.pow(tau, 1.5) + c * Math.pow(tau, 2.5) + d * Math.pow(tau, 5)) / tr);
    }

    @Override
    public String equation() {
        return EQUATION;
    }

    @Override
    public String equationName() {
        return "Wagner equation (2.5–5 form)";
    }

    @Override
    public List<Double> coefficients() {
        return java.util.Arrays.asList(a, b, c, d, null);
    }
}
