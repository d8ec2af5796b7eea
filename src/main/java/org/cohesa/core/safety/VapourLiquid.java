package org.cohesa.core.safety;

import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.cohesa.core.activity.ActivityModel;
import org.cohesa.core.solvent.VapourPressure;

/**
 * Liquid–vapour equilibrium at low pressure by modified Raoult's law, pᵢ = xᵢ γᵢ Psatᵢ(T), with the library's
 * vapour-pressure curves ({@link VapourPressure}: Antoine, Poling, Prausnitz, O'Connell, <i>The Properties of Gases and
 * Liquids</i>, 5th ed., 2000, else the Clausius–Clapeyron estimate) and activity coefficients from an {@link ActivityModel}. Ideal vapour phase; pressures in Pa, temperatures in K.
 */
final class VapourLiquid {

    /** Standard atmosphere, Pa. */
    static final double ATMOSPHERE_PA = 101_325.0;

    private static final double ABSOLUTE_ACCURACY_K = 1e-5;
    private static final int MAX_EVALUATIONS = 500;

    private VapourLiquid() {
    }

    /** Partial pressures xᵢγᵢPsatᵢ(T), Pa; a component without a vapour-pressure curve gives NaN. */
    static double[] partialPressures(double[] x, List<VapourPressure> psat, ActivityModel model, double kelvin) {
        double[] g = model.gamma(x, kelvin);
        double[] p = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            VapourPressure a = psat.get(i);
            p[i] = x[i] == 0 ? 0 : (a == null ? Double.NaN : x[i] * g[i] * a.pressurePa(kelvin));
        }
        return p;
    }

    /**
     * Bubble-point temperature at {@code pressurePa}: Σ xᵢγᵢPsatᵢ(T) = P solved for T with Brent's method
     * (Commons Math). Every component with xᵢ &gt; 0 needs a vapour-pressure curve.
     *
     * @return K, or NaN when no root lies in 150–700 K
     */
    static double bubblePointK(double[] x, List<VapourPressure> psat, ActivityModel model, double pressurePa) {
        UnivariateFunction f = t -> {
            double sum = 0;
            for (double p : partialPressures(x, psat, model, t)) {
                sum += p;
            }
            return Math.log(sum / pressurePa);
        };
        return solve(f, 150, 700);
    }

    /**
     * Brent root of {@code f} in [lo, hi]; NaN when none is found. Both functions solved here (log of the bubble-point
     * and of the Le Chatelier sums) rise with temperature, so when the ends differ in sign Brent runs on the whole
     * interval; otherwise the interval is scanned in 10 K steps for a sign change.
     */
    static double solve(UnivariateFunction f, double lo, double hi) {
        double flo = f.value(lo);
        double fhi = f.value(hi);
        if (Double.isFinite(flo) && Double.isFinite(fhi) && flo * fhi <= 0) {
            return brent(f, lo, hi);
        }
        double step = 10;
        double a = lo;
        double fa = flo;
        while (a < hi) {
            double b = Math.min(a + step, hi);
            double fb = f.value(b);
            if (Double.isFinite(fa) && Double.isFinite(fb) && fa * fb <= 0) {
                return brent(f, a, b);
            }
            a = b;
            fa = fb;
        }
        return Double.NaN;
    }

    private static double brent(UnivariateFunction f, double a, double b) {
        try {
            return new BrentSolver(ABSOLUTE_ACCURACY_K).solve(MAX_EVALUATIONS, f, a, b);
        } catch (NoBracketingException | TooManyEvaluationsException e) {
            return Double.NaN;
        }
    }
}
