package org.cohesa.core.solvent;

import java.util.Arrays;
import java.util.List;

/**
 * Antoine vapour-pressure equation, log₁₀(P/Pa) = A − B/(T/K + C), with its range of validity.
 *
 * <p>Form and coefficients as tabulated in Poling, B. E., Prausnitz, J. M., O'Connell, J. P., <i>The
 * Properties of Gases and Liquids</i>, 5th ed., McGraw-Hill, 2000, appendix A (converted to Pa and K).
 *
 * @param a      A, dimensionless
 * @param b      B, K
 * @param c      C, K
 * @param tminK  lower end of the fitted range, K, or null
 * @param tmaxK  upper end of the fitted range, K, or null
 * @param source source key of the coefficients, or null
 */
public record Antoine(double a, double b, double c, Double tminK, Double tmaxK, String source) implements VapourCorrelation {

    public static final String EQUATION = "antoine-log10";

    public Antoine {
        VapourCorrelation.checkCommon("Antoine", tminK, tmaxK, a, b, c);
        source = VapourCorrelation.cleanSource(source);
    }

    @Override
    public double pressurePa(double kelvin) {
        return Math.pow(10.0, a - b / (kelvin + c));
    }

    /** Exact inverse of the equation, K. */
    @Override
    public double temperatureAtPressure(double pa) {
        if (!(pa > 0)) {
            throw new IllegalArgumentException("pressure must be positive, got " + pa);
        }
        return b / (a - Math.log10(pa)) - c;
    }

    @Override
    public String equation() {
        return EQUATION;
    }

    @Override
    public String equationName() {
        return "Antoine equation (log10, Pa, K)";
    }

    @Override
    public List<Double> coefficients() {
        return Arrays.asList(a, b, c, null, null);
    }
}
