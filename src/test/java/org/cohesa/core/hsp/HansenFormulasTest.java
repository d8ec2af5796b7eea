package org.cohesa.core.hsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class HansenFormulasTest {

    private static final HansenParameters TOLUENE = HansenParameters.of(18.0, 1.4, 2.0);   // Alshehri et al. 2022 table
    private static final HansenParameters ACETONE = HansenParameters.of(15.5, 10.4, 7.0);  // Alshehri et al. 2022 table
    private static final HansenParameters WATER = HansenParameters.of(15.5, 16.0, 42.3);   // Hansen 2007 table, from memory

    @Test
    void totalParameterOfWaterMatchesHansensTabulatedValue() {
        // Hansen 2007, appendix table: water δt = 47.8 MPa^½ (from memory)
        assertEquals(47.8, WATER.total(), 0.05);
    }

    @Test
    void distanceUsesFourTimesTheDispersionDifference() {
        // Hansen 2007, ch. 1: Ra² = 4ΔδD² + ΔδP² + ΔδH²; toluene–acetone by hand:
        // 4·2.5² + 9.0² + 5.0² = 25 + 81 + 25 = 131
        assertEquals(Math.sqrt(131.0), HansenDistance.ra(TOLUENE, ACETONE), 1e-12);
    }

    @Test
    void distanceIsSymmetricAndZeroToItself() {
        // metric properties of Ra (Hansen 2007, ch. 1: Ra is a weighted Euclidean distance)
        Random rnd = new Random(7);
        for (int i = 0; i < 200; i++) {
            HansenParameters a = HansenParameters.of(14 + 7 * rnd.nextDouble(), 20 * rnd.nextDouble(), 25 * rnd.nextDouble());
            HansenParameters b = HansenParameters.of(14 + 7 * rnd.nextDouble(), 20 * rnd.nextDouble(), 25 * rnd.nextDouble());
            assertEquals(a.distanceTo(b), b.distanceTo(a), 1e-12);
            assertEquals(0.0, a.distanceTo(a), 0.0);
        }
    }

    @Test
    void redIsDistanceOverRadius() {
        // Hansen 2007, ch. 1: RED = Ra/R0; inside below 1
        SolubilitySphere s = new SolubilitySphere(TOLUENE, 8.0);
        assertEquals(Math.sqrt(131.0) / 8.0, s.red(ACETONE), 1e-12);
        assertTrue(s.red(ACETONE) > 1);
        assertTrue(s.contains(HansenParameters.of(18.5, 3.0, 3.0)));
    }

    @Test
    void teasFractionsOfAcetoneMatchPublishedChart() {
        // Burke, J., "Solubility Parameters: Theory and Application", AIC Book and Paper Group Annual 3 (1984),
        // Teas-chart table: acetone fd 47, fp 32, fh 21 (from memory)
        TeasFractions t = TeasFractions.of(ACETONE);
        assertEquals(47, Math.round(100 * t.fd()));
        assertEquals(32, Math.round(100 * t.fp()));
        assertEquals(21, Math.round(100 * t.fh()));
        assertEquals(1.0, t.fd() + t.fp() + t.fh(), 1e-12);
    }

    @Test
    void volumeMixingOfOneComponentIsTheComponent() {
        // Hansen 2007, ch. 1: δ_blend = Σφδ; a one-component blend equals its component
        assertEquals(TOLUENE, VolumeMixing.mix(new double[] {1.0}, List.of(TOLUENE)));
    }

    @Test
    void volumeMixingIsTheFractionWeightedMean() {
        // Hansen 2007, ch. 1, volume-fraction rule: 0.6 toluene + 0.4 acetone
        HansenParameters m = VolumeMixing.mix(new double[] {0.6, 0.4}, List.of(TOLUENE, ACETONE));
        assertEquals(0.6 * 18.0 + 0.4 * 15.5, m.dD(), 1e-12);
        assertEquals(0.6 * 1.4 + 0.4 * 10.4, m.dP(), 1e-12);
        assertEquals(0.6 * 2.0 + 0.4 * 7.0, m.dH(), 1e-12);
    }

    @Test
    void rejectsBadInputsWithClearMessages() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> HansenParameters.of(-1, 2, 3));
        assertEquals("dD must not be negative (a Hansen parameter is the square root of an energy density), got -1.0", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new SolubilitySphere(TOLUENE, 0));
        assertEquals("R0 must be a positive number, got 0.0", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> VolumeMixing.mix(new double[] {0.5, 0.4}, List.of(TOLUENE, ACETONE)));
        assertEquals("volume fractions must sum to 1, got 0.9", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> VolumeMixing.mix(new double[] {1.2, -0.2}, List.of(TOLUENE, ACETONE)));
        assertEquals("volume fraction must be a number ≥ 0, got -0.2", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> HansenParameters.of(Double.NaN, 1, 1));
    }

    @Test
    void fractionsThatSumToOneWithinOneMillionthAreAccepted() {
        // the tolerance the foundation issue sets: 1e-6
        VolumeMixing.mix(new double[] {0.3333333, 0.6666667}, List.of(TOLUENE, ACETONE));
        assertThrows(IllegalArgumentException.class,
                () -> VolumeMixing.mix(new double[] {0.333333, 0.666665}, List.of(TOLUENE, ACETONE)));
    }

    @Test
    void hildebrandParameterOfTolueneFromCrcEnthalpyMatchesHandbookValue() {
        // CRC Handbook 95th ed. (2014), enthalpy of vaporization: toluene ΔHvap(298 K) = 38.01 kJ/mol;
        // density 0.8623 g/cm³, M = 92.14 g/mol (CRC physical constants, rounded).
        // Barton, A. F. M., CRC Handbook of Solubility Parameters (1983): toluene δ = 18.2 MPa^½ (from memory)
        CohesiveEnergy.Result r = CohesiveEnergy.fromVaporisation(38.01, 92.14, 0.8623, 298.15);
        assertEquals(18.2, r.delta(), 0.1);
        assertEquals(r.delta() * r.delta(), r.cohesiveEnergyDensity(), 1e-9);
    }

    @Test
    void hildebrandParameterOfWaterMatchesHansenTotal() {
        // CRC Handbook 95th ed.: water ΔHvap(298 K) = 43.98 kJ/mol; density 0.99705 g/cm³ at 25 °C (from memory);
        // Hansen 2007 gives δt(water) = 47.8 MPa^½ (from memory)
        CohesiveEnergy.Result r = CohesiveEnergy.fromVaporisation(43.98, 18.015, 0.99705, 298.15);
        assertEquals(47.8, r.delta(), 0.3);
    }

    @Test
    void cohesiveEnergyRejectsEnthalpyBelowRt() {
        assertThrows(IllegalArgumentException.class, () -> CohesiveEnergy.fromVaporisation(2.0, 50, 1, 298.15));
    }

    @Test
    void temperatureShiftFollowsHansenBeerbowerSlopes() {
        // Hansen & Beerbower (1971), restated in Hansen 2007 ch. 1:
        // dδD/dT = −1.25αδD, dδP/dT = −0.5αδP, dδH/dT = −δH(1.22e-3 + 0.5α); toluene α ≈ 1.08e-3 1/K (from memory)
        double alpha = 1.08e-3;
        HansenParameters up = TemperatureShift.shift(TOLUENE, alpha, 298.15, 298.15 + 1e-3);
        assertEquals(-1.25 * alpha * 18.0, (up.dD() - 18.0) / 1e-3, 1e-6);
        assertEquals(-0.5 * alpha * 1.4, (up.dP() - 1.4) / 1e-3, 1e-6);
        assertEquals(-2.0 * (1.22e-3 + 0.5 * alpha), (up.dH() - 2.0) / 1e-3, 1e-6);
        // heating lowers every parameter; the round trip returns the start
        HansenParameters hot = TemperatureShift.shift(TOLUENE, alpha, 298.15, 348.15);
        assertTrue(hot.dD() < 18.0 && hot.dP() < 1.4 && hot.dH() < 2.0);
        HansenParameters back = TemperatureShift.shift(hot, alpha, 348.15, 298.15);
        assertEquals(18.0, back.dD(), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> TemperatureShift.shift(TOLUENE, -1e-3, 298, 300));
    }

    @Test
    void floryHugginsChiIsMolarVolumeTimesQuarterRaSquaredOverRt() {
        // Hansen 2007, ch. 2: χ12 = V1/(RT)·[(ΔδD)² + ¼(ΔδP)² + ¼(ΔδH)²]; toluene (V = 106.8 cm³/mol) vs acetone at 298.15 K:
        // [6.25 + 20.25 + 6.25] · 106.8 / (8.314462618 · 298.15) = 32.75 · 106.8 / 2478.96 = 1.4110
        double chi = FloryHugginsChi.chi(TOLUENE, ACETONE, 106.8, 298.15, 1.0);
        assertEquals(32.75 * 106.8 / (CohesiveEnergy.GAS_CONSTANT * 298.15), chi, 1e-12);
        assertEquals(1.411, chi, 1e-3);
        // Lindvig et al. 2002 scale by 0.6
        assertEquals(0.6 * chi, FloryHugginsChi.chi(TOLUENE, ACETONE, 106.8, 298.15, FloryHugginsChi.LINDVIG_ALPHA), 1e-12);
    }
}
