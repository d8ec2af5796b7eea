package org.cohesa.core.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.io.Reader;
import java.io.StringReader;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/**
 * {@code solvent-db/curation/estimated-hsp.csv}: structure-based Hansen estimates for the bundled solvents that have
 * a SMILES but no published Hansen parameters, each with its route and expected error, for curation to take up
 * as estimated values (source key estimate-structure-groups: the default group route, GroupRoute.COMBINED — per
 * component the mean of Mathieu 2018 and Stefanis–Panayiotou where both cover it, else the one that does — the same
 * route and key a user's solvent added by SMILES gets). Where Poling et al. (2000) give the solvent's dipole moment
 * ({@code poling-dipole.csv} of the reference data), δP takes the property route instead (Hansen–Beerbower, with the
 * molar volume from the table's density): on the validation compounds that have a dipole moment it beat the group
 * route, MAE 1.02 against 1.51 MPa^½ on the same 71 compounds (docs/methods.md), and it is what a user's
 * {@code solvents add --smiles … --dipole D} gives. The row keeps the measured inputs with their source keys, so the
 * check below needs no reference data; with the reference data present it also checks them against Poling. Each row
 * names every component's route and that case's expected error. The file is generated from the code; this test fails
 * when it is stale. Regenerate with {@code -Dcohesa.writeEstimates=true} (needs the reference data).
 */
class LibraryEstimatesTest {

    static final Path FILE = Path.of("solvent-db", "curation", "estimated-hsp.csv");
    /** Source key of the estimated sets in solvents.csv (SOURCES.md). */
    static final String HSP_KEY = org.cohesa.store.StructureEntries.HSP_SOURCE;

    /** Source key of the dipole moments fed to the property route (SOURCES.md). */
    static final String DIPOLE_KEY = "poling-2000-dipole";

    static final String HEADER = "cas,name,smiles,dipole_debye,src_dipole,density,src_density,dD,dP,dH,route,route_dD,route_dP,route_dH,mae_dD,mae_dP,mae_dH,p90_dD,p90_dP,p90_dH,"
            + "family,caution";

    /** Dipole moments by CAS, debye, from Poling et al. (2000) as the validation reads them (HansenValidation). */
    static Map<String, Double> polingDipoles(Path ref) {
        Map<String, Double> dipole = new HashMap<>();
        for (String[] r : ReferenceTables.tsv(ref, "poling-dipole.csv", true)) {
            if (r.length > 2 && !r[2].isBlank()) {
                dipole.put(r[0].strip(), Double.parseDouble(r[2]));
            }
        }
        return dipole;
    }

    /** The solvents the file covers: a SMILES and a CAS, and no published set (a set taken from this file counts as none). */
    static List<Solvent> covered() {
        List<Solvent> out = new ArrayList<>();
        for (Solvent s : BundledLiquids.library().all()) {
            // a set curate.py took from this file is still "no published value": regenerating must keep it
            // (any structure-estimate key, so that a change of route or key regenerates the same rows)
            String key = s.sources().get("hsp");
            boolean estimated = key != null && key.startsWith("estimate-structure-");
            if ((s.hasHansen() && !estimated) || s.smiles() == null || s.cas() == null) {
                continue;
            }
            out.add(s);
        }
        return out;
    }

    static String table(Map<String, Double> dipoles) {
        List<String> lines = new ArrayList<>();
        lines.add(HEADER);
        for (Solvent s : covered()) {
            lines.add(line(s, dipoles.get(s.cas())));
        }
        return String.join("\n", lines) + "\n";
    }

    /**
     * The measured properties the estimate of {@code s} takes, the same record a user's
     * {@code solvents add --smiles … --dipole D} builds (SolventFromStructure: the row's density and the given dipole):
     * with a dipole moment, the table's density gives the molar volume of the Hansen–Beerbower δP.
     */
    static MeasuredProperties measured(Solvent s, Double dipole) {
        return dipole == null ? MeasuredProperties.NONE : new MeasuredProperties(s.density(), null, dipole, null);
    }

    static StructureEstimate estimate(Solvent s, Double dipole) {
        return StructureEstimator.estimate(StructureParser.parse("smiles", s.smiles()), measured(s, dipole),
                StructureEstimator.GroupRoute.COMBINED);
    }

    static String line(Solvent s, Double dipole) {
        StructureEstimate e = estimate(s, dipole);
        MeasuredProperties m = measured(s, dipole);
        String inputs = String.join(",", m.dipoleDebye() == null ? "" : plain(m.dipoleDebye()), m.dipoleDebye() == null ? "" : DIPOLE_KEY,
                m.density() == null ? "" : plain(m.density()), m.density() == null ? "" : s.sources().getOrDefault("density", ""));
        if (!e.hasHansen()) {
            return String.join(",", s.cas(), quote(s.name()), quote(s.smiles()), inputs, "", "", "", "not covered", "", "", "", "", "", "",
                    "", "", "", quote(e.family()), quote(String.join("; ", e.warnings().stream()
                            .filter(w -> w.contains("no published increment") || w.contains("Stefanis–Panayiotou")).toList())));
        }
        // the cautions that bear on the set: a component Mathieu 2018 does not cover (so one method alone, or the
        // measured property, gives it) and a family estimated much less well than average
        String caution = String.join("; ", e.warnings().stream()
                .filter(w -> w.contains("much less well") || w.startsWith("Mathieu 2018 has no published increment")).toList());
        return String.join(",", s.cas(), quote(s.name()), quote(s.smiles()), inputs,
                f(e.dD().value()), f(e.dP().value()), f(e.dH().value()), HSP_KEY,
                quote(e.dD().route()), quote(e.dP().route()), quote(e.dH().route()),
                f2(e.dD().expectedMae()), f2(e.dP().expectedMae()), f2(e.dH().expectedMae()),
                f2(e.dD().expectedP90()), f2(e.dP().expectedP90()), f2(e.dH().expectedP90()), quote(e.family()), quote(caution));
    }

    /** The rows of the file, by header. */
    static List<CSVRecord> records(String text) throws IOException {
        try (Reader in = new StringReader(text)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }

    /** The dipole moment a row of the file was estimated with, or null. */
    static Double dipoleOf(CSVRecord row) {
        return row.get("dipole_debye").isEmpty() ? null : Double.parseDouble(row.get("dipole_debye"));
    }

    private static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
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
        Optional<Path> ref = ReferenceTables.folder();
        if (Boolean.getBoolean("cohesa.writeEstimates")) {
            assertTrue(ref.isPresent(), "writing the estimates needs the reference data (poling-dipole.csv)");
            Files.writeString(FILE, table(polingDipoles(ref.get())), StandardCharsets.UTF_8);
        }
        // Row by row, keyed by CAS, so that solvents added to or dropped from the library later do not make the file
        // wrong; a change of the estimation code does, until the file is regenerated. Each row is recomputed from the
        // measured inputs it names.
        String text = Files.readString(FILE, StandardCharsets.UTF_8);
        List<String> rows = text.lines().toList();
        assertEquals(HEADER, rows.get(0));
        assertTrue(rows.size() > 40, "only " + (rows.size() - 1) + " estimates");
        List<CSVRecord> records = records(text);
        List<String> stale = new ArrayList<>();
        for (int i = 1; i < rows.size(); i++) {
            String row = rows.get(i);
            CSVRecord rec = records.get(i - 1);
            String cas = rec.get("cas");
            Solvent s = BundledLiquids.library().all().stream().filter(x -> cas.equals(x.cas())).findFirst().orElse(null);
            if (s != null && s.smiles() != null && !line(s, dipoleOf(rec)).equals(row)) {
                stale.add(row + "\n   now " + line(s, dipoleOf(rec)));
            }
        }
        assertTrue(stale.isEmpty(), "estimated-hsp.csv is stale (regenerate with -Dcohesa.writeEstimates=true):\n" + String.join("\n", stale));
    }

    @Test
    void theDipoleMomentsAreExactlyPolingsForTheSolventsItLists() throws IOException {
        // Poling, Prausnitz, O'Connell, The Properties of Gases and Liquids, 5th ed. (2000), appendix
        // (poling-dipole.csv of the reference data): every covered solvent Poling lists is estimated with its value,
        // and no other solvent has a dipole moment in the file.
        Optional<Path> ref = ReferenceTables.folder();
        org.junit.jupiter.api.Assumptions.assumeTrue(ref.isPresent(), "reference-data folder not found; skipping the check against Poling");
        Map<String, Double> poling = polingDipoles(ref.get());
        List<String> bad = new ArrayList<>();
        int withDipole = 0;
        for (CSVRecord r : records(Files.readString(FILE, StandardCharsets.UTF_8))) {
            Double want = poling.get(r.get("cas"));
            Double have = dipoleOf(r);
            if (want == null ? have != null : !want.equals(have)) {
                bad.add(r.get("name") + ": file " + have + " D, Poling " + want + " D");
            }
            if (have != null) {
                withDipole++;
                if (!r.get("src_dipole").equals(DIPOLE_KEY) || r.get("density").isEmpty() || r.get("src_density").isEmpty()) {
                    bad.add(r.get("name") + ": a dipole moment without its source key, or no density with its key");
                }
            }
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
        // when the property route was adopted (2026-12-04) Poling had 11 of the 44 rows; a solvent added
        // since may add one, none may go missing
        assertTrue(withDipole >= 11, withDipole + " rows with a dipole moment");
    }
}
