package org.cohesa.core.activity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

class MiscibilityTest {

    private static final double T25 = 298.15;
    private static final String LLE = "UNIFAC LLE (Magnussen 1981)";

    private static MiscibilityResult check(double kelvin, String a, String b, double phiA) {
        return Miscibility.check(BundledLiquids.all(a, b), new double[] {phiA, 1 - phiA}, kelvin);
    }

    @Test
    void hexaneAndMethanolSeparate() {
        // common practice, no source: n-hexane and methanol are only partly miscible at room temperature
        MiscibilityResult r = check(T25, "n-hexane", "methanol", 0.5);
        assertTrue(r.splits(), r.detail());
        assertEquals(LLE, r.model());
    }

    @Test
    void waterAndButanolSeparate() {
        // common practice, no source: water and 1-butanol form two layers at room temperature
        MiscibilityResult r = check(T25, "water", "1-butanol", 0.5);
        assertTrue(r.splits(), r.detail());
        assertEquals(LLE, r.model());
    }

    @Test
    void waterAndEthylAcetateSeparate() {
        // common practice, no source: ethyl acetate dissolves only ~8 % water-side; 50/50 by volume is two phases
        assertTrue(check(T25, "water", "ethyl acetate", 0.5).splits());
    }

    @Test
    void fullyMisciblePairsStayOnePhase() {
        // common practice, no source: toluene–ethanol, hexane–ethanol and acetone–water mix in all proportions at 25 °C
        for (String[] pair : new String[][] {{"toluene", "ethanol"}, {"n-hexane", "ethanol"}, {"acetone", "water"}}) {
            for (double phi : new double[] {0.1, 0.5, 0.9}) {
                MiscibilityResult r = check(T25, pair[0], pair[1], phi);
                assertFalse(r.splits(), pair[0] + "/" + pair[1] + " at " + phi + ": " + r.detail());
            }
        }
    }

    /**
     * Consensus rule: the liquid–liquid set splits DMSO, NMP, DMAc, 1,2-dimethoxyethane, ethyl lactate and morpholine from
     * water, original UNIFAC does not, and they are miscible in all proportions (CRC Handbook, 95th ed., solubility column;
     * from memory) — one phase, with the disagreement named. Pairs both sets split stay split (hexane–methanol, acetonitrile–
     * hexane, DMSO–hexane, ethylene glycol–toluene: partly miscible at 25 °C, common practice, no source).
     */
    @Test
    void aSplitIsReportedOnlyWhenBothUnifacParameterSetsFindIt() {
        for (String s : List.of("dimethyl sulfoxide", "N-methyl-2-pyrrolidone", "N,N-dimethylacetamide", "1,2-dimethoxyethane", "ethyl lactate",
                "morpholine")) {
            for (double phi : new double[] {0.1, 0.35, 0.5, 0.65, 0.9}) {
                MiscibilityResult r = check(T25, s, "water", phi);
                assertFalse(r.splits(), s + " at " + phi + ": " + r.detail());
            }
            MiscibilityResult any = null;
            for (double phi : new double[] {0.02, 0.1, 0.2, 0.35, 0.5, 0.65, 0.8, 0.9, 0.98}) {
                MiscibilityResult r = check(T25, s, "water", phi);
                if (r.detail().contains("consensus rule")) {
                    any = r;
                }
            }
            assertTrue(any != null, s + ": the liquid–liquid set's split and its overruling are named somewhere on the tested range");
            assertTrue(any.detail().contains("finds none"), any.detail());
        }
        for (String[] pair : new String[][] {{"n-hexane", "methanol"}, {"acetonitrile", "n-hexane"}, {"dimethyl sulfoxide", "n-hexane"},
                {"ethylene glycol", "toluene"}}) {
            MiscibilityResult r = check(T25, pair[0], pair[1], 0.5);
            assertTrue(r.splits(), pair[0] + "/" + pair[1] + ": " + r.detail());
            assertTrue(r.detail().contains("agrees"), r.detail());
        }
    }

    @Test
    void smallAmountOfButanolDissolvesInWater() {
        // 1-butanol dissolves in water to about 7 wt % at 25 °C (CRC Handbook, aqueous solubility; from memory);
        // 2 vol % butanol in water is a single phase, 30 vol % is beyond the solubility.
        assertFalse(check(T25, "water", "1-butanol", 0.98).splits());
        assertTrue(check(T25, "water", "1-butanol", 0.70).splits());
    }

    @Test
    void ternaryAndQuaternaryBlends() {
        // common practice, no source: ethanol is the classic co-solvent that makes water and ethyl acetate mix;
        // water 20 / ethanol 60 / ethyl acetate 20 by volume is one phase, water 45 / ethanol 10 / ethyl acetate 45 is two.
        List<Solvent> wee = BundledLiquids.all("water", "ethanol", "ethyl acetate");
        assertFalse(Miscibility.check(wee, new double[] {0.2, 0.6, 0.2}, T25).splits());
        assertTrue(Miscibility.check(wee, new double[] {0.45, 0.1, 0.45}, T25).splits());
        // an all-organic four-component lacquer thinner (common practice, no source) is one phase
        List<Solvent> thinner = BundledLiquids.all("toluene", "acetone", "ethyl acetate", "ethanol");
        assertFalse(Miscibility.check(thinner, new double[] {0.4, 0.2, 0.2, 0.2}, T25).splits());
        // adding hexane and methanol as the main parts of a four-component blend still splits
        List<Solvent> hm = BundledLiquids.all("n-hexane", "methanol", "toluene", "acetone");
        assertTrue(Miscibility.check(hm, new double[] {0.45, 0.45, 0.05, 0.05}, T25).splits());
    }

    @Test
    void singleLiquidNeverSplits() {
        assertFalse(Miscibility.check(BundledLiquids.all("water"), new double[] {1}, T25).splits());
    }

    @Test
    void fallsBackToFloryHugginsWhenAGroupHasNoLiquidLiquidCounterpart() {
        // NMP's original-UNIFAC group has no counterpart in the 1981 set
        Solvent nmp = BundledLiquids.library().lookup("NMP").stream().findFirst().orElseThrow();
        MiscibilityResult r = Miscibility.check(List.of(nmp, BundledLiquids.get("toluene")), new double[] {0.5, 0.5}, T25);
        assertEquals(FloryHuggins.NAME, r.model());
        assertTrue(r.detail().contains("Flory–Huggins"), r.detail());
        // common practice, no source: NMP and toluene are miscible
        assertFalse(r.splits(), r.detail());
    }

    @Test
    void floryHugginsFallbackSeesAStrongMismatch() {
        // Flory–Huggins with Hansen parameters alone (Lindvig et al. 2002) still separates a very unlike pair:
        // hexane–methanol, Ra ≈ 25 MPa^½ (common practice, no source: they are partly miscible).
        List<Solvent> hm = BundledLiquids.all("n-hexane", "methanol");
        ActivityModel fh = ActivityModels.floryHuggins(hm, "test");
        double[] z = Composition.moleFractions(new double[] {0.5, 0.5}, Composition.molarVolumes(hm));
        assertTrue(Miscibility.mostNegativeTpd(fh, z, T25).tpd() < 0);
    }
}
