package org.cohesa.core.target;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.store.BundledData;
import org.cohesa.store.MaterialCsv;
import org.junit.jupiter.api.Test;

/** The radius–centre trade-off note of the likelihood fit ({@link RadiusCentreTradeOff}). */
class RadiusCentreTradeOffTest {

    @Test
    void spheresOnALineGiveItsSlopeAndIndependentOnesDoNot() {
        SplittableRandom rng = new SplittableRandom(3);
        List<double[]> line = new ArrayList<>();
        List<double[]> cloud = new ArrayList<>();
        for (int i = 0; i < 400; i++) {
            double r = 8 + 6 * rng.nextDouble();
            // centre = (17, 8, 6) + (0.5, −0.2, 0.1)·(R0 − 8), with a little scatter: least squares recovers the
            // slope and R² near 1 (common practice, no source)
            line.add(new double[] {17 + 0.5 * (r - 8) + 0.02 * rng.nextGaussian(), 8 - 0.2 * (r - 8) + 0.02 * rng.nextGaussian(),
                    6 + 0.1 * (r - 8) + 0.02 * rng.nextGaussian(), r});
            cloud.add(new double[] {17 + rng.nextGaussian(), 8 + rng.nextGaussian(), 6 + rng.nextGaussian(), r});
        }
        RadiusCentreTradeOff t = RadiusCentreTradeOff.of(line).orElseThrow();
        assertEquals(0.5, t.slope()[0], 0.01);
        assertEquals(-0.2, t.slope()[1], 0.01);
        assertEquals(0.1, t.slope()[2], 0.01);
        assertTrue(t.rSquared() > 0.99, "R² " + t.rSquared());
        assertTrue(t.matters());
        // in the Ra metric δD's shift counts double: 1.0 against 0.2 and 0.1
        assertEquals("+δD", t.direction());
        RadiusCentreTradeOff u = RadiusCentreTradeOff.of(cloud).orElseThrow();
        assertTrue(u.rSquared() < 0.05, "R² " + u.rSquared());
        assertFalse(u.matters());
        assertTrue(RadiusCentreTradeOff.of(line.subList(0, 10)).isEmpty(), "too few spheres");
    }

    @Test
    void polystyrenesOpenHighDispersionSideIsNamedAndPolycarbonateIsNot() throws Exception {
        // Truth: Hansen 2007 Table A.2 spheres (recalled, solvent-db/materials.csv). Polystyrene (δD 21.3, R0 12.7)
        // lies beyond every common test liquid in δD, so 30 of them leave that side open (bench fit-checks --limits:
        // its fits miss by a median 1.94 with δD 0.6 too low and R0 0.9 too small); polycarbonate's are bounded
        // (median 0.58).
        BundledData b = BundledData.resource("materials.csv");
        List<Material> all = MaterialCsv.read(b.name(), new InputStreamReader(new ByteArrayInputStream(b.bytes()), StandardCharsets.UTF_8), false);
        List<NamedPoint> pool = CommonTestLiquids.resolve(BundledLibrary.get());
        SplittableRandom rng = new SplittableRandom(5);
        int named = 0;
        int pcNamed = 0;
        for (int k = 0; k < 4; k++) {
            FitResult ps = fit(all, "polystyrene", pool, rng, k);
            String note = ps.notes().stream().filter(n -> n.startsWith("centre and radius slide together")).findFirst().orElse(null);
            if (note != null) {
                named++;
                assertTrue(note.contains("further towards +δD"), note);
            }
            pcNamed += fit(all, "polycarbonate", pool, rng, k).notes().stream().anyMatch(n -> n.startsWith("centre and radius")) ? 1 : 0;
        }
        assertTrue(named >= 3, "polystyrene's trade-off named in " + named + " of 4");
        assertTrue(pcNamed <= 1, "polycarbonate's named in " + pcNamed + " of 4");
    }

    private static FitResult fit(List<Material> all, String name, List<NamedPoint> pool, SplittableRandom rng, long seed) {
        SolubilitySphere truth = all.stream().filter(m -> m.name().equals(name)).findFirst().orElseThrow().sphere();
        SyntheticSeries s = FitValidation.usable(truth, pool, new FitValidation.Scenario(30, 0, 0), rng);
        return SphereFitter.fit(s.results(), List.of(), new FitOptions(seed, 0, 12, 0));
    }
}
