package org.cohesa.core.safety;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.cohesa.core.activity.ActivityModel;
import org.cohesa.core.solvent.VapourPressure;

/**
 * Flash point of a liquid mixture by Le Chatelier's rule combined with vapour–liquid equilibrium:
 * <pre>  Σ_flammable xᵢ γᵢ(x, T) Psatᵢ(T) / Psatᵢ(T_fp,i) = 1</pre>
 * solved for T (Brent's method, Commons Math). Source: Liaw, H.-J., Lee, Y.-H., Tang, C.-L., Hsu, H.-H.,
 * Liu, J.-H., "A mathematical model for predicting the flash point of binary solutions", <i>J. Loss Prev.
 * Process Ind.</i> 15 (2002) 429–438; the multicomponent form: Liaw, H.-J., Tang, C.-L., Lai, J.-S.,
 * "A model for predicting the flash point of ternary flammable solutions of liquid", <i>Combust. Flame</i> 138
 * (2004) 308 (from memory); aqueous–organic use: Liaw, H.-J., Chiu, Y.-Y., <i>J. Hazard. Mater.</i> 101 (2003) 83.
 *
 * <p>The sum runs over the flammable components only (those with a flash point): a non-flammable component
 * (water, dichloromethane) adds no flammable vapour but dilutes the liquid, through xᵢ and through the γᵢ of the
 * others. Psatᵢ(T_fp,i) is the pure component's vapour pressure at its own flash point, which stands in for its
 * lower flammability limit × P. Vapour pressures come from {@link VapourPressure} (Antoine where the library has it,
 * else the Clausius–Clapeyron estimate from Tb and ΔHvap; with constant ΔHvap the ratio Psat(T)/Psat(T_fp) does not
 * depend on the Tb anchor). The notes name every estimate and extrapolation. Temperatures in K, pressures in Pa.
 *
 * <p>The search runs from 80 K below the lowest component flash point up to the mixture's bubble point: if the
 * sum stays below 1 up to boiling, the mixture has no flash point below its boiling point.
 */
public final class BlendFlashPoint {

    /**
     * @param kelvin        flash point, K, or NaN when there is none below the bubble point
     * @param bubblePointK  bubble point at 101.325 kPa, K (NaN when not computable)
     * @param notes         extrapolations and assumptions
     */
    public record Result(double kelvin, double bubblePointK, List<String> notes) {
        public Result {
            notes = List.copyOf(notes);
        }

        public boolean hasFlashPoint() {
            return Double.isFinite(kelvin);
        }
    }

    private BlendFlashPoint() {
    }

    /**
     * @param names        component names, for the notes
     * @param x            mole fractions (sum 1)
     * @param psat         each component's vapour-pressure curve (null allowed only for non-flammable
     *                     components; then no bubble point is computed)
     * @param flashPointK  each component's flash point, K, or null for a non-flammable component
     * @param model        the activity-coefficient model for these components, in the same order
     */
    public static Result solve(List<String> names, double[] x, List<VapourPressure> psat, List<Double> flashPointK, ActivityModel model) {
        int n = x.length;
        if (names.size() != n || psat.size() != n || flashPointK.size() != n || model.size() != n) {
            throw new IllegalArgumentException("need one name, Antoine equation, flash point and model slot per component");
        }
        List<String> notes = new ArrayList<>();
        double[] pAtFlash = new double[n];
        double lowestFp = Double.POSITIVE_INFINITY;
        boolean anyFlammable = false;
        boolean allPsat = true;
        for (int i = 0; i < n; i++) {
            VapourPressure a = psat.get(i);
            Double fp = flashPointK.get(i);
            if (a == null) {
                allPsat = false;
            }
            if (fp == null || x[i] == 0) {
                continue;
            }
            if (a == null) {
                throw new IllegalArgumentException(names.get(i) + " has a flash point but the library has no vapour-pressure data for it"
                        + " (no vapour-pressure correlation, nor boiling point and enthalpy of vaporisation)");
            }
            anyFlammable = true;
            pAtFlash[i] = a.pressurePa(fp);
            lowestFp = Math.min(lowestFp, fp);
            if (a.isEstimate(fp)) {
                notes.add(names.get(i) + ": vapour pressure " + a.methodAt(fp).label());
            }
        }
        double bubble = allPsat ? VapourLiquid.bubblePointK(x, psat, model, VapourLiquid.ATMOSPHERE_PA) : Double.NaN;
        if (!anyFlammable) {
            return new Result(Double.NaN, bubble, notes);
        }
        UnivariateFunction leChatelier = t -> {
            double[] g = model.gamma(x, t);
            double sum = 0;
            for (int i = 0; i < n; i++) {
                if (flashPointK.get(i) != null && x[i] > 0) {
                    sum += x[i] * g[i] * psat.get(i).pressurePa(t) / pAtFlash[i];
                }
            }
            return Math.log(sum);
        };
        double lo = Math.max(120, lowestFp - 80);
        while (lo > 120 && leChatelier.value(lo) > 0) {
            // strongly positive deviations (large γ) can lift the sum above 1 far below the pure flash points
            lo = Math.max(120, lo - 60);
        }
        double hi = Double.isFinite(bubble) ? bubble : lowestFp + 250;
        if (!Double.isFinite(bubble)) {
            notes.add("no bubble point (a component lacks vapour-pressure data): searched up to " + kelvinToC(hi));
        }
        if (leChatelier.value(hi) < 0) {
            return new Result(Double.NaN, bubble, notes);
        }
        double t = VapourLiquid.solve(leChatelier, lo, hi);
        // The sum is evaluated at the blend's flash point too: say where a curve is used outside its published range there.
        for (int i = 0; i < n; i++) {
            VapourPressure a = psat.get(i);
            if (flashPointK.get(i) != null && x[i] > 0 && a.methodAt(t).kind() == VapourPressure.Kind.EXTRAPOLATED
                    && !a.isEstimate(flashPointK.get(i))) {
                notes.add(names.get(i) + ": vapour pressure at the blend flash point " + kelvinToC(t) + " " + a.methodAt(t).label());
            }
        }
        return new Result(t, bubble, notes);
    }

    private static String kelvinToC(double k) {
        return String.format(java.util.Locale.ROOT, "%.1f °C", k - 273.15);
    }
}
