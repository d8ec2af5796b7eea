package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.cohesa.cli.CliTestSupport.Result;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The record commands end to end through the command line, against a scratch database. */
class RecordCommandsTest {

    @TempDir
    static Path templateDir;
    static Path template;

    @TempDir
    Path dir;
    Path db;

    /** A database holding record 1 (approved, toluene → ethyl acetate/n-butyl acetate) and record 2 (draft, a blend with 1,4-dioxane). */
    @BeforeAll
    static void fileRecords() {
        template = templateDir.resolve("template.db");
        Result r = CliTestSupport.run(template, "record", "add", "--process", "Enamel thinner, line 2 (invented demo)", "--site", "Plant A (fictional)",
                "--replaced", "toluene", "--replacement", "ethyl acetate:0.5,methanol:0.5", "--reason", "regulatory: reprotoxic aromatic",
                "--author", "A. Chemist", "--target", "18,9,8,7", "--json");
        assertEquals(0, r.exitCode(), r.err());
        // three people at their own operating-system accounts (four eyes compares them)
        assertEquals(0, CliTestSupport.runAs("qreviewer", template, "record", "review", "1", "--by", "Q. Reviewer").exitCode());
        assertEquals(0, CliTestSupport.runAs("mmanager", template, "record", "approve", "1", "--by", "M. Manager", "--comment", "lab trials passed")
                .exitCode());
        Result r2 = CliTestSupport.run(template, "record", "add", "--process", "Extraction step 4 (invented)", "--replaced", "1,4-dioxane:0.3,water:0.7",
                "--replacement", "ethanol", "--reason", "safety", "--author", "B. Chemist");
        assertEquals(0, r2.exitCode(), r2.err());
    }

    @BeforeEach
    void copy() throws Exception {
        db = dir.resolve("cohesa.db");
        Files.copy(template, db);
    }

    private Result run(String... args) {
        return CliTestSupport.run(db, args);
    }

    @Test
    void showJsonCarriesIdStatusHistoryAndEvidence() {
        JsonNode j = run("record", "show", "1", "--json").json();
        assertEquals(1, j.get("id").asInt());
        assertEquals("approved", j.get("status").asText());
        assertEquals(3, j.get("history").size());
        assertEquals("M. Manager", j.get("history").get(2).get("by").asText());
        assertEquals("lab trials passed", j.get("history").get(2).get("comment").asText());
        JsonNode ev = j.get("evidence");
        // toluene (18.0, 1.4, 2.0) MPa^½ (Alshehri et al. 2022, via the bundled table); Ra to (18, 9, 8) by Hansen's
        // Ra² = 4ΔδD² + ΔδP² + ΔδH² (Hansen 2007, ch. 1) = 0 + 7.6² + 6.0² = 93.76
        assertEquals(Math.sqrt(93.76), ev.get("replaced").get("ra_to_target").asDouble(), 1e-9);
        assertEquals(Math.sqrt(93.76) / 7, ev.get("replaced").get("red").asDouble(), 1e-9);
        assertEquals("toluene", ev.get("replaced").get("components").get(0).get("name").asText());
        assertEquals(2, ev.get("replacement").get("components").size());
        assertTrue(ev.get("data_sources").size() > 0);
        assertFalse(ev.get("app_version").asText().isBlank());
        // the safety workflow's profile is filed: toluene, flash point 4 °C (IEC 60079-20-1) and boiling point 110.6 °C (CRC)
        // → GHS Rev. 10 Table 2.6.1: flash point < 23 °C and initial boiling point > 35 °C = Category 2; UN packing group II
        JsonNode safety = ev.get("safety").get("replaced");
        assertEquals("Category 2", safety.get("ghs_flammable_category").asText());
        assertEquals("II", safety.get("packing_group").asText());
        assertTrue(safety.get("cmr").toString().contains("H361d"), safety.toString());
        assertTrue(ev.get("safety").get("replacement").has("flash_point_c"), "a blend flash point is filed");
        // the drying workflow's paths are filed for both liquids (25 °C, to 95 % evaporated)
        JsonNode series = ev.get("drying").get("series");
        assertEquals(2, series.size());
        assertEquals("replaced", series.get(0).get("liquid").asText());
        assertEquals("toluene", series.get(0).get("last_solvent").asText());
        // a pure liquid keeps its parameters while it evaporates, so its RED stays that of the can (Hansen 2007 mixing rule)
        for (JsonNode p : series.get(0).get("points")) {
            assertEquals(Math.sqrt(93.76) / 7, p.get(1).asDouble(), 1e-6);
        }
        assertTrue(series.get(1).get("points").size() > 5);
        JsonNode cautions = ev.get("cautions");
        assertTrue(cautions.size() > 1);
        assertTrue(cautions.get(cautions.size() - 1).asText().contains("screening estimates"), cautions.toString());
    }

    @Test
    void aLibraryMaterialBecomesTheTargetWithItsSource() {
        JsonNode material = run("materials", "--json").json().get(0);
        String name = material.get("name").asText();
        Result r = run("record", "add", "--process", "p (invented)", "--replaced", "toluene", "--replacement", "ethyl acetate",
                "--reason", "supply", "--author", "A", "--material", name, "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode t = r.json().get("evidence").get("target");
        assertEquals(name, t.get("label").asText());
        assertEquals(material.get("dD").asDouble(), t.get("dD").asDouble(), 1e-9);
        assertEquals(material.get("r0").asDouble(), t.get("r0").asDouble(), 1e-9);
        assertTrue(t.get("source").asText().startsWith(material.get("source").asText()), t.toString());
        assertTrue(r.json().get("evidence").get("replaced").has("red"));
        Result unknown = run("record", "add", "--process", "p", "--replaced", "toluene", "--replacement", "ethanol",
                "--reason", "r", "--author", "a", "--material", "no such polymer");
        assertEquals(2, unknown.exitCode());
        assertTrue(unknown.err().startsWith("error: --material"), unknown.err());
    }

    @Test
    void listShowsBothRecords() {
        JsonNode j = run("record", "list", "--json").json();
        assertEquals(2, j.size());
        assertEquals("draft", j.get(1).get("status").asText());
        Result table = run("record", "list");
        assertTrue(table.out().contains("approved") && table.out().contains("draft"), table.out());
    }

    @Test
    void badInputGetsOneErrorLineAndChangesNothing() {
        String before = run("record", "verify", "--json").json().get("head_hash").asText();
        String[][] bad = {
                {"record", "approve", "2", "--by", "M. Manager", "--comment", "skip review"},   // draft cannot be approved
                {"record", "reject", "1", "--by", "M. Manager", "--comment", "changed my mind"}, // approved is final
                {"record", "review", "99", "--by", "Q. Reviewer"},                              // unknown record
                {"record", "show", "abc"},                                                      // not a number
                {"record", "approve", "2", "--by", "M. Manager", "--comment", " "},             // empty comment
                {"record", "add", "--process", "p", "--replaced", "no-such-liquid", "--replacement", "ethanol", "--reason", "r", "--author", "a"},
                {"record", "add", "--process", "p", "--replaced", "toluene", "--replacement", "ethanol:0.5,water:0.4", "--reason", "r", "--author", "a"},
                {"record", "add", "--process", " ", "--replaced", "toluene", "--replacement", "ethanol", "--reason", "r", "--author", "a"},
                {"record", "add", "--process", "p", "--replaced", "toluene", "--replacement", "ethanol", "--reason", "r", "--author", "a", "--target", "18,9,8"},
        };
        for (String[] args : bad) {
            Result r = run(args);
            assertEquals(2, r.exitCode(), String.join(" ", args) + "\n" + r.out() + r.err());
            assertTrue(r.err().startsWith("error: "), r.err());
            assertEquals(1, r.err().strip().lines().count(), r.err());
            assertFalse(r.err().contains("Exception"), r.err());
        }
        assertTrue(run("record", "approve", "2", "--by", "M", "--comment", "x").err().contains("draft"));
        JsonNode after = run("record", "verify", "--json").json();
        assertEquals(before, after.get("head_hash").asText(), "nothing was written");
        assertEquals(4, after.get("events").asInt());
    }

    @Test
    void verifyPassesThenNamesTheRecordEditedOutsideTheApp() throws Exception {
        Result ok = run("record", "verify");
        assertEquals(0, ok.exitCode(), ok.err());
        assertTrue(ok.out().contains("intact"), ok.out());
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            st.execute("DROP TRIGGER record_event_append_only_update");
            st.execute("UPDATE record_event SET payload = replace(payload, 'regulatory', 'cost') WHERE record_id = 1 AND seq = 1");
        }
        Result broken = run("record", "verify", "--json");
        assertEquals(1, broken.exitCode());
        JsonNode j = broken.json();
        assertFalse(j.get("intact").asBoolean());
        assertEquals(1, j.get("first_record").asInt());
        assertEquals("altered", j.get("problems").get(0).get("kind").asText());
        assertFalse(j.get("append_only_guards").asBoolean());
        assertTrue(run("record", "verify").out().contains("record 1 altered"));
    }

    @Test
    void pdfReportHoldsTheKeyFacts() throws Exception {
        Path pdf = dir.resolve("record-1.pdf");
        Result r = run("record", "export", "1", "--pdf", pdf.toString());
        assertEquals(0, r.exitCode(), r.err());
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            // the report proper on one or two pages, then the appendix with every data source in full
            assertTrue(doc.getNumberOfPages() <= 4, doc.getNumberOfPages() + " pages");
            assertTrue(new PDFTextStripper().getText(doc).contains("Appendix: data sources in full"));
            String text = new PDFTextStripper().getText(doc);
            for (String fact : List.of("Record No. 1", "APPROVED", "Enamel thinner, line 2", "toluene", "ethyl acetate", "methanol",
                    "regulatory: reprotoxic aromatic", "M. Manager", "lab trials passed", "Q. Reviewer", "A. Chemist",
                    "1.38", // RED of toluene to (18, 9, 8, 7): √93.76 / 7 = 1.383 (Hansen 2007 Ra formula, see showJson test)
                    "H225", "Ontario", "Category 2", "screening estimates", "Data sources", "Status history", "Drying path", "last to evaporate")) {
                assertTrue(text.contains(fact), "missing '" + fact + "' in\n" + text);
            }
            assertTrue(text.contains("δD") || text.contains("dD"), "the parameter names print");
        }
    }

    @Test
    void csvRegisterHasOneRowPerRecordWithQuotedCommas() throws Exception {
        Path csv = dir.resolve("register.csv");
        assertEquals(0, run("record", "export", "--csv", csv.toString()).exitCode());
        try (Reader in = Files.newBufferedReader(csv);
             CSVParser p = CSVParser.builder().setReader(in).setFormat(CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()).get()) {
            List<CSVRecord> rows = p.getRecords();
            assertEquals(2, rows.size());
            assertEquals("approved", rows.get(0).get("status"));
            assertEquals("M. Manager", rows.get(0).get("decided_by"));
            assertEquals("1,4-dioxane:0.3,water:0.7", rows.get(1).get("replaced"), "a name with commas survives as one quoted field");
            assertEquals("", rows.get(1).get("red_replaced"), "no target, no RED");
            assertTrue(run("record", "show", "2", "--json").json().get("evidence").get("drying").get("note").asText().contains("no target"));
        }
    }

    @Test
    void backupWritesAVerifiedCopyAndRefusesToOverwrite() {
        Path copy = dir.resolve("copy.db");
        Result r = run("backup", copy.toString(), "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.json().get("chain_intact").asBoolean());
        assertEquals(4, r.json().get("record_events").asInt());
        assertEquals(2, r.json().get("records").asInt());
        assertEquals(copy.toString(), r.json().get("file").asText());
        assertTrue(r.json().get("head_hash").asText().matches("[0-9a-f]{64}"), r.out());
        assertEquals(List.of("file", "record_events", "records", "chain_intact", "head_hash"), iterableNames(r.json()), "the result record's fields");
        Result again = run("backup", copy.toString());
        assertEquals(2, again.exitCode());
        assertTrue(again.err().startsWith("error: FILE"), again.err());
        assertEquals("approved", CliTestSupport.run(copy, "record", "show", "1", "--json").json().get("status").asText());
    }

    private static List<String> iterableNames(com.fasterxml.jackson.databind.JsonNode node) {
        List<String> names = new java.util.ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
