package org.cohesa.core.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class HansenEstimateTest {

    private static HansenValidation validation;

    @BeforeAll
    static void validate() {
        Path ref = ReferenceTables.folder().orElse(null);
        if (ref != null) {
            validation = HansenValidation.run(ref);
            System.out.println(validation.summary());
        }
    }

    private static void assertStated(String key, double[] stated) {
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        HansenValidation.Errors e = validation.of(key);
        // The expected errors the app prints are the figures measured here, rounded to 0.01 (not loosened): a
        // method change that makes the estimates worse fails until the stated error and docs/methods.md say so.
        assertEquals(stated[0], e.mae(), 0.0051, key + " MAE");
        assertEquals(stated[1], e.p90(), 0.0051, key + " P90");
    }

    @Test
    void groupMethodErrorsOnAtLeast100PublishedCompoundsAreTheStatedOnes() {
        // Alshehri et al., AIChE J. 68 (2022) e17469, experimental column, joined to PubChem SMILES.
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        assertTrue(validation.of("group δD").all.size() >= 100, validation.summary());
        assertStated("group δD", EstimateErrors.GROUP_DD);
        assertStated("group δP", EstimateErrors.GROUP_DP);
        assertStated("group δH", EstimateErrors.GROUP_DH);
        assertStated("group V (rel)", EstimateErrors.GROUP_VOLUME);
    }

    @Test
    void groupMethodErrorsStandAgainstThePapersOwn() {
        // Mathieu, ACS Omega 3 (2018) 17049, MAE δD / δP / δH on its external set of 769 Hansen-handbook values,
        // 0.75 / 2.08 / 1.67 MPa½: second-hand, as tabulated in stanlo229/fluoropolymer_replacement_virtual_screening
        // hsp/docs/literature_ml_hsp.md (commit 960a8d07), which states it read them from the paper.
        // Not the same compounds (the paper's per-compound spreadsheet was not reachable). δD and δH must stay at or
        // below the paper's figures; δP is above it by 0.11 as measured (2.19): the bound 0.12 keeps that shortfall
        // from growing unnoticed (docs/methods.md, "Against the paper").
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        assertTrue(validation.of("group δD").mae() <= 0.75, validation.summary());
        assertTrue(validation.of("group δH").mae() <= 1.67, validation.summary());
        assertTrue(validation.of("group δP").mae() - 2.08 <= 0.12, validation.summary());
    }

    @Test
    void propertyRouteErrorsAreTheStatedOnes() {
        // Inputs: CRC refractive index and density (Haynes 2014), Poling et al. (2000) dipole moments.
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        assertTrue(validation.of("property δD").all.size() >= 100, validation.summary());
        assertStated("property δD", EstimateErrors.PROPERTY_DD);
        assertStated("property δP", EstimateErrors.PROPERTY_DP);
        // Inputs as above plus CRC ΔHvap at 298 K: δt against the published δt, and δH as the remainder of it
        assertStated("property δt", EstimateErrors.PROPERTY_DT);
        assertStated("property δH", EstimateErrors.PROPERTY_DH);
    }

    @Test
    void theFamiliesThatGetAWarningAreTheMuchWorseOnes() {
        // Rule: a family (at least 5 compounds) whose group-method MAE exceeds 1.5 times the overall MAE in any
        // component is much worse; exactly those carry a warning, with their measured figures.
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        String[] keys = {"group δD", "group δP", "group δH"};
        Map<String, double[]> worse = new TreeMap<>();
        for (String family : validation.of("group δD").byFamily.keySet()) {
            double[] mae = new double[3];
            boolean flagged = false;
            for (int c = 0; c < 3; c++) {
                HansenValidation.Errors e = validation.of(keys[c]);
                List<Double> f = e.byFamily.get(family);
                mae[c] = HansenValidation.Errors.mae(f);
                flagged |= f.size() >= 5 && mae[c] > 1.5 * e.mae();
            }
            if (flagged) {
                worse.put(family, mae);
            }
        }
        assertEquals(worse.keySet(), new java.util.TreeSet<>(EstimateErrors.MUCH_WORSE.keySet()));
        worse.forEach((f, mae) -> {
            for (int c = 0; c < 3; c++) {
                assertEquals(mae[c], EstimateErrors.MUCH_WORSE.get(f)[c], 0.0051, f + " " + keys[c]);
            }
        });
    }

    @Test
    void ethanolByBothRoutesLandsNearItsPublishedParameters() {
        // Ethanol: published (15.8, 8.8, 19.4) MPa½ (Alshehri 2022 table); n_D 1.3611, ρ 0.7893 g/cm³ (CRC 2014),
        // μ 1.69 D (Poling 2000). Each component must fall within its route's P90.
        Structure st = StructureParser.parse("smiles", "CCO");
        StructureEstimate group = StructureEstimator.estimate(st, MeasuredProperties.NONE);
        assertTrue(Math.abs(group.dD().value() - 15.8) <= EstimateErrors.GROUP_DD[1]);
        assertTrue(Math.abs(group.dP().value() - 8.8) <= EstimateErrors.GROUP_DP[1]);
        assertTrue(Math.abs(group.dH().value() - 19.4) <= EstimateErrors.GROUP_DH[1]);
        assertTrue(group.molarVolume().estimated());
        assertEquals(StructureEstimator.GROUP, group.dD().route());

        StructureEstimate prop = StructureEstimator.estimate(st, new MeasuredProperties(0.7893, 1.3611, 1.69, null));
        assertEquals(StructureEstimator.REFRACTIVE, prop.dD().route());
        assertEquals(StructureEstimator.DIPOLE, prop.dP().route());
        assertFalse(prop.molarVolume().estimated());
        assertEquals(58.37, prop.molarVolume().value(), 0.05);
        assertTrue(Math.abs(prop.dD().value() - 15.8) <= EstimateErrors.PROPERTY_DD[1]);
        assertTrue(Math.abs(prop.dP().value() - 8.8) <= EstimateErrors.PROPERTY_DP[1]);
        // ΔHvap(298 K) 42.32 kJ/mol (CRC 2014): δt within the route's P90 of the published √(15.8² + 8.8² + 19.4²) = 26.5,
        // and δH as its remainder within that route's P90 of 19.4; the estimate itself keeps the group δH
        MeasuredProperties withHvap = new MeasuredProperties(0.7893, 1.3611, 1.69, 42.32);
        StructureEstimate all = StructureEstimator.estimate(st, withHvap);
        EstimatedValue dt = StructureEstimator.totalFromVaporisation(all, withHvap);
        assertEquals(StructureEstimator.VAPORISATION, dt.route());
        assertTrue(Math.abs(dt.value() - Math.sqrt(15.8 * 15.8 + 8.8 * 8.8 + 19.4 * 19.4)) <= EstimateErrors.PROPERTY_DT[1], "δt " + dt.value());
        EstimatedValue rest = StructureEstimator.hydrogenBondingRemainder(all, withHvap);
        assertTrue(Math.abs(rest.value() - 19.4) <= EstimateErrors.PROPERTY_DH[1], "δH remainder " + rest.value());
        assertEquals(StructureEstimator.GROUP, all.dH().route());
        assertEquals(null, StructureEstimator.hydrogenBondingRemainder(group, withHvap), "no remainder from group-route δD and δP");
        assertEquals(null, StructureEstimator.totalFromVaporisation(prop, prop == null ? null : new MeasuredProperties(0.7893, 1.3611, 1.69, null)));
    }

    @Test
    void warnsForAMuchWorseFamilyAndForWhatTheTablesDoNotCover() {
        StructureEstimate acid = StructureEstimator.estimate(StructureParser.parse("smiles", "CC(=O)O"), MeasuredProperties.NONE);
        assertEquals("acid", acid.family());
        assertTrue(acid.warnings().stream().anyMatch(w -> w.startsWith("acid structures are estimated much less well")), acid.warnings().toString());
        // Pyridine's aromatic C–N bond has no published polar increment: no δP, said so, δD and δH still given.
        StructureEstimate pyridine = StructureEstimator.estimate(StructureParser.parse("smiles", "c1ccncc1"), MeasuredProperties.NONE);
        assertNotNull(pyridine.dD());
        assertTrue(pyridine.dP() == null && !pyridine.hasHansen());
        assertTrue(pyridine.warnings().stream().anyMatch(w -> w.contains("C~N")), pyridine.warnings().toString());
        // its UNIFAC groups are still found (C5H5N)
        assertEquals(Map.of(37, 1), pyridine.unifac().groups());
    }
}
