package org.cohesa.core.activity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cohesa.core.blend.MeasuredFirstPhaseCheck;
import org.cohesa.core.blend.PhaseCheck;
import org.cohesa.store.WaterMiscibilityCsv;
import org.junit.jupiter.api.Test;

/**
 * The blend designer's phase check with water: published mutual solubilities first (docs/methods.md, "Water miscibility").
 */
class BlendWaterPhaseTest {

    private static final double T25 = 298.15;
    private static final PhaseCheck CHECK = MeasuredFirstPhaseCheck.with(WaterMiscibilityCsv.bundled());

    @Test
    void fluorobenzeneWithTenPercentWaterIsTwoPhasesByTheData() {
        // Fluorobenzene dissolves 1.54 g/L in water at 25 °C (one of the two determinations the IUPAC-NIST evaluation keeps,
        // Andrews & Keefer 1950, NIST SRD 106 system 20_170; the value from memory) and takes up well under 0.1 mass %
        // water (from memory): 9.8 % water by volume is far over it. The Flory–Huggins fallback alone calls it one phase.
        PhaseCheck.Verdict v = CHECK.check(BundledLiquids.all("fluorobenzene", "water"), new double[] {0.902, 0.098}, T25);
        assertTrue(v.checked() && v.splits(), v.detail());
        assertEquals("measured", v.basis());
        MiscibilityResult model = Miscibility.check(BundledLiquids.all("fluorobenzene", "water"), new double[] {0.902, 0.098}, T25);
        assertFalse(model.splits(), "the model alone was the fault this guards: " + model.detail());
    }

    @Test
    void threeHydrophobicSolventsWithWaterSplitByAdditiveUptake() {
        // Toluene takes up 0.033 mass % water, chlorobenzene 0.03 (IUPAC-NIST SDS 81; Stephenson, J. Chem. Eng. Data 37 (1992) 80;
        // both from memory): together they cannot hold 5 % water by volume.
        PhaseCheck.Verdict v = CHECK.check(BundledLiquids.all("toluene", "chlorobenzene", "water"), new double[] {0.5, 0.45, 0.05}, T25);
        assertTrue(v.checked() && v.splits(), v.detail());
        assertEquals("measured", v.basis());
        // MEK holds 12.5 mass % water at 25 °C, ethyl acetate up to 3.3 (The Merck Index monographs, stored copies): 2 % water in a
        // 1:1 blend of the two is within what they take up added together, so the rule does not split it.
        PhaseCheck.Verdict w = CHECK.check(BundledLiquids.all("methyl ethyl ketone", "ethyl acetate", "water"), new double[] {0.49, 0.49, 0.02}, T25);
        assertFalse(w.splits(), w.detail());
    }

    @Test
    void waterWithoutDataOrUnifacIsNotKnownToBeOnePhase() {
        // Benzotrifluoride (no row in the table) with water: the model falls to Hansen–Flory–Huggins, which is not trusted with water
        // (common practice, no source: benzotrifluoride is hydrophobic and takes up a trace of water only).
        PhaseCheck.Verdict v = CHECK.check(BundledLiquids.all("benzotrifluoride", "water"), new double[] {0.9, 0.1}, T25);
        assertFalse(v.checked(), v.detail());
    }

    @Test
    void blendsWithoutWaterStayWithTheModel() {
        // Hexane–methanol 1:1 splits at 25 °C (upper critical solution temperature about 35 °C; common practice, no source).
        PhaseCheck.Verdict v = CHECK.check(BundledLiquids.all("n-hexane", "methanol"), new double[] {0.5, 0.5}, T25);
        assertTrue(v.splits(), v.detail());
        assertEquals("model", v.basis());
    }
}
