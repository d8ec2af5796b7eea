package org.cohesa.cli.structure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cohesa.core.solvent.UnifacAssignment;
import org.cohesa.core.structure.EstimatedValue;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;

/**
 * Fills the row of a user solvent from its SMILES: what the user gave stays, what is missing is estimated and
 * marked so (source keys beginning "estimate-", and a note that names route and expected error of each value).
 */
public final class SolventFromStructure {

    private SolventFromStructure() {
    }

    /** Fills {@code row} in place; returns the lines that say what was estimated. Refuses a bad SMILES (exit 2). */
    public static List<String> fill(Map<String, String> row, String smiles) {
        Double density = number(row.get("density"));
        StructureEstimate e = StructureEstimates.estimate("--smiles", smiles, new MeasuredProperties(density, null, null, null));
        List<String> said = new ArrayList<>();
        row.put("smiles", e.structure().smiles());
        row.putIfAbsent("src_smiles", "user");
        row.putIfAbsent("formula", e.structure().formula());
        row.putIfAbsent("molar_mass", String.format(Locale.ROOT, "%.3f", e.structure().molarMass()));
        row.putIfAbsent("src_molar_mass", "computed");
        boolean hspGiven = row.containsKey("dD") || row.containsKey("dP") || row.containsKey("dH");
        if (!hspGiven) {
            StructureEstimates.requireHansen("--smiles", smiles, e);
            row.put("dD", one(e.dD()));
            row.put("dP", one(e.dP()));
            row.put("dH", one(e.dH()));
            row.put("src_hsp", StructureEstimates.HSP_SOURCE);
            said.add(line("δD", e.dD()));
            said.add(line("δP", e.dP()));
            said.add(line("δH", e.dH()));
        } else if (!(row.containsKey("dD") && row.containsKey("dP") && row.containsKey("dH"))) {
            throw new org.cohesa.core.InvalidInputException("--dD/--dP/--dH", smiles,
                    "give all three Hansen components or none (none: all three are estimated from the structure)");
        }
        if (!row.containsKey("molar_volume") && density == null && e.molarVolume() != null) {
            row.put("molar_volume", String.format(Locale.ROOT, "%.1f", e.molarVolume().value()));
            said.add(line("Vm", e.molarVolume()));
        }
        if (!row.containsKey("unifac_groups") && e.unifac().complete()) {
            UnifacAssignment a = e.unifac().assignment();
            row.put("unifac_groups", a.format());
            row.put("src_unifac", StructureEstimates.UNIFAC_SOURCE);
            said.add("UNIFAC groups " + a.format() + " (from the structure by SMARTS; 99.9 % agree with DDBST)");
        }
        e.warnings().forEach(w -> said.add("caution: " + w));
        if (!said.isEmpty()) {
            String note = "estimated from the structure: " + String.join("; ", said);
            String old = row.get("note");
            row.put("note", old == null || old.isBlank() ? note : old + "; " + note);
        }
        return said;
    }

    private static String one(EstimatedValue v) {
        return String.format(Locale.ROOT, "%.1f", v.value());
    }

    static String line(String label, EstimatedValue v) {
        return String.format(Locale.ROOT, "%s %.1f estimated by %s (expected error ± %.1f, 90 %% within %.1f)", label, v.value(), v.route(),
                v.expectedMae(), v.expectedP90());
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
