package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.Test;

/**
 * Blend flash points from {@link SafetyProfiler} (Liaw et al. 2002 with the library's activity model, bundled solvent data)
 * against measured values. Errors are printed so the build log carries them; docs/methods.md quotes them.
 */
class PublishedBlendFlashPointTest {

    private static final SolventLibrary LIB = TestSolvents.bundled();

    private static SafetyProfile profile(String a, double fa, String b, boolean ideal) {
        Solvent sa = LIB.resolve("solvent", a);
        Solvent sb = LIB.resolve("solvent", b);
        return SafetyProfiler.profile(new Blend(List.of(new BlendComponent(sa, fa), new BlendComponent(sb, 1 - fa))), 298.15, ideal);
    }

    /**
     * Ethanol–water, a strongly non-ideal aqueous pair. Measured closed-cup flash points by % alcohol by volume as
     * tabulated in the "Ethanol" article of Wikipedia (Flammability section, citing its own source; here read from a
     * 2015 copy on the ACS DCHAS list): 10 % 49 °C, 20 % 36, 30 % 29, 40 % 26, 50 % 24, 60 % 22, 70 % 21, 80 % 20,
     * 90 % 17, 96 % 17. A tertiary source: the test method and the original publication were not checked. Volume
     * fractions are converted to mole fractions with pure-liquid molar volumes (no volume contraction).
     */
    @Test
    void ethanolWaterAgainstMeasuredFlashPoints() {
        double[] abv = {0.10, 0.20, 0.30, 0.40, 0.50, 0.60, 0.70, 0.80, 0.90, 0.96};
        double[] measured = {49, 36, 29, 26, 24, 22, 21, 20, 17, 17};
        double sumAbs = 0;
        double maxAbs = 0;
        StringBuilder report = new StringBuilder("ethanol-water flash points (vol% ethanol: model / measured °C):");
        for (int i = 0; i < abv.length; i++) {
            SafetyProfile p = profile("ethanol", abv[i], "water", false);
            assertEquals(SafetyProfile.FlashPointStatus.COMPUTED, p.flashPoint().status(), p.flashPoint().detail().toString());
            double err = p.flashPoint().celsius() - measured[i];
            sumAbs += Math.abs(err);
            maxAbs = Math.max(maxAbs, Math.abs(err));
            report.append(String.format(Locale.ROOT, " %.0f%%: %.1f / %.0f (%+.1f);", abv[i] * 100, p.flashPoint().celsius(), measured[i], err));
            assertTrue(Math.abs(err) <= 8, report.toString());
        }
        double mae = sumAbs / abv.length;
        System.out.println(report + String.format(Locale.ROOT, " mean |error| %.1f K, max %.1f K", mae, maxAbs));
        assertTrue(mae <= 3.0, "mean absolute error " + mae + " K; " + report);
        assertTrue(profile("ethanol", 0.5, "water", false).flashPoint().model().contains("UNIFAC"),
                "the model that served is named");
    }

    @Test
    void theIdealSolutionBadlyOverestimatesAqueousBlends() {
        // same measured table: 20 % by volume flashes at 36 °C; Raoult's law (γ = 1) misses the water-driven rise of γ(ethanol)
        double ideal = profile("ethanol", 0.20, "water", true).flashPoint().celsius();
        double real = profile("ethanol", 0.20, "water", false).flashPoint().celsius();
        assertTrue(ideal - 36 > 15, "ideal estimate " + ideal + " °C");
        assertTrue(Math.abs(real - 36) < Math.abs(ideal - 36));
        assertTrue(profile("ethanol", 0.20, "water", true).flashPoint().model().contains("ideal"), "the ideal model is named when asked for");
    }

    /**
     * 2-Propanol–water at 70 % by volume ("rubbing alcohol"): suppliers' SDSs give a closed-cup flash point of about
     * 19–21 °C (from memory, no single SDS checked); taken here as 20 ± 3 °C.
     */
    @Test
    void isopropanolWater70PercentByVolume() {
        double fp = profile("2-propanol", 0.70, "water", false).flashPoint().celsius();
        System.out.println(String.format(Locale.ROOT, "2-propanol-water 70 vol%%: model %.1f °C vs about 20 °C (SDS, from memory), error %+.1f K", fp, fp - 20));
        assertEquals(20, fp, 3.0);
    }

    /**
     * Methanol + ethanol, a nearly ideal pair: Liaw et al. (2002) measured its flash points and found them between those
     * of the pure alcohols, well described by the ideal solution (from memory; the measured numbers are not reproduced here).
     * Check: the estimate lies between the pure flash points of the library and differs from the ideal estimate by &lt; 1 K.
     */
    @Test
    void methanolEthanolIsNearlyIdeal() {
        for (double f : new double[] {0.25, 0.5, 0.75}) {
            double fp = profile("methanol", f, "ethanol", false).flashPoint().celsius();
            double ideal = profile("methanol", f, "ethanol", true).flashPoint().celsius();
            double lo = Math.min(LIB.resolve("s", "methanol").flashPointC(), LIB.resolve("s", "ethanol").flashPointC());
            double hi = Math.max(LIB.resolve("s", "methanol").flashPointC(), LIB.resolve("s", "ethanol").flashPointC());
            assertTrue(fp >= lo - 0.5 && fp <= hi + 0.5, f + ": " + fp);
            assertEquals(ideal, fp, 1.0);
        }
    }
}
