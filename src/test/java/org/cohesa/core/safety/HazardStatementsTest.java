package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/** Hazard-statement texts (GHS Rev. 10 Annex 3 / CLP Annex III wording, from memory) and the CMR predicates. */
class HazardStatementsTest {

    @Test
    void textsOfCommonSolventStatements() {
        // GHS Rev. 10 Annex 3 Table A3.1.1 / A3.1.2 (from memory)
        assertEquals("Highly flammable liquid and vapour.", HazardStatements.text("H225").orElseThrow());
        assertEquals("May be fatal if swallowed and enters airways.", HazardStatements.text("H304").orElseThrow());
        assertEquals("Suspected of damaging the unborn child.", HazardStatements.text("H361d").orElseThrow());
        assertEquals("May damage fertility. May damage the unborn child.", HazardStatements.text("H360FD").orElseThrow());
        assertEquals("May form explosive peroxides.", HazardStatements.text("EUH019").orElseThrow());
        assertTrue(HazardStatements.text("H999").isEmpty());
    }

    @Test
    void cmrFamiliesAndCategories() {
        assertTrue(HazardStatements.isCarcinogen("H350i"));
        assertEquals("1", HazardStatements.cmrCategory("H350i"));
        assertTrue(HazardStatements.isCarcinogen("H351"));
        assertEquals("2", HazardStatements.cmrCategory("H351"));
        assertTrue(HazardStatements.isMutagen("H341"));
        assertTrue(HazardStatements.isReproductiveToxicant("H360Df"));
        assertTrue(HazardStatements.isReproductiveToxicant("H361f"));
        assertFalse(HazardStatements.isReproductiveToxicant("H336"));
        assertTrue(HazardStatements.isAspirationHazard("H304"));
    }

    @Test
    void everyStatementInTheBundledTableHasAText() {
        // curation completeness: the output must never show a code without its wording
        List<String> missing = new ArrayList<>();
        for (Solvent s : TestSolvents.bundled().all()) {
            for (String h : s.hazardStatements()) {
                if (HazardStatements.text(h).isEmpty()) {
                    missing.add(s.name() + ": " + h);
                }
            }
        }
        assertTrue(missing.isEmpty(), "codes without text: " + missing);
    }
}
