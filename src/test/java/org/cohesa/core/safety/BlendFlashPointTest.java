package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.cohesa.core.solvent.Antoine;
import org.cohesa.core.solvent.ExposureLimit;
import org.cohesa.core.solvent.VapourPressure;
import org.junit.jupiter.api.Test;

/**
 * The Le Chatelier–VLE flash-point equation (Liaw et al., J. Loss Prev. Process Ind. 15 (2002) 429) solved with the
 * test-only ideal stand-in, against closed-form consequences of the equation. Antoine coefficients: Poling, Prausnitz,
 * O'Connell, The Properties of Gases and Liquids, 5th ed. (2000), as in the shared reference table
 * antoine-collection-poling.tsv (ethanol A 10.33675, B 1648.22, C −42.232; water A 10.11564, B 1687.537, C −42.98).
 */
class BlendFlashPointTest {

    static final Antoine ETHANOL = new Antoine(10.33675, 1648.22, -42.232, 276.5, 369.54, "poling-2000-antoine");
    static final Antoine WATER = new Antoine(10.11564, 1687.537, -42.98, 273.2, 473.2, "poling-2000-antoine");
    static final double ETHANOL_FP_K = 12.0 + 273.15; // IEC 60079-20-1:2010, ethanol 12 °C
    static final VapourPressure ETHANOL_P = curve("ethanol", ETHANOL);
    static final VapourPressure WATER_P = curve("water", WATER);

    static VapourPressure curve(String name, Antoine a) {
        return VapourPressure.of(TestSolvents.vle(name, "0-00-0", 50.0, null, a, ExposureLimit.NONE, "")).orElseThrow();
    }

    @Test
    void dilutionByANonFlammableLiquidFollowsRaoultsLawInTheIdealCase() {
        // Ideal solution, one flammable component: x·Psat(T) = Psat(T_fp)  ⇒  T = Antoine⁻¹(Psat(T_fp)/x)
        double x = 0.3;
        BlendFlashPoint.Result r = BlendFlashPoint.solve(List.of("ethanol", "water"), new double[] {x, 1 - x},
                Arrays.asList(ETHANOL_P, WATER_P), Arrays.asList(ETHANOL_FP_K, null), new IdealStandIn(2));
        double expected = ETHANOL.temperatureAtPressure(ETHANOL.pressurePa(ETHANOL_FP_K) / x);
        assertEquals(expected, r.kelvin(), 1e-4);
        assertTrue(r.kelvin() > ETHANOL_FP_K, "water raises the flash point");
    }

    @Test
    void identicalFlammablesKeepTheirFlashPointAtAnyComposition() {
        // Le Chatelier: Σ xᵢ Psat(T)/Psat(T_fp) = Psat(T)/Psat(T_fp) = 1 ⇒ T = T_fp whatever the split
        BlendFlashPoint.Result r = BlendFlashPoint.solve(List.of("a", "b"), new double[] {0.37, 0.63},
                Arrays.asList(ETHANOL_P, ETHANOL_P), Arrays.asList(ETHANOL_FP_K, ETHANOL_FP_K), new IdealStandIn(2));
        assertEquals(ETHANOL_FP_K, r.kelvin(), 1e-4);
    }

    @Test
    void bubblePointOfAPureLiquidIsItsNormalBoilingPoint() {
        // CRC Handbook (95th ed.), ethanol normal boiling point 78.29 °C; Antoine (Poling 2000) reproduces it within 0.3 K
        BlendFlashPoint.Result r = BlendFlashPoint.solve(List.of("ethanol"), new double[] {1}, List.of(ETHANOL_P), List.of(ETHANOL_FP_K),
                new IdealStandIn(1));
        assertEquals(78.29 + 273.15, r.bubblePointK(), 0.3);
        assertEquals(ETHANOL_FP_K, r.kelvin(), 1e-4);
    }

    @Test
    void veryDiluteFlammableHasNoFlashPointBelowBoiling() {
        // ideal: at x = 0.001 the ethanol vapour needs Psat(T) = 1000 × Psat(T_fp) ≈ 3.9 MPa, far above boiling of the water
        BlendFlashPoint.Result r = BlendFlashPoint.solve(List.of("ethanol", "water"), new double[] {0.001, 0.999},
                Arrays.asList(ETHANOL_P, WATER_P), Arrays.asList(ETHANOL_FP_K, null), new IdealStandIn(2));
        assertFalse(r.hasFlashPoint());
        assertTrue(Double.isFinite(r.bubblePointK()));
    }

    @Test
    void noFlammableComponentGivesNoFlashPoint() {
        BlendFlashPoint.Result r = BlendFlashPoint.solve(List.of("water"), new double[] {1}, List.of(WATER_P), Arrays.asList((Double) null),
                new IdealStandIn(1));
        assertFalse(r.hasFlashPoint());
        // CRC: water boils at 100.0 °C at 101.325 kPa
        assertEquals(373.15, r.bubblePointK(), 0.3);
    }
}
