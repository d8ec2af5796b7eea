package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.cli.CliTestSupport.Result;
import org.cohesa.core.coverage.Provenance;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code solvents --coverage} and the basis column of {@code solvent NAME}, checked against the bundled file
 * {@code solvent-db/solvents.csv} read independently here, with the source-key rules of {@code solvent-db/SOURCES.md}
 * ({@code memory-…} = recalled, {@code estimate-…} = estimated).
 */
class CoverageCommandTest {

    @TempDir
    static Path dir;
    private static List<Map<String, String>> rows;
    private static JsonNode coverage;

    @BeforeAll
    static void read() throws IOException {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();
        rows = new ArrayList<>();
        try (Reader in = Files.newBufferedReader(Path.of("solvent-db", "solvents.csv"), StandardCharsets.UTF_8);
                CSVParser p = CSVParser.builder().setReader(in).setFormat(format).get()) {
            for (CSVRecord r : p) {
                rows.add(r.toMap());
            }
        }
        Result r = CliTestSupport.run(dir.resolve("c.db"), "solvents", "--coverage", "--json");
        assertEquals(0, r.exitCode(), r.err());
        coverage = r.json();
    }

    private static JsonNode property(String key) {
        for (JsonNode p : coverage.get("properties")) {
            if (p.get("property").asText().equals(key)) {
                return p;
            }
        }
        throw new AssertionError("no property " + key);
    }

    private static long count(java.util.function.Predicate<Map<String, String>> test) {
        return rows.stream().filter(test).count();
    }

    @Test
    void countsEqualTheBundledFile() {
        assertEquals(rows.size(), coverage.get("solvents").asInt());
        for (String[] g : new String[][] {{"hsp", "dD"}, {"vapour_pressure", "vp_equation"}, {"flash_point", "flash_point_c"},
                {"boiling_point", "boiling_point_c"}, {"hazard_statements", "hazard_statements"}, {"density", "density"}}) {
            JsonNode p = property(g[0]);
            String src = "src_" + g[0];
            assertEquals(count(r -> !r.get(g[1]).isEmpty()), p.get("have").asLong(), g[0]);
            assertEquals(count(r -> !r.get(g[1]).isEmpty() && r.get(src).startsWith("memory-")), p.get("from_memory").asLong(), g[0]);
            assertEquals(count(r -> !r.get(g[1]).isEmpty() && r.get(src).startsWith("estimate-")), p.get("estimated").asLong(), g[0]);
            int sum = 0;
            for (String f : List.of("measured", "estimated", "from_memory", "derived", "your_entries", "unsourced")) {
                sum += p.get(f).asInt();
            }
            assertEquals(p.get("have").asInt(), sum, g[0] + ": the provenance counts add up to the count");
            assertEquals(0, p.get("unsourced").asInt(), g[0] + ": every bundled value has a source");
        }
    }

    @Test
    void workflowReadinessCountsTheHansenSolvents() {
        JsonNode w = coverage.get("workflows");
        long hansen = count(r -> !r.get("dD").isEmpty());
        assertEquals(hansen, w.get("hansen_solvents").asLong());
        // drying needs a vapour pressure (stored, or Tb with ΔHvap), a molar mass and a molar volume, and a liquid below
        // its boiling point at 25 °C
        long canDry = count(r -> !r.get("dD").isEmpty() && (!r.get("vp_equation").isEmpty()
                || (!r.get("boiling_point_c").isEmpty() && !r.get("hvap_kj_mol").isEmpty()))
                && !r.get("molar_mass").isEmpty() && !r.get("molar_volume").isEmpty()
                && (r.get("boiling_point_c").isEmpty() || Double.parseDouble(r.get("boiling_point_c")) > 25));
        assertEquals(canDry, w.get("drying_computable").asLong(), w.get("not_drying").toString());
        assertEquals(hansen - canDry, w.get("not_drying").size());
        assertEquals(w.get("drying_computable").asDouble() / hansen, w.get("drying_fraction").asDouble(), 1e-3);
        double vp = coverage.get("vapour_pressure_at_25c").get("correlation").asDouble();
        assertTrue(vp > 100, "most vapour pressures at 25 °C come from a correlation inside its range: " + vp);
    }

    @Test
    void theTableSaysWhatTheValuesRestOn() {
        Result r = CliTestSupport.run(dir.resolve("c.db"), "solvents", "--coverage");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("measured") && r.out().contains("from memory") && r.out().contains("estimated"), r.out());
        assertTrue(r.out().contains("solvents with Hansen parameters: drying path computable for"), r.out());
    }

    @Test
    void oneSolventShowsForEachValueWhetherMeasuredEstimatedOrRecalled() {
        // tert-butyl acetate: Hansen parameters from Alshehri et al. 2022 (measured), vapour pressure estimated from Tb and
        // the CRC ΔHvap (no published correlation passes the boiling-point check), GHS statements checked against its CLP
        // Annex VI entry 607-026-00-7 (solvent-db/SOURCES.md, clp-annex-vi-checked)
        JsonNode j = CliTestSupport.run(dir.resolve("c.db"), "solvent", "tert-butyl acetate", "--json").json();
        JsonNode src = j.get("sources");
        assertEquals(Provenance.of(src.get("hsp").get("key").asText(), false).label(), src.get("hsp").get("basis").asText());
        assertEquals("estimated", src.get("vapour_pressure").get("basis").asText());
        assertEquals("measured", src.get("hazard_statements").get("basis").asText());
        assertEquals("clp-annex-vi-checked", src.get("hazard_statements").get("key").asText());
        // a solvent whose GHS statements are a supplier self-classification recalled from memory (key memory-…, SOURCES.md)
        // says so; taken from the table, since such lists are being checked one by one (tetrahydropyran was the example)
        String recalled = rows.stream().filter(x -> x.get("src_hazard_statements").startsWith("memory-")).map(x -> x.get("name"))
                .findFirst().orElseThrow();
        JsonNode mem = CliTestSupport.run(dir.resolve("c.db"), "solvent", recalled, "--json").json().get("sources");
        assertEquals("from memory", mem.get("hazard_statements").get("basis").asText(), recalled);
        assertEquals("estimate", j.get("vapour_pressure_at_25c").get("kind").asText());
        // N-methyl-2-pyrrolidone: the Landolt–Börnstein Antoine set starts at 336 K, so 25 °C is an extrapolation, said so
        Result nmp = CliTestSupport.run(dir.resolve("c.db"), "solvent", "NMP");
        assertEquals(0, nmp.exitCode(), nmp.err());
        assertTrue(nmp.out().contains("vapour pressure at 25 °C") && nmp.out().contains("extrapolated below its range"), nmp.out());
        assertTrue(nmp.out().contains("basis"), nmp.out());
    }
}
