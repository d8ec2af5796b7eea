package org.cohesa.core.solvent;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.HansenParameters;
import org.junit.jupiter.api.Test;

class SolventLibraryTest {

    static Solvent solvent(String name, String cas, List<String> synonyms, double dD, double dP, double dH) {
        return new Solvent(name, synonyms, cas, null, null, null, null, null, null, null, HansenParameters.of(dD, dP, dH), null, null,
                null, null, null, null, List.of(), false, null, null, null, null, null, false);
    }

    // Hansen parameters from Alshehri et al. 2022 / Hansen 2007 (dioxane, from memory); only identity matters here
    private final SolventLibrary lib = new SolventLibrary(List.of(
            solvent("1,4-dioxane", "123-91-1", List.of("dioxane"), 17.5, 1.8, 9.0),
            solvent("1,3-dioxolane", "646-06-0", List.of("dioxolane"), 18.1, 6.6, 9.3),
            solvent("water", "7732-18-5", List.of(), 15.5, 16.0, 42.3),
            solvent("o-xylene", "95-47-6", List.of("xylene"), 17.8, 1.0, 3.1),
            solvent("p-xylene", "106-42-3", List.of("xylene"), 17.8, 1.0, 3.1),
            solvent("n-butyl acetate", "123-86-4", List.of("BuAc", "butyl acetate"), 15.8, 3.7, 6.3)));

    @Test
    void resolvesNameSynonymAndCasCaseInsensitively() {
        assertEquals("1,4-dioxane", lib.resolve("x", "1,4-Dioxane").name());
        assertEquals("1,4-dioxane", lib.resolve("x", "123-91-1").name());
        assertEquals("n-butyl acetate", lib.resolve("x", "buac").name());
        assertEquals("n-butyl acetate", lib.resolve("x", "  n-butyl   acetate ").name());
    }

    @Test
    void ambiguousNameListsTheCandidates() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> lib.resolve("--solvent", "xylene"));
        assertEquals("--solvent 'xylene': matches several solvents: o-xylene, p-xylene; use the full name or the CAS number", e.getMessage());
    }

    @Test
    void unknownNameSuggestsNearNames() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> lib.resolve("--solvent", "1,4-dioxan"));
        assertTrue(e.getMessage().startsWith("--solvent '1,4-dioxan': no such solvent in the library (did you mean 1,4-dioxane"), e.getMessage());
    }

    @Test
    void listOptionsResolveNamesContainingCommas() {
        List<Solvent> got = lib.resolveList("--exclude", List.of("1,4-dioxane,water", "1,3-dioxolane"));
        assertEquals(List.of("1,4-dioxane", "water", "1,3-dioxolane"), got.stream().map(Solvent::name).toList());
    }

    @Test
    void blendNotationResolvesToABlend() {
        Blend b = lib.resolveBlend("--blend", "1,4-dioxane:0.3,water:0.7");
        assertEquals(2, b.size());
        assertEquals(0.3 * 17.5 + 0.7 * 15.5, b.hansen().dD(), 1e-12);
        assertEquals("1,4-dioxane:0.3,water:0.7", b.describe());
        assertThrows(InvalidInputException.class, () -> lib.resolveBlend("--blend", "water:0.5,H2O-free:0.5"));
        assertThrows(InvalidInputException.class, () -> lib.resolveBlend("--blend", "water:0.5,7732-18-5:0.5"));
    }
}
