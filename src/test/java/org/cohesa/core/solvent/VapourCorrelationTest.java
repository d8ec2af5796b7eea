package org.cohesa.core.solvent;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Each equation form against a published outside value: ethanol's normal boiling point, 351.44 K (CRC Handbook of
 * Chemistry and Physics, 95th ed., 2014, "Physical Constants of Organic Compounds"), where P = 101.325 kPa. The
 * coefficients are those of the published tables (as copied into ../shared/reference-data, see its README).
 */
class VapourCorrelationTest {

    static final double ETHANOL_TB = 351.44;

    /** Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-8, ethanol. */
    static final Dippr101 PERRY = new Dippr101(73.304, -7122.3, -7.1424, 2.8853e-06, 2, 159.05, 514.0, "perry-2008-dippr101");
    /** VDI Heat Atlas, 2nd ed. (2010), PPDS Wagner coefficients, ethanol; valid Tm..Tc. */
    static final Wagner25 VDI = new Wagner25(-8.33803, 0.0872, -3.30575, -0.26001, 513.9, 6_148_000.0, 159.05, 513.9, "vdi-2010-wagner");
    /** McGarry, Ind. Eng. Chem. Process Des. Dev. 22 (1983) 313, ethanol; lower limit only. */
    static final Wagner36 MCGARRY = new Wagner36(-8.51838, 0.341626, -5.73683, 8.32581, 513.92, 6_130_870.0, 293.0, null, "mcgarry-1983-wagner");
    /** Landolt–Börnstein IV/20 (Dykyj, Hall 2000), ethanol, converted to ln(P/Pa); valid 341–514 K. */
    static final AntoineLn LANDOLT = new AntoineLn(22.850048558090364, 3247.704170264382, -64.636, 341.0, 514.0, "landolt-antoine");
    /** Poling, Prausnitz, O'Connell (2000), appendix A, ethanol. */
    static final Antoine POLING = new Antoine(10.33675, 1648.22, -42.232, 276.5, 369.54, "poling-2000-antoine");

    @Test
    void everyPublishedFormGivesOneAtmosphereAtEthanolsBoilingPoint() {
        for (VapourCorrelation c : List.<VapourCorrelation>of(PERRY, VDI, MCGARRY, LANDOLT, POLING)) {
            double p = c.pressurePa(ETHANOL_TB);
            assertEquals(101_325.0, p, 0.005 * 101_325.0, c.equation() + " gives " + p);
            assertEquals(ETHANOL_TB, c.temperatureAtPressure(p), 1e-6, c.equation() + " inverted");
            assertFalse(c.isEstimate());
        }
    }

    @Test
    void theFileFormBuildsTheSameCurve() {
        for (VapourCorrelation c : List.<VapourCorrelation>of(PERRY, VDI, MCGARRY, LANDOLT, POLING)) {
            VapourCorrelation back = VapourCorrelation.of(c.equation(), c.coefficients(), c.tminK(), c.tmaxK(), c.tcK(), c.pcPa(), c.source());
            assertEquals(c, back);
        }
    }

    @Test
    void mackaysBoilingPointMethodIsTheConstantHeatCapacityCase() {
        // Mackay, Bobra, Chan, Shiu, Environ. Sci. Technol. 16 (1982) 645: ln(P/atm) = −(4.4 + ln Tb)·[1.803(Tb/T − 1)
        // − 0.803 ln(Tb/T)]; the same curve as Clausius–Clapeyron with ΔH(Tb) = R·Tb·(4.4 + ln Tb), ΔCp = −0.803·ΔH/Tb
        double tb = 400.0;
        double dsR = 4.4 + Math.log(tb);
        ClapeyronEstimate e = new ClapeyronEstimate(tb, 101_325.0, ClapeyronEstimate.R * tb * dsR, -0.803 * ClapeyronEstimate.R * dsR,
                null, null, "estimate-mackay-1982");
        double t = 298.15;
        double mackay = 101_325.0 * Math.exp(-dsR * (1.803 * (tb / t - 1) - 0.803 * Math.log(tb / t)));
        assertEquals(mackay, e.pressurePa(t), 1e-9 * mackay);
        assertTrue(e.isEstimate());
        assertEquals(101_325.0, e.pressurePa(tb), 1e-6);
    }

    @Test
    void theWagnerFormsHoldTheCriticalPressureAtAndAboveTc() {
        assertEquals(6_148_000.0, VDI.pressurePa(513.9), 1e-6);
        assertEquals(6_148_000.0, VDI.pressurePa(600.0), 1e-6);
    }

    @Test
    void badCoefficientsAreRefusedWithTheReason() {
        IllegalArgumentException unknown = assertThrows(IllegalArgumentException.class,
                () -> VapourCorrelation.of("antoine-log2", List.of(1.0, 2.0, 3.0), null, null, null, null, null));
        assertTrue(unknown.getMessage().contains("unknown vapour-pressure equation"), unknown.getMessage());
        IllegalArgumentException missing = assertThrows(IllegalArgumentException.class,
                () -> VapourCorrelation.of("dippr-101", Arrays.asList(1.0, 2.0, 3.0, null, null), null, null, null, null, null));
        assertTrue(missing.getMessage().contains("vp_c4"), missing.getMessage());
        IllegalArgumentException noTc = assertThrows(IllegalArgumentException.class,
                () -> VapourCorrelation.of("wagner-3-6", List.of(1.0, 2.0, 3.0, 4.0), null, null, null, 1e6, null));
        assertTrue(noTc.getMessage().contains("vp_tc_k"), noTc.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Antoine(10, 1600, -40, 400.0, 300.0, null));
        assertThrows(IllegalArgumentException.class, () -> new ClapeyronEstimate(350, 101_325, -1, 0, null, null, null));
    }

    @Test
    void outsideItsRangeTheValueSaysItIsExtrapolated() {
        // the Landolt ethanol set starts at 341 K: at 25 °C it is an extrapolation, and the basis says so
        Solvent ethanol = new Solvent("ethanol", null, "64-17-5", null, null, "alcohol", null, null, null, null, null, 78.29, null, null,
                LANDOLT, null, null, null, false, null, null, null, null, null, false);
        VapourPressure vp = VapourPressure.of(ethanol).orElseThrow();
        assertEquals(VapourPressure.Kind.CORRELATION, vp.methodAt(ETHANOL_TB).kind());
        assertFalse(vp.isEstimate(ETHANOL_TB));
        VapourPressure.Basis at25 = vp.methodAt(298.15);
        assertEquals(VapourPressure.Kind.EXTRAPOLATED, at25.kind());
        assertTrue(at25.label().contains("extrapolated below its range"), at25.label());
        assertTrue(at25.label().contains("landolt-antoine"), at25.label());
        assertTrue(vp.isEstimate(298.15));
    }
}
