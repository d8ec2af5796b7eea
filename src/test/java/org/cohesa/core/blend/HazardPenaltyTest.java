package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.cohesa.core.solvent.ExposureLimit;
import org.cohesa.core.solvent.FireData;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.UnifacAssignment;
import org.junit.jupiter.api.Test;

/**
 * A recalled hazard list does not look cleaner than a checked one. Source of the rule: the CHEM21 guide (Prat et al., Green
 * Chem. 18 (2016) 288) scores a solvent without registered hazard data ("n.a.") health 5 — Table 8: γ-valerolactone, diethyl
 * succinate, p-cymene — between Eye Dam. 1 H318 (4) and a suspected CMR (6); the penalty's weights for those are 1.5 and 4,
 * and its weight for an unknown list, 2, lies between them, so a recalled list's health part counts at least 2.
 */
class HazardPenaltyTest {

    private static Solvent liquid(String hazards, Map<String, String> sources) {
        return new Solvent("test ether", List.of(), null, null, null, "ether", List.of(), 86.0, 0.88, 98.0, null, 88.0, null,
                new FireData(-20.0, null, null, null), null, null, ExposureLimit.NONE,
                hazards.isBlank() ? List.of() : Arrays.asList(hazards.split(" ")), false, 3, UnifacAssignment.NONE, null, sources, null, false);
    }

    private static double points(HazardPenalty p, String prefix) {
        return p.terms().stream().filter(t -> t.startsWith(prefix)).mapToDouble(t -> Double.parseDouble(t.substring(t.lastIndexOf(' ') + 1))).sum();
    }

    @Test
    void aRecalledListCountsAtLeastAsMuchHealthAsAnUnknownOne() {
        HazardPenalty recalled = HazardPenalty.of(liquid("H225", Map.of("hazard_statements", "memory-supplier-classification")));
        HazardPenalty checked = HazardPenalty.of(liquid("H225", Map.of("hazard_statements", "supplier-sds-checked")));
        HazardPenalty unknown = HazardPenalty.of(liquid("", Map.of()));
        assertEquals(HazardPenalty.UNKNOWN_STATEMENTS, points(recalled, "hazard list recalled"), 1e-9, recalled.terms().toString());
        // 2 for health, and the computed guide rank takes the paper's "n.a." default too (problematic here: 0.5)
        assertEquals(HazardPenalty.UNKNOWN_STATEMENTS + 0.5, recalled.points() - checked.points(), 1e-9, recalled.terms() + " vs " + checked.terms());
        assertTrue(recalled.terms().contains("guide: problematic (computed) 0.5"), recalled.terms().toString());
        assertFalse(checked.terms().stream().anyMatch(t -> t.startsWith("hazard list recalled")), checked.terms().toString());
        // the unknown list carries the same 2 points (and no recalled term): neither looks safer than the other
        assertEquals(unknown.points(), recalled.points(), 1e-9, unknown.terms() + " vs " + recalled.terms());
    }

    @Test
    void aRecalledListWithEnoughHealthStatementsIsTakenAsItIs() {
        // H318 1.5 + H302 0.5 = 2: already at the floor, nothing added; H319 0.5 alone: 1.5 added
        HazardPenalty full = HazardPenalty.of(liquid("H225 H302 H318", Map.of("hazard_statements", "memory-supplier-classification")));
        assertFalse(full.terms().stream().anyMatch(t -> t.startsWith("hazard list recalled")), full.terms().toString());
        HazardPenalty thin = HazardPenalty.of(liquid("H225 H319", Map.of("hazard_statements", "memory-clp-annex-vi")));
        assertEquals(1.5, points(thin, "hazard list recalled"), 1e-9, thin.terms().toString());
        assertTrue(thin.terms().contains("H319 irritant/drowsiness 0.5"), thin.terms().toString());
    }
}
