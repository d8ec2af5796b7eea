package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The blend, replace and bench commands end to end on the bundled library. */
class BlendCommandsTest {

    @TempDir
    Path dir;

    private CliTestSupport.Result run(String... args) {
        return CliTestSupport.run(dir.resolve("t.db"), args);
    }

    @Test
    void hexaneWithMethanolIsFlaggedAsTwoPhase() {
        // Common practice, no source: n-hexane and methanol are only partly miscible at room temperature.
        // The target sits between them so the blend is the best answer geometrically.
        CliTestSupport.Result r = run("blend", "--target", "15.4,10,10,6", "--include", "n-hexane,methanol", "--max-components", "2",
                "--keep-two-phase", "--rank-by", "red", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode pair = null;
        for (JsonNode b : r.json().get("blends")) {
            if (b.get("components").size() == 2) {
                pair = b;
            }
        }
        assertTrue(pair != null, r.out());
        assertTrue(pair.get("phase").get("splits").asBoolean());
        assertTrue(pair.get("warnings").get(0).asText().startsWith("TWO LIQUID PHASES"), pair.toString());
        // Without --keep-two-phase the pair is left out and counted.
        CliTestSupport.Result dropped = run("blend", "--target", "15.4,10,10,6", "--include", "n-hexane,methanol", "--max-components", "2", "--rank-by", "red", "--json");
        for (JsonNode b : dropped.json().get("blends")) {
            assertEquals(1, b.get("components").size(), "no two-phase pair offered: " + b);
        }
        assertEquals(1, dropped.json().get("search").get("two_phase_left_out").asInt());
    }

    @Test
    void blendOfTwoNonSolventsDissolvesNitrocellulose() {
        // Common practice (from memory): collodion is nitrocellulose (pyroxylin) dissolved in diethyl ether with ethanol,
        // neither of which dissolves it alone. Sphere: the library's nitrocellulose entry (memory of Hansen 2007, Table A.2).
        CliTestSupport.Result r = run("blend", "--material", "nitrocellulose", "--include", "diethyl ether,ethanol",
                "--max-components", "2", "--keep-two-phase", "--rank-by", "red", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode blends = r.json().get("blends");
        JsonNode best = blends.get(0);
        assertEquals(2, best.get("components").size(), "the blend beats either liquid alone: " + r.out());
        assertTrue(best.get("red").asDouble() < 1, "the blend is inside the sphere");
        assertFalse(best.get("phase").get("splits").asBoolean(), "ether and ethanol mix");
        int singles = 0;
        for (JsonNode b : blends) {
            if (b.get("components").size() == 1) {
                singles++;
                assertTrue(b.get("red").asDouble() > 1, "each liquid alone is a non-solvent: " + b);
            }
        }
        assertEquals(2, singles);
    }

    @Test
    void blendTableRespectsConstraintsAndNamesWithCommas() {
        CliTestSupport.Result r = run("blend", "--target", "18,9,8,7", "--exclude", "1,4-dioxane,toluene", "--no-cmr",
                "--boiling-range", "60..160", "--min-flash-point", "0", "--max-ich-class", "2", "--fixed", "water:0.1",
                "--max-components", "3", "--top", "5", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode blends = r.json().get("blends");
        assertTrue(blends.size() > 0, r.out());
        for (JsonNode b : blends) {
            JsonNode first = b.get("components").get(0);
            assertEquals("water", first.get("name").asText());
            assertEquals(0.1, first.get("fraction").asDouble(), 1e-9);
            for (JsonNode c : b.get("components")) {
                String n = c.get("name").asText();
                assertFalse(n.equals("1,4-dioxane") || n.equals("toluene"), n);
            }
            assertTrue(b.has("cautions") && b.get("cautions").size() > 0);
        }
        CliTestSupport.Result table = run("blend", "--target", "18,9,8,7", "--rank-by", "hazard", "--top", "3");
        assertEquals(0, table.exitCode(), table.err());
        assertTrue(table.out().contains("hazard score") && table.out().contains("Screening estimates"), table.out());
    }

    @Test
    void minimumFlashPointHoldsForTheBlendItself() {
        CliTestSupport.Result r = run("blend", "--target", "17,6,8,6", "--min-flash-point", "25", "--max-components", "2", "--top", "8", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.json().get("blends").size() > 0, r.out());
        for (JsonNode b : r.json().get("blends")) {
            JsonNode fp = b.get("flash_point_c");
            assertTrue(fp.isNull() || fp.asDouble() >= 25, "blend flash point " + fp + " below the minimum: " + b);
            assertTrue(b.get("flash_point_basis").asText().length() > 0);
        }
    }

    @Test
    void replaceShowsTheOriginalBesideTheCandidates() {
        CliTestSupport.Result r = run("replace", "toluene", "--max-components", "2", "--top", "4", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        assertEquals("toluene", j.get("original").get("name").asText());
        assertEquals(4.0, j.get("target").get("r0").asDouble(), 0);
        for (JsonNode c : j.get("candidates")) {
            for (JsonNode comp : c.get("components")) {
                assertFalse(comp.get("name").asText().equals("toluene"), "the replaced solvent is not its own substitute");
            }
            assertTrue(c.has("ra_to_original") && c.has("flash_point_c") && c.has("flash_point_basis") && c.has("hazard_statements") && c.has("ich_class"));
        }
        CliTestSupport.Result table = run("replace", "toluene", "--top", "3");
        assertTrue(table.out().contains("in use"), table.out());
    }

    @Test
    void pvdfGetsNoWaterAndLdpeTheHotCaution() {
        // Water precipitates PVDF from its solutions (membrane casting from NMP or DMAc into water; common practice, no
        // source): no default suggestion for PVDF contains water, and the output says why. Before, acetone 90 % + water 10 %
        // was #4, carried in by water's δH 42.3 at full weight.
        CliTestSupport.Result r = run("blend", "--material", "PVDF", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.json().get("applied_limits").toString().contains("water left out"), r.out());
        for (JsonNode b : r.json().get("blends")) {
            for (JsonNode c : b.get("components")) {
                assertFalse(c.get("name").asText().equals("water"), "water in a PVDF blend: " + b);
            }
        }
        // asked for, water comes back (an aqueous process)
        CliTestSupport.Result asked = run("blend", "--material", "PVDF", "--with-water", "miscible", "--json");
        assertFalse(asked.json().get("applied_limits").toString().contains("water left out"), asked.out());
        // LDPE is semicrystalline: at 25 °C solvents inside its sphere swell it; it dissolves hot (common practice, no source)
        CliTestSupport.Result ldpe = run("blend", "--material", "LDPE", "--top", "3");
        assertTrue(ldpe.out().contains("is semicrystalline") && ldpe.out().contains("--temperature"), ldpe.out());
        CliTestSupport.Result pmma = run("blend", "--material", "PMMA", "--top", "3");
        assertFalse(pmma.out().contains("semicrystalline"), "PMMA is amorphous: " + pmma.out());
    }

    @Test
    void replaceBringsNoNewReactivityAndASemicrystallinePolymerHasNoEvaporationWindow() {
        // dichloromethane is inert: the α,β-unsaturated ketone mesityl oxide (a Michael acceptor, ReactiveFlagTest) is no
        // substitute unless asked for; the output says so in one line
        CliTestSupport.Result r = run("replace", "dichloromethane");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("reactivity as the original: dichloromethane is no carboxylic acid"), r.out());
        assertFalse(r.out().contains("mesityl oxide 100.0 %"), r.out());
        CliTestSupport.Result kept = run("replace", "dichloromethane", "--exclude-reactive", "none");
        assertFalse(kept.out().contains("reactivity as the original"), kept.out());
        assertTrue(kept.out().contains("mesityl oxide 100.0 %"), kept.out());
        // PVDF is dissolved warm and dried hot or coagulated: no evaporation window by default (common practice, no source),
        // --process general brings the window back
        CliTestSupport.Result pvdf = run("blend", "--material", "PVDF", "--json");
        assertEquals("any", pvdf.json().get("ranking").get("process").get("use").asText(), pvdf.out());
        assertEquals("triethyl phosphate", pvdf.json().get("blends").get(0).get("components").get(0).get("name").asText(), pvdf.out());
        CliTestSupport.Result general = run("blend", "--material", "PVDF", "--process", "general", "--json");
        assertEquals("general", general.json().get("ranking").get("process").get("use").asText(), general.out());
        CliTestSupport.Result pmma = run("blend", "--material", "PMMA", "--top", "3", "--json");
        assertEquals("general", pmma.json().get("ranking").get("process").get("use").asText(), pmma.out());
    }

    @Test
    void anAcidicDrugGetsNoAmineAndSaysWhy() {
        // Salicylic acid (pKa 2.97, CRC Handbook, dissociation constants; from memory) forms a salt with an amine solvent
        // (common practice, no source): a salt, not a solution. Its structure (solvent-db/material-structures.csv) marks it acidic.
        CliTestSupport.Result r = run("blend", "--material", "salicylic acid", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode blends = r.json().get("blends");
        assertTrue(blends.size() > 0, r.out());
        for (JsonNode b : blends) {
            assertTrue(b.get("why").toString().contains("solute acidic: no amine"), b.toString());
            for (JsonNode c : b.get("components")) {
                String n = c.get("name").asText();
                assertFalse(n.contains("amine") || n.equals("piperidine") || n.equals("pyrrolidine") || n.equals("morpholine")
                        || n.equals("pyridine") || n.contains("picoline") || n.contains("amino"), "an amine for an acid: " + b);
            }
        }
        CliTestSupport.Result table = run("blend", "--material", "salicylic acid", "--top", "3");
        assertTrue(table.out().contains("the material is acidic by its structure") && table.out().contains("--allow-salt-formers"), table.out());
        CliTestSupport.Result allowed = run("blend", "--material", "salicylic acid", "--allow-salt-formers", "--json");
        assertFalse(allowed.json().get("blends").get(0).get("why").toString().contains("solute acidic"), allowed.out());
    }

    @Test
    void defaultBlendSearchLeavesOutCmrAndClassOneAndSaysWhatAndWhy() {
        CliTestSupport.Result r = run("blend", "--material", "PMMA", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        String defaults = j.get("search").get("left_out_by_safety_defaults").toString();
        assertTrue(defaults.contains("benzene") && defaults.contains("--allow-cmr") && defaults.contains("carbon tetrachloride"), defaults);
        assertTrue(j.get("blends").size() > 0, r.out());
        for (JsonNode b : j.get("blends")) {
            assertTrue(b.get("red").asDouble() <= 0.8 + 1e-9, "only qualifying blends: " + b);
            assertTrue(b.get("why").size() >= 3 && b.get("why").get(0).asText().startsWith("inside with margin"), b.toString());
            for (JsonNode c : b.get("components")) {
                String n = c.get("name").asText();
                assertFalse(n.equals("benzene") || n.equals("N-methyl-2-pyrrolidone") || n.equals("carbon tetrachloride"), n);
            }
        }
        CliTestSupport.Result allowed = run("blend", "--material", "PMMA", "--allow-cmr", "--allow-ich-class-1", "--json");
        assertEquals(0, allowed.json().get("search").get("left_out_by_safety_defaults").size(), allowed.out());
        assertTrue(allowed.json().get("search").get("searched").asInt() > j.get("search").get("searched").asInt());
        CliTestSupport.Result table = run("blend", "--material", "PMMA", "--top", "3");
        assertTrue(table.out().contains("left out by the safety defaults") && table.out().contains("#1 why: inside with margin"), table.out());
    }

    @Test
    void replacingNmpNeverOffersAReprotoxicantAndKeepsTheOriginalInView() {
        CliTestSupport.Result r = run("replace", "NMP", "--json");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode j = r.json();
        assertEquals("N-methyl-2-pyrrolidone", j.get("original").get("name").asText());
        assertTrue(j.get("original").get("replaced_for").toString().contains("reprotoxic"), j.get("original").toString());
        assertTrue(j.get("candidates").size() > 0, r.out());
        for (JsonNode c : j.get("candidates")) {
            for (JsonNode h : c.get("hazard_statements")) {
                assertFalse(h.asText().startsWith("H360"), "a candidate with the reason it is replaced for: " + c);
            }
        }
        CliTestSupport.Result because = run("replace", "toluene", "--because", "flammable", "--top", "5", "--json");
        assertEquals(0, because.exitCode(), because.err());
        for (JsonNode c : because.json().get("candidates")) {
            JsonNode fp = c.get("flash_point_c");
            assertTrue(fp.isNull() || fp.asDouble() >= 23, "toluene is GHS Category 2: candidates are at least Category 3: " + c);
        }
        assertEquals(2, run("replace", "acetone", "--because", "reprotoxic").exitCode(), "acetone carries no reprotoxic statement");
    }

    @Test
    void costWithoutPricesSaysSoInOneLine() {
        CliTestSupport.Result r = run("blend", "--material", "PMMA", "--rank-by", "cost");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("cohesa solvents price NAME PRICE") && r.err().strip().lines().count() == 1, r.err());
        CliTestSupport.Result p = run("blend", "--material", "PMMA", "--prefer", "cost", "--top", "3");
        assertEquals(0, p.exitCode(), p.err());
        assertTrue(p.out().contains("cost did not weigh") && p.out().contains("cohesa solvents price NAME PRICE"), p.out());
    }

    @Test
    void processConstraintsOfIssue18() {
        // Families: every family of a solvent counts (chlorobenzene is aromatic and chlorinated; benzyl alcohol alcohol and aromatic).
        CliTestSupport.Result fam = run("blend", "--target", "19,4.3,2,5", "--exclude-family", "aromatic", "--allow-cmr", "--json");
        assertEquals(0, fam.exitCode(), fam.err());
        String counts = fam.json().get("search").get("left_out_names").toString();
        assertTrue(counts.contains("chlorobenzene") && counts.contains("benzyl alcohol"), counts);
        // Reactive solvents are flagged and can be left out.
        CliTestSupport.Result flagged = run("blend", "--target", "17.8,0.4,1,4", "--include", "triethylamine", "--include", "n-heptane", "--json");
        assertEquals(0, flagged.exitCode(), flagged.err());
        assertTrue(flagged.out().contains("triethylamine: amine or pyridine base"), "triethylamine is flagged: " + flagged.out());
        CliTestSupport.Result noReactive = run("blend", "--target", "17.8,0.4,1,4", "--include", "triethylamine", "--include", "n-heptane",
                "--exclude-reactive", "amine", "--json");
        assertTrue(noReactive.json().get("search").get("left_out_names").toString().contains("reactive: amine"), noReactive.out());
        for (JsonNode b : noReactive.json().get("blends")) {
            assertEquals(0, b.get("flags").size(), "no reactive solvent once left out: " + b);
        }
        // ICH Q3C: "not listed" is kept apart from class 3 and the user chooses.
        CliTestSupport.Result ich = run("replace", "toluene", "--max-ich-class", "3", "--json");
        for (JsonNode c : ich.json().get("candidates")) {
            assertFalse(c.get("ich_class").asText().contains("not listed"), c.toString());
        }
        CliTestSupport.Result unlisted = run("replace", "toluene", "--max-ich-class", "3", "--ich-unlisted", "keep", "--json");
        assertTrue(unlisted.out().contains("not listed"), unlisted.out());
        // A flash-point limit on the blend itself, and the output says which limit it applied.
        CliTestSupport.Result flash = run("blend", "--material", "PMMA", "--min-blend-flash-point", "30", "--max-components", "2", "--json");
        assertTrue(flash.json().get("applied_limits").toString().contains("blend's computed flash point only"), flash.out());
        for (JsonNode b : flash.json().get("blends")) {
            JsonNode fp = b.get("flash_point_c");
            assertTrue(fp.isNull() || fp.asDouble() >= 30, b.toString());
        }
        // replace takes --material as blend does.
        CliTestSupport.Result mat = run("replace", "toluene", "--material", "PMMA", "--top", "3", "--json");
        assertEquals(0, mat.exitCode(), mat.err());
        assertEquals("poly(methyl methacrylate)", mat.json().get("target").get("material").asText());
    }

    @Test
    void withWaterImmiscibleGivesExtractionSolventsAndSaysOnWhatBasis() {
        CliTestSupport.Result r = run("replace", "dichloromethane", "--with-water", "immiscible", "--top", "5", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.json().get("candidates").size() > 0, r.out());
        for (JsonNode c : r.json().get("candidates")) {
            assertTrue(c.get("why").toString().contains("with water: immiscible"), c.get("why").toString());
        }
        // Common practice, no source: acetone and ethanol mix with water in all proportions, so no miscible-only answer passes.
        CliTestSupport.Result m = run("blend", "--target", "15.5,10.4,7,4", "--with-water", "miscible", "--max-components", "1", "--top", "5", "--json");
        assertEquals(0, m.exitCode(), m.err());
        for (JsonNode b : m.json().get("blends")) {
            assertTrue(b.get("why").toString().contains("with water: miscible"), b.toString());
        }
    }

    @Test
    void badInputGivesOneErrorLineAndExitTwo() {
        String[][] cases = {
                {"blend", "--target", "18,9,8"},
                {"blend", "--target", "18,9,8,7", "--max-components", "5"},
                {"blend", "--target", "18,9,8,7", "--fixed", "water:1.5"},
                {"blend", "--target", "18,9,8,7", "--exclude", "unobtainium"},
                {"blend", "--target", "18,9,8,7", "--rank-by", "colour"},
                {"blend", "--target", "18,9,8,7", "--boiling-range", "120..60"},
                {"blend", "--target", "18,9,8,7", "--family", "nonsense"},
                {"blend", "--material", "no such material"},
                {"replace", "toluene", "--radius", "-1"},
                {"bench", "blend", "--components", "9"},
                {"blend", "--target", "18,9,8,7", "--prefer", "speed"},
                {"blend", "--target", "18,9,8,7", "--weights", "hazard=x"},
                {"blend", "--target", "18,9,8,7", "--weights", "colour=1"},
                {"blend", "--target", "18,9,8,7", "--exclude-reactive", "sugar"},
                {"blend", "--target", "18,9,8,7", "--ich-unlisted", "maybe"},
                {"replace", "toluene", "--because", "smell"},
                {"blend", "--target", "18,9,8,7", "--with-water", "sometimes"},
                {"replace", "toluene", "--material", "PMMA", "--target", "18,9,8,7"},
        };
        for (String[] c : cases) {
            CliTestSupport.Result r = run(c);
            assertEquals(2, r.exitCode(), String.join(" ", c) + " → " + r.err());
            assertTrue(r.err().startsWith("error:"), r.err());
            assertEquals(1, r.err().strip().lines().count(), r.err());
        }
    }

    @Test
    void benchPrintsSubsetsAndMedian() {
        CliTestSupport.Result r = run("bench", "blend", "--library-size", "30", "--components", "3", "--runs", "3", "--warmup", "1", "--json");
        assertEquals(0, r.exitCode(), r.err());
        assertEquals(30 + 435 + 4060, r.json().get("subsets").asLong(), "C(30,1)+C(30,2)+C(30,3)");
        assertTrue(r.json().get("seconds_median").asDouble() >= 0);
    }

    @Test
    void processTemperatureShiftsTheSolventsAndKeepsTheMaterialSphereAsMeasured() {
        // Hansen–Beerbower (Hansen, Hansen Solubility Parameters: A User's Handbook, 2nd ed. (2007), ch. 1):
        // δD(T) = δD(25 °C)·exp(−1.25·α·ΔT). Toluene's volumetric expansion coefficient near 50 °C, about 1.1·10⁻³ K⁻¹
        // (CRC Handbook, from memory), over 25 → 80 °C: 18.0 · exp(−1.25 · 1.1e-3 · 55) = 16.7 MPa^½.
        String[] base = {"blend", "--material", "PMMA", "--include", "toluene", "--max-components", "1", "--rank-by", "red", "--json"};
        CliTestSupport.Result cold = run(base);
        assertEquals(0, cold.exitCode(), cold.err());
        String[] hotArgs = java.util.Arrays.copyOf(base, base.length + 2);
        hotArgs[base.length] = "--temperature";
        hotArgs[base.length + 1] = "80";
        CliTestSupport.Result hot = run(hotArgs);
        assertEquals(0, hot.exitCode(), hot.err());
        JsonNode t = hot.json().get("temperature");
        assertEquals(80.0, t.get("process_temperature_c").asDouble(), 1e-9);
        assertTrue(t.get("solvent_parameters_shifted").asBoolean(), t.toString());
        assertTrue(t.get("target_sphere").asText().contains("taken as measured"), t.toString());
        assertFalse(cold.json().get("temperature").get("solvent_parameters_shifted").asBoolean());
        // the material's sphere is the same at both temperatures
        assertEquals(cold.json().get("target").get("dD").asDouble(), hot.json().get("target").get("dD").asDouble(), 1e-12);
        assertEquals(18.0, cold.json().get("blends").get(0).get("dD").asDouble(), 1e-9, "toluene as stored at 25 °C");
        assertEquals(16.7, hot.json().get("blends").get(0).get("dD").asDouble(), 0.15, "toluene shifted to 80 °C");
        CliTestSupport.Result text = run("blend", "--material", "PMMA", "--include", "toluene", "--max-components", "1", "--rank-by", "red",
                "--temperature", "80");
        assertTrue(text.out().contains("shifted from 25 °C to 80 °C") && text.out().contains("target sphere is taken as measured"), text.out());
    }
}
