package org.cohesa.core.coverage;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The source-key naming rules of solvent-db/SOURCES.md (common practice of this project, no outside source). */
class ProvenanceTest {

    @Test
    void keysSayWhatAValueRestsOn() {
        assertEquals(Provenance.RECALLED, Provenance.of("memory-ghs-clp", false));
        assertEquals(Provenance.ESTIMATED, Provenance.of("estimate-clapeyron-crc-hvap", false));
        assertEquals(Provenance.DERIVED, Provenance.of("computed", false));
        assertEquals(Provenance.DERIVED, Provenance.of("unifac-manual", false));
        assertEquals(Provenance.MEASURED, Provenance.of("vdi-2010-wagner", false));
        assertEquals(Provenance.USER, Provenance.of(null, true));
        assertEquals(Provenance.UNSOURCED, Provenance.of(" ", false));
    }
}
