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
 *   <li>δD: refractive index and molar volume ({@link PropertyRoute}) when both are known, else the Mathieu
 *       group method;</li>
 *   <li>δP: dipole moment and molar volume (Hansen–Beerbower) when known, else the group method;</li>
 *   <li>δH: the group method (on the validation set it beat the remainder √(δt² − δD² − δP²), MAE 1.52 vs
 *       1.94 MPa^½, because the remainder collects the errors of the other three);</li>
 *   <li>molar volume: M/ρ from a given density, else the group method's increments (marked estimated).</li>
 * </ul>
 * The property route needs the molar volume; with no density it uses the group volume.
 */
public final class StructureEstimator {

    static final String GROUP = "group contribution (Mathieu 2018)";
    static final String REFRACTIVE = "refractive index via molar refraction (Lorentz–Lorenz, Mathieu 2018 relation)";
    static final String DIPOLE = "dipole moment (Hansen–Beerbower)";

    private StructureEstimator() {
    }

    /**
     * Mean absolute error {δD, δP, δH} of the group method for {@code family} when that family is estimated much
     * worse than average on the published table (the families the estimate warns about), else null.
     */
    public static double[] muchWorseFamilyError(String family) {
        double[] e = EstimateErrors.MUCH_WORSE.get(family);
        return e == null ? null : e.clone();
    }

    public static StructureEstimate estimate(Structure structure, MeasuredProperties measured) {
        MeasuredProperties m = measured == null ? MeasuredProperties.NONE : measured;
        MathieuEstimate group = MathieuMethod.estimate(structure);
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
        } else if (group.dD() != null) {
            dD = new EstimatedValue(group.dD(), GROUP, EstimateErrors.GROUP_DD[0], EstimateErrors.GROUP_DD[1], true);
        }
        EstimatedValue dP = null;
        if (m.dipoleDebye() != null && volume != null) {
            dP = new EstimatedValue(PropertyRoute.polarFromDipole(m.dipoleDebye(), volume.value()), DIPOLE,
                    EstimateErrors.PROPERTY_DP[0], EstimateErrors.PROPERTY_DP[1], true);
        } else if (group.dP() != null) {
            dP = new EstimatedValue(group.dP(), GROUP, EstimateErrors.GROUP_DP[0], EstimateErrors.GROUP_DP[1], true);
        }
        EstimatedValue dH = group.dH() == null ? null
                : new EstimatedValue(group.dH(), GROUP, EstimateErrors.GROUP_DH[0], EstimateErrors.GROUP_DH[1], true);

        if (!group.uncovered().isEmpty()) {
            warnings.add("the group method has no published increment for " + String.join(", ", group.uncovered())
                    + "; components that need it are not estimated");
        }
        double[] worse = EstimateErrors.MUCH_WORSE.get(family);
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
        return new StructureEstimate(structure.facts(), family, dD, dP, dH, volume, unifac, lle, warnings);
    }
}
