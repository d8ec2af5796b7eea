package org.cohesa.core.solvent;

import java.util.Arrays;
import java.util.List;

/**
 * Antoine vapour-pressure equation with the natural logarithm, ln(P/Pa) = A − B/(T/K + C).
 *
 * <p>The Landolt–Börnstein collections (K. R. Hall (ed.), <i>Vapor Pressure and Antoine Constants for
 * Hydrocarbons, and S, Se, Te, and Halogen Containing Organic Compounds</i>, 1999; J. Dykyj, K. R. Hall,
 * <i>… for Oxygen Containing Organic Compounds</i>, 2000; K. R. Hall, <i>… for Nitrogen Containing Organic
 * Compounds</i>, 2001; Landolt–Börnstein New Series IV/20, Springer) tabulate log₁₀(P/kPa) = A′ − B′/(T + C);
 * the coefficients here are converted to this form: A = (A′ + 3)·ln 10, B = B′·ln 10. Many sets cover a
 * narrow range only: never trust one outside Tmin–Tmax.
 *
 * @param a A, dimensionless; b B, K; c C, K; range in K; source key
 */
public record AntoineLn(double a, double b, double c, Double tminK, Double tmaxK, String source) implements VapourCorrelation {

    public static final String EQUATION = "antoine-ln";

    public AntoineLn {
        VapourCorrelation.checkCommon("Antoine (ln)", tminK, tmaxK, a, b, c);
        source = VapourCorrelation.cleanSource(source);
    }

    @Override
    public double pressurePa(double kelvin) {
        return Math.exp(a - b / (kelvin + c));
    }

    @Override
    public double temperatureAtPressure(double pa) {
        if (!(pa > 0)) {
            throw new IllegalArgumentException("pressure must be positive, got " + pa);
        }
        return b / (a - Math.log(pa)) - c;
    }

    @Override
    public String equation() {
        return EQUATION;
    }

    @Override
    public String equationName() {
        return "Antoine equation (ln, Pa, K)";
    }

    @Override
    public List<Double> coefficients() {
        return Arrays.asList(a, b, c, null, null);
    }
}
