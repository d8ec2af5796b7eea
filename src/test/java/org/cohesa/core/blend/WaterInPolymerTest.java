package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.junit.jupiter.api.Test;

/**
 * Water as a blend component for a polymer water does not dissolve. Water is the non-solvent that precipitates PVDF from
 * NMP or DMAc in membrane casting (common practice, no source); water's parameters 15.5/16.0/42.3 (Hansen 2007, as in the
 * bundled table).
 */
class WaterInPolymerTest {

    private static final Solvent WATER = org.cohesa.core.activity.BundledLiquids.get("water");

    private static Material material(String name, MaterialKind kind, double dD, double dP, double dH, double r0, String note) {
        return new Material(name, List.of(), kind, new SolubilitySphere(new HansenParameters(dD, dP, dH), r0), "test", note, false);
    }

    @Test
    void waterIsLeftOutForAPolymerItDoesNotDissolve() {
        // PVDF sphere 17.0/12.1/10.2, R0 4.1 (the bundled one): water lies at RED ≈ 7.9
        Material pvdf = material("PVDF", MaterialKind.POLYMER, 17.0, 12.1, 10.2, 4.1, "");
        assertTrue(WaterInPolymer.reasonToLeaveOut(pvdf, WATER).orElseThrow().contains("RED 7.9"));
        Material resin = material("resin", MaterialKind.RESIN, 20.4, 12.0, 11.5, 12.7, "");
        assertTrue(WaterInPolymer.reasonToLeaveOut(resin, WATER).isPresent());
    }

    @Test
    void drugsWaterSolublePolymersAndSpheresHoldingWaterKeepIt() {
        // water–cosolvent blends are everyday practice for small molecules (common practice, no source)
        assertFalse(WaterInPolymer.reasonToLeaveOut(material("paracetamol", MaterialKind.DRUG, 17.8, 10.5, 13.9, 7.0, ""), WATER).isPresent());
        // PEO dissolves in cold water although its sphere leaves water outside (common practice, no source)
        assertFalse(WaterInPolymer.reasonToLeaveOut(material("PEO", MaterialKind.POLYMER, 17.3, 3.0, 9.4, 8.4, "water-soluble (…)"), WATER).isPresent());
        // a sphere that holds water itself (RED ≤ 1) keeps it
        assertFalse(WaterInPolymer.reasonToLeaveOut(material("hydrogel", MaterialKind.POLYMER, 16.0, 16.0, 38.0, 10.0, ""), WATER).isPresent());
    }
}
