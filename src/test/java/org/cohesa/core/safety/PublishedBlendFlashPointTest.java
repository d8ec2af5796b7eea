package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
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

    /** One measured point of {@code published-blend-flash-points.csv}. */
    record MeasuredPoint(String system, String first, String second, String basis, double fraction, double celsius, String source) {
    }

    static List<MeasuredPoint> measuredPoints() {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).setCommentMarker('#').get();
        try (Reader in = new InputStreamReader(PublishedBlendFlashPointTest.class.getResourceAsStream("published-blend-flash-points.csv"),
                StandardCharsets.UTF_8); CSVParser p = CSVParser.builder().setReader(in).setFormat(format).get()) {
            List<MeasuredPoint> out = new ArrayList<>();
            for (CSVRecord r : p) {
                out.add(new MeasuredPoint(r.get("system"), r.get("component_1"), r.get("component_2"), r.get("basis"),
                        Double.parseDouble(r.get("fraction_1")), Double.parseDouble(r.get("flash_point_c")), r.get("source")));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The first component's volume fraction for a point given by volume or by mass (pure-liquid densities, no contraction). */
    static double volumeFraction(MeasuredPoint m) {
        if (m.basis().equals("volume")) {
            return m.fraction();
        }
        if (!m.basis().equals("mass")) {
            throw new IllegalArgumentException("basis " + m.basis());
        }
        double r1 = LIB.resolve("s", m.first()).density();
        double r2 = LIB.resolve("s", m.second()).density();
        double v1 = m.fraction() / r1;
        double v2 = (1 - m.fraction()) / r2;
        return v1 / (v1 + v2);
    }

    /** Mean and worst |model − measured| per system, K, for the activity model (UNIFAC) or the ideal solution. */
    static Map<String, double[]> errorsBySystem(boolean ideal, StringBuilder report) {
        Map<String, double[]> out = new LinkedHashMap<>();
        Map<String, Integer> counts = new LinkedHashMap<>();
        for (MeasuredPoint m : measuredPoints()) {
            SafetyProfile p = profile(m.first(), volumeFraction(m), m.second(), ideal);
            assertEquals(SafetyProfile.FlashPointStatus.COMPUTED, p.flashPoint().status(), m + ": " + p.flashPoint().detail());
            double err = p.flashPoint().celsius() - m.celsius();
            double[] e = out.computeIfAbsent(m.system(), k -> new double[2]);
            e[0] += Math.abs(err);
            e[1] = Math.max(e[1], Math.abs(err));
            counts.merge(m.system(), 1, Integer::sum);
            report.append(String.format(Locale.ROOT, " %s %.0f%%: %.1f / %.0f (%+.1f);", m.system(), 100 * m.fraction(), p.flashPoint().celsius(),
                    m.celsius(), err));
        }
        out.forEach((k, e) -> e[0] /= counts.get(k));
        return out;
    }

    /**
     * Every published mixture in {@code published-blend-flash-points.csv} (our own file, a source per row), with
     * Liaw et al. (2002) and the library's activity model, mean and worst |error| asserted at the figures measured on
     * 2026-12-03 (docs/methods.md). Ethanol–water: the same tertiary numbers read once as % by volume (Wikipedia) and
     * once as % by mass (Engineering ToolBox); which basis is right is not settled, so both are checked.
     */
    @Test
    void everyPublishedMixtureAgainstItsMeasuredFlashPoints() {
        StringBuilder report = new StringBuilder("blend flash points, model / measured °C:");
        Map<String, double[]> unifac = errorsBySystem(false, report);
        Map<String, double[]> ideal = errorsBySystem(true, new StringBuilder());
        unifac.forEach((k, e) -> report.append(String.format(Locale.ROOT, "%n  %s: activity model mean %.1f K, worst %.1f K; ideal solution mean %.1f K, worst %.1f K",
                k, e[0], e[1], ideal.get(k)[0], ideal.get(k)[1])));
        System.out.println(report);
        assertEquals(List.of("ethanol-water (vol %)", "ethanol-water (mass %)"), List.copyOf(unifac.keySet()));
        assertErrors(unifac.get("ethanol-water (vol %)"), VOL_MEAN, VOL_WORST, report);
        assertErrors(unifac.get("ethanol-water (mass %)"), MASS_MEAN, MASS_WORST, report);
        for (String k : unifac.keySet()) {
            assertTrue(ideal.get(k)[0] > 2 * unifac.get(k)[0], k + ": the ideal solution is much worse; " + report);
        }
        assertTrue(profile("ethanol", 0.5, "water", false).flashPoint().model().contains("UNIFAC"), "the model that served is named");
    }

    private static void assertErrors(double[] e, double mean, double worst, StringBuilder report) {
        assertTrue(e[0] <= mean + 0.05, "mean |error| " + e[0] + " K; " + report);
        assertTrue(e[1] <= worst + 0.05, "worst |error| " + e[1] + " K; " + report);
    }

    // measured 2026-12-03, see docs/methods.md
    private static final double VOL_MEAN = 1.9;
    private static final double VOL_WORST = 7.0;
    private static final double MASS_MEAN = 3.3;
    private static final double MASS_WORST = 11.9;

    /**
     * Minimum-flash-point behaviour, qualitatively: Vidal, Rogers &amp; Mannan, "Prediction of minimum flash point behaviour
     * for binary mixtures", <i>Process Saf. Environ. Prot.</i> 84 (2006) 1, state in their abstract that octane–ethanol and
     * octane–1-butanol exhibit it (the mixture flashes below both pure liquids); their measured values could not be read
     * here, so only the behaviour is checked: the activity model must show a minimum at least 1 K below the lower pure flash
     * point (of the library), the ideal solution must not (it cannot, for a positive-deviation pair).
     */
    @Test
    void alcoholOctaneBlendsFlashBelowBothLiquids() {
        StringBuilder report = new StringBuilder("minimum flash point (model, vol % alcohol):");
        for (String alcohol : List.of("ethanol", "1-butanol")) {
            double lowerPure = Math.min(LIB.resolve("s", alcohol).flashPointC(), LIB.resolve("s", "n-octane").flashPointC());
            double minModel = Double.POSITIVE_INFINITY;
            double minIdeal = Double.POSITIVE_INFINITY;
            double at = Double.NaN;
            for (double f : new double[] {0.02, 0.05, 0.1, 0.2, 0.3, 0.5, 0.7, 0.9, 0.98}) {
                double m = profile(alcohol, f, "n-octane", false).flashPoint().celsius();
                if (m < minModel) {
                    minModel = m;
                    at = f;
                }
                minIdeal = Math.min(minIdeal, profile(alcohol, f, "n-octane", true).flashPoint().celsius());
            }
            report.append(String.format(Locale.ROOT, " %s + n-octane %.1f °C at %.0f %% (lower pure liquid %.1f °C, ideal solution %.1f °C);",
                    alcohol, minModel, 100 * at, lowerPure, minIdeal));
            assertTrue(minModel < lowerPure - 1, report.toString());
            assertTrue(minIdeal > lowerPure - 0.5, report.toString());
        }
        System.out.println(report);
    }

    @Test
    void theIdealSolutionBadlyOverestimatesAqueousBlends() {
        // the same tertiary table (published-blend-flash-points.csv): 20 % by volume flashes at 36 °C; Raoult's law (γ = 1)
        // misses the water-driven rise of γ(ethanol)
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
