package org.cohesa.core.structure;

import java.util.List;
import java.util.Map;
import org.cohesa.core.hsp.HansenParameters;

/**
 * Everything Cohesa estimates from one structure (nothing stored).
 *
 * @param structure     formula, molar mass, SMILES
 * @param family        the family the error figures and warnings use ({@link StructureFamily})
 * @param dD            dispersion component with route and expected error, or null when no route covers it
 * @param dP            polar component, or null
 * @param dH            hydrogen-bonding component, or null
 * @param molarVolume   liquid molar volume, cm³/mol (given density → M/ρ; else the Mathieu increments), or null
 * @param unifac        original-UNIFAC subgroups found (empty when an atom has no group)
 * @param lleGroups     the same in the liquid–liquid set's numbering, or empty when a subgroup has no counterpart
 * @param warnings      cautions to show beside the values (family much worse than average, parts not covered)
 * @param groupMethods  what each group method gave before they were combined (Mathieu 2018, then Stefanis–Panayiotou
 *                      on the default route)
 */
public record StructureEstimate(StructureFacts structure, String family, EstimatedValue dD, EstimatedValue dP, EstimatedValue dH,
        EstimatedValue molarVolume, UnifacGrouping unifac, Map<Integer, Integer> lleGroups, List<String> warnings,
        List<GroupMethodValues> groupMethods) {

    public StructureEstimate {
        lleGroups = Map.copyOf(lleGroups);
        warnings = List.copyOf(warnings);
        groupMethods = List.copyOf(groupMethods);
    }

    /** True when all three Hansen components have a value. */
    public boolean hasHansen() {
        return dD != null && dP != null && dH != null;
    }

    /** The three components as parameters, or null when one is missing. */
    public HansenParameters hansen() {
        return hasHansen() ? HansenParameters.of(round(dD.value()), round(dP.value()), round(dH.value())) : null;
    }

    private static double round(double v) {
        return Math.round(v * 10) / 10.0;
    }
}
