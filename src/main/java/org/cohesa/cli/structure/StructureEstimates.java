package org.cohesa.cli.structure;

import java.util.Map;
import java.util.TreeMap;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.Structure;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.structure.StructureEstimator;
import org.cohesa.core.structure.StructureParser;
import org.cohesa.core.structure.UnifacGrouper;

/** The command line's entry to the structure estimates: parsing with the option name in every error. */
public final class StructureEstimates {

    /** Source key of values estimated from a structure (the "estimate-" prefix marks an estimate everywhere). */
    public static final String HSP_SOURCE = "estimate-structure-mathieu-2018";
    public static final String UNIFAC_SOURCE = "estimate-unifac-smarts";

    private StructureEstimates() {
    }

    public static StructureEstimate estimate(String field, String smiles, MeasuredProperties measured) {
        Structure st = StructureParser.parse(field, smiles);
        return StructureEstimator.estimate(st, measured);
    }

    /** "CH3×1 CH2×1 OH×1" from subgroup counts (names of the original-UNIFAC table). */
    static String groupNames(Map<Integer, Integer> groups) {
        StringBuilder sb = new StringBuilder();
        new TreeMap<>(groups).forEach((id, n) -> sb.append(sb.length() == 0 ? "" : "  ").append(UnifacGrouper.name(id)).append(" ×").append(n)
                .append(" (").append(id).append(')'));
        return sb.toString();
    }

    static void requireHansen(String field, String smiles, StructureEstimate e) {
        if (!e.hasHansen()) {
            throw new InvalidInputException(field, smiles, "the group method cannot estimate "
                    + (e.dD() == null ? "δD" : e.dP() == null ? "δP" : "δH") + " for this structure ("
                    + String.join("; ", e.warnings().stream().filter(w -> w.startsWith("the group method")).toList())
                    + "); give the missing component(s) with --dD/--dP/--dH");
        }
    }
}
