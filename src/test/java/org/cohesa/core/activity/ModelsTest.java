package org.cohesa.core.activity;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.FloryHugginsChi;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

class ModelsTest {

    private static final double T25 = 298.15;

    @Test
    void choosesUnifacWhenEveryComponentHasGroups() {
        ActivityModel m = ActivityModels.choose(BundledLiquids.all("ethanol", "water"), false);
        assertEquals("UNIFAC (original)", m.name());
        assertEquals("", m.note());
    }

    @Test
    void idealWhenAsked() {
        ActivityModel m = ActivityModels.choose(BundledLiquids.all("ethanol", "water"), true);
        assertEquals("ideal", m.name());
        assertArrayEquals(new double[] {1, 1}, m.gamma(new double[] {0.3, 0.7}, T25));
    }

    @Test
    void fallsBackToFloryHugginsAndSaysWhy() {
        Solvent ethanol = BundledLiquids.get("ethanol");
        Solvent noGroups = withoutGroups(BundledLiquids.get("toluene"));
        ActivityModel m = ActivityModels.choose(List.of(ethanol, noGroups), false);
        assertEquals(FloryHuggins.NAME, m.name());
        assertTrue(m.note().contains("toluene"), m.note());
    }

    @Test
    void noModelForALiquidWithNeitherGroupsNorHansen() {
        Solvent bare = new Solvent("mystery liquid", null, null, null, null, null, null, null, null, 100.0, null, null, null, null, null,
                null, null, null, false, null, null, null, null, null, true);
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ActivityModels.choose(List.of(bare, BundledLiquids.get("water")), false));
        assertTrue(e.getMessage().contains("mystery liquid"));
    }

    @Test
    void floryHugginsBinaryReducesToTheTextbookForm() {
        // Binary Flory–Huggins: ln γ1 = ln(φ1/x1) + 1 − φ1/x1 + χ12 φ2² (Flory, Principles of Polymer Chemistry,
        // Cornell 1953, ch. XII; Lindvig et al. 2002 eq. 1) with χ12 = α V1 Ra²/(4RT).
        HansenParameters a = HansenParameters.of(18.0, 1.4, 2.0);
        HansenParameters b = HansenParameters.of(15.8, 8.8, 19.4);
        double v1 = 106.85;
        double v2 = 58.37;
        FloryHuggins fh = new FloryHuggins(List.of(a, b), new double[] {v1, v2}, "");
        double x1 = 0.3;
        double phi1 = x1 * v1 / (x1 * v1 + (1 - x1) * v2);
        double phi2 = 1 - phi1;
        double chi = FloryHugginsChi.chi(a, b, v1, T25, FloryHugginsChi.LINDVIG_ALPHA);
        double expected = Math.log(phi1 / x1) + 1 - phi1 / x1 + chi * phi2 * phi2;
        assertEquals(expected, fh.lnGamma(new double[] {x1, 1 - x1}, T25)[0], 1e-12);
    }

    @Test
    void floryHugginsIsGibbsDuhemConsistentAndUnityForPure() {
        List<Solvent> s = BundledLiquids.all("toluene", "ethanol", "water", "acetone");
        FloryHuggins fh = ActivityModels.floryHuggins(s, "");
        GibbsDuhem.assertConsistent(fh, new double[] {0.1, 0.4, 0.3, 0.2}, T25);
        assertEquals(1.0, fh.gamma(new double[] {0, 0, 1, 0}, T25)[2], 1e-12);
    }

    @Test
    void compositionRoundTrip() {
        double[] v = {106.85, 58.37, 18.07};
        double[] phi = {0.2, 0.5, 0.3};
        double[] x = Composition.moleFractions(phi, v);
        // hand check: x_water = (0.3/18.07) / (0.2/106.85 + 0.5/58.37 + 0.3/18.07)
        assertEquals((0.3 / 18.07) / (0.2 / 106.85 + 0.5 / 58.37 + 0.3 / 18.07), x[2], 1e-12);
        assertArrayEquals(phi, Composition.volumeFractions(x, v), 1e-12);
    }

    @Test
    void lleTranslationSpecialCases() {
        UnifacParameters lle = UnifacParameters.liquidLiquid();
        // Magnussen et al. (1981): methanol is CH3 + OH in the liquid-liquid set
        Map<Integer, Integer> methanol = LleGroups.translate(BundledLiquids.get("methanol").unifac()).counts();
        assertEquals(Map.of(1, 1, 14, 1), methanol);
        // 1-propanol and 2-propanol are whole-molecule groups P1 and P2 there
        assertEquals("P2", lle.subgroup(LleGroups.translate(BundledLiquids.get("2-propanol").unifac()).counts()
                .keySet().iterator().next()).orElseThrow().name());
        // water keeps its own group under another number; ethyl acetate keeps CH3COO
        assertEquals(Map.of(17, 1), LleGroups.translate(BundledLiquids.get("water").unifac()).counts());
        assertEquals(Map.of(1, 1, 2, 1, 25, 1), LleGroups.translate(BundledLiquids.get("ethyl acetate").unifac()).counts());
        // the ether CHO (main group CH2O) must not be confused with the aldehyde CHO (main group CHO)
        assertEquals(Map.of(29, 1), LleGroups.translate(new org.cohesa.core.solvent.UnifacAssignment(Map.of(26, 1))).counts());
        assertEquals(Map.of(21, 1), LleGroups.translate(new org.cohesa.core.solvent.UnifacAssignment(Map.of(20, 1))).counts());
        // an amine group has no counterpart
        assertTrue(!LleGroups.translate(new org.cohesa.core.solvent.UnifacAssignment(Map.of(28, 1))).ok());
    }

    private static Solvent withoutGroups(Solvent s) {
        return new Solvent(s.name(), s.synonyms(), s.cas(), s.formula(), s.smiles(), s.family(), s.families(), s.molarMass(), s.density(), s.molarVolume(),
                s.hansen(), s.boilingPointC(), s.meltingPointC(), s.fire(), s.vapourPressure(), s.hvapKjPerMol(), s.exposure(),
                s.hazardStatements(), s.peroxideFormer(), s.ichClass(), null, s.pricePerLitre(), s.sources(), s.note(), s.userEntry());
    }
}
