package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.Test;

/**
 * A partly miscible organic + water mixture boils at its heterogeneous azeotrope whatever its overall composition
 * inside the gap: the vapour is that of the coexisting layers. With the coexisting-layer activities
 * ({@link org.cohesa.core.activity.CoexistingLiquids}) the profile's initial boiling point must be the same at 20, 50
 * and 80 % by volume, and close to the published heteroazeotrope boiling point at 101.325 kPa.
 */
class TwoLayerBoilingPointTest {

    private static final SolventLibrary LIB = TestSolvents.bundled();

    /** solvent, heteroazeotrope boiling point with water, °C: CRC Handbook, "Azeotropic data" table (from memory). */
    private static final List<Object[]> AZEOTROPES = List.of(
            new Object[] {"1-butanol", 92.7},
            new Object[] {"isobutanol", 89.9},
            new Object[] {"ethyl acetate", 70.4},
            new Object[] {"toluene", 84.1},
            new Object[] {"n-heptane", 79.2});

    @Test
    void insideTheGapTheBubblePointIsTheHeteroazeotrope() {
        StringBuilder table = new StringBuilder();
        for (Object[] a : AZEOTROPES) {
            String name = (String) a[0];
            double published = (Double) a[1];
            double first = Double.NaN;
            for (double phi : new double[] {0.2, 0.5, 0.8}) {
                Blend b = new Blend(List.of(new BlendComponent(LIB.resolve("s", name), phi), new BlendComponent(LIB.resolve("s", "water"), 1 - phi)));
                SafetyProfile p = SafetyProfiler.profile(b, 298.15);
                double ibp = p.initialBoilingPointC();
                if (Double.isNaN(first)) {
                    first = ibp;
                }
                assertEquals(first, ibp, 0.05, name + " + water at " + phi + " by volume: the same two layers boil at one temperature");
            }
            table.append(String.format(Locale.ROOT, "%s %.1f (published %.1f); ", name, first, published));
            assertTrue(Math.abs(first - published) <= 1.5, name + ": " + first + " °C against the heteroazeotrope's " + published + " °C");
        }
        System.out.println("two-layer bubble points with water, °C: " + table);
    }

    @Test
    void aTernaryWithTwoLayersBoilsAboveItsAzeotropeAndFlashesNearItsOrganicLayer() {
        // toluene + ethanol + water 10/10/80 by volume: two layers. No liquid of these three boils below their
        // minimum-boiling ternary azeotrope, 74.4 °C (CRC Handbook, "Azeotropic data", from memory); the toluene layer
        // holds little water, so the blend flashes near toluene's 4 °C (library), a little below it for the ethanol in
        // it. The one-liquid calculation gave a bubble point of 15.9 °C and a flash point of −51.7 °C.
        Blend b = new Blend(List.of(new BlendComponent(LIB.resolve("s", "toluene"), 0.1), new BlendComponent(LIB.resolve("s", "ethanol"), 0.1),
                new BlendComponent(LIB.resolve("s", "water"), 0.8)));
        SafetyProfile p = SafetyProfiler.profile(b, 298.15);
        assertTrue(p.initialBoilingPointC() > 74.4 - 1.5 && p.initialBoilingPointC() < 100, "bubble point " + p.initialBoilingPointC());
        double fp = p.flashPoint().celsius();
        assertTrue(fp > -10 && fp <= LIB.resolve("s", "toluene").flashPointC() + 0.5, "flash point " + fp);
        assertTrue(p.flashPoint().detail().stream().anyMatch(d -> d.contains("two liquid layers")), p.flashPoint().detail().toString());
    }
}
