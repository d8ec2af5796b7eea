package org.cohesa.core.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/**
 * {@code solvent-db/curation/estimated-hsp.csv}: structure-based Hansen estimates for the bundled solvents that have
 * a SMILES but no published Hansen parameters, each with its route and expected error, for curation to take up
 * as estimated values (source key estimate-structure-groups: the default group route, GroupRoute.COMBINED — per
 * component the mean of Mathieu 2018 and Stefanis–Panayiotou where both cover it, else the one that does — the same
 * route and key a user's solvent added by SMILES gets). Each row names every component's route and that case's
 * expected error. The file is generated from the code; this test fails when it is stale. Regenerate with
 * {@code -Dcohesa.writeEstimates=true}.
 */
class LibraryEstimatesTest {

    static final Path FILE = Path.of("solvent-db", "curation", "estimated-hsp.csv");
    /** Source key of the estimated sets in solvents.csv (SOURCES.md). */
    static final String HSP_KEY = org.cohesa.store.StructureEntries.HSP_SOURCE;

    static final String HEADER = "cas,name,smiles,dD,dP,dH,route,route_dD,route_dP,route_dH,mae_dD,mae_dP,mae_dH,p90_dD,p90_dP,p90_dH,"
            + "family,caution";

    static String table() {
        List<String> lines = new ArrayList<>();
        lines.add(HEADER);
        for (Solvent s : BundledLiquids.library().all()) {
            // a set curate.py took from this file is still "no published value": regenerating must keep it
            // (any structure-estimate key, so that a change of route or key regenerates the same rows)
            String key = s.sources().get("hsp");
            boolean estimated = key != null && key.startsWith("estimate-structure-");
            if ((s.hasHansen() && !estimated) || s.smiles() == null || s.cas() == null) {
                continue;
            }
            lines.add(line(s));
        }
        return String.join("\n", lines) + "\n";
    }

    static String line(Solvent s) {
        {
            StructureEstimate e = StructureEstimator.estimate(StructureParser.parse("smiles", s.smiles()), MeasuredProperties.NONE,
                    StructureEstimator.GroupRoute.COMBINED);
            if (!e.hasHansen()) {
                return String.join(",", s.cas(), quote(s.name()), quote(s.smiles()), "", "", "", "not covered", "", "", "", "", "", "",
                        "", "", "", quote(e.family()), quote(String.join("; ", e.warnings().stream()
                                .filter(w -> w.contains("no published increment") || w.contains("Stefanis–Panayiotou")).toList())));
            }
            // the cautions that bear on the set: a component Mathieu 2018 does not cover (so one method alone gives it)
            // and a family estimated much less well than average
            String caution = String.join("; ", e.warnings().stream()
                    .filter(w -> w.contains("much less well") || w.startsWith("Mathieu 2018 has no published increment")).toList());
            return String.join(",", s.cas(), quote(s.name()), quote(s.smiles()),
                    f(e.dD().value()), f(e.dP().value()), f(e.dH().value()), HSP_KEY,
                    quote(e.dD().route()), quote(e.dP().route()), quote(e.dH().route()),
                    f2(e.dD().expectedMae()), f2(e.dP().expectedMae()), f2(e.dH().expectedMae()),
                    f2(e.dD().expectedP90()), f2(e.dP().expectedP90()), f2(e.dH().expectedP90()), quote(e.family()), quote(caution));
        }
    }

    private static String f(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    /** Errors as docs/methods.md gives them (two decimals). */
    private static String f2(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

    private static String quote(String t) {
        return t.contains(",") || t.contains("\"") ? "\"" + t.replace("\"", "\"\"") + "\"" : t;
    }

    @Test
    void everyRowOfTheEstimatesFileIsWhatTheCodeEstimates() throws IOException {
        if (Boolean.getBoolean("cohesa.writeEstimates")) {
            Files.writeString(FILE, table(), StandardCharsets.UTF_8);
        }
        // Row by row, keyed by CAS, so that solvents added to or dropped from the library later do not make the file
        // wrong; a change of the estimation code does, until the file is regenerated.
        List<String> rows = Files.readAllLines(FILE, StandardCharsets.UTF_8);
        assertEquals(HEADER, rows.get(0));
        assertTrue(rows.size() > 40, "only " + (rows.size() - 1) + " estimates");
        List<String> stale = new ArrayList<>();
        for (String row : rows.subList(1, rows.size())) {
            String cas = row.substring(0, row.indexOf(','));
            Solvent s = BundledLiquids.library().all().stream().filter(x -> cas.equals(x.cas())).findFirst().orElse(null);
            if (s != null && s.smiles() != null && !line(s).equals(row)) {
                stale.add(row + "\n   now " + line(s));
            }
        }
        assertTrue(stale.isEmpty(), "estimated-hsp.csv is stale (regenerate with -Dcohesa.writeEstimates=true):\n" + String.join("\n", stale));
    }
}
