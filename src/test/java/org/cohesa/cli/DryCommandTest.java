package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.cohesa.cli.CliTestSupport.Result;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DryCommandTest {

    @TempDir
    Path dir;

    private Result run(String... args) {
        return CliTestSupport.run(dir.resolve("cohesa.db"), args);
    }

    @Test
    void jsonCarriesThePathAndWhereItLeavesTheSphere() {
        // invented demo sphere; acetone flashes off and leaves n-butyl acetate (common practice, no source)
        Result r = run("dry", "--blend", "acetone:0.3,n-butyl acetate:0.7", "--target", "18.6,10.5,7.5,8.6", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        JsonNode path = j.get("path");
        assertTrue(path.size() >= 20);
        double prev = -1;
        for (JsonNode p : path) {
            double e = p.get("evaporated").asDouble();
            assertTrue(e >= prev);
            prev = e;
            assertTrue(p.get("composition").has("acetone") && p.has("time") && p.has("dD") && p.has("dP") && p.has("dH") && p.has("red"));
        }
        assertEquals(0.95, path.get(path.size() - 1).get("evaporated").asDouble(), 1e-6);
        double leaves = j.get("leaves_sphere_at").asDouble();
        assertTrue(leaves > 0.2 && leaves < 0.5, "leaves at " + leaves);
        assertEquals("n-butyl acetate", j.get("last_solvent").asText());
        assertEquals("UNIFAC (original)", j.get("model").asText());
        assertTrue(j.get("tail_suggestions").size() > 0);
        assertTrue(j.get("cautions").toString().contains("screening estimates"));
    }

    @Test
    void materialTargetAndTableOutput() {
        Result r = run("dry", "--blend", "ethanol:0.5,water:0.5", "--material", "nitrocellulose", "--until", "70%", "--ideal");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("activity model: ideal"), r.out());
        assertTrue(r.out().contains("left last: water"), r.out());
        assertTrue(r.out().lines().anyMatch(l -> l.strip().startsWith("70.0 ")), r.out());
        assertTrue(r.out().contains("evaporated %") && r.out().contains("δD MPa½"), "units in the table header: " + r.out());
        Result noTarget = run("dry", "--blend", "toluene:1", "--json");
        assertEquals(0, noTarget.exitCode(), noTarget.err());
        assertTrue(noTarget.json().get("leaves_sphere_at").isNull());
    }

    @Test
    void badInputIsOneErrorLineWithExitCode2() {
        for (String[] args : new String[][] {
                {"dry", "--blend", "acetone:0.5,toluene:0.5", "--until", "1.2"},
                {"dry", "--blend", "acetone:0.5,toluene:0.5", "--temperature", "hot"},
                {"dry", "--blend", "acetone:0.5,toluene:0.5", "--temperature", "90"},
                {"dry", "--blend", "acetone:0.5,nonesuch:0.5"},
                {"dry", "--blend", "acetone:0.5,toluene:0.5", "--target", "18,5,5"},
                {"dry", "--blend", "acetone:0.5,toluene:0.5", "--material", "no such material"}}) {
            Result r = run(args);
            assertEquals(2, r.exitCode(), String.join(" ", args) + " -> " + r.err());
            assertTrue(r.err().startsWith("error: "), r.err());
            assertEquals(1, r.err().strip().lines().count(), r.err());
        }
    }

    @Test
    void benchDryReportsAMedian() {
        Result r = run("bench", "dry", "--runs", "3", "--warmup", "1", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        assertEquals(4, j.get("components").asInt());
        assertTrue(j.get("median_s").asDouble() >= 0 && j.get("median_ms").asDouble() > 0);
        assertEquals(2, run("bench", "dry", "--runs", "zero").exitCode());
    }
}
