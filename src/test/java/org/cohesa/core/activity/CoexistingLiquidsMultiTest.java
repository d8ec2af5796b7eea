package org.cohesa.core.activity;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/** The liquid–liquid flash behind the coexisting-layers correction for three or more liquids. */
class CoexistingLiquidsMultiTest {

    private static final double T = 298.15;

    private static double[] moles(List<Solvent> s, double... phi) {
        return Composition.moleFractions(phi, Composition.molarVolumes(s));
    }

    @Test
    void aSplittingTernaryGivesTwoLayersWithEqualActivitiesAndTheirMaterialBalance() {
        // toluene + ethanol + water at 10/10/80 by volume separates into a toluene layer and a water layer (common
        // practice, no source; IUPAC-NIST SDS 69 compiles this ternary's two-liquid region, e.g. NIST SRD 106 69_87).
        // Checks: equal activities in both layers (the equilibrium condition) and the lever rule z = (1 − β)x′ + βx″.
        List<Solvent> s = BundledLiquids.all("toluene", "ethanol", "water");
        ActivityModel inner = ActivityModels.choose(s, false);
        double[] z = moles(s, 0.1, 0.1, 0.8);
        assertTrue(CoexistingLiquidsMulti.splitsNear(inner, z));
        CoexistingLiquidsMulti model = new CoexistingLiquidsMulti(inner);
        CoexistingLiquidsMulti.Layers layers = model.splitAt(z, T).orElseThrow();
        double[] g1 = inner.gamma(layers.first(), T);
        double[] g2 = inner.gamma(layers.second(), T);
        for (int i = 0; i < 3; i++) {
            assertEquals(layers.first()[i] * g1[i], layers.second()[i] * g2[i], 1e-6 * Math.max(1e-3, layers.first()[i] * g1[i]),
                    "activity of component " + i);
            assertEquals(z[i], (1 - layers.beta()) * layers.first()[i] + layers.beta() * layers.second()[i], 1e-8, "balance of " + i);
        }
        // the returned coefficients reproduce the layers' activities at the overall composition
        double[] eff = model.gamma(z, T);
        for (int i = 0; i < 3; i++) {
            assertEquals(layers.first()[i] * g1[i], z[i] * eff[i], 1e-9);
        }
    }

    @Test
    void aMiscibleTernaryIsLeftAlone() {
        // ethanol, acetone and water mix in all proportions (CRC Handbook, from memory)
        List<Solvent> s = BundledLiquids.all("ethanol", "acetone", "water");
        ActivityModel inner = ActivityModels.choose(s, false);
        double[] z = moles(s, 0.3, 0.2, 0.5);
        assertFalse(CoexistingLiquidsMulti.splitsNear(inner, z));
        CoexistingLiquidsMulti model = new CoexistingLiquidsMulti(inner);
        assertTrue(model.splitAt(z, T).isEmpty());
        assertArrayEquals(inner.gamma(z, T), model.gamma(z, T), 0);
    }
}
