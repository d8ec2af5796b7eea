package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MaterialCommandsTest {

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        List<String> all = new ArrayList<>(List.of("--db", dir.resolve("t.db").toString()));
        all.addAll(List.of(args));
        int code = CohesaCommand.run(all.toArray(String[]::new), new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void materialJsonCarriesTheSphereAndItsSource() throws Exception {
        Run r = run("material", "pvdf", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("poly(vinylidene fluoride)", j.get("name").asText());
        for (String f : List.of("dD", "dP", "dH", "r0")) {
            assertTrue(j.get(f).isNumber(), f);
        }
        assertTrue(j.get("source").asText().startsWith("memory-"));
    }

    @Test
    void searchListsMatchesAndCounts() {
        Run r = run("materials", "resin");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("phenolic resin"));
        assertTrue(r.out().contains("materials;"));
    }

    @Test
    void unknownMaterialIsOneErrorLineWithExitCode2() {
        Run r = run("material", "unobtainium");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("error: NAME 'unobtainium'"), r.err());
        assertEquals(1, r.err().strip().lines().count());
    }

    @Test
    void addedMaterialIsShownAndNegativeParameterRefused() throws Exception {
        Run bad = run("materials", "add", "--name", "x", "--dD", "-1", "--dP", "5", "--dH", "5", "--r0", "5");
        assertEquals(2, bad.code());
        assertTrue(bad.err().startsWith("error: --dD '-1'"), bad.err());
        Run ok = run("materials", "add", "--name", "house binder", "--dD", "18.2", "--dP", "6", "--dH", "5.5", "--r0", "7.5", "--kind", "resin");
        assertEquals(0, ok.code(), ok.err());
        JsonNode j = new ObjectMapper().readTree(run("material", "house binder", "--json").out());
        assertEquals(7.5, j.get("r0").asDouble());
        assertTrue(j.get("user_entry").asBoolean());
        assertTrue(run("materials", "--mine").out().contains("house binder"));
    }
}
