package org.cohesa.core.solvent;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.hsp.HansenParameters;
import org.junit.jupiter.api.Test;

/** The library at a process temperature: every solvent shifted by the same Hansen–Beerbower rule as one solvent. */
class LibraryAtTemperatureTest {

    private static Solvent liquid(String name, double dD, double dP, double dH, double tb) {
        return new Solvent(name, List.of(), null, null, null, null, List.of(), 100.0, 0.9, 100.0, HansenParameters.of(dD, dP, dH), tb,
                null, null, null, null, null, List.of(), false, null, null, null, java.util.Map.of(), null, false);
    }

    @Test
    void atTwentyFiveDegreesTheLibraryIsUsedAsStored() {
        SolventLibrary lib = new SolventLibrary(List.of(liquid("a", 16, 8, 6, 120)));
        LibraryAtTemperature at = LibraryAtTemperature.of(lib, 298.15);
        assertSame(lib, at.library());
        assertFalse(at.shifted());
        assertNull(at.describe());
    }

    @Test
    void eachSolventTakesTheSameShiftAsOnItsOwnAndHeatLowersEveryComponent() {
        // δ falls with temperature as the liquid expands (Hansen, Hansen Solubility Parameters: A User's Handbook,
        // 2nd ed. (2007), ch. 1: dδD/dT = −1.25 α δD, dδP/dT = −0.5 α δP, dδH/dT = −(1.22e-3 + 0.5 α) δH)
        Solvent a = liquid("a", 16, 8, 6, 120);
        Solvent b = liquid("b", 18, 3, 10, 180);
        LibraryAtTemperature at = LibraryAtTemperature.of(new SolventLibrary(List.of(a, b)), 348.15);
        assertTrue(at.shifted());
        for (Solvent s : List.of(a, b)) {
            HansenParameters want = HansenAtTemperature.at(s, 348.15);
            HansenParameters got = at.library().resolve("name", s.name()).hansen();
            assertEquals(want, got);
            assertTrue(got.dD() < s.hansen().dD() && got.dP() < s.hansen().dP() && got.dH() < s.hansen().dH());
        }
        assertTrue(at.describe().contains("75 °C") && at.describe().contains("taken as measured"), at.describe());
    }
}
