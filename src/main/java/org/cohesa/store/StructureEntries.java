package org.cohesa.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.UnifacAssignment;
import org.cohesa.core.structure.EstimatedValue;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.Structure;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.structure.StructureEstimator;
import org.cohesa.core.structure.StructureParser;
import org.cohesa.core.structure.UnifacGrouper;

/**
 * From a structure estimate to what the database keeps: the row of a user solvent (what the user gave stays, what
 * is missing is estimated and marked so, with source keys beginning "estimate-" and a note naming route and
 * expected error of each value) and the sphere of a material added by its structure. Shared by the command line
 * and the desktop, so both store the same thing for the same input.
 */
public final class StructureEntries {

    /**
     * Source key of Hansen values a user's solvent gets from its structure by the default group route (Mathieu 2018
     * and Stefanis–Panayiotou, per component; the note names each component's route), and the key of the bundled
     * table's estimated sets (same route). The "estimate-" prefix marks an estimate everywhere.
     */
    public static final String HSP_SOURCE = "estimate-structure-groups";
    /** The key the same entries carried while the group route was Mathieu 2018 alone (still in older databases). */
    public static final String HSP_SOURCE_MATHIEU = "estimate-structure-mathieu-2018";
    public static final String UNIFAC_SOURCE = "estimate-unifac-smarts";

    /**
     * Default interaction radius for a small-molecule drug substance with no measured sphere, MPa^½: 7.0, the
     * Δδ below which Greenhalgh et al., J. Pharm. Sci. 88 (1999) 1182 found drug–excipient pairs miscible (from
     * memory; the bundled drug substances use the same default). A screening value only.
     */
    public static final double DEFAULT_R0 = 7.0;

    /** Centre and radius of a material with the lines that say how they were obtained. */
    public record Centre(double dD, double dP, double dH, double r0, String source, List<String> lines) {

        public Centre {
            lines = List.copyOf(lines);
        }
    }

    /**
     * How the edge names its inputs in messages.
     *
     * @param smiles    the structure field, e.g. "--smiles" or "SMILES"
     * @param hansen    the three components together, e.g. "--dD/--dP/--dH" or "δD/δP/δH"
     * @param howToGive what to do when the method cannot estimate a component, e.g. "give them with --dD/--dP/--dH"
     * @param measureRadius how to measure a material's sphere, said with the default radius, e.g. "with 'cohesa fit' …"
     */
    public record Fields(String smiles, String hansen, String howToGive, String measureRadius) {
    }

    private static final String ESTIMATED_FROM = "estimated from the structure ";
    private static final String ESTIMATED_BY = " (group contribution: Mathieu 2018 and Stefanis–Panayiotou)";
    /** The suffix of centres estimated while the group route was Mathieu 2018 alone (still in older databases). */
    private static final String ESTIMATED_BY_MATHIEU = " (Mathieu 2018 group contribution)";

    /** The SMILES of a material whose centre {@link #materialCentre} estimated (its source says so), or null for any other source. */
    public static String estimatedFrom(String source) {
        if (source == null || !source.startsWith(ESTIMATED_FROM)) {
            return null;
        }
        String suffix = source.endsWith(ESTIMATED_BY) ? ESTIMATED_BY : source.endsWith(ESTIMATED_BY_MATHIEU) ? ESTIMATED_BY_MATHIEU : null;
        if (suffix == null) {
            return null;
        }
        String smiles = source.substring(ESTIMATED_FROM.length(), source.length() - suffix.length()).strip();
        return smiles.isEmpty() || smiles.contains(" ") ? null : smiles;
    }

    private StructureEntries() {
    }

    /** Parses {@code smiles} ({@code field} names it in every error) and estimates what the structure gives. */
    public static StructureEstimate estimate(String field, String smiles, MeasuredProperties measured) {
        Structure st = StructureParser.parse(field, smiles);
        return StructureEstimator.estimate(st, measured);
    }

    /** Refuses an estimate that lacks a Hansen component, naming the field and the structure. */
    public static void requireHansen(String field, String smiles, StructureEstimate e, String howToGive) {
        if (!e.hasHansen()) {
            throw new InvalidInputException(field, smiles, "the group method cannot estimate "
                    + (e.dD() == null ? "δD" : e.dP() == null ? "δP" : "δH") + " for this structure ("
                    + String.join("; ", e.warnings().stream().filter(w -> w.startsWith("the group method")).toList())
                    + "); " + howToGive);
        }
    }

    /**
     * Fills {@code row} (solvent columns of {@link SolventFields}) in place from {@code e}; returns the lines that
     * say what was estimated. Hansen components the row already holds (all three) stay; one or two is refused.
     */
    public static List<String> fillSolventRow(Map<String, String> row, StructureEstimate e, Fields f, String smiles) {
        List<String> said = new ArrayList<>();
        row.put("smiles", e.structure().smiles());
        putIfBlank(row, "src_smiles", "user");
        putIfBlank(row, "formula", e.structure().formula());
        if (putIfBlank(row, "molar_mass", String.format(Locale.ROOT, "%.3f", e.structure().molarMass()))) {
            putIfBlank(row, "src_molar_mass", "computed");
        }
        int given = (has(row, "dD") ? 1 : 0) + (has(row, "dP") ? 1 : 0) + (has(row, "dH") ? 1 : 0);
        if (given == 0) {
            requireHansen(f.smiles(), smiles, e, f.howToGive());
            row.put("dD", one(e.dD()));
            row.put("dP", one(e.dP()));
            row.put("dH", one(e.dH()));
            row.put("src_hsp", HSP_SOURCE);
            said.add(line("δD", e.dD()));
            said.add(line("δP", e.dP()));
            said.add(line("δH", e.dH()));
        } else if (given < 3) {
            throw new InvalidInputException(f.hansen(), smiles,
                    "give all three Hansen components or none (none: all three are estimated from the structure)");
        }
        if (!has(row, "molar_volume") && !has(row, "density") && e.molarVolume() != null) {
            row.put("molar_volume", String.format(Locale.ROOT, "%.1f", e.molarVolume().value()));
            said.add(line("Vm", e.molarVolume()));
        }
        if (!has(row, "unifac_groups") && e.unifac().complete()) {
            UnifacAssignment a = e.unifac().assignment();
            row.put("unifac_groups", a.format());
            row.put("src_unifac", UNIFAC_SOURCE);
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

    /**
     * The sphere of a material added by its structure: the given centre (all three components) or the estimated
     * one, the given radius or {@link #DEFAULT_R0} with a caution.
     */
    public static Centre materialCentre(StructureEstimate e, Fields f, String smiles, Double dD, Double dP, Double dH, Double r0) {
        List<String> lines = new ArrayList<>();
        boolean anyGiven = dD != null || dP != null || dH != null;
        if (anyGiven && (dD == null || dP == null || dH == null)) {
            throw new InvalidInputException(f.hansen(), smiles, "give all three centre components or none (none: estimated from the structure)");
        }
        double d;
        double p;
        double h;
        String source;
        if (anyGiven) {
            d = dD;
            p = dP;
            h = dH;
            source = "user entry (structure " + e.structure().smiles() + ")";
        } else {
            requireHansen(f.smiles(), smiles, e, f.howToGive());
            d = round(e.dD().value());
            p = round(e.dP().value());
            h = round(e.dH().value());
            source = ESTIMATED_FROM + e.structure().smiles() + ESTIMATED_BY;
            lines.add(line("δD", e.dD()));
            lines.add(line("δP", e.dP()));
            lines.add(line("δH", e.dH()));
        }
        double r;
        if (r0 != null) {
            r = r0;
        } else {
            r = DEFAULT_R0;
            lines.add(String.format(Locale.ROOT, "caution: R0 %.1f is a default screening radius for small-molecule solids, not a measurement "
                    + "(a radius cannot be estimated from the structure); measure the sphere " + f.measureRadius(), r));
        }
        e.warnings().forEach(w -> lines.add("caution: " + w));
        return new Centre(d, p, h, r, source, lines);
    }

    /** "δD 17.2 estimated by … (expected error ± 0.7, 90 % within 1.6)". */
    public static String line(String label, EstimatedValue v) {
        return String.format(Locale.ROOT, "%s %.1f estimated by %s (expected error ± %.1f, 90 %% within %.1f)", label, v.value(), v.route(),
                v.expectedMae(), v.expectedP90());
    }

    /** "CH3 ×1 (1)  CH2 ×1 (2)  OH ×1 (14)" from subgroup counts (names of the original-UNIFAC table). */
    public static String groupNames(Map<Integer, Integer> groups) {
        StringBuilder sb = new StringBuilder();
        new TreeMap<>(groups).forEach((id, n) -> sb.append(sb.length() == 0 ? "" : "  ").append(UnifacGrouper.name(id)).append(" ×").append(n)
                .append(" (").append(id).append(')'));
        return sb.toString();
    }

    private static boolean has(Map<String, String> row, String col) {
        String v = row.get(col);
        return v != null && !v.isBlank();
    }

    private static boolean putIfBlank(Map<String, String> row, String col, String value) {
        if (has(row, col)) {
            return false;
        }
        row.put(col, value);
        return true;
    }

    private static String one(EstimatedValue v) {
        return String.format(Locale.ROOT, "%.1f", v.value());
    }

    private static double round(double v) {
        return Math.round(v * 10) / 10.0;
    }
}
