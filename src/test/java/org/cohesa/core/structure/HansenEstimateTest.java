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
    void stefanisPanayiotouAndTheCombinedRouteErrorsAreTheStatedOnes() {
        // Same table and join. S–P: Stefanis & Panayiotou, Int. J. Pharm. 426 (2012) 29, Appendix A, as transcribed by a
        // third party (StefanisPanayiotouTables: not checked against the paper here).
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        String[] c = {"δD", "δP", "δH"};
        for (int k = 0; k < 3; k++) {
            assertStated("S–P " + c[k], EstimateErrors.SP[k]);
            assertStated("combined " + c[k], EstimateErrors.COMBINED[k]);
            assertStated("combined on Mathieu's set " + c[k], EstimateErrors.COMBINED_ON_MATHIEU_SET[k]);
            assertStated("combined mean " + c[k], EstimateErrors.MEAN[k]);
            assertStated("combined Mathieu alone " + c[k], EstimateErrors.MATHIEU_ALONE[k]);
        }
        assertStated("combined S–P alone δP", EstimateErrors.SP_ALONE[1]);
        // no compound of the table takes δD or δH from S–P alone, so those carry the method's overall figures
        assertTrue(validation.of("combined S–P alone δD").all.isEmpty() && validation.of("combined S–P alone δH").all.isEmpty(), validation.summary());
        assertEquals(EstimateErrors.SP[0][0], EstimateErrors.SP_ALONE[0][0]);
        assertEquals(EstimateErrors.SP[2][0], EstimateErrors.SP_ALONE[2][0]);
        assertTrue(validation.spCovered >= 100, validation.summary());
    }

    @Test
    void theMeanWasChosenOnOneHalfAndHoldsOnTheOther() {
        // Common practice, no source: combine estimators on a development half, confirm on a held-out half. Halves by the
        // parity of the CAS check digit. On the compounds both methods cover, the mean must beat each method alone in every
        // component on the development half (the choice) and on the validation half (the check).
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        for (String half : new String[] {"dev", "validation"}) {
            for (String c : new String[] {"δD", "δP", "δH"}) {
                double mean = validation.of(half + " mean " + c).mae();
                assertTrue(mean < validation.of(half + " Mathieu " + c).mae() && mean < validation.of(half + " S–P " + c).mae(),
                        half + " " + c + "\n" + validation.summary());
            }
        }
    }

    @Test
    void groupRouteErrorsStandAgainstThePapersOwn() {
        // Mathieu, ACS Omega 3 (2018) 17049, MAE δD / δP / δH on its external set of 769 Hansen-handbook values,
        // 0.75 / 2.08 / 1.67 MPa½, and leave-one-out on 174 experimental values 0.68 / 2.00 / 1.55: second-hand, as
        // tabulated in stanlo229/fluoropolymer_replacement_virtual_screening hsp/docs/literature_ml_hsp.md (commit
        // 960a8d07), which states it read them from the paper. Not the same compounds.
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        // The Mathieu groups alone: δD and δH at or below the paper's external figures, δP above by 0.11 (2.19): the
        // bound 0.12 keeps that shortfall from growing unnoticed.
        assertTrue(validation.of("group δD").mae() <= 0.75, validation.summary());
        assertTrue(validation.of("group δH").mae() <= 1.67, validation.summary());
        assertTrue(validation.of("group δP").mae() - 2.08 <= 0.12, validation.summary());
        // The default combined route on the same 407 compounds: at or below both of the paper's figure sets in every component.
        double[] loo = {0.68, 2.00, 1.55};
        String[] c = {"δD", "δP", "δH"};
        for (int k = 0; k < 3; k++) {
            assertTrue(validation.of("combined on Mathieu's set " + c[k]).mae() <= loo[k], c[k] + "\n" + validation.summary());
            assertTrue(validation.of("combined on Mathieu's set " + c[k]).mae() < validation.of("group " + c[k]).mae(), validation.summary());
        }
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
    void theBundledSetsTakeTheDipoleRouteForDeltaPOnlyBecauseItWinsOnTheSameCompounds() {
        // Rule (common practice, no source): a property route replaces the default group route in the bundled estimated
        // sets only for a component where it beats the group route on the same validation compounds in MAE and P90.
        // Inputs as above; the group route is the default combined one. Figures as in docs/methods.md (measured here).
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
        double[][] stated = {
            {1.51, 2.83, 1.02, 2.17}, // δP: group, then Hansen–Beerbower from μ, on the 71 compounds with μ and a group δP
            {0.56, 1.26, 0.65, 1.37}, // δD: group, then n_D (Lorentz–Lorenz), on the 370 with n_D
            {1.17, 2.35, 1.94, 5.10}}; // δH: group, then the remainder, on the 64 with ΔHvap, n_D and μ
        String[] c = {"δP", "δD", "δH"};
        for (int k = 0; k < 3; k++) {
            String group = "like for like " + c[k] + " group";
            String property = "like for like " + c[k] + " property";
            assertStated(group, new double[] {stated[k][0], stated[k][1]});
            assertStated(property, new double[] {stated[k][2], stated[k][3]});
            assertEquals(validation.of(group).all.size(), validation.of(property).all.size());
        }
        HansenValidation.Errors gp = validation.of("like for like δP group");
        HansenValidation.Errors pp = validation.of("like for like δP property");
        assertTrue(pp.mae() < gp.mae() && pp.p90() < gp.p90(), "δP: the dipole route is adopted only while it wins\n" + validation.summary());
        // on the held-out half as well (the CAS-parity halves of the mean's choice)
        assertTrue(validation.of("validation δP property").mae() < validation.of("validation δP group").mae(), validation.summary());
        assertTrue(validation.of("like for like δD group").mae() < validation.of("like for like δD property").mae(), "δD stays on the groups");
        assertTrue(validation.of("like for like δH group").mae() < validation.of("like for like δH property").mae(), "δH stays on the groups");
    }

    @Test
    void theFamiliesThatGetAWarningAreTheMuchWorseOnes() {
        // Rule: a family (at least 5 compounds) whose group-route MAE exceeds 1.5 times the overall MAE in any
        // component is much worse; exactly those carry a warning, with their measured figures.
        assertMuchWorse(new String[] {"combined δD", "combined δP", "combined δH"}, EstimateErrors.MUCH_WORSE);
    }

    @Test
    void theFamiliesThatGetAWarningOnTheMathieuRouteAreItsMuchWorseOnes() {
        // the same rule for the Mathieu groups alone (GroupRoute.MATHIEU, kept for comparison)
        assertMuchWorse(new String[] {"group δD", "group δP", "group δH"}, EstimateErrors.MUCH_WORSE_MATHIEU);
    }

    private static void assertMuchWorse(String[] keys, Map<String, double[]> stated) {
        Assumptions.assumeTrue(validation != null, "reference-data folder not found; skipping the validation");
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
        worse.forEach((f, mae) -> System.out.printf(java.util.Locale.ROOT, "much worse (%s): %s %.2f %.2f %.2f%n", keys[0], f, mae[0], mae[1], mae[2]));
        assertEquals(worse.keySet(), new java.util.TreeSet<>(stated.keySet()));
        worse.forEach((f, mae) -> {
            for (int c = 0; c < 3; c++) {
                assertEquals(mae[c], stated.get(f)[c], 0.0051, f + " " + keys[c]);
            }
        });
    }

    @Test
    void ethanolByBothRoutesLandsNearItsPublishedParameters() {
        // Ethanol: published (15.8, 8.8, 19.4) MPa½ (Alshehri 2022 table); n_D 1.3611, ρ 0.7893 g/cm³ (CRC 2014),
        // μ 1.69 D (Poling 2000). Each component must fall within its route's P90.
        Structure st = StructureParser.parse("smiles", "CCO");
        // Two carbons: outside the Stefanis–Panayiotou range (three or more), so the Mathieu groups alone.
        StructureEstimate group = StructureEstimator.estimate(st, MeasuredProperties.NONE);
        assertTrue(Math.abs(group.dD().value() - 15.8) <= group.dD().expectedP90());
        assertTrue(Math.abs(group.dP().value() - 8.8) <= group.dP().expectedP90());
        assertTrue(Math.abs(group.dH().value() - 19.4) <= group.dH().expectedP90());
        assertTrue(group.molarVolume().estimated());
        assertEquals(StructureEstimator.GROUP, group.dD().route());
        assertEquals(EstimateErrors.MATHIEU_ALONE[0][0], group.dD().expectedMae());

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
        StructureEstimate amide = StructureEstimator.estimate(StructureParser.parse("smiles", "CN(C)C(C)=O"), MeasuredProperties.NONE);
        assertEquals("amide", amide.family());
        assertTrue(amide.warnings().stream().anyMatch(w -> w.startsWith("amide structures are estimated much less well")), amide.warnings().toString());
        // On the Mathieu route alone acids are a much-worse family (they are not on the combined route).
        StructureEstimate acid = StructureEstimator.estimate(StructureParser.parse("smiles", "CC(=O)O"), MeasuredProperties.NONE,
                StructureEstimator.GroupRoute.MATHIEU);
        assertTrue(acid.warnings().stream().anyMatch(w -> w.startsWith("acid structures are estimated much less well")), acid.warnings().toString());
        // Pyridine's aromatic C–N bond has no Mathieu polar increment: on the Mathieu route no δP, said so, δD and δH given;
        // on the default route the Stefanis–Panayiotou groups (Kekulé form, pyridine second-order group) give δP alone.
        StructureEstimate mathieu = StructureEstimator.estimate(StructureParser.parse("smiles", "c1ccncc1"), MeasuredProperties.NONE,
                StructureEstimator.GroupRoute.MATHIEU);
        assertNotNull(mathieu.dD());
        assertTrue(mathieu.dP() == null && !mathieu.hasHansen());
        assertTrue(mathieu.warnings().stream().anyMatch(w -> w.contains("C~N")), mathieu.warnings().toString());
        StructureEstimate pyridine = StructureEstimator.estimate(StructureParser.parse("smiles", "c1ccncc1"), MeasuredProperties.NONE);
        assertTrue(pyridine.hasHansen());
        assertEquals(StructureEstimator.GROUP_SP, pyridine.dP().route());
        assertEquals(StructureEstimator.GROUP_MEAN, pyridine.dD().route());
        assertTrue(pyridine.warnings().stream().anyMatch(w -> w.contains("C~N") && w.contains("δP comes from the Stefanis–Panayiotou groups alone")),
                pyridine.warnings().toString());
        // its UNIFAC groups are still found (C5H5N)
        assertEquals(Map.of(37, 1), pyridine.unifac().groups());
    }
}
