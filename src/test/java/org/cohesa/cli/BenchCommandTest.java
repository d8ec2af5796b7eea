package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The benchmark command runs and reports its statistics (no timing is asserted: speed lives in docs/performance.md). */
class BenchCommandTest {

    @TempDir
    Path dir;

    @Test
    void fitBenchmarkReportsMedianOfItsRuns() throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CohesaCommand.run(new String[] {"--db", dir.resolve("t.db").toString(), "bench", "fit", "--runs", "3",
                "--resamples", "5", "--results", "30", "--json"}, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertEquals("fit", j.get("benchmark").asText());
        assertEquals(3, j.get("runs").asInt());
        assertTrue(j.get("min_s").asDouble() <= j.get("median_s").asDouble());
        assertTrue(j.get("median_s").asDouble() <= j.get("max_s").asDouble());
    }

    @Test
    void fitBenchmarkTimesTheStructurePriorToo() throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        // aspirin (PubChem CID 2244, SMILES from memory)
        int code = CohesaCommand.run(new String[] {"--db", dir.resolve("t.db").toString(), "bench", "fit", "--runs", "2",
                "--results", "30", "--prior-smiles", "CC(=O)Oc1ccccc1C(=O)O", "--json"}, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        assertEquals("likelihood with structure prior", new ObjectMapper().readTree(out.toString()).get("method").asText());
    }

    @Test
    void badRunCountIsRefused() {
        StringWriter err = new StringWriter();
        int code = CohesaCommand.run(new String[] {"--db", dir.resolve("t.db").toString(), "bench", "fit", "--runs", "0"},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(2, code);
        assertTrue(err.toString().startsWith("error: --runs '0'"), err.toString());
    }

    @Test
    void fitChecksRefuseAListOfLiquidsTheSeriesCannotBeDrawnFrom() throws Exception {
        Path shortList = dir.resolve("short.txt");
        java.nio.file.Files.writeString(shortList, "# our shelf\nacetone\nwater\n");
        StringWriter err = new StringWriter();
        int code = CohesaCommand.run(new String[] {"--db", dir.resolve("t.db").toString(), "bench", "fit-checks", "--liquids", shortList.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(2, code);
        assertTrue(err.toString().startsWith("error: --liquids '" + shortList + "': lists 2 different liquids"), err.toString());

        Path unknown = dir.resolve("unknown.txt");
        java.nio.file.Files.writeString(unknown, "acetone\nnot-a-liquid\n");
        err = new StringWriter();
        code = CohesaCommand.run(new String[] {"--db", dir.resolve("t.db").toString(), "bench", "fit-checks", "--liquids", unknown.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(2, code);
        assertTrue(err.toString().startsWith("error: --liquids 'not-a-liquid': no such solvent"), err.toString());
    }

    @Test
    void fitChecksLimitsReportEachVariantPerScenarioAndSphere() throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CohesaCommand.run(new String[] {"--db", dir.resolve("t.db").toString(), "bench", "fit-checks", "--limits", "--trials", "5",
                "--json"}, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertEquals("fit-checks --limits", j.get("benchmark").asText());
        assertEquals(5, j.get("scenarios").size(), "15, 20, 30 clean, 30 with two flips, 30 with two flips and two scored 0.5");
        assertEquals(2, j.get("scenarios").get(4).get("scored_half").asInt());
        JsonNode thirty = j.get("scenarios").get(2);
        assertEquals(30, thirty.get("liquids").asInt());
        assertEquals(23, thirty.get("lines").size(), "8 diagnostics and 15 estimators tried against the fit (FitLimits)");
        assertEquals(0, thirty.get("lines").get(0).get("pairedMeanDifference").asDouble(), 1e-12, "the program's fit against itself");
        assertEquals(5, thirty.get("per_sphere").size(), "the five spheres of issue 14");
        assertEquals(0, thirty.get("fit_worse_than_truth").asInt());
        assertTrue(j.get("library_spheres").asInt() > 20, "the published non-drug spheres of the bundled table");
    }
}
