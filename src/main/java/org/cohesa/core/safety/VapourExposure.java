package org.cohesa.core.safety;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.activity.ActivityModel;
import org.cohesa.core.solvent.VapourPressure;
import org.cohesa.core.solvent.ExposureLimit;

/**
 * Exposure from the saturated vapour above a liquid: each component's equilibrium concentration in air and
 * the mixture exposure index by the additive formula
 * <pre>  I = Σᵢ Cᵢ / OELᵢ,   Cᵢ = xᵢ γᵢ Psatᵢ(T) / P × 10⁶ (ppm by volume)</pre>
 * Source of the additive formula: ACGIH, <i>TLVs and BEIs</i> (annual booklet), appendix "Mixtures" (the
 * additive-effects formula C₁/T₁ + C₂/T₂ + … ; from memory). Cᵢ by modified Raoult's law (see {@link VapourLiquid};
 * estimated vapour pressures are named in the notes),
 * P = 101.325 kPa. For a pure liquid the index is Psat/P × 10⁶ / OEL, the vapour hazard ratio: how many times the
 * limit the air at equilibrium with the liquid would be. The limit used is the 8-h TWA; where only a STEL or a
 * ceiling is known that value is used and named. Components without a limit are listed and make the index a
 * lower bound; they are never counted as safe.
 *
 * <p>Above the bubble point the partial pressures would exceed P: they are scaled down to sum to P (the air
 * above a boiling liquid is displaced by its vapour), and the result says so.
 */
public final class VapourExposure {

    private static final String WATER_CAS = "7732-18-5";

    /**
     * One component's share.
     *
     * @param name             solvent name
     * @param saturatedPpm     equilibrium vapour concentration, ppm (null without vapour-pressure data)
     * @param limitPpm         the limit used, ppm (null when none is known)
     * @param limitKind        "TWA", "STEL" or "ceiling" (null when none)
     * @param twaPpm           8-h TWA, ppm, or null
     * @param stelPpm          15-min STEL, ppm, or null
     * @param jurisdiction     whose limits, e.g. "Ontario"
     * @param skin             skin notation
     * @param ratio            saturatedPpm / limitPpm, or null
     * @param status           "counted", "no limit known", "no vapour pressure known" or "water: no limit applies"
     */
    public record Component(String name, Double saturatedPpm, Double limitPpm, String limitKind, Double twaPpm, Double stelPpm,
                            String jurisdiction, boolean skin, Double ratio, String status) {
    }

    /**
     * @param index      Σ Cᵢ/OELᵢ over the counted components
     * @param complete   false when a component with possible exposure could not be counted
     * @param components per component
     * @param notes      e.g. above the boiling point
     */
    public record Result(double index, boolean complete, List<Component> components, List<String> notes) {
        public Result {
            components = List.copyOf(components);
            notes = List.copyOf(notes);
        }

        /** True when at least one component entered the index (otherwise the index says nothing). */
        public boolean anyCounted() {
            return components.stream().anyMatch(c -> c.ratio() != null);
        }
    }

    private VapourExposure() {
    }

    /**
     * The ACGIH additive formula Σ Cᵢ/Tᵢ for concentrations and limits in the same unit (values above 1 mean the
     * mixture limit is exceeded).
     */
    public static double additiveIndex(double[] concentrations, double[] limits) {
        if (concentrations.length != limits.length) {
            throw new IllegalArgumentException("need one limit per concentration");
        }
        double sum = 0;
        for (int i = 0; i < limits.length; i++) {
            if (!(limits[i] > 0) || !(concentrations[i] >= 0)) {
                throw new IllegalArgumentException("limits must be positive and concentrations non-negative");
            }
            sum += concentrations[i] / limits[i];
        }
        return sum;
    }

    public static Result compute(List<String> names, List<String> cas, double[] x, List<VapourPressure> psat, List<ExposureLimit> limits,
                                 ActivityModel model, double kelvin) {
        int n = x.length;
        double[] p = VapourLiquid.partialPressures(x, psat, model, kelvin);
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (psat.get(i) != null && x[i] > 0 && psat.get(i).isEstimate(kelvin)) {
                notes.add(names.get(i) + ": vapour pressure " + psat.get(i).methodAt(kelvin).label());
            }
        }
        double total = 0;
        for (double v : p) {
            if (Double.isFinite(v)) {
                total += v;
            }
        }
        double scale = 1;
        if (total > VapourLiquid.ATMOSPHERE_PA) {
            scale = VapourLiquid.ATMOSPHERE_PA / total;
            notes.add(String.format(java.util.Locale.ROOT,
                    "at %.1f °C the liquid is above its boiling point: the vapour displaces the air (concentrations scaled to 100 %% vapour)", kelvin - 273.15));
        }
        List<Component> out = new ArrayList<>();
        double index = 0;
        boolean complete = true;
        for (int i = 0; i < n; i++) {
            ExposureLimit lim = limits.get(i);
            Double ppm = Double.isFinite(p[i]) ? p[i] * scale / VapourLiquid.ATMOSPHERE_PA * 1e6 : null;
            Double limit = null;
            String kind = null;
            if (lim.twaPpm() != null) {
                limit = lim.twaPpm();
                kind = "TWA";
            } else if (lim.stelPpm() != null) {
                limit = lim.stelPpm();
                kind = "STEL";
            } else if (lim.ceilingPpm() != null) {
                limit = lim.ceilingPpm();
                kind = "ceiling";
            }
            String status;
            Double ratio = null;
            if (WATER_CAS.equals(cas.get(i)) && limit == null) {
                status = "water: no limit applies";
            } else if (limit == null) {
                status = "no limit known";
                complete = false;
            } else if (ppm == null) {
                status = "no vapour pressure known";
                complete = false;
            } else {
                ratio = ppm / limit;
                index += ratio;
                status = "counted";
            }
            out.add(new Component(names.get(i), ppm, limit, kind, lim.twaPpm(), lim.stelPpm(), lim.jurisdiction(), lim.skin(), ratio, status));
        }
        return new Result(index, complete, out, notes);
    }
}
