package org.cohesa.core.structure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cohesa.core.activity.LleGroups;

/**
 * From a structure (and whatever liquid properties are measured) to Hansen parameters, molar volume and UNIFAC
 * groups, each with its route and expected error. Route per component:
 * <ul>
 *   <li>δD: refractive index and molar volume ({@link PropertyRoute}) when both are known, else the group
 *       route (on the same validation compounds the default group route is the better one, MAE 0.56 vs 0.65 MPa^½ on
 *       370, so the bundled sets keep it; docs/methods.md);</li>
 *   <li>δP: dipole moment and molar volume (Hansen–Beerbower) when known, else the group route (on the validation
 *       compounds with a dipole moment it beat the default group route, MAE 1.02 vs 1.51 MPa^½ on the same 71, so the
 *       bundled estimated sets take it too, from the Poling dipole moments);</li>
 *   <li>δH: the group route (on the validation set the default group route beats the remainder √(δt² − δD² − δP²), MAE
 *       1.17 vs 1.94 MPa^½ on the same 64 compounds, because the remainder collects the errors of the other three); with ΔHvap, n_D and μ
 *       given the remainder is offered beside it for comparison ({@link #hydrogenBondingRemainder});</li>
 *   <li>molar volume: M/ρ from a given density, else the group method's increments (marked estimated).</li>
 * </ul>
 * The property route needs the molar volume; with no density it uses the group volume.
 *
 * <p>The group route ({@link GroupRoute#COMBINED}, the default) is, per component, the mean of the two published
 * group methods where both cover the structure — Mathieu 2018 ({@link MathieuMethod}) and Stefanis–Panayiotou
 * ({@link StefanisPanayiotouMethod}) — and the one that covers it otherwise. The mean of independent estimators is
 * the usual way to combine them; it was chosen on half of the validation table (CAS check digit even) and confirmed on
 * the other half, where it beat either method alone in every component (docs/methods.md). The bundled table's estimated
 * sets and a user's solvent added by SMILES both use it (source key estimate-structure-groups). {@link GroupRoute#MATHIEU}
 * keeps the Mathieu groups alone, for comparison (the route of the bundled sets before, key estimate-structure-mathieu-2018).
 */
public final class StructureEstimator {

    static final String GROUP = "group contribution (Mathieu 2018)";
    static final String GROUP_SP = "group contribution (Stefanis–Panayiotou 2008/2012)";
    static final String GROUP_MEAN = "group contribution (mean of Mathieu 2018 and Stefanis–Panayiotou 2008/2012)";

    /** Which group methods the group route uses. */
    public enum GroupRoute {
        /** Mean of Mathieu 2018 and Stefanis–Panayiotou where both cover a component, else the one that does. */
        COMBINED,
        /** Mathieu 2018 alone. */
        MATHIEU
    }
    static final String REFRACTIVE = "refractive index via molar refraction (Lorentz–Lorenz, Mathieu 2018 relation)";
    static final String DIPOLE = "dipole moment (Hansen–Beerbower)";
    static final String REMAINDER = "remainder √(δt² − δD² − δP²), δt from the enthalpy of vaporisation";
    static final String VAPORISATION = "enthalpy of vaporisation and molar volume (Hildebrand–Scott)";

    private StructureEstimator() {
    }

    /**
     * Mean absolute error {δD, δP, δH} of the group method for {@code family} when that family is estimated much
     * worse than average on the published table (the families the estimate warns about), else null.
     */
    public static double[] muchWorseFamilyError(String family) {
        return muchWorseFamilyError(family, GroupRoute.COMBINED);
    }

    /** As {@link #muchWorseFamilyError(String)} for the given group route. */
    public static double[] muchWorseFamilyError(String family, GroupRoute route) {
        double[] e = (route == GroupRoute.MATHIEU ? EstimateErrors.MUCH_WORSE_MATHIEU : EstimateErrors.MUCH_WORSE).get(family);
        return e == null ? null : e.clone();
    }

    /**
     * δt from a given enthalpy of vaporisation and the estimate's molar volume ({@link PropertyRoute#totalFromVaporisation}),
     * with that route's error on the published table; null without ΔHvap or a molar volume. A check on the three
     * components (√(δD² + δP² + δH²) should fall within its error), and the δt the remainder route starts from.
     */
    public static EstimatedValue totalFromVaporisation(StructureEstimate e, MeasuredProperties measured) {
        return total(measured == null ? MeasuredProperties.NONE : measured, e.molarVolume());
    }

    /**
     * δH as the remainder √(δt² − δD² − δP²) of the δt from ΔHvap, with its error on the published table — measured
     * with δD and δP from the property route as well, so it is given only when the estimate's δD and δP come from
     * n_D and μ; null otherwise. The estimate keeps the group δH (closer on that table); this is for comparison.
     */
    public static EstimatedValue hydrogenBondingRemainder(StructureEstimate e, MeasuredProperties measured) {
        EstimatedValue t = totalFromVaporisation(e, measured);
        if (t == null || e.dD() == null || !REFRACTIVE.equals(e.dD().route()) || e.dP() == null || !DIPOLE.equals(e.dP().route())) {
            return null;
        }
        return new EstimatedValue(PropertyRoute.hydrogenBondingRemainder(t.value(), e.dD().value(), e.dP().value()), REMAINDER,
                EstimateErrors.PROPERTY_DH[0], EstimateErrors.PROPERTY_DH[1], true);
    }

    private static EstimatedValue total(MeasuredProperties m, EstimatedValue volume) {
        if (m.hvapKjPerMol() == null || volume == null) {
            return null;
        }
        double t = PropertyRoute.totalFromVaporisation(m.hvapKjPerMol() * 1000, volume.value());
        return Double.isFinite(t) ? new EstimatedValue(t, VAPORISATION, EstimateErrors.PROPERTY_DT[0], EstimateErrors.PROPERTY_DT[1], true) : null;
    }

    /** The estimate by the default group route ({@link GroupRoute#COMBINED}). */
    public static StructureEstimate estimate(Structure structure, MeasuredProperties measured) {
        return estimate(structure, measured, GroupRoute.COMBINED);
    }

    /**
     * One group component: the mean where both methods give it (COMBINED), else the one that does, each with the
     * error that case showed on the published table; null when neither does.
     */
    private static EstimatedValue groupComponent(Double mathieu, Double sp, int k, GroupRoute route) {
        if (route == GroupRoute.MATHIEU || sp == null) {
            if (mathieu == null) {
                return null;
            }
            double[] e = route == GroupRoute.MATHIEU ? EstimateErrors.GROUP[k] : EstimateErrors.MATHIEU_ALONE[k];
            return new EstimatedValue(mathieu, GROUP, e[0], e[1], true);
        }
        if (mathieu == null) {
            return new EstimatedValue(sp, GROUP_SP, EstimateErrors.SP_ALONE[k][0], EstimateErrors.SP_ALONE[k][1], true);
        }
        return new EstimatedValue((mathieu + sp) / 2, GROUP_MEAN, EstimateErrors.MEAN[k][0], EstimateErrors.MEAN[k][1], true);
    }

    public static StructureEstimate estimate(Structure structure, MeasuredProperties measured, GroupRoute route) {
        MeasuredProperties m = measured == null ? MeasuredProperties.NONE : measured;
        MathieuEstimate group = MathieuMethod.estimate(structure);
        StefanisPanayiotouEstimate sp = route == GroupRoute.MATHIEU ? null : StefanisPanayiotouMethod.estimate(structure);
        EstimatedValue groupD = groupComponent(group.dD(), sp == null ? null : sp.dD(), 0, route);
        EstimatedValue groupP = groupComponent(group.dP(), sp == null ? null : sp.dP(), 1, route);
        EstimatedValue groupH = groupComponent(group.dH(), sp == null ? null : sp.dH(), 2, route);
        String family = StructureFamily.of(structure);
        List<String> warnings = new ArrayList<>();

        EstimatedValue volume = null;
        if (m.density() != null) {
            volume = new EstimatedValue(structure.molarMass() / m.density(), "molar mass / given density", 0, 0, false);
        } else if (group.molarVolume() != null) {
            double v = group.molarVolume();
            volume = new EstimatedValue(v, "group contribution (Mathieu 2018 volume increments, 25 °C)",
                    v * EstimateErrors.GROUP_VOLUME[0], v * EstimateErrors.GROUP_VOLUME[1], true);
        }

        EstimatedValue dD = null;
        if (m.refractiveIndex() != null && volume != null) {
            dD = new EstimatedValue(PropertyRoute.dispersionFromRefractiveIndex(m.refractiveIndex(), volume.value()), REFRACTIVE,
                    EstimateErrors.PROPERTY_DD[0], EstimateErrors.PROPERTY_DD[1], true);
        } else {
            dD = groupD;
        }
        EstimatedValue dP = null;
        if (m.dipoleDebye() != null && volume != null) {
            dP = new EstimatedValue(PropertyRoute.polarFromDipole(m.dipoleDebye(), volume.value()), DIPOLE,
                    EstimateErrors.PROPERTY_DP[0], EstimateErrors.PROPERTY_DP[1], true);
        } else {
            dP = groupP;
        }
        EstimatedValue dH = groupH;

        if (route == GroupRoute.MATHIEU && !group.uncovered().isEmpty()) {
            // say whether the measured properties filled what the group method could not
            List<String> open = new ArrayList<>();
            List<String> filled = new ArrayList<>();
            (group.dD() == null ? (dD == null ? open : filled) : new ArrayList<String>()).add("δD");
            (group.dP() == null ? (dP == null ? open : filled) : new ArrayList<String>()).add("δP");
            (group.dH() == null ? (dH == null ? open : filled) : new ArrayList<String>()).add("δH");
            warnings.add("the group method has no published increment for " + String.join(", ", group.uncovered())
                    + (open.isEmpty() && !filled.isEmpty() ? "; " + String.join(" and ", filled) + " come" + (filled.size() == 1 ? "s" : "")
                            + " from the measured properties instead" : "; components that need it are not estimated"));
        } else if (route == GroupRoute.COMBINED && !group.uncovered().isEmpty()) {
            List<String> bySp = new ArrayList<>();
            List<String> byMeasured = new ArrayList<>();
            List<String> open = new ArrayList<>();
            String[] names = {"δD", "δP", "δH"};
            Double[] mathieu = {group.dD(), group.dP(), group.dH()};
            EstimatedValue[] chosen = {dD, dP, dH};
            for (int k = 0; k < 3; k++) {
                if (mathieu[k] != null) {
                    continue;
                }
                (chosen[k] == null ? open : GROUP_SP.equals(chosen[k].route()) ? bySp : byMeasured).add(names[k]);
            }
            warnings.add("Mathieu 2018 has no published increment for " + String.join(", ", group.uncovered())
                    + (bySp.isEmpty() ? "" : "; " + String.join(" and ", bySp) + (bySp.size() == 1 ? " comes" : " come")
                            + " from the Stefanis–Panayiotou groups alone")
                    + (byMeasured.isEmpty() ? "" : "; " + String.join(" and ", byMeasured) + (byMeasured.size() == 1 ? " comes" : " come")
                            + " from the measured properties instead")
                    + (open.isEmpty() ? "" : "; " + String.join(" and ", open) + " not estimated (no group method covers it)"));
        }
        if (sp != null && !sp.complete()) {
            warnings.add((sp.dD() != null || sp.dP() != null || sp.dH() != null ? "the Stefanis–Panayiotou tables leave out a component"
                    : "Stefanis–Panayiotou groups not used") + ": " + String.join("; ", sp.uncovered()));
        }
        double[] worse = (route == GroupRoute.MATHIEU ? EstimateErrors.MUCH_WORSE_MATHIEU : EstimateErrors.MUCH_WORSE).get(family);
        if (worse != null) {
            warnings.add(String.format(Locale.ROOT, "%s structures are estimated much less well than average by the group method "
                    + "(mean error δD %.1f, δP %.1f, δH %.1f MPa½ on the published table): measure, or treat the values as rough",
                    family, worse[0], worse[1], worse[2]));
        }
        UnifacGrouping unifac = UnifacGrouper.group(structure);
        Map<Integer, Integer> lle = Map.of();
        if (unifac.complete()) {
            LleGroups.Translation t = LleGroups.translate(unifac.assignment());
            if (t.ok()) {
                lle = t.counts();
            }
        } else {
            warnings.add("no original-UNIFAC group for atom(s) " + String.join(", ", unifac.unplaced())
                    + "; activity falls back to Flory–Huggins");
        }
        if (dD != null || dP != null || dH != null) {
            warnings.add("estimates are screening values: confirm solubility by a laboratory test before relying on them");
        }
        List<GroupMethodValues> methods = sp == null ? List.of(GroupMethodValues.of(group))
                : List.of(GroupMethodValues.of(group), GroupMethodValues.of(sp));
        return new StructureEstimate(structure.facts(), family, dD, dP, dH, volume, unifac, lle, warnings, methods);
    }
}
