package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/**
 * Boundary cases of GHS Rev. 10 (2023) Table 2.6.1 (flammable liquids) and UN Model Regulations Rev. 23 (2023)
 * 2.3.2.6 (Class 3 packing groups). The inequalities are the standards' own: Cat 1/2 "flash point &lt; 23 °C",
 * Cat 1 "initial boiling point ≤ 35 °C", Cat 3 "≥ 23 °C and ≤ 60 °C", Cat 4 "&gt; 60 °C and ≤ 93 °C";
 * PG I "initial boiling point ≤ 35 °C", PG II "&lt; 23 °C and &gt; 35 °C", PG III "≥ 23 °C, ≤ 60 °C"
 * (recalled from memory of both texts).
 */
class FlammableLiquidClassTest {

    @Test
    void category1And2SplitOnTheInitialBoilingPointAt35C() {
        // GHS Table 2.6.1: Cat 1 IBP ≤ 35 °C, Cat 2 IBP > 35 °C (both FP < 23 °C)
        assertEquals(1, FlammableLiquidClass.ghs(-45.0, 35.0).category());
        assertEquals(2, FlammableLiquidClass.ghs(-45.0, 35.1).category());
        // UN 2.3.2.6: PG I for IBP ≤ 35 °C, PG II for FP < 23 °C and IBP > 35 °C
        assertEquals("I", FlammableLiquidClass.packingGroup(-45.0, 35.0));
        assertEquals("II", FlammableLiquidClass.packingGroup(-45.0, 35.1));
    }

    @Test
    void flashPoint23CIsCategory3NotCategory2() {
        // GHS Table 2.6.1: "flash point < 23 °C" for Cat 2, "≥ 23 °C and ≤ 60 °C" for Cat 3
        assertEquals(2, FlammableLiquidClass.ghs(22.9, 80.0).category());
        assertEquals(3, FlammableLiquidClass.ghs(23.0, 80.0).category());
        assertEquals("II", FlammableLiquidClass.packingGroup(22.9, 80.0));
        assertEquals("III", FlammableLiquidClass.packingGroup(23.0, 80.0));
    }

    @Test
    void flashPoint60CIsStillCategory3AndClass3() {
        // GHS: Cat 3 up to and including 60 °C; Cat 4 above 60 up to 93 °C. UN 2.3.1.1: Class 3 up to 60 °C
        assertEquals(3, FlammableLiquidClass.ghs(60.0, 150.0).category());
        assertEquals(4, FlammableLiquidClass.ghs(60.1, 150.0).category());
        assertEquals("III", FlammableLiquidClass.packingGroup(60.0, 150.0));
        assertNull(FlammableLiquidClass.packingGroup(60.1, 150.0));
    }

    @Test
    void flashPoint93CIsTheLastCategory4() {
        // GHS Table 2.6.1: Cat 4 "> 60 °C and ≤ 93 °C"
        assertEquals(4, FlammableLiquidClass.ghs(93.0, 200.0).category());
        assertNull(FlammableLiquidClass.ghs(93.1, 200.0).category());
    }

    @Test
    void lowBoilingLiquidWithFlashPointAbove23IsStillPackingGroupI() {
        // UN 2.3.2.6: PG I is set by IBP ≤ 35 °C alone; GHS Cat 3 by the flash point alone
        assertEquals("I", FlammableLiquidClass.packingGroup(25.0, 34.0));
        assertEquals(3, FlammableLiquidClass.ghs(25.0, 34.0).category());
    }

    @Test
    void noFlashPointIsNotClassified() {
        assertNull(FlammableLiquidClass.ghs(null, 100.0).category());
        assertNull(FlammableLiquidClass.packingGroup(null, 100.0));
    }

    @Test
    void unknownBoilingPointTakesTheStricterClass() {
        // our rule (no source): with FP < 23 °C and no IBP, Category 1 / PG I is assumed and said
        assertEquals(1, FlammableLiquidClass.ghs(10.0, null).category());
        assertEquals("I", FlammableLiquidClass.packingGroup(10.0, null));
    }

    @Test
    void realSolventsFallInTheirKnownCategories() {
        // diethyl ether FP −45 °C, bp 34.6 °C: GHS Cat 1 (H224), UN 1155 PG I — from memory of CLP Annex VI and the Dangerous Goods List
        assertEquals(1, FlammableLiquidClass.ghs(-45.0, 34.6).category());
        assertEquals("I", FlammableLiquidClass.packingGroup(-45.0, 34.6));
        // ethanol FP 12 °C (IEC 60079-20-1), bp 78.3 °C: H225 (Cat 2), UN 1170 PG II — from memory of CLP Annex VI and the Dangerous Goods List
        assertEquals(2, FlammableLiquidClass.ghs(12.0, 78.3).category());
        assertEquals("II", FlammableLiquidClass.packingGroup(12.0, 78.3));
        // 1-butanol FP 35 °C, bp 117.7 °C: H226 (Cat 3), UN 1120 PG III — from memory
        assertEquals(3, FlammableLiquidClass.ghs(35.0, 117.7).category());
        assertEquals("III", FlammableLiquidClass.packingGroup(35.0, 117.7));
    }
}
