package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.Set;
import java.util.stream.Collectors;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.activity.WaterSolubility;
import org.junit.jupiter.api.Test;

class WaterMiscibilityCsvTest {

    private static final String HEADER = String.join(",", WaterMiscibilityCsv.COLUMNS) + "\n";

    @Test
    void bundledTableReadsAndNamesLibrarySolvents() {
        var table = WaterMiscibilityCsv.bundled();
        assertTrue(table.rows().size() >= 100, "rows " + table.rows().size());
        Set<String> cas = BundledLiquids.library().all().stream().map(s -> s.cas()).collect(Collectors.toSet());
        for (WaterSolubility r : table.rows()) {
            assertTrue(cas.contains(r.cas()), r.name() + " " + r.cas() + " is not in the solvent table");
            assertTrue(BundledLiquids.library().resolve("test", r.name()).cas().equals(r.cas()), r.name());
            assertTrue(!r.source().isBlank() && !r.basis().isBlank(), r.name());
        }
    }

    @Test
    void everyBadCellIsListed() {
        String csv = HEADER
                + "toluene,108-88-3,partial,abc,0.03,25,,,iupac-sds-81,from memory,\n"
                + "acetone,67-64-1,sometimes,,,25,,,crc,from memory,\n"
                + "ethanol,64-17-5,miscible,,,25,,,,from memory,\n"
                + "hexane,110-54-3,partial,60,50,25,,,x,from memory,\n";
        BadRowsException e = assertThrows(BadRowsException.class, () -> WaterMiscibilityCsv.read("w.csv", new StringReader(csv)));
        assertEquals(4, e.errors().size(), e.getMessage());
    }
}
