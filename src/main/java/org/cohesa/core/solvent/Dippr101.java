package org.cohesa.core.solvent;

import java.util.List;

/**
 * DIPPR equation 101, ln(P/Pa) = C1 + C2/T + C3·ln(T/K) + C4·T^C5, T in K.
 *
 * <p>Coefficients of D. W. Green, R. H. Perry (eds.), <i>Perry's Chemical Engineers' Handbook</i>, 8th ed.,
 * McGraw-Hill, 2008, Table 2-8 (DIPPR data), valid from the triple point to the critical point.
 *
 * @param c1 C1, dimensionless; c2 C2, K; c3 C3, dimensionless; c4 C4, K^−C5; c5 C5, dimensionless
 */
public record Dippr101(double c1, double c2, double c3, double c4, double c5, Double tminK, Double tmaxK, String source)
        implements VapourCorrelation {

    public static final String EQUATION = "dippr-101";

    public Dippr101 {
        VapourCorrelation.checkCommon("DIPPR 101", tminK, tmaxK, c1, c2, c3, c4, c5);
        source = VapourCorrelation.cleanSource(source);
    }

    @Override
    public double pressurePa(double kelvin) {
        return Math.exp(c1 + c2 / kelvin + c3 * Math.log(kelvin) + c4 * Math.pow(kelvin, c5));
    }

    @Override
    public String equation() {
        return EQUATION;
    }

    @Override
    public String equationName() {
        return "DIPPR 101 equation";
    }

    @Override
    public List<Double> coefficients() {
        return List.of(c1, c2, c3, c4, c5);
    }
}
