package org.cohesa.cli.structure;

import java.util.List;
import java.util.Map;
import org.cohesa.core.structure.EstimatedValue;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.store.StructureEntries;

/**
 * Fills the row of a user solvent from its SMILES ({@link StructureEntries#fillSolventRow}, shared with the
 * desktop): what the user gave stays, what is missing is estimated and marked so.
 */
public final class SolventFromStructure {

    static final StructureEntries.Fields FIELDS = new StructureEntries.Fields("--smiles", "--dD/--dP/--dH",
            "give the missing component(s) with --dD/--dP/--dH",
            "with 'cohesa fit' from dissolving tests ('cohesa fit FILE --prior-smiles SMILES' starts from this estimate)");

    private SolventFromStructure() {
    }

    /** Fills {@code row} in place; returns the lines that say what was estimated. Refuses a bad SMILES (exit 2). */
    public static List<String> fill(Map<String, String> row, String smiles) {
        return fill(row, smiles, null, null);
    }

    /**
     * The same with a measured refractive index and dipole moment (text of --refractive-index and --dipole, null when
     * not given): δD and δP then come from the property route, as in the desktop's form with the same values.
     */
    public static List<String> fill(Map<String, String> row, String smiles, String refractiveIndex, String dipole) {
        Double density = number(row.get("density"));
        MeasuredProperties given = MeasuredOptions.of(null, refractiveIndex, dipole);
        StructureEstimate e = StructureEstimates.estimate("--smiles", smiles,
                new MeasuredProperties(density, given.refractiveIndex(), given.dipoleDebye(), null));
        return StructureEntries.fillSolventRow(row, e, FIELDS, smiles);
    }

    static String line(String label, EstimatedValue v) {
        return StructureEntries.line(label, v);
    }

    private static Double number(String text) {
        if (text == null || text.isBlank()) {
            return null;
        }
        try {
            return Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            return null; // the row check names the bad cell
        }
    }
}
