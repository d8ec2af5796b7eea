package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.store.BundledData;
import org.cohesa.store.SolventCsv;
import org.junit.jupiter.api.Test;

/** Process-suitability flags on bundled solvents, and their weight in the hazard penalty. */
class ReactiveFlagTest {

    private final SolventLibrary lib = bundled();

    private static SolventLibrary bundled() {
        BundledData b = BundledData.resource("solvents.csv");
        try {
            return new SolventLibrary(SolventCsv.read(b.name(),
                    new InputStreamReader(new ByteArrayInputStream(b.bytes()), StandardCharsets.UTF_8), false));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Test
    void oneThreeDicarbonylsAreFlaggedAndPlainEstersAndKetonesAreNot() {
        // acetoacetates and malonates carry the C(=O)CH2C(=O) active methylene (any organic chemistry text,
        // e.g. the acetoacetic-ester and malonic-ester syntheses; common practice, no source)
        for (String name : List.of("ethyl acetoacetate", "methyl acetoacetate", "diethyl malonate")) {
            assertTrue(ReactiveFlag.of(lib.resolve("name", name)).contains(ReactiveFlag.ACTIVE_METHYLENE), name);
        }
        for (String name : List.of("ethyl acetate", "acetone", "methyl ethyl ketone", "diacetone alcohol", "Cyrene")) {
            assertFalse(ReactiveFlag.of(lib.resolve("name", name)).contains(ReactiveFlag.ACTIVE_METHYLENE), name);
        }
    }

    @Test
    void unsaturatedKetonesAreMichaelAcceptorsAndSaturatedOnesAreNot() {
        // mesityl oxide and isophorone are α,β-unsaturated ketones: conjugate addition of amines and thiols (Michael
        // addition; any organic chemistry text, common practice, no source); their saturated relatives and aromatic
        // carbonyls are not flagged
        for (String name : List.of("mesityl oxide", "isophorone")) {
            assertTrue(ReactiveFlag.of(lib.resolve("name", name)).contains(ReactiveFlag.MICHAEL_ACCEPTOR), name);
        }
        for (String name : List.of("acetone", "cyclohexanone", "methyl isobutyl ketone", "methyl benzoate", "acetophenone", "Cyrene", "d-limonene")) {
            assertFalse(ReactiveFlag.of(lib.resolve("name", name)).contains(ReactiveFlag.MICHAEL_ACCEPTOR), name);
        }
        assertEquals(List.of(ReactiveFlag.MICHAEL_ACCEPTOR), ReactiveFlag.parse("--exclude-reactive", "enone"));
    }

    @Test
    void aReactiveSolventCarriesThePenaltyAndSaysWhy() {
        Solvent eaa = lib.resolve("name", "ethyl acetoacetate");
        HazardPenalty p = HazardPenalty.of(eaa);
        assertTrue(p.terms().stream().anyMatch(t -> t.startsWith("reactive: 1,3-dicarbonyl")), p.terms().toString());
        assertEquals(List.of(ReactiveFlag.ACTIVE_METHYLENE), ReactiveFlag.parse("--exclude-reactive", "dicarbonyl"));
    }
}
