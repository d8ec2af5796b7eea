package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.records.DryingEvidence;
import org.cohesa.core.records.Evidence;
import org.cohesa.core.records.EvidenceAssembler;
import org.cohesa.core.records.TargetRef;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Issue 18, "Evidence that agrees with itself": both drying paths filed, one flash point everywhere. */
class EvidenceAgreementTest {

    @TempDir
    Path dir;

    @Test
    void bothLiquidsDryingPathsAndOneFlashPointAreFiled() {
        try (Database db = Database.open(dir.resolve("cohesa.db"))) {
            SolventLibrary lib = new SolventRepository(db).library();
            Blend from = lib.resolveBlend("--replaced", "xylene:1");
            Blend to = lib.resolveBlend("--replacement", "n-butyl acetate:0.6,ethyl acetate:0.4");
            Evidence ev = EvidenceAssembler.assemble(from, to, new TargetRef("invented test sphere", SolubilitySphere.of(18, 9, 8, 7), "invented"),
                    SourceCatalog.bundled().all(), "test");
            JsonNode series = ev.section(Evidence.Sections.DRYING).orElseThrow().get("series");
            assertEquals(2, series.size(), "the replaced liquid's and the replacement's path");
            for (JsonNode s : series) {
                assertTrue(s.get("points").size() > 5, s.toString());
            }
            JsonNode liquid = ev.section(Evidence.Sections.REPLACEMENT).orElseThrow();
            JsonNode safety = ev.section(Evidence.Sections.SAFETY).orElseThrow().get(Evidence.Sections.REPLACEMENT);
            assertTrue(safety.get("flash_point_c").isNumber(), "the blend's flash point is estimated (Liaw 2002)");
            assertEquals(safety.get("flash_point_c").decimalValue(), liquid.get("flash_point_c").decimalValue(), "one value in both sections");
            assertTrue(liquid.get("flash_point_basis").asText().startsWith("computed"), liquid.toString());
            String fp = String.valueOf(Math.round(safety.get("flash_point_c").doubleValue()));
            assertTrue(ev.section(Evidence.Sections.CAUTIONS).orElseThrow().toString().contains("flash point " + fp + " °C"),
                    "and the same in the cautions");
        }
    }

    @Test
    void aLiquidThatCannotBeDriedLeavesANoteAndTheOtherPathStays() {
        JsonNode s = DryingEvidence.section(null, null, "no vapour pressure for X", "no vapour pressure for Y", "x:1", "y:1", 25);
        assertEquals("no drying path: no vapour pressure for X", s.get("series").get(0).get("note").asText());
        assertEquals(0, s.get("series").get(0).get("points").size());
    }
}
