package org.cohesa.core.activity;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Solvent;

/**
 * Picks the activity model for a mixture: original UNIFAC when every component has a group assignment
 * and every main-group pair has a published parameter; otherwise the Hansen–Flory–Huggins model
 * (Lindvig et al. 2002), with {@link ActivityModel#note()} saying why; the ideal solution when asked.
 */
public final class ActivityModels {

    private ActivityModels() {
    }

    /**
     * @param components the mixture's liquids, in the order γ will be returned
     * @param ideal      true for γ = 1 (a comparison baseline)
     * @throws InvalidInputException naming the solvent when no model can describe it (no UNIFAC groups and
     *                               no Hansen parameters or molar volume)
     */
    public static ActivityModel choose(List<Solvent> components, boolean ideal) {
        if (components == null || components.isEmpty()) {
            throw new IllegalArgumentException("a mixture needs at least one component");
        }
        if (ideal) {
            return new IdealSolution(components.size());
        }
        List<Map<Integer, Integer>> assignments = new ArrayList<>();
        String why = null;
        for (Solvent s : components) {
            if (s.unifac().isEmpty()) {
                why = s.name() + " has no UNIFAC group assignment";
                break;
            }
            assignments.add(s.unifac().counts());
        }
        if (why == null) {
            String missing = Unifac.missingParameter(UnifacParameters.original(), assignments);
            if (missing == null) {
                return new Unifac(UnifacParameters.original(), assignments, UnifacParameters.original().name(), "");
            }
            why = "UNIFAC not usable: " + missing;
        }
        return floryHuggins(components, why);
    }

    /** The Hansen–Flory–Huggins model for the components; {@code why} is kept as its note. */
    static FloryHuggins floryHuggins(List<Solvent> components, String why) {
        List<HansenParameters> hsp = new ArrayList<>();
        for (Solvent s : components) {
            if (!s.hasHansen() || s.effectiveMolarVolume() == null) {
                throw new InvalidInputException("solvent", s.name(), (why == null ? "" : why + "; ")
                        + "the Flory–Huggins fallback needs Hansen parameters and a molar volume, and the library lacks "
                        + (!s.hasHansen() ? "the Hansen parameters" : "the molar volume"));
            }
            hsp.add(s.hansen());
        }
        return new FloryHuggins(hsp, Composition.molarVolumes(components), why);
    }
}
