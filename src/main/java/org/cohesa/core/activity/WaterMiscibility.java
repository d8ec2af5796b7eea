package org.cohesa.core.activity;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.Optional;
import org.cohesa.core.hsp.VolumeMixing;
import org.cohesa.core.solvent.Solvent;

/**
 * Judges whether a liquid containing water separates into two liquid phases, measured data first.
 *
 * <p>Order of evidence:
 * <ol>
 *   <li><b>A solvent–water binary with published mutual solubilities</b> ({@link WaterSolubilityTable}): at a
 *   temperature within {@value #DATA_BAND_K} K of the measurement, the pair is two phases exactly when the mass
 *   fraction of the solvent lies between its solubility in water and 1 − (water's solubility in the solvent), the
 *   lever rule's two-phase range (e.g. Prausnitz, Lichtenthaler, de Azevedo, <i>Molecular Thermodynamics of
 *   Fluid-Phase Equilibria</i>, 3rd ed., 1999, ch. 6); a pair listed as miscible is one phase. Below a published
 *   lower critical solution temperature (LCST) the pair is one phase at any composition, above a published
 *   upper critical solution temperature (UCST) too; between an LCST and a UCST (a closed miscibility loop) the
 *   data do not give the compositions and the model decides.</li>
 *   <li><b>A blend of water and several solvents</b>: when every solvent mixes with water in all proportions by
 *   the data and every pair of the other solvents mixes in all proportions by the model, the blend is one phase
 *   (common practice, no source: a liquid whose binaries are all miscible almost never splits). Otherwise the
 *   whole blend goes to the model.</li>
 *   <li><b>Everything else</b>: the tangent-plane test with the UNIFAC liquid–liquid set ({@link Miscibility}).</li>
 * </ol>
 * Mass fractions come from the volume fractions with each liquid's density (molar mass / molar volume); the
 * volume of mixing is neglected.
 */
public final class WaterMiscibility {

    /** Published values (20–25 °C) are used within this many kelvin of their temperature. */
    public static final double DATA_BAND_K = 15;
    /** Water volume fractions tried by {@link #withWater}: from a trace to a dilute solution. */
    public static final double[] WATER_FRACTIONS = {0.02, 0.05, 0.1, 0.2, 0.3, 0.5, 0.7, 0.8, 0.9, 0.95, 0.98};
    /** CAS number of water. */
    public static final String WATER_CAS = "7732-18-5";
    private static final double[] PAIR_FRACTIONS = {0.1, 0.3, 0.5, 0.7, 0.9};

    private WaterMiscibility() {
    }

    public static boolean isWater(Solvent s) {
        return WATER_CAS.equals(s.cas()) || "water".equalsIgnoreCase(s.name());
    }

    /**
     * @param components      the liquids (water among them or not)
     * @param volumeFractions one per component, summing to 1
     * @param kelvin          temperature, K
     * @param data            published mutual solubilities with water ({@link WaterSolubilityTable#NONE} for the model alone)
     */
    public static WaterJudgement judge(List<Solvent> components, double[] volumeFractions, double kelvin, WaterSolubilityTable data) {
        return judge(components, volumeFractions, kelvin, data, new HashMap<>());
    }

    /** As {@link #judge(List, double[], double, WaterSolubilityTable)}, with the solvent pairs' model verdicts shared across calls. */
    private static WaterJudgement judge(List<Solvent> components, double[] volumeFractions, double kelvin, WaterSolubilityTable data,
                                        Map<List<Solvent>, Boolean> pairSplits) {
        if (components == null || volumeFractions == null || components.size() != volumeFractions.length) {
            throw new IllegalArgumentException("need one volume fraction per component");
        }
        VolumeMixing.requireFractions(volumeFractions);
        Activity.requireTemperature(kelvin);
        List<Solvent> present = new ArrayList<>();
        List<Double> phi = new ArrayList<>();
        int water = -1;
        for (int i = 0; i < components.size(); i++) {
            if (volumeFractions[i] > 0) {
                if (isWater(components.get(i))) {
                    water = present.size();
                }
                present.add(components.get(i));
                phi.add(volumeFractions[i]);
            }
        }
        if (water < 0 || present.size() == 1) {
            return model(components, volumeFractions, kelvin, "");
        }
        if (present.size() == 2) {
            int other = 1 - water;
            Solvent s = present.get(other);
            Optional<WaterSolubility> row = data.find(s);
            if (row.isEmpty()) {
                return model(components, volumeFractions, kelvin, "no published mutual solubility of " + s.name() + " with water: ");
            }
            Verdict v = binary(row.get(), s, present.get(water), phi.get(other), phi.get(water), kelvin);
            if (v.decided) {
                return new WaterJudgement(v.splits, WaterJudgement.Basis.MEASURED, WaterJudgement.MEASURED_MODEL, v.why);
            }
            return model(components, volumeFractions, kelvin, v.why + "; ");
        }
        return multicomponent(components, volumeFractions, present, water, kelvin, data, pairSplits);
    }

    /**
     * How a solvent or blend (without water, or with some) behaves when mixed with water in any amount: each
     * of {@link #WATER_FRACTIONS} of water is judged by {@link #judge}.
     *
     * @param water the library's water
     */
    public static WaterBehaviour withWater(List<Solvent> components, double[] volumeFractions, Solvent water, double kelvin,
                                           WaterSolubilityTable data) {
        if (!isWater(water)) {
            throw new IllegalArgumentException(water.name() + " is not water");
        }
        VolumeMixing.requireFractions(volumeFractions);
        List<Solvent> with = new ArrayList<>(components);
        int w = -1;
        for (int i = 0; i < components.size(); i++) {
            if (isWater(components.get(i))) {
                w = i;
            }
        }
        if (w < 0) {
            with.add(water);
            w = with.size() - 1;
        }
        List<String> splitAt = new ArrayList<>();
        boolean splitsAtHalf = false;
        boolean allMeasured = true;
        boolean anyMeasured = false;
        String firstDetail = null;
        // whether two of the solvents split from each other does not depend on how much water is added
        Map<List<Solvent>, Boolean> pairSplits = new HashMap<>();
        for (double f : WATER_FRACTIONS) {
            double[] phi = new double[with.size()];
            for (int i = 0; i < components.size(); i++) {
                phi[i] = volumeFractions[i] * (1 - f);
            }
            phi[w] += f;
            WaterJudgement j = judge(with, phi, kelvin, data, pairSplits);
            allMeasured &= j.basis() == WaterJudgement.Basis.MEASURED;
            anyMeasured |= j.basis() != WaterJudgement.Basis.MODEL;
            if (j.splits()) {
                splitAt.add(pct(f));
                splitsAtHalf |= f == 0.5;
                if (firstDetail == null) {
                    firstDetail = j.detail();
                }
            }
        }
        WaterJudgement.Basis basis = allMeasured ? WaterJudgement.Basis.MEASURED
                : anyMeasured ? WaterJudgement.Basis.MEASURED_AND_MODEL : WaterJudgement.Basis.MODEL;
        if (splitAt.isEmpty()) {
            String d = "one liquid phase with water at every tested water content (2–98 % by volume, "
                    + String.format(Locale.ROOT, "%.1f °C", kelvin - 273.15) + "; " + basis.label() + ")";
            return new WaterBehaviour(WaterBehaviour.Kind.MISCIBLE, basis, d);
        }
        String d = "two liquid phases at " + String.join(", ", splitAt) + " water by volume (" + basis.label() + "): " + firstDetail;
        return new WaterBehaviour(splitsAtHalf ? WaterBehaviour.Kind.IMMISCIBLE : WaterBehaviour.Kind.PARTLY_MISCIBLE, basis, d);
    }

    private record Verdict(boolean decided, boolean splits, String why) {
    }

    /** The published data's verdict for one solvent–water mixture, or undecided with the reason. */
    static Verdict binary(WaterSolubility row, Solvent s, Solvent water, double phiS, double phiW, double kelvin) {
        double t = kelvin - 273.15;
        String src = " (" + row.source() + ", " + row.basis() + ")";
        String temp = String.format(Locale.ROOT, "%.1f °C", t);
        boolean closedLoop = row.lcstC() != null && row.ucstC() != null && row.lcstC() < row.ucstC();
        if (row.ucstC() != null && t > row.ucstC() && (row.lcstC() == null || closedLoop)) {
            return new Verdict(true, false, String.format(Locale.ROOT, "one liquid phase: %s and water mix in all proportions above their "
                    + "upper critical solution temperature of %.1f °C%s", s.name(), row.ucstC(), src));
        }
        if (row.lcstC() != null && t < row.lcstC()) {
            return new Verdict(true, false, String.format(Locale.ROOT, "one liquid phase: %s and water mix in all proportions below their "
                    + "lower critical solution temperature of %.1f °C%s", s.name(), row.lcstC(), src));
        }
        if (row.lcstC() != null) {
            return new Verdict(false, false, String.format(Locale.ROOT, "%s is above the published lower critical solution temperature of "
                    + "%s with water (%.1f °C), where the pair can split at compositions the data do not give", temp, s.name(), row.lcstC()));
        }
        if (row.ucstC() != null && row.miscible()) {
            return new Verdict(false, false, String.format(Locale.ROOT, "%s is below the published upper critical solution temperature of "
                    + "%s with water (%.1f °C)", temp, s.name(), row.ucstC()));
        }
        if (!row.near(kelvin)) {
            return new Verdict(false, false, String.format(Locale.ROOT, "the published mutual solubility of %s with water is for %.0f °C, "
                    + "more than %.0f K from %s", s.name(), row.temperatureC(), DATA_BAND_K, temp));
        }
        if (row.miscible()) {
            return new Verdict(true, false, String.format(Locale.ROOT, "one liquid phase: %s and water mix in all proportions at %.0f °C%s",
                    s.name(), row.temperatureC(), src));
        }
        double ms = phiS * density(s);
        double mw = phiW * density(water);
        double w = ms / (ms + mw);
        double lo = row.solventInWaterWtPct() / 100;
        double hi = 1 - row.waterInSolventWtPct() / 100;
        boolean splits = w > lo && w < hi;
        String limits = String.format(Locale.ROOT, "%s dissolves %s mass %% in water and takes up %s mass %% water at %.0f °C%s; this mixture "
                        + "holds %.3g mass %% %s", s.name(), num(row.solventInWaterWtPct()), num(row.waterInSolventWtPct()),
                row.temperatureC(), src, 100 * w, s.name());
        return new Verdict(true, splits, (splits ? "two liquid phases: " : "one liquid phase: ") + limits
                + (splits ? ", inside the two-phase range" : w <= lo ? ", below its solubility in water" : ", within the water it can take up"));
    }

    private static WaterJudgement multicomponent(List<Solvent> components, double[] volumeFractions, List<Solvent> present, int water,
                                                 double kelvin, WaterSolubilityTable data, Map<List<Solvent>, Boolean> pairSplits) {
        WaterJudgement additive = additiveUptake(present, volumeFractions(components, volumeFractions, present), water, kelvin, data);
        if (additive != null) {
            return additive;
        }
        List<String> unsure = new ArrayList<>();
        for (int i = 0; i < present.size(); i++) {
            if (i == water) {
                continue;
            }
            Solvent s = present.get(i);
            Optional<WaterSolubility> row = data.find(s);
            if (row.isEmpty()) {
                unsure.add(s.name() + " has no published mutual solubility with water");
                continue;
            }
            if (!misciblePair(row.get(), s, present.get(water), kelvin)) {
                unsure.add(s.name() + " is not miscible with water in all proportions by the data");
            }
        }
        if (unsure.isEmpty()) {
            for (int i = 0; i < present.size(); i++) {
                for (int j = i + 1; j < present.size(); j++) {
                    if (i == water || j == water) {
                        continue;
                    }
                    List<Solvent> pair = List.of(present.get(i), present.get(j));
                    if (pairSplits.computeIfAbsent(pair, p -> pairSplits(p, kelvin))) {
                        unsure.add(present.get(i).name() + " and " + present.get(j).name() + " can split by the model");
                    }
                }
            }
            if (unsure.isEmpty()) {
                return new WaterJudgement(false, WaterJudgement.Basis.MEASURED_AND_MODEL, WaterJudgement.MEASURED_MODEL,
                        String.format(Locale.ROOT, "one liquid phase at %.1f °C: every solvent mixes with water in all proportions "
                                + "(published mutual solubilities) and with the others (activity model)", kelvin - 273.15));
            }
        }
        return model(components, volumeFractions, kelvin, String.join("; ", unsure) + ": ");
    }

    private static boolean pairSplits(List<Solvent> pair, double kelvin) {
        for (double f : PAIR_FRACTIONS) {
            if (Miscibility.check(pair, new double[] {f, 1 - f}, kelvin).splits()) {
                return true;
            }
        }
        return false;
    }

    private static double[] volumeFractions(List<Solvent> components, double[] volumeFractions, List<Solvent> present) {
        double[] phi = new double[present.size()];
        for (int i = 0, k = 0; i < components.size(); i++) {
            if (volumeFractions[i] > 0) {
                phi[k++] = volumeFractions[i];
            }
        }
        return phi;
    }

    /**
     * The additive-uptake rule for water with several solvents that are each only partly miscible with it (our own
     * rule, docs/methods.md "Water miscibility"): the solvent-rich phase can hold at most Σ m_i·u_i/(1 − u_i) of
     * water (u_i = water's mass-fraction solubility in solvent i) and the water-rich phase can dissolve the solvents
     * only while Σ (m_i/m_w)/(s_i/(1 − s_i)) ≤ 1 (s_i = solvent i's solubility in water). More water than the first
     * and more solvent than the second is two phases. It assumes no solvent helps another take up water, which is
     * why it is used only when every non-water component is partly miscible by the data (a cosolvent that mixes
     * with water in all proportions can carry any amount; then the model decides). Null when it does not apply or
     * does not decide.
     */
    private static WaterJudgement additiveUptake(List<Solvent> present, double[] phi, int water, double kelvin, WaterSolubilityTable data) {
        double mw = phi[water] * density(present.get(water));
        double uptake = 0;
        double dissolved = 0;
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < present.size(); i++) {
            if (i == water) {
                continue;
            }
            Solvent s = present.get(i);
            Optional<WaterSolubility> row = data.find(s);
            if (row.isEmpty() || row.get().miscible() || row.get().lcstC() != null || row.get().ucstC() != null || !row.get().near(kelvin)) {
                return null;
            }
            double m = phi[i] * density(s);
            double u = row.get().waterInSolventWtPct() / 100;
            double sw = row.get().solventInWaterWtPct() / 100;
            uptake += m * u / (1 - u);
            dissolved += (m / mw) / (sw / (1 - sw));
            parts.add(s.name() + " " + num(row.get().waterInSolventWtPct()) + " mass % (" + row.get().source() + ", " + row.get().basis() + ")");
        }
        if (mw > uptake && dissolved > 1) {
            double wWater = mw / (mw + sum(present, phi, water));
            return new WaterJudgement(true, WaterJudgement.Basis.MEASURED, WaterJudgement.MEASURED_MODEL, String.format(Locale.ROOT,
                    "two liquid phases at %.1f °C: the blend holds %.3g mass %% water, more than its solvents can take up added together "
                            + "(water's solubility in %s) and more solvent than the water can dissolve", kelvin - 273.15, 100 * wWater,
                    String.join(", ", parts)));
        }
        return null;
    }

    private static double sum(List<Solvent> present, double[] phi, int water) {
        double m = 0;
        for (int i = 0; i < present.size(); i++) {
            if (i != water) {
                m += phi[i] * density(present.get(i));
            }
        }
        return m;
    }

    /** True when the data say the pair is one phase at every composition at {@code kelvin}. */
    private static boolean misciblePair(WaterSolubility row, Solvent s, Solvent water, double kelvin) {
        for (double f : PAIR_FRACTIONS) {
            Verdict v = binary(row, s, water, f, 1 - f, kelvin);
            if (!v.decided || v.splits) {
                return false;
            }
        }
        return true;
    }

    private static WaterJudgement model(List<Solvent> components, double[] volumeFractions, double kelvin, String why) {
        MiscibilityResult r = Miscibility.check(components, volumeFractions, kelvin);
        return new WaterJudgement(r.splits(), WaterJudgement.Basis.MODEL, r.model(), why.isEmpty() ? r.detail() : why + r.detail());
    }

    /** g/cm³ from the library: the density, else molar mass over molar volume. */
    private static double density(Solvent s) {
        if (s.density() != null) {
            return s.density();
        }
        if (s.molarMass() != null && s.effectiveMolarVolume() != null) {
            return s.molarMass() / s.effectiveMolarVolume();
        }
        throw new IllegalArgumentException(s.name() + ": the library has neither its density nor its molar mass and volume");
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.3g", v);
    }

    private static String pct(double f) {
        return String.format(Locale.ROOT, "%.0f %%", 100 * f);
    }
}
