package org.cohesa.core.solvent;

import java.util.Arrays;
import java.util.List;

/**
 * An <b>estimated</b> vapour-pressure curve: the Clausius–Clapeyron equation integrated from an anchor point
 * (T0, P0) with the enthalpy of vaporisation varying linearly in T (constant ΔCp = Cp,vap − Cp,liq, Kirchhoff):
 *
 * <pre>ln(P/P0) = −((ΔH0 − ΔCp·T0)/R)·(1/T − 1/T0) + (ΔCp/R)·ln(T/T0)</pre>
 *
 * (e.g. Atkins, <i>Physical Chemistry</i>, "The Clausius–Clapeyron equation"; the constant-ΔCp integration as in
 * Myrdal, Yalkowsky, <i>Ind. Eng. Chem. Res.</i> 36 (1997) 2494). With ΔCp = 0 it is the classic constant-ΔHvap
 * form. Mackay's boiling-point-only method (Mackay, Bobra, Chan, Shiu, <i>Environ. Sci. Technol.</i> 16 (1982) 645)
 * is the special case T0 = Tb, P0 = 1 atm, ΔH0 = R·Tb·(4.4 + ln Tb), ΔCp = −0.803·ΔH0/Tb. How each stored estimate
 * was made is in its source key ({@code estimate-…}) and in {@code docs/methods.md}, with its measured error.
 *
 * @param anchorK    T0, K (usually the normal boiling point)
 * @param anchorPa   P0 at T0, Pa (101 325 Pa at the normal boiling point)
 * @param hvapJPerMol ΔH0, enthalpy of vaporisation at T0, J/mol (positive)
 * @param dCpJPerMolK ΔCp, J/(mol·K) (usually negative: ΔHvap falls as T rises)
 */
public record ClapeyronEstimate(double anchorK, double anchorPa, double hvapJPerMol, double dCpJPerMolK, Double tminK, Double tmaxK,
        String source) implements VapourCorrelation {

    public static final String EQUATION = "clapeyron";

    /** Gas constant, J/(mol·K) (CODATA 2018, exact). */
    static final double R = 8.314462618;

    public ClapeyronEstimate {
        VapourCorrelation.checkCommon("Clausius–Clapeyron estimate", tminK, tmaxK, anchorK, anchorPa, hvapJPerMol, dCpJPerMolK);
        if (!(anchorK > 0 && anchorPa > 0 && hvapJPerMol > 0)) {
            throw new IllegalArgumentException("Clausius–Clapeyron estimate needs a positive anchor temperature, pressure and ΔHvap, got "
                    + anchorK + " K, " + anchorPa + " Pa, " + hvapJPerMol + " J/mol");
        }
        source = VapourCorrelation.cleanSource(source);
    }

    /** The classic form anchored at the normal boiling point with one ΔHvap (no temperature dependence). */
    public static ClapeyronEstimate atBoilingPoint(double tbK, double hvapJPerMol, String source) {
        return new ClapeyronEstimate(tbK, VapourPressure.ATMOSPHERE_PA, hvapJPerMol, 0.0, null, null, source);
    }

    @Override
    public double pressurePa(double kelvin) {
        double lnRatio = -((hvapJPerMol - dCpJPerMolK * anchorK) / R) * (1.0 / kelvin - 1.0 / anchorK)
                + (dCpJPerMolK / R) * Math.log(kelvin / anchorK);
        return anchorPa * Math.exp(lnRatio);
    }

    @Override
    public boolean isEstimate() {
        return true;
    }

    @Override
    public String equation() {
        return EQUATION;
    }

    @Override
    public String equationName() {
        return dCpJPerMolK == 0 ? "Clausius–Clapeyron estimate (constant ΔHvap)" : "Clausius–Clapeyron estimate (ΔHvap linear in T)";
    }

    @Override
    public List<Double> coefficients() {
        return Arrays.asList(anchorK, anchorPa, hvapJPerMol, dCpJPerMolK, null);
    }
}
