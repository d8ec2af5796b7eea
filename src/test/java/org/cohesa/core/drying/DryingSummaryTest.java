package org.cohesa.core.drying;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.activity.WaterJudgement;
import org.cohesa.core.solvent.Blend;
import org.cohesa.store.WaterMiscibilityCsv;
import org.junit.jupiter.api.Test;

/** The drying summary agrees with the path it summarises; water blends are judged by measured data first. */
class DryingSummaryTest {

    private static final double T25 = 298.15;

    private static Blend blend(String text) {
        return BundledLiquids.library().resolveBlend("test", text);
    }

    @Test
    void practicallyGoneAgreesWithThePathTable() {
        // acetone in n-butyl acetate: the summary's moment must be where the path shows (almost) none of it left
        Blend b = blend("acetone:0.3,n-butyl acetate:0.7");
        DryingPath p = DryingSimulator.simulate(new DryingRequest(b, null, T25, 0.95, false, 0.01, false));
        DryingPath.Exhaustion gone = p.exhausted().get(0);
        assertEquals("acetone", gone.solvent());
        double initial = 0.3;
        for (PathPoint pt : p.points()) {
            double left = pt.composition().get("acetone") * (1 - pt.evaporated()) / initial;
            if (pt.evaporated() < gone.evaporated() - 1e-9) {
                assertTrue(left > DryingSimulator.PRACTICALLY_GONE, "before " + gone.evaporated() + ": " + left + " at " + pt.evaporated());
            } else {
                assertTrue(left <= DryingSimulator.PRACTICALLY_GONE * (1 + 1e-6), "after: " + left + " at " + pt.evaporated());
                // the table prints φ with three decimals: from there on acetone reads 0.000 or 0.001
                assertTrue(pt.composition().get("acetone") < 0.0015, "φ " + pt.composition().get("acetone"));
            }
        }
        // acetone (30 % of the volume) cannot be gone before 30 % has evaporated, and is gone well before 95 %
        assertTrue(gone.evaporated() > 0.3 && gone.evaporated() < 0.6, "gone at " + gone.evaporated());
    }

    @Test
    void butoxyethanolInWaterStaysOnePhaseWhileItDries() {
        // 2-butoxyethanol and water are miscible below their LCST of about 49 °C (Wikipedia "2-Butoxyethanol", a tertiary source)
        DryingPath p = DryingSimulator.simulate(new DryingRequest(blend("2-butoxyethanol:0.2,water:0.8"), null, T25, 0.95, false, 0.05, true,
                WaterMiscibilityCsv.bundled()));
        assertNull(p.splitsAt(), p.phases() == null ? "" : p.phases().detail());
        assertNotNull(p.phases());
        assertEquals(WaterJudgement.Basis.MEASURED, p.phases().basis());
        // without the data the LLE model alone predicts a false split: the measured data are what fix it
        DryingPath model = DryingSimulator.simulate(new DryingRequest(blend("2-butoxyethanol:0.2,water:0.8"), null, T25, 0.95, false, 0.05, true));
        assertNotNull(model.splitsAt());
        assertFalse(model.phases().basis() == WaterJudgement.Basis.MEASURED);
    }

    @Test
    void tolueneWaterSplitsFromTheStartByTheData() {
        // toluene dissolves 0.052 mass % in water (IUPAC-NIST Solubility Data Series 81; from memory)
        DryingPath p = DryingSimulator.simulate(new DryingRequest(blend("toluene:0.5,water:0.5"), null, T25, 0.5, false, 0.05, true,
                WaterMiscibilityCsv.bundled()));
        assertEquals(0.0, p.splitsAt());
        assertEquals(WaterJudgement.Basis.MEASURED, p.phases().basis());
    }
}
