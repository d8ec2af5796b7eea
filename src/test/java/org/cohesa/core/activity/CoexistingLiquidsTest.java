package org.cohesa.core.activity;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/** The binary model that returns the coexisting layers' activities inside its own miscibility gap. */
class CoexistingLiquidsTest {

    private static final double T = 298.15;

    @Test
    void insideTheGapEveryCompositionHasTheActivitiesOfTheCoexistingLayers() {
        // Thermodynamic identity (equal activities in coexisting phases, e.g. Prausnitz, Lichtenthaler, de Azevedo 1999,
        // ch. 6); water + 1-butanol is partly miscible at 25 °C (IUPAC-NIST SDS, solvent-db/water-miscibility.csv).
        List<Solvent> pair = BundledLiquids.all("1-butanol", "water");
        ActivityModel inner = ActivityModels.choose(pair, false);
        CoexistingLiquids model = new CoexistingLiquids(inner);
        BinaryLle.Phases layers = BinaryLle.solve(inner, T).orElseThrow();
        double[] lean = {layers.x1Lean(), 1 - layers.x1Lean()};
        double[] rich = {layers.x1Rich(), 1 - layers.x1Rich()};
        double[] gl = inner.gamma(lean, T);
        double[] gr = inner.gamma(rich, T);
        assertEquals(lean[0] * gl[0], rich[0] * gr[0], 1e-7, "butanol activity equal in both layers");
        assertEquals(lean[1] * gl[1], rich[1] * gr[1], 1e-7, "water activity equal in both layers");
        for (double f : new double[] {0.25, 0.5, 0.75}) {
            double x1 = layers.x1Lean() + f * (layers.x1Rich() - layers.x1Lean());
            double[] x = {x1, 1 - x1};
            double[] g = model.gamma(x, T);
            assertEquals(lean[0] * gl[0], x[0] * g[0], 1e-9, "butanol activity at x1 = " + x1);
            assertEquals(lean[1] * gl[1], x[1] * g[1], 1e-9, "water activity at x1 = " + x1);
            assertTrue(model.splitAt(x, T).isPresent());
        }
        // outside the gap the wrapped model is used as it is
        double[] outside = {layers.x1Lean() / 2, 1 - layers.x1Lean() / 2};
        assertArrayEquals(inner.gamma(outside, T), model.gamma(outside, T), 0);
        assertEquals(Optional.empty(), model.splitAt(outside, T));
    }

    @Test
    void aPairThatMixesIsLeftAlone() {
        // ethanol and water mix in all proportions (CRC Handbook; solvent-db/water-miscibility.csv)
        List<Solvent> pair = BundledLiquids.all("ethanol", "water");
        ActivityModel inner = ActivityModels.choose(pair, false);
        CoexistingLiquids model = new CoexistingLiquids(inner);
        for (double x1 : new double[] {0.01, 0.2, 0.5, 0.9}) {
            double[] x = {x1, 1 - x1};
            assertArrayEquals(inner.gamma(x, T), model.gamma(x, T), 0);
            assertTrue(model.splitAt(x, T).isEmpty());
        }
    }
}
