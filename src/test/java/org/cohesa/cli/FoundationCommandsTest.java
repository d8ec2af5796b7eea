package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.cohesa.cli.CliTestSupport.Result;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FoundationCommandsTest {

    @TempDir
    Path dir;

    private Result run(String... args) {
        return CliTestSupport.run(dir.resolve("cohesa.db"), args);
    }

    @Test
    void solventJsonCarriesTheRecordAndItsSources() {
        Result r = run("solvent", "toluene", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        assertEquals("toluene", j.get("name").asText());
        assertEquals("108-88-3", j.get("cas").asText());
        // Alshehri et al. 2022: toluene (18.0, 1.4, 2.0) MPa^½
        assertEquals(18.0, j.get("dD").asDouble(), 1e-9);
        assertEquals(1.4, j.get("dP").asDouble(), 1e-9);
        assertEquals(2.0, j.get("dH").asDouble(), 1e-9);
        assertTrue(j.get("molar_volume").asDouble() > 100);
        assertTrue(j.has("boiling_point_c") && j.has("flash_point_c"));
        JsonNode hsp = j.get("sources").get("hsp");
        assertFalse(hsp.get("key").asText().isBlank());
        assertFalse(hsp.get("citation").isNull(), "the source key must resolve to a citation in SOURCES.md");
    }

    @Test
    void solventByCasAndSynonym() {
        assertEquals("toluene", run("solvent", "108-88-3", "--json").json().get("name").asText());
        assertEquals("ethanol", run("solvent", "EtOH", "--json").json().get("name").asText());
    }

    @Test
    void solventsSearchListsMatchesAsJsonArray() {
        Result r = run("solvents", "tolu", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.json().isArray());
        assertEquals("toluene", r.json().get(0).get("name").asText());
        Result table = run("solvents", "tolu");
        assertTrue(table.out().contains("toluene"), table.out());
    }

    @Test
    void distanceOfABlendWithACommaInAName() {
        Result r = run("distance", "--target", "18,9,8,7", "--blend", "1,4-dioxane:0.3,water:0.7", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        assertTrue(j.has("ra") && j.has("red") && j.has("dD") && j.has("dP") && j.has("dH"));
        assertEquals(j.get("ra").asDouble() / 7.0, j.get("red").asDouble(), 1e-3);
    }

    @Test
    void distanceOfASolventAgreesWithHandCalculation() {
        // Hansen 2007 Ra formula; toluene (18.0, 1.4, 2.0) to target (18, 9, 8): √(0 + 57.76 + 36) = 9.683
        JsonNode j = run("distance", "--target", "18,9,8,7", "--solvent", "toluene", "--json").json();
        assertEquals(9.683, j.get("ra").asDouble(), 1e-3);
        assertEquals(9.683 / 7, j.get("red").asDouble(), 1e-3);
    }

    @Test
    void cohesionFromExplicitValues() {
        // CRC Handbook 95th ed.: toluene ΔHvap(298 K) = 38.01 kJ/mol; Barton 1983: δ ≈ 18.2 MPa^½ (from memory)
        Result r = run("cohesion", "--hvap", "38.01", "--molar-mass", "92.14", "--density", "0.8623", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(18.2, r.json().get("delta").asDouble(), 0.1);
        assertEquals(r.json().get("delta").asDouble() * r.json().get("delta").asDouble(),
                r.json().get("cohesive_energy_density").asDouble(), 0.05);
    }

    @Test
    void badInputGivesOneErrorLineAndExitTwo() {
        Result r = run("solvent", "unobtainium");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().startsWith("error: NAME 'unobtainium': no such solvent in the library"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());

        r = run("distance", "--target", "18,9,x,7", "--solvent", "toluene");
        assertEquals(2, r.exitCode());
        assertEquals("error: --target '18,9,x,7': dH 'x' is not a number", r.err().strip());

        r = run("distance", "--target", "18,9,8,7", "--blend", "toluene:0.5,ethanol:0.4");
        assertEquals(2, r.exitCode());
        assertEquals("error: --blend 'toluene:0.5,ethanol:0.4': fractions must sum to 1, they sum to 0.900000", r.err().strip());

        r = run("cohesion", "--hvap", "abc", "--molar-mass", "92", "--density", "0.86");
        assertEquals(2, r.exitCode());
        assertEquals("error: --hvap 'abc': not a number", r.err().strip());

        r = run("distance", "--solvent", "toluene");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().startsWith("error: --target is required (see cohesa distance --help)"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void userSolventLifecycleAddExportEditImportRemove() throws Exception {
        Result add = run("solvents", "add", "--name", "house thinner 7", "--dD", "16.2", "--dP", "4.1", "--dH", "6.0",
                "--flash-point", "31", "--set", "hazard_statements=H226 H336", "--json");
        assertEquals(0, add.exitCode(), add.err());
        assertTrue(add.json().get("user_entry").asBoolean());

        Path export = dir.resolve("mine.csv");
        assertEquals(0, run("solvents", "export", export.toString(), "--mine").exitCode());
        String csv = Files.readString(export);
        assertTrue(csv.startsWith("name,synonyms,cas,"), csv);
        assertTrue(csv.contains("house thinner 7"), csv);

        assertEquals(0, run("solvents", "remove", "house thinner 7").exitCode());
        Result back = run("solvents", "import", export.toString(), "--json");
        assertEquals(0, back.exitCode(), back.err());
        assertEquals(1, back.json().get("imported").asInt());
        assertEquals(16.2, run("solvent", "house thinner 7", "--json").json().get("dD").asDouble(), 1e-12);

        Result dup = run("solvents", "add", "--name", "Toluene", "--dD", "18", "--dP", "1", "--dH", "2");
        assertEquals(2, dup.exitCode());
        assertTrue(dup.err().startsWith("error: name 'Toluene': already in the library"), dup.err());

        Result bundledRemove = run("solvents", "remove", "toluene");
        assertEquals(2, bundledRemove.exitCode());
    }

    @Test
    void badImportFileListsEveryBadRowAndImportsNothing() throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, "name,dD,dP,dH\nfine one,16,5,7\nbroken,16,x,7\nworse,,5,7\n");
        Result r = run("solvents", "import", f.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().startsWith("error: " + f + ": 2 bad cells, nothing was imported"), r.err());
        assertTrue(r.err().contains("line 3, column dP, value 'x': not a number"), r.err());
        assertTrue(r.err().contains("line 4, column dD/dP/dH"), r.err());
        assertEquals(2, run("solvent", "fine one").exitCode());

        Result missing = run("solvents", "import", dir.resolve("nope.csv").toString());
        assertEquals(2, missing.exitCode());
        assertTrue(missing.err().startsWith("error: FILE '"), missing.err());
    }

    @Test
    void priceIsStoredAndCleared() {
        assertEquals(0, run("solvents", "price", "toluene", "3.20").exitCode());
        assertEquals(3.2, run("solvent", "toluene", "--json").json().get("price_per_litre").asDouble(), 1e-12);
        assertEquals(0, run("solvents", "price", "toluene", "none").exitCode());
        assertTrue(run("solvent", "toluene", "--json").json().get("price_per_litre").isNull());
        assertEquals(2, run("solvents", "price", "toluene", "-1").exitCode());
    }

    @Test
    void everyCommandAnswersHelp() {
        for (String[] cmd : new String[][] {{"solvents", "--help"}, {"solvent", "--help"}, {"distance", "--help"}, {"cohesion", "--help"},
                {"solvents", "import", "--help"}, {"hazards", "--help"}, {"blend", "--help"}, {"dry", "--help"}, {"fit", "--help"},
                {"record", "add", "--help"}, {"bench", "blend", "--help"}}) {
            Result r = run(cmd);
            assertEquals(0, r.exitCode(), String.join(" ", cmd) + ": " + r.err());
            assertTrue(r.out().contains("Usage: cohesa"), String.join(" ", cmd) + ": " + r.out());
        }
    }
}
