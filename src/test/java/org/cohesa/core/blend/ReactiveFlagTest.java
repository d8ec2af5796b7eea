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

    /**
     * The reactive term weighs 2, as much as a Category 2 flammability: the CHEM21 panel moved the reactive solvents its
     * computed ranking placed too well one or two classes down (Prat et al., Green Chem. 18 (2016) 288, Table 7: pyridine
     * recommended → hazardous, triethylamine problematic → hazardous, nitromethane hazardous → highly hazardous; 2.5, 1.5
     * and 1.5 points at the full weight of a guide term). The published rows are read from chem21-ranks.csv.
     */
    @Test
    void theReactiveWeightFollowsTheChem21PanelsMovesForReactiveSolvents() {
        double moved = 0;
        int n = 0;
        for (String cas : List.of("110-86-1", "121-44-8", "75-52-5")) {
            org.cohesa.core.safety.SolventGuide.Published row = org.cohesa.core.safety.SolventGuide.published(cas).orElseThrow();
            assertTrue(guidePoints(row.finalRank()) > guidePoints(row.defaultRank()), row.name());
            moved += 2 * (guidePoints(row.finalRank()) - guidePoints(row.defaultRank()));
            n++;
        }
        assertEquals(HazardPenalty.REACTIVE, Math.rint(moved / n), 1e-9, "mean full-weight move " + moved / n);
        assertTrue(HazardPenalty.of(lib.resolve("name", "mesityl oxide")).terms().contains("reactive: α,β-unsaturated carbonyl (Michael acceptor) 2"));
    }

    private static double guidePoints(org.cohesa.core.safety.GuideRank r) {
        // HazardPenalty's guide term (half weight): recommended 0, problematic 0.5, hazardous 1.25, highly hazardous 2
        return switch (r) {
            case RECOMMENDED -> 0;
            case PROBLEMATIC -> 0.5;
            case HAZARDOUS -> 1.25;
            case HIGHLY_HAZARDOUS -> 2;
        };
    }

    @Test
    void aSubstituteBringsNoReactivityTheOriginalLacks() {
        // an inert original: every reactivity but peroxide formation (a storage hazard, kept as a penalty) is new to it
        java.util.Set<ReactiveFlag> newToDcm = ReactiveFlag.newTo(lib.resolve("name", "dichloromethane"));
        assertEquals(java.util.EnumSet.complementOf(java.util.EnumSet.of(ReactiveFlag.PEROXIDE)), newToDcm);
        // a reactive original keeps its own kind: pyridine may be replaced by another base
        assertFalse(ReactiveFlag.newTo(lib.resolve("name", "pyridine")).contains(ReactiveFlag.AMINE));
        assertTrue(ReactiveFlag.newTo(lib.resolve("name", "pyridine")).contains(ReactiveFlag.MICHAEL_ACCEPTOR));
        assertEquals(List.of(), ReactiveFlag.parse("--exclude-reactive", "none"));
    }

    /** The rule the command line and the desktop share (common practice in process chemistry, no source; docs/methods.md). */
    @Test
    void namedFlagsDecideElseAReplacementLeavesOutWhatTheOriginalLacks() {
        Solvent dcm = lib.resolve("name", "dichloromethane");
        ReactiveExclusion byRule = ReactiveExclusion.of(null, dcm);
        assertTrue(byRule.fromReplaced());
        assertEquals(ReactiveFlag.newTo(dcm), byRule.flags());
        assertTrue(byRule.lack().startsWith("dichloromethane is no carboxylic acid, amine or pyridine base"), byRule.lack());
        // --exclude-reactive none / the desktop's switch off: nothing left out, the rule silent
        ReactiveExclusion none = ReactiveExclusion.of(java.util.Set.of(), dcm);
        assertFalse(none.fromReplaced());
        assertTrue(none.flags().isEmpty());
        // named flags decide alone
        assertEquals(java.util.Set.of(ReactiveFlag.ACID), ReactiveExclusion.of(java.util.Set.of(ReactiveFlag.ACID), dcm).flags());
        // no replacement (or another process use): nothing unless named
        assertTrue(ReactiveExclusion.of(null, null).flags().isEmpty());
        BlendConstraints c = ReactiveExclusion.of(null, dcm).applyTo(BlendConstraints.NONE);
        assertEquals(ReactiveFlag.newTo(dcm), c.more().excludeReactive());
    }
}
