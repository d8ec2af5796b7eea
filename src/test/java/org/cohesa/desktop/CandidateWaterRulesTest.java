package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.cohesa.cli.CliTestSupport;
import org.cohesa.core.activity.WaterBehaviour;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.blend.HazardLimit;
import org.cohesa.core.blend.ProcessUse;
import org.cohesa.core.blend.ReactiveFlag;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.store.WaterMiscibilityCsv;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The candidates follow the command line's water rules (issue 11), from the same core code: no water in the solution of
 * a polymer water does not dissolve (PVDF: `cohesa blend --material PVDF` gives the same list), and a case that replaces
 * dichloromethane asks every candidate to separate from water as dichloromethane does (as `cohesa replace` does); and such a
 * case leaves out every reactivity the replaced liquid lacks unless its switch is off (`cohesa replace --exclude-reactive none`).
 */
@ExtendWith(ApplicationExtension.class)
class CandidateWaterRulesTest {

    private DesktopFixture fx;
    private static Path shared;

    @Start
    void start(Stage stage) throws Exception {
        if (shared == null) {
            shared = java.nio.file.Files.createTempDirectory("cohesa-water-rules-test");
        }
        fx = new DesktopFixture(stage, shared);
    }

    @Test
    void noWaterInAPvdfSolutionAsOnTheCommandLine(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // PVDF's sphere leaves water far outside (RED > 4 with the bundled sphere); water is the non-solvent PVDF membranes
        // are precipitated with (common practice, no source)
        Material pvdf = fx.session.materials().stream().filter(m -> m.name().startsWith("poly(vinylidene fluoride)")).findFirst().orElseThrow();
        robot.interact(() -> fx.session.targetProperty().set(new TargetChoice(pvdf.name(), pvdf.sphere(),
                "material library, source: " + pvdf.source())));
        BlendModel m = fx.workbench.blendModel();
        List<BlendModel.Row> rows = fx.searchCandidates(robot, () -> {
            m.maxComponents.set(2);
            m.top.set(10);
        });
        assertFalse(rows.isEmpty());
        for (BlendModel.Row r : rows) {
            for (BlendComponent c : r.blend().components()) {
                assertFalse(WaterMiscibility.isWater(c.solvent()), "water in a PVDF solution: " + DesktopFixture.names(List.of(r)));
            }
        }
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.startsWith("water left out") && l.contains("Include only")),
                m.leftOutBySafety().toString());
        CliTestSupport.Result cli = CliTestSupport.run(fx.folder.resolve("cohesa.db"), "blend", "--material", pvdf.name(),
                "--max-components", "2", "--top", "10", "--json");
        assertEquals(0, cli.exitCode(), cli.err());
        assertEquals(DesktopFixture.names(cli.json().get("blends")), DesktopFixture.names(rows), "the same candidates, in the same order, as `cohesa blend`");
    }

    @Test
    void aDichloromethaneCaseGetsCandidatesThatSeparateFromWater(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        List<Solvent> lib = List.copyOf(fx.session.solvents());
        Solvent dcm = lib.stream().filter(s -> s.name().equals("dichloromethane")).findFirst().orElseThrow();
        Solvent water = lib.stream().filter(WaterMiscibility::isWater).findFirst().orElseThrow();
        BlendModel m = fx.workbench.blendModel();
        robot.interact(() -> {
            fx.session.replacingProperty().set("dichloromethane");
            fx.session.targetProperty().set(new TargetChoice("around dichloromethane", SolubilitySphere.of(dcm.hansen().dD(),
                    dcm.hansen().dP(), dcm.hansen().dH(), 4), "typed in"));
        });
        assertEquals(ProcessUse.AS_ORIGINAL, m.process.get(), "a replacement case ranks as the replaced liquid");
        List<BlendModel.Row> rows = fx.searchCandidates(robot, () -> {
            m.maxComponents.set(2);
            m.top.set(10);
        });
        assertFalse(rows.isEmpty());
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.startsWith("with water as the replaced liquid: dichloromethane is immiscible")),
                m.leftOutBySafety().toString());
        for (BlendModel.Row r : rows) {
            List<Solvent> comps = r.blend().components().stream().map(BlendComponent::solvent).toList();
            double[] f = r.blend().components().stream().mapToDouble(BlendComponent::fraction).toArray();
            WaterBehaviour wb = WaterMiscibility.withWater(comps, f, water, 298.15, WaterMiscibilityCsv.bundled());
            assertEquals(WaterBehaviour.Kind.IMMISCIBLE, wb.kind(), DesktopFixture.names(List.of(r)) + " must separate from water: " + wb.detail());
        }
        // the replaced liquid is no candidate for its own replacement (as `cohesa replace`), though it sits at RED 0 here
        assertTrue(DesktopFixture.names(rows).stream().noneMatch(n -> n.contains("dichloromethane")), DesktopFixture.names(rows).toString());
        assertTrue(m.leftOutBySafety().contains("the replaced liquid itself (dichloromethane) is no candidate"), m.leftOutBySafety().toString());
        // 1,3-dioxolane mixes with water (it led the list before the rule): not a candidate here
        assertTrue(DesktopFixture.names(rows).stream().noneMatch(n -> n.contains("1,3-dioxolane")), DesktopFixture.names(rows).toString());
        // the choice `cohesa replace --with-water any` gives: no water demand at all, and a candidate that does not separate is back
        List<BlendModel.Row> any = fx.searchCandidates(robot, () -> {
            m.withWater.set(BlendModel.WATER_NOT_EVEN_AS_REPLACED);
            m.top.set(60);
        });
        assertTrue(m.leftOutBySafety().stream().noneMatch(l -> l.startsWith("with water as the replaced liquid")), m.leftOutBySafety().toString());
        assertTrue(any.stream().anyMatch(r -> {
            List<Solvent> comps = r.blend().components().stream().map(BlendComponent::solvent).toList();
            double[] f = r.blend().components().stream().mapToDouble(BlendComponent::fraction).toArray();
            return WaterMiscibility.withWater(comps, f, water, 298.15, WaterMiscibilityCsv.bundled()).kind() != WaterBehaviour.Kind.IMMISCIBLE;
        }), DesktopFixture.names(any).toString());
        robot.interact(() -> {
            m.withWater.set(BlendModel.WATER_ANY);
            fx.session.replacingProperty().set("");
        });
    }

    @Test
    void aReplacementCaseOffersNothingAsBadOnTheReplacedLiquidsHealthStatements(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        List<Solvent> lib = List.copyOf(fx.session.solvents());
        // toluene carries H361d (reproductive toxicant, category 2) and H373 (organ damage, repeated exposure), read from a
        // stored supplier SDS (solvent-db/SOURCES.md, supplier-sds-checked); `cohesa replace toluene` treats both as reasons
        Solvent toluene = lib.stream().filter(s -> s.name().equals("toluene")).findFirst().orElseThrow();
        List<HazardLimit> limits = HazardLimit.defaults(toluene);
        assertTrue(limits.stream().anyMatch(h -> h.kind().equals("reprotoxic")) && limits.stream().anyMatch(h -> h.kind().equals("organ-repeated")),
                limits.toString());
        SolubilitySphere around = SolubilitySphere.of(toluene.hansen().dD(), toluene.hansen().dP(), toluene.hansen().dH(), 4);
        // the rule has something to act on: library liquids inside the sphere that carry such a statement (e.g. ethylbenzene, H373)
        assertTrue(lib.stream().filter(s -> s != toluene && s.hansen() != null && around.red(s.hansen()) <= 1)
                .anyMatch(s -> limits.stream().anyMatch(h -> h.rejects(s))), "no liquid near toluene carries H361/H373");
        BlendModel m = fx.workbench.blendModel();
        robot.interact(() -> {
            fx.session.replacingProperty().set("toluene");
            fx.session.targetProperty().set(new TargetChoice("around toluene", around, "typed in"));
        });
        List<BlendModel.Row> rows = fx.searchCandidates(robot, () -> {
            m.maxComponents.set(2);
            m.top.set(20);
        });
        assertFalse(rows.isEmpty());
        for (BlendModel.Row r : rows) {
            for (BlendComponent c : r.blend().components()) {
                for (HazardLimit h : limits) {
                    assertFalse(h.rejects(c.solvent()), c.solvent().name() + " is as bad as toluene on " + h.kind() + " (" + h.because() + ")");
                }
            }
        }
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.startsWith("replaced for reprotoxic (H361d of toluene)")), m.leftOutBySafety().toString());
        robot.interact(() -> fx.session.replacingProperty().set(""));
        fx.searchCandidates(robot, () -> m.top.set(20));
        assertTrue(m.leftOutBySafety().stream().noneMatch(l -> l.startsWith("replaced for")), "a case that replaces nothing has no such rule");
    }

    @Test
    void aTolueneCaseReplacedForFlammabilityOffersOnlyLessFlammableCandidates(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        List<Solvent> lib = List.copyOf(fx.session.solvents());
        // toluene: flash point 4 °C (IEC 60079-20-1), boiling point 110.6 °C (CRC Handbook), both as bundled, so GHS flammable liquid category 2 (UN GHS Rev. 10
        // Table 2.6.1: flash point < 23 °C and initial boiling point > 35 °C); "less flammable" is then category 3 or none,
        // flash point ≥ 23 °C (the same rule as `cohesa replace toluene --because flammable`, ReplacementReasons)
        Solvent toluene = lib.stream().filter(s -> s.name().equals("toluene")).findFirst().orElseThrow();
        assertTrue(toluene.flashPointC() != null && toluene.flashPointC() < 23, "toluene's flash point " + toluene.flashPointC());
        SolubilitySphere around = SolubilitySphere.of(toluene.hansen().dD(), toluene.hansen().dP(), toluene.hansen().dH(), 4);
        BlendModel m = fx.workbench.blendModel();
        CheckBox flammable = robot.lookup("#blend-because-flammable").queryAs(CheckBox.class);
        Label reasonsNow = robot.lookup("#blend-because-rule").queryAs(Label.class);
        javafx.scene.Node reasonBoxes = robot.lookup("#blend-because").query();
        assertFalse(reasonBoxes.isVisible(), "no replacement, no reasons");
        robot.interact(() -> {
            fx.session.replacingProperty().set("toluene");
            fx.session.targetProperty().set(new TargetChoice("around toluene", around, "typed in"));
        });
        assertTrue(reasonBoxes.isVisible() && !flammable.isSelected(), "offered in a replacement case, none ticked by default");
        assertTrue(reasonsNow.getText().startsWith("None ticked: its own health statements") && reasonsNow.getText().contains("H361d of toluene"),
                reasonsNow.getText());
        Runnable form = () -> {
            m.maxComponents.set(2);
            m.top.set(40);
        };
        // the default stays as it was: the health statements are the reasons, and flash points below 23 °C are let in
        List<BlendModel.Row> health = fx.searchCandidates(robot, form);
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.startsWith("replaced for reprotoxic (H361d of toluene)")), m.leftOutBySafety().toString());
        assertTrue(m.leftOutBySafety().stream().noneMatch(l -> l.startsWith("replaced for flammable")), m.leftOutBySafety().toString());
        assertTrue(health.stream().flatMap(r -> r.blend().components().stream())
                .anyMatch(c -> c.solvent().flashPointC() != null && c.solvent().flashPointC() < 23),
                "by default a candidate as flammable as toluene takes part: " + DesktopFixture.names(health));
        assertEquals("", m.limits().get("replaced-because"));

        robot.interact(() -> flammable.setSelected(true));
        assertTrue(reasonsNow.getText().startsWith("Ticked") && reasonsNow.getText().contains("flash point ≥ 23.0 °C"), reasonsNow.getText());
        List<BlendModel.Row> rows = fx.searchCandidates(robot, form);
        assertFalse(rows.isEmpty());
        for (BlendModel.Row r : rows) {
            for (BlendComponent c : r.blend().components()) {
                Double fp = c.solvent().flashPointC();
                assertTrue(fp == null || fp >= 23, c.solvent().name() + " (flash point " + fp + " °C) is as flammable as toluene");
            }
        }
        assertTrue(m.leftOutBySafety().contains("replaced for flammable (GHS Category 2 → components and blend flash point ≥ 23.0 °C)"),
                m.leftOutBySafety().toString());
        // the named reason replaces the default one, as `--because` does
        assertTrue(m.leftOutBySafety().stream().noneMatch(l -> l.startsWith("replaced for reprotoxic")), m.leftOutBySafety().toString());
        var limits = m.limits();
        assertEquals("flammable", limits.get("replaced-because"));
        robot.interact(() -> {
            flammable.setSelected(false);
            m.applyLimits(limits);
        });
        assertTrue(flammable.isSelected(), "the reasons round-trip through the map a case stores");

        // a reason toluene does not have is refused in one line naming it (toluene is not an ozone-layer hazard)
        robot.interact(() -> robot.lookup("#blend-because-ozone").queryAs(CheckBox.class).setSelected(true));
        assertTrue(reasonsNow.getText().startsWith("toluene carries no hazard statement of that kind"), reasonsNow.getText());
        robot.interact(() -> {
            robot.lookup("#blend-because-ozone").queryAs(CheckBox.class).setSelected(false);
            flammable.setSelected(false);
            fx.session.replacingProperty().set("");
        });
        assertEquals("", m.limits().get("replaced-because"), "no replacement, no reasons");
    }

    @Test
    void aReplacementCaseLeavesOutReactivityTheLiquidLacksUnlessSwitchedOff(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // NMP: water-miscible, so the water rule keeps miscible candidates, among them pyridine (a base) near its parameters
        Solvent nmp = fx.session.solvents().stream().filter(s -> s.name().equals("N-methyl-2-pyrrolidone")).findFirst().orElseThrow();
        BlendModel m = fx.workbench.blendModel();
        CheckBox rule = robot.lookup("#blend-reactive-as-replaced").queryAs(CheckBox.class);
        Label ruleNow = robot.lookup("#blend-reactive-rule").queryAs(Label.class);
        assertFalse(rule.isVisible(), "no replacement, no switch");
        robot.interact(() -> {
            fx.session.replacingProperty().set(nmp.name());
            fx.session.targetProperty().set(new TargetChoice("around NMP", SolubilitySphere.of(nmp.hansen().dD(),
                    nmp.hansen().dP(), nmp.hansen().dH(), 6), "typed in"));
        });
        // NMP is no acid, base, nitroalkane, 1,3-dicarbonyl or enone (its structure, a lactam: CN1CCCC1=O; common practice, no source)
        java.util.Set<ReactiveFlag> lacked = ReactiveFlag.newTo(nmp);
        assertEquals(java.util.EnumSet.of(ReactiveFlag.ACID, ReactiveFlag.AMINE, ReactiveFlag.NITRO, ReactiveFlag.ACTIVE_METHYLENE,
                ReactiveFlag.MICHAEL_ACCEPTOR), lacked);
        assertTrue(rule.isVisible() && rule.isSelected() && !rule.isDisabled(), "on by default in a replacement case, as `cohesa replace`");
        assertTrue(ruleNow.getText().startsWith(nmp.name() + " is no carboxylic acid"), ruleNow.getText());
        // every single liquid that qualifies (the top 100 holds them all), so the two lists differ by the rule alone
        Runnable form = () -> {
            m.maxComponents.set(1);
            m.top.set(100);
        };
        List<BlendModel.Row> on = fx.searchCandidates(robot, form);
        assertFalse(on.isEmpty());
        assertTrue(on.stream().flatMap(r -> r.blend().components().stream()).noneMatch(c -> lacked.stream().anyMatch(f -> f.applies(c.solvent()))),
                DesktopFixture.names(on).toString());
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.startsWith("reactivity as the replaced liquid: " + nmp.name() + " is no")),
                m.leftOutBySafety().toString());
        assertEquals("true", m.limits().get("reactive-as-replaced"));

        // switched off: the reactive ones come back (the check above can fail), and the note goes
        robot.interact(() -> rule.setSelected(false));
        assertTrue(ruleNow.getText().startsWith("Off:"), ruleNow.getText());
        List<BlendModel.Row> off = fx.searchCandidates(robot, form);
        java.util.function.Predicate<BlendModel.Row> reactive = r -> r.blend().components().stream()
                .anyMatch(c -> lacked.stream().anyMatch(f -> f.applies(c.solvent())));
        assertTrue(off.stream().anyMatch(reactive), "with the switch off a reactive candidate comes back: " + DesktopFixture.names(off));
        java.util.Set<String> back = new java.util.TreeSet<>(DesktopFixture.names(off));
        DesktopFixture.names(on).forEach(back::remove);
        assertEquals(new java.util.TreeSet<>(DesktopFixture.names(off.stream().filter(reactive).toList())), back,
                "the switch brings back exactly the reactive ones");
        assertTrue(off.size() < 100, "every qualifying liquid was listed");
        assertTrue(m.leftOutBySafety().stream().noneMatch(l -> l.startsWith("reactivity as the replaced liquid")), m.leftOutBySafety().toString());
        var limits = m.limits();
        assertEquals("false", limits.get("reactive-as-replaced"));
        robot.interact(() -> {
            m.reactiveAsReplaced.set(true);
            m.applyLimits(limits);
        });
        assertFalse(m.reactiveAsReplaced.get(), "the switch round-trips through the map a case stores");

        // a ticked kind decides instead (as --exclude-reactive FLAGS): the switch is greyed and only that kind stays out
        robot.interact(() -> {
            rule.setSelected(true);
            robot.lookup("#blend-reactive-" + ReactiveFlag.MICHAEL_ACCEPTOR.word()).queryAs(CheckBox.class).setSelected(true);
        });
        assertTrue(rule.isDisabled(), "ticked boxes decide");
        assertTrue(ruleNow.getText().startsWith("The ticked kinds decide"), ruleNow.getText());
        List<BlendModel.Row> enone = fx.searchCandidates(robot, form);
        assertTrue(enone.stream().flatMap(r -> r.blend().components().stream()).noneMatch(c -> ReactiveFlag.MICHAEL_ACCEPTOR.applies(c.solvent())));
        assertTrue(m.leftOutBySafety().stream().noneMatch(l -> l.startsWith("reactivity as the replaced liquid")), m.leftOutBySafety().toString());
        robot.interact(() -> robot.lookup("#blend-reactive-" + ReactiveFlag.MICHAEL_ACCEPTOR.word()).queryAs(CheckBox.class).setSelected(false));

        // another process use drops the rule, as on the command line
        robot.interact(() -> m.process.set(ProcessUse.GENERAL));
        assertTrue(rule.isDisabled() && ruleNow.getText().startsWith("Applies only"), ruleNow.getText());
        robot.interact(() -> {
            m.process.set(ProcessUse.AS_ORIGINAL);
            fx.session.replacingProperty().set("");
        });
        assertEquals("", m.limits().get("reactive-as-replaced"), "no replacement, no such limit");
    }
}
