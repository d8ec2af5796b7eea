package org.cohesa.core.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.coverage.Provenance;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The estimated Hansen sets of the bundled table (issue 12: no solvent silently left out of the searches): they are
 * exactly what the core estimator gives today, they are marked as estimates, and no published set was replaced.
 * ({@link LibraryEstimatesTest} keeps {@code curation/estimated-hsp.csv} current; curate.py fills the table from it.)
 */
class EstimatedHansenTableTest {

    private static final Path SOLVENTS = Path.of("solvent-db", "solvents.csv");
    private static final Path MANUAL = Path.of("solvent-db", "curation", "manual.csv");
    private static List<CSVRecord> table;
    private static List<CSVRecord> file;

    @BeforeAll
    static void read() throws IOException {
        table = csv(SOLVENTS);
        file = csv(LibraryEstimatesTest.FILE);
    }

    private static List<CSVRecord> csv(Path path) throws IOException {
        try (Reader in = Files.newBufferedReader(path, StandardCharsets.UTF_8)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }

    @Test
    void everyBundledEstimatedSetEqualsTheEstimateOfItsSmilesAndSaysSo() {
        // Source: the default group route of StructureEstimator with the SMILES alone — per component the mean of
        // D. Mathieu, ACS Omega 3 (2018) 17049 and E. Stefanis, C. Panayiotou, Int. J. Thermophys. 29 (2008) 568 (2012
        // update) where both cover it, else the one that does; δP instead from the dipole moment of Poling et al.
        // (2000) by Hansen–Beerbower (molar volume from the table's density) where the estimates file names one;
        // values rounded to 0.1 MPa^½ as the table stores them.
        Map<String, CSVRecord> inputs = new LinkedHashMap<>();
        file.forEach(e -> inputs.put(e.get("cas"), e));
        List<String> bad = new ArrayList<>();
        int estimated = 0;
        for (CSVRecord r : table) {
            if (!r.get("src_hsp").equals(LibraryEstimatesTest.HSP_KEY)) {
                continue;
            }
            estimated++;
            CSVRecord in = inputs.get(r.get("cas"));
            Double dipole = in == null ? null : LibraryEstimatesTest.dipoleOf(in);
            MeasuredProperties measured = MeasuredProperties.NONE;
            if (dipole != null) {
                // the density the estimate used is the table's, with the table's source key
                if (in.get("density").isEmpty() || Double.parseDouble(in.get("density")) != Double.parseDouble(r.get("density"))
                        || !in.get("src_density").equals(r.get("src_density"))) {
                    bad.add(r.get("name") + ": estimated with density " + in.get("density") + " (" + in.get("src_density") + "), table "
                            + r.get("density") + " (" + r.get("src_density") + ")");
                }
                measured = new MeasuredProperties(Double.parseDouble(r.get("density")), null, dipole, null);
                String said = "dipole moment " + in.get("dipole_debye") + " D (" + in.get("src_dipole") + ")";
                if (!r.get("note").contains(said)) {
                    bad.add(r.get("name") + ": the note does not name the measured " + said);
                }
            }
            StructureEstimate e = StructureEstimator.estimate(StructureParser.parse("smiles", r.get("smiles")),
                    measured, StructureEstimator.GroupRoute.COMBINED);
            if (!e.hasHansen()) {
                bad.add(r.get("name") + ": the estimator gives no full set today");
                continue;
            }
            double[] want = {e.dD().value(), e.dP().value(), e.dH().value()};
            String[] cols = {"dD", "dP", "dH"};
            for (int i = 0; i < 3; i++) {
                String expected = String.format(Locale.ROOT, "%.1f", want[i]);
                if (!r.get(cols[i]).equals(expected)) {
                    bad.add(r.get("name") + " " + cols[i] + ": table " + r.get(cols[i]) + ", estimator " + expected);
                }
            }
            // the app's provenance column ('solvent NAME', 'solvents --coverage') must read the key as an estimate
            // (SOURCES.md naming rule: keys starting with estimate- mark estimates; common practice, no source)
            if (Provenance.of(r.get("src_hsp"), false) != Provenance.ESTIMATED) {
                bad.add(r.get("name") + ": " + r.get("src_hsp") + " is not shown as estimated");
            }
            String note = r.get("note");
            if (!note.contains("Hansen parameters estimated from the structure") || !note.contains("no published value found")
                    || !note.contains("expected error")) {
                bad.add(r.get("name") + ": the note does not say the set is estimated, with its expected error");
            }
            // the note names each component's route and that case's expected error (EstimateErrors, docs/methods.md)
            EstimatedValue[] v = {e.dD(), e.dP(), e.dH()};
            String[] sym = {"δD", "δP", "δH"};
            for (int i = 0; i < 3; i++) {
                String method = v[i].route().substring(v[i].route().indexOf('(') + 1, v[i].route().length() - 1); // e.g. Hansen–Beerbower
                String error = String.format(Locale.ROOT, "%s %.2f (P90 %.2f)", sym[i], v[i].expectedMae(), v[i].expectedP90());
                if (!note.contains(method) || !note.contains(error)) {
                    bad.add(r.get("name") + " " + sym[i] + ": the note does not name its route (" + method + ") and error (" + error + ")");
                }
            }
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
        long inFile = file.stream().filter(e -> !e.get("dD").isEmpty()).count();
        assertEquals(inFile, estimated, "every estimate of the file is in the table under " + LibraryEstimatesTest.HSP_KEY);
        assertTrue(estimated >= 40, "only " + estimated + " estimated sets");
    }

    @Test
    void everyEstimateOfTheFileIsMarkedInTheTable() {
        // Common practice, no source: an estimate is never shown as a published value. Each estimate of the file
        // must sit in the table under the estimate key with the same numbers.
        Map<String, CSVRecord> byCas = new LinkedHashMap<>();
        table.forEach(r -> byCas.put(r.get("cas"), r));
        List<String> bad = new ArrayList<>();
        for (CSVRecord e : file) {
            CSVRecord r = byCas.get(e.get("cas"));
            if (r == null) {
                bad.add(e.get("cas") + ": not in solvents.csv");
            } else if (e.get("dD").isEmpty()) {
                if (!r.get("dD").isEmpty() || !r.get("note").contains("no structure-based estimate")) {
                    bad.add(r.get("name") + ": not estimable, but the table does not say so");
                }
            } else if (!r.get("src_hsp").equals(LibraryEstimatesTest.HSP_KEY)
                    || !(r.get("dD") + r.get("dP") + r.get("dH")).equals(e.get("dD") + e.get("dP") + e.get("dH"))) {
                bad.add(r.get("name") + ": table " + r.get("dD") + "/" + r.get("dP") + "/" + r.get("dH") + " " + r.get("src_hsp"));
            }
        }
        for (CSVRecord r : table) {
            if (r.get("dD").isEmpty() && r.get("smiles").isEmpty() && !r.get("note").contains("no single structure")) {
                bad.add(r.get("name") + ": no Hansen set and no structure, but the note does not say why");
            }
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }

    @Test
    void noPublishedSetWasReplacedByAnEstimate() throws IOException {
        // Alshehri et al., AIChE J. 68 (2022) e17469 (experimental column) and Schrier, Wolfram Data Repository (2020):
        // a solvent either table holds, or that manual.csv gives a recalled or representative set, never carries the
        // estimate key.
        Optional<Path> ref = ReferenceTables.folder();
        assumeTrue(ref.isPresent(), "reference-data folder not found");
        Set<String> published = new HashSet<>();
        for (String name : List.of("alshehri-hansen-solubility-parameters.tsv", "schrier-hansen-solubility-parameters.tsv")) {
            ReferenceTables.tsv(ref.get(), name, true).forEach(row -> published.add(row[0].strip()));
        }
        for (CSVRecord m : csv(MANUAL)) {
            if (!m.get("dD").isBlank() || !m.get("hsp_component").isBlank()) {
                published.add(m.get("cas"));
            }
        }
        List<String> bad = new ArrayList<>();
        for (CSVRecord r : table) {
            if (r.get("src_hsp").equals(LibraryEstimatesTest.HSP_KEY) && published.contains(r.get("cas"))) {
                bad.add(r.get("name") + " (" + r.get("cas") + ") has a published or recalled set, but carries the estimate");
            }
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }
}
