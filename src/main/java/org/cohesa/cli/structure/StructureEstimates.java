package org.cohesa.cli.structure;

import java.util.Map;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.store.StructureEntries;

/** The command line's entry to the structure estimates: parsing with the option name in every error. */
public final class StructureEstimates {

    /** Source key of values estimated from a structure (the "estimate-" prefix marks an estimate everywhere). */
    public static final String HSP_SOURCE = StructureEntries.HSP_SOURCE;
    public static final String UNIFAC_SOURCE = StructureEntries.UNIFAC_SOURCE;

    private StructureEstimates() {
    }

    public static StructureEstimate estimate(String field, String smiles, MeasuredProperties measured) {
        return StructureEntries.estimate(field, smiles, measured);
    }

    /** "CH3×1 CH2×1 OH×1" from subgroup counts (names of the original-UNIFAC table). */
    static String groupNames(Map<Integer, Integer> groups) {
        return StructureEntries.groupNames(groups);
    }

    static void requireHansen(String field, String smiles, StructureEstimate e) {
        StructureEntries.requireHansen(field, smiles, e, "give the missing component(s) with --dD/--dP/--dH");
    }
}
