package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.ExposureLimit;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.Test;

/** The profile's decisions: no silent ideal fallback, non-flammable components, cautions. */
class SafetyProfilerTest {

    private static final SolventLibrary LIB = TestSolvents.bundled();

    private static Blend blend(String a, double fa, String b) {
        return new Blend(List.of(new BlendComponent(LIB.resolve("s", a), fa), new BlendComponent(LIB.resolve("s", b), 1 - fa)));
    }

    @Test
    void aBlendNoModelCanDescribeHasAnUnknownFlashPointNotAnIdealOne() {
        // a liquid with neither UNIFAC groups nor Hansen parameters (invented for this test) leaves no activity model
        Solvent unknown = TestSolvents.vle("test liquid without groups", "0-00-0", 100.0, 20.0, BlendFlashPointTest.ETHANOL,
                ExposureLimit.NONE, "H225");
        Blend b = new Blend(List.of(new BlendComponent(unknown, 0.5), new BlendComponent(LIB.resolve("s", "water"), 0.5)));
        SafetyProfile p = SafetyProfiler.profile(b, 298.15);
        assertEquals(SafetyProfile.FlashPointStatus.UNKNOWN, p.flashPoint().status());
        assertNull(p.flashPoint().celsius());
        assertTrue(p.flashPoint().detail().get(0).contains("test liquid without groups"), p.flashPoint().detail().toString());
        assertNull(p.ghs().category());
        List<String> c = Cautions.forProfile(p);
        assertTrue(c.stream().anyMatch(s -> s.contains("could not be estimated")), c.toString());
    }

    @Test
    void waterIsNotFlammableAndDilutesTheBlend() {
        SafetyProfile water = SafetyProfiler.profile(Blend.pure(LIB.resolve("s", "water")), 298.15);
        assertEquals(SafetyProfile.FlashPointStatus.NOT_FLAMMABLE, water.flashPoint().status());
        assertNull(water.packingGroup());
        assertEquals(GuideRank.RECOMMENDED, water.guideRank());
        SafetyProfile aqueous = SafetyProfiler.profile(blend("ethanol", 0.4, "water"), 298.15);
        assertTrue(aqueous.flashPoint().celsius() > LIB.resolve("s", "ethanol").flashPointC(), "water raises the flash point");
        assertTrue(aqueous.flashPoint().detail().stream().anyMatch(d -> d.contains("water")), "the non-flammable component is named");
    }

    @Test
    void estimatedVapourPressuresAreUsedAndNamed() {
        // tert-butyl acetate has no published correlation that passes the boiling-point check; its stored curve is a
        // Clausius–Clapeyron estimate from Tb and the CRC ΔHvap values (solvent-db/SOURCES.md): it serves, and says so
        SafetyProfile p = SafetyProfiler.profile(blend("ethanol", 0.5, "tert-butyl acetate"), 298.15);
        assertEquals(SafetyProfile.FlashPointStatus.COMPUTED, p.flashPoint().status(), p.flashPoint().detail().toString());
        assertTrue(p.flashPoint().detail().stream().anyMatch(d -> d.contains("tert-butyl acetate") && d.contains("Clausius")),
                p.flashPoint().detail().toString());
        // Le Chatelier with positive weights: the blend flashes between its components' flash points or below the lower one
        assertTrue(p.flashPoint().celsius() < LIB.resolve("s", "ethanol").flashPointC());
    }

    @Test
    void aPureSolventsOwnStatementStandsInForAMissingFlashPoint() {
        // H226 declares GHS Category 3 (GHS Rev. 10 Annex 3 / Table 2.6.1); Class 3 liquids of that category travel in PG III
        Solvent noFp = TestSolvents.guideInput("test liquid H226 without flash point", "0-00-1", "ether", 150.0, null, null, false, "H226");
        SafetyProfile p = SafetyProfiler.profile(Blend.pure(noFp), 298.15);
        assertEquals(SafetyProfile.FlashPointStatus.UNKNOWN, p.flashPoint().status());
        assertEquals(3, p.ghs().category());
        assertEquals("III", p.packingGroup());
    }

    @Test
    void aLabelThatDisagreesWithTheFlashPointIsPointedOut() {
        // n-butyl acetate: IEC 60079-20-1:2010 flash point 22 °C (Category 2 by Table 2.6.1), CLP Annex VI H226 (Category 3, from memory)
        Solvent nba = TestSolvents.guideInput("n-butyl acetate", "123-86-4", "ester", 126.0, 22.0, 390.0, false, "H226 H336");
        List<String> c = Cautions.forProfile(SafetyProfiler.profile(Blend.pure(nba), 298.15));
        assertTrue(c.stream().anyMatch(s -> s.contains("declare GHS Category 3") && s.contains("Category 2")), c.toString());
    }

    @Test
    void blendRankIsTheLeastFavourableComponent() {
        SafetyProfile p = SafetyProfiler.profile(blend("ethanol", 0.5, "N-methyl-2-pyrrolidone"), 298.15);
        assertEquals(GuideRank.HAZARDOUS, p.guideRank());
        assertEquals("reproductive toxicant", p.cmr().get(0).effect());
        assertEquals(50.0, p.cmr().get(0).volumePercent(), 1e-9);
    }

    @Test
    void hazardStatementsCarryTheirComponentsAndShares() {
        SafetyProfile p = SafetyProfiler.profile(blend("toluene", 0.3, "ethyl acetate"), 298.15);
        SafetyProfile.HazardLine h225 = p.hazardStatements().stream().filter(h -> h.code().equals("H225")).findFirst().orElseThrow();
        assertEquals(2, h225.carriers().size());
        SafetyProfile.HazardLine h304 = p.hazardStatements().stream().filter(h -> h.code().equals("H304")).findFirst().orElseThrow();
        assertEquals("toluene", h304.carriers().get(0).name());
        assertEquals(30.0, h304.carriers().get(0).volumePercent(), 1e-9);
        assertEquals(List.of("toluene"), p.aspirationHazards());
    }

    @Test
    void everyCautionListEndsWithTheReminder() {
        for (Blend b : List.of(Blend.pure(LIB.resolve("s", "water")), Blend.pure(LIB.resolve("s", "diethyl ether")), blend("ethanol", 0.3, "water"),
                blend("dichloromethane", 0.5, "methanol"))) {
            List<String> c = Cautions.forProfile(SafetyProfiler.profile(b, 298.15));
            assertEquals(Cautions.REMINDER, c.get(c.size() - 1), b.describe());
        }
        List<String> ether = Cautions.forProfile(SafetyProfiler.profile(Blend.pure(LIB.resolve("s", "diethyl ether")), 298.15));
        assertTrue(ether.stream().anyMatch(s -> s.contains("peroxides")), ether.toString());
        assertTrue(ether.stream().anyMatch(s -> s.contains("highly flammable")), ether.toString());
        List<String> water = Cautions.forProfile(SafetyProfiler.profile(Blend.pure(LIB.resolve("s", "water")), 298.15));
        assertEquals(1, water.size(), "water alone needs only the reminder: " + water);
    }

    @Test
    void temperatureOutsideTheRangeIsRejectedNamingTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> SafetyProfiler.profile(Blend.pure(LIB.resolve("s", "water")), 1000));
        assertEquals("temperature", e.field());
        assertFalse(e.getMessage().isBlank());
    }

    @Test
    void insideTheModelsMiscibilityGapTheFlashPointIsTheSameAtEveryComposition() {
        // Methanol and n-heptane are only partly miscible near room temperature (common practice, no source). Over a
        // two-liquid mixture in equilibrium the vapour is that of either layer, so the flash point is constant across
        // the gap (Liaw, Lu, Gerbaud & Chen, J. Hazard. Mater. 153 (2008) 1165; from memory) — the phase rule: at fixed
        // pressure a two-phase binary has one degree of freedom left, temperature.
        double[] inGap = {0.1, 0.2, 0.5, 0.8};
        double first = Double.NaN;
        for (double f : inGap) {
            SafetyProfile p = SafetyProfiler.profile(blend("methanol", f, "n-heptane"), 298.15);
            assertEquals(SafetyProfile.FlashPointStatus.COMPUTED, p.flashPoint().status(), p.flashPoint().detail().toString());
            assertTrue(p.flashPoint().detail().stream().anyMatch(d -> d.contains("two liquid layers")), p.flashPoint().detail().toString());
            if (Double.isNaN(first)) {
                first = p.flashPoint().celsius();
            }
            assertEquals(first, p.flashPoint().celsius(), 0.05, "flash point at " + f + " methanol by volume");
        }
        // below both pure flash points (minimum-flash-point behaviour; the library has methanol 9 °C, n-heptane −7 °C)
        double lowestPure = Math.min(LIB.resolve("s", "methanol").flashPointC(), LIB.resolve("s", "n-heptane").flashPointC());
        assertTrue(first < lowestPure, first + " °C against " + lowestPure + " °C");
        // outside the gap the one-liquid calculation stands and says nothing of layers
        SafetyProfile rich = SafetyProfiler.profile(blend("methanol", 0.97, "n-heptane"), 298.15);
        assertFalse(rich.flashPoint().detail().stream().anyMatch(d -> d.contains("two liquid layers")), rich.flashPoint().detail().toString());
        assertTrue(rich.flashPoint().celsius() > first + 1, "nearly pure methanol flashes higher than the two-layer mixture");
    }
}
