package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.cohesa.core.safety.Cautions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code cohesa hazards} end to end on the bundled library. */
class HazardsCommandTest {

    @TempDir
    Path dir;

    private CliTestSupport.Result run(String... args) {
        return CliTestSupport.run(dir.resolve("t.db"), args);
    }

    @Test
    void jsonCarriesTheAgreedFieldsForAPureSolvent() {
        CliTestSupport.Result r = run("hazards", "--solvent", "toluene", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        for (String f : new String[] {"flash_point_c", "ghs_flammable_category", "packing_group", "hazard_statements", "cmr", "exposure_index",
                "vapour_hazard_ratio", "ich_q3c", "guide_rank", "cautions", "flash_point_model"}) {
            assertTrue(j.has(f), "missing field " + f);
        }
        // toluene: flash point 4 °C (IEC 60079-20-1), bp 110.6 °C → GHS Category 2, PG II (GHS Table 2.6.1; UN 2.3.2.6)
        assertEquals(4.0, j.get("flash_point_c").asDouble(), 1e-9);
        assertEquals(2, j.get("ghs_flammable_category").asInt());
        assertEquals("II", j.get("packing_group").asText());
        // ICH Q3C(R8) Table 2: toluene Class 2, PDE 8.9 mg/day, 890 ppm (from memory)
        JsonNode ich = j.get("ich_q3c").get(0);
        assertEquals(2, ich.get("class").asInt());
        assertEquals(8.9, ich.get("pde_mg_per_day").asDouble(), 1e-9);
        assertEquals(890, ich.get("limit_ppm").asDouble(), 1e-9);
        assertEquals("problematic", j.get("guide_rank").asText());
        // toluene carries H361d (CLP Annex VI): a reproductive-toxicant entry
        assertEquals("reproductive toxicant", j.get("cmr").get(0).get("effect").asText());
        // saturated toluene vapour at 25 °C ≈ 37,400 ppm (CRC: 3.79 kPa, from memory) over the Ontario TWA of 20 ppm ≈ 1870
        assertEquals(1870, j.get("vapour_hazard_ratio").asDouble(), 40);
        JsonNode cautions = j.get("cautions");
        assertEquals(Cautions.REMINDER, cautions.get(cautions.size() - 1).asText());
    }

    @Test
    void readableOutputByDefault() {
        CliTestSupport.Result r = run("hazards", "--solvent", "dichloromethane");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("H351"), r.out());
        assertTrue(r.out().contains("Cautions:"));
        assertTrue(r.out().contains("screening estimates"));
        assertFalse(r.out().contains("{"), "no JSON without --json");
    }

    @Test
    void helpDescribesTheCommand() {
        CliTestSupport.Result r = run("hazards", "--help");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("--blend") && r.out().contains("screening estimates"), r.out());
        assertFalse(r.err().contains("WARN"), r.err());
    }

    @Test
    void benchmarkRunsAndReportsItsMedian() {
        CliTestSupport.Result r = run("bench", "hazards", "--runs", "3", "--warmup", "0", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(3, r.json().get("runs").asInt());
        assertTrue(r.json().get("median_ms").asDouble() > 0);
        assertEquals(2, run("bench", "hazards", "--runs", "0").exitCode());
    }

    @Test
    void badInputIsOneErrorLineAndExitCode2() {
        CliTestSupport.Result unknown = run("hazards", "--solvent", "unobtainium");
        assertEquals(2, unknown.exitCode());
        assertTrue(unknown.err().startsWith("error:") && unknown.err().contains("unobtainium"), unknown.err());
        CliTestSupport.Result badT = run("hazards", "--solvent", "toluene", "--temperature", "warm");
        assertEquals(2, badT.exitCode());
        assertTrue(badT.err().startsWith("error:") && badT.err().contains("warm"), badT.err());
        CliTestSupport.Result hot = run("hazards", "--solvent", "toluene", "--temperature", "900");
        assertEquals(2, hot.exitCode());
        assertTrue(hot.err().startsWith("error: --temperature '900'"), hot.err());
        CliTestSupport.Result both = run("hazards", "--solvent", "toluene", "--blend", "toluene:1");
        assertEquals(2, both.exitCode());
        CliTestSupport.Result sum = run("hazards", "--blend", "toluene:0.5,ethanol:0.2");
        assertEquals(2, sum.exitCode());
        assertTrue(sum.err().startsWith("error: --blend"), sum.err());
        assertFalse(sum.err().contains("Exception"), sum.err());
    }
}
