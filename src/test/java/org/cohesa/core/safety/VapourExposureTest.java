package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.cohesa.core.solvent.Antoine;
import org.cohesa.core.solvent.ExposureLimit;
import org.junit.jupiter.api.Test;

/** Saturated-vapour exposure and the ACGIH additive mixture formula. */
class VapourExposureTest {

    // Poling et al. 2000 Antoine for toluene, as in antoine-collection-poling.tsv
    static final Antoine TOLUENE = new Antoine(9.05043, 1327.62, -55.525, 286.44, 409.61, "poling-2000-antoine");

    @Test
    void additiveFormulaWorkedExample() {
        // ACGIH TLV booklet, appendix on mixtures, additive-effects example (from memory): acetone 400 ppm (TLV 500),
        // sec-butyl acetate 150 ppm (TLV 200), methyl ethyl ketone 100 ppm (TLV 200): 0.8 + 0.75 + 0.5 = 2.05 > 1
        assertEquals(2.05, VapourExposure.additiveIndex(new double[] {400, 150, 100}, new double[] {500, 200, 200}), 1e-12);
    }

    @Test
    void pureTolueneSaturatedVapourAt25C() {
        // CRC Handbook, vapour pressure of toluene at 25 °C: 3.79 kPa (28.4 mmHg) — from memory → 37,400 ppm
        ExposureLimit oel = new ExposureLimit(20.0, null, null, false, "Ontario");
        VapourExposure.Result r = VapourExposure.compute(List.of("toluene"), List.of("108-88-3"), new double[] {1}, List.of(BlendFlashPointTest.curve("toluene", TOLUENE)),
                List.of(oel), new IdealStandIn(1), 298.15);
        double ppm = r.components().get(0).saturatedPpm();
        assertEquals(3.79e3 / 101_325 * 1e6, ppm, 0.02 * ppm);
        assertEquals(ppm / 20.0, r.index(), 1e-9, "vapour hazard ratio = Psat/P × 10⁶ / TWA");
        assertTrue(r.complete());
    }

    @Test
    void componentWithoutLimitIsListedNotCountedAsSafe() {
        ExposureLimit none = ExposureLimit.NONE;
        ExposureLimit oel = new ExposureLimit(20.0, null, null, true, "Ontario");
        VapourExposure.Result r = VapourExposure.compute(List.of("toluene", "mystery"), List.of("108-88-3", "0-00-0"), new double[] {0.5, 0.5},
                Arrays.asList(BlendFlashPointTest.curve("toluene", TOLUENE), BlendFlashPointTest.curve("toluene", TOLUENE)), List.of(oel, none), new IdealStandIn(2), 298.15);
        assertFalse(r.complete());
        assertEquals("no limit known", r.components().get(1).status());
        assertNull(r.components().get(1).ratio());
        assertTrue(r.components().get(0).skin());
    }

    @Test
    void stelIsUsedAndNamedWhenNoTwaIsKnown() {
        // ethanol in the Ontario table: STEL 1000 ppm, no TWA
        ExposureLimit ethanol = new ExposureLimit(null, 1000.0, null, false, "Ontario");
        VapourExposure.Result r = VapourExposure.compute(List.of("ethanol"), List.of("64-17-5"), new double[] {1},
                List.of(BlendFlashPointTest.ETHANOL_P), List.of(ethanol), new IdealStandIn(1), 298.15);
        assertEquals("STEL", r.components().get(0).limitKind());
        assertEquals(r.components().get(0).saturatedPpm() / 1000.0, r.index(), 1e-9);
    }

    @Test
    void aboveTheBoilingPointTheVapourIsCappedAtPureVapour() {
        ExposureLimit oel = new ExposureLimit(20.0, null, null, false, "Ontario");
        VapourExposure.Result r = VapourExposure.compute(List.of("toluene"), List.of("108-88-3"), new double[] {1}, List.of(BlendFlashPointTest.curve("toluene", TOLUENE)),
                List.of(oel), new IdealStandIn(1), 400.0);
        assertEquals(1e6, r.components().get(0).saturatedPpm(), 1e-6);
        assertFalse(r.notes().isEmpty());
    }
}
