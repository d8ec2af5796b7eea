package org.cohesa.core.activity;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.cohesa.core.solvent.UnifacAssignment;

/**
 * Translates an original-UNIFAC group assignment (the subgroup numbering stored on each solvent, Hansen et al.
 * 1991) into the subgroup numbering of the liquid–liquid parameter set (Magnussen, Rasmussen, Fredenslund,
 * <i>Ind. Eng. Chem. Process Des. Dev.</i> 20 (1981) 331).
 *
 * <p>Most subgroups carry the same name and main group in both sets and translate one to one by
 * (main-group name, subgroup name). Special cases, because the 1981 set groups some molecules differently:
 * <ul>
 * <li>whole molecules that are their own group in the 1981 set: 1-propanol (CH3 + 2 CH2 + OH → P1),
 *     2-propanol (2 CH3 + CH + OH → P2), trichloroethylene (CH=C + 3 Cl-(C=C) → TCE), diethylene glycol
 *     (2 CH2 + OH + C2H5O2 → DEOH), sulfolane (2 CH2 + (CH2)2SU → TMS);</li>
 * <li>methanol: the original CH3OH group becomes CH3 + OH (the 1981 set has no methanol group);</li>
 * <li>the ring ether group THF becomes FCH2O;</li>
 * <li>the glycol-ether groups C2H5O2 (HO–CH2–CH2–O–) and C2H4O2 (HO–CH–CH2–O–) are split into the simple
 *     groups they were written as before those groups existed: CH2 + CH2O + OH and CH + CH2O + OH.</li>
 * </ul>
 * A subgroup with no counterpart (amines, formates, NMP, amides, fluorinated groups…) cannot be
 * translated; the caller then falls back to Flory–Huggins and says so.
 */
public final class LleGroups {

    /** Translation result: the LLE counts, or the reason there are none. */
    public record Translation(Map<Integer, Integer> counts, String problem) {

        public boolean ok() {
            return problem == null;
        }
    }

    private LleGroups() {
    }

    /** Original subgroup ids of the whole-molecule special cases → LLE subgroup name. */
    private static final Map<Map<Integer, Integer>, String> WHOLE_MOLECULES = Map.of(
            Map.of(1, 1, 2, 2, 14, 1), "P1",
            Map.of(1, 2, 3, 1, 14, 1), "P2",
            Map.of(8, 1, 69, 3), "CCl2=CHCl",
            Map.of(2, 2, 14, 1, 100, 1), "(HOCH2CH2)2O",
            Map.of(2, 2, 118, 1), "(CH2)4SO2");

    /** Original subgroup name (upper case) → LLE subgroup names it splits into or is renamed to. */
    private static final Map<String, String[]> SPLITS = Map.of(
            "CH3OH", new String[] {"CH3", "OH"},
            "THF", new String[] {"FCH2O"},
            "C2H5O2", new String[] {"CH2", "CH2O", "OH"},
            "C2H4O2", new String[] {"CH", "CH2O", "OH"});

    /** Translates with the bundled parameter sets. */
    public static Translation translate(UnifacAssignment original) {
        return translate(original.counts(), UnifacParameters.original(), UnifacParameters.liquidLiquid());
    }

    static Translation translate(Map<Integer, Integer> original, UnifacParameters from, UnifacParameters to) {
        if (original.isEmpty()) {
            return new Translation(Map.of(), "no UNIFAC group assignment");
        }
        String whole = WHOLE_MOLECULES.get(original);
        if (whole != null) {
            return new Translation(Map.of(byName(to, null, whole).orElseThrow(), 1), null);
        }
        Map<Integer, Integer> out = new LinkedHashMap<>();
        for (Map.Entry<Integer, Integer> e : original.entrySet()) {
            UnifacSubgroup s = from.subgroup(e.getKey()).orElse(null);
            if (s == null) {
                return new Translation(Map.of(), "unknown original UNIFAC subgroup " + e.getKey());
            }
            String[] split = SPLITS.get(s.name().toUpperCase(Locale.ROOT));
            if (split != null) {
                for (String part : split) {
                    out.merge(byName(to, null, part).orElseThrow(), e.getValue(), Integer::sum);
                }
                continue;
            }
            Optional<Integer> id = byName(to, s.mainGroupName(), s.name());
            if (id.isEmpty()) {
                return new Translation(Map.of(), "subgroup " + s.name() + " (" + s.mainGroupName()
                        + ") has no counterpart in " + to.name());
            }
            out.merge(id.get(), e.getValue(), Integer::sum);
        }
        return new Translation(out, null);
    }

    /** LLE subgroup id by name (and main-group name when given), case-insensitive. */
    private static Optional<Integer> byName(UnifacParameters set, String mainGroupName, String name) {
        for (UnifacSubgroup s : set.subgroups().values()) {
            if (s.name().equalsIgnoreCase(name) && (mainGroupName == null || s.mainGroupName().equalsIgnoreCase(mainGroupName))) {
                return Optional.of(s.id());
            }
        }
        return Optional.empty();
    }
}
