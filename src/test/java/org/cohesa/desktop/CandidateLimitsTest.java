package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.cohesa.core.blend.ReactiveFlag;
import org.cohesa.core.hsp.InsideOut;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.desktop.common.TargetChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The limits the command line has, on the desktop form (issue 18): several families per solvent, reactive solvents left
 * out, a water demand, a limit on the blend's own flash point, the list left out by the safety defaults; and the
 * candidates' parameter panel. Target: an invented demo sphere.
 */
@ExtendWith(ApplicationExtension.class)
class CandidateLimitsTest {

    private DesktopFixture fx;
    /** The tests of this class share one database, so the bundled table is imported once. */
    private static java.nio.file.Path shared;

    @Start
    void start(Stage stage) throws Exception {
        if (shared == null) {
            shared = java.nio.file.Files.createTempDirectory("cohesa-limits-test");
        }
        fx = new DesktopFixture(stage, shared);
    }

    private List<BlendModel.Row> search(FxRobot robot, Runnable form) throws Exception {
        return fx.searchCandidates(robot, form);
    }

    private static boolean any(List<BlendModel.Row> rows, java.util.function.Predicate<Solvent> p) {
        return rows.stream().flatMap(r -> r.blend().components().stream()).map(BlendComponent::solvent).anyMatch(p);
    }

    @Test
    void theFormsLimitsReachTheSearch(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // an aromatic-leaning sphere (invented): chlorobenzene, benzonitrile and benzyl benzoate sit near it
        robot.interact(() -> fx.session.targetProperty().set(new TargetChoice("demo aromatic resin (invented)",
                SolubilitySphere.of(19.0, 6.0, 4.0, 6.0), "typed in")));
        BlendModel m = fx.workbench.blendModel();
        List<BlendModel.Row> base = search(robot, () -> {
            m.maxComponents.set(1);
            m.top.set(40);
        });
        assertTrue(any(base, s -> s.inFamily("aromatic") && s.families().size() > 1), "multi-family aromatics take part without a family limit");

        // the process term reaches the desktop ranking as it does `cohesa blend` (general by default: removed by evaporation)
        assertEquals(org.cohesa.core.blend.ProcessUse.GENERAL, m.process.get());
        assertTrue(base.stream().allMatch(r -> String.join("; ", r.suggestion().why()).contains("process general")
                || String.join("; ", r.suggestion().why()).contains("(general)")), "every why names the process use");
        List<BlendModel.Row> anyUse = search(robot, () -> m.process.set(org.cohesa.core.blend.ProcessUse.ANY));
        assertTrue(anyUse.stream().noneMatch(r -> String.join("; ", r.suggestion().why()).contains("general")), "no process term under 'any'");
        assertEquals("any", m.limits().get("process"), "the process use is stored with the case's limits");
        robot.interact(() -> m.process.set(org.cohesa.core.blend.ProcessUse.GENERAL));

        // replacing a liquid: the use follows it and the window is measured from its rate, as `cohesa replace` does
        robot.interact(() -> fx.session.replacingProperty().set("toluene"));
        assertEquals(org.cohesa.core.blend.ProcessUse.AS_ORIGINAL, m.process.get());
        var lib = new org.cohesa.core.solvent.SolventLibrary(List.copyOf(fx.session.solvents()));
        var asOriginal = m.processWeights(lib);
        assertEquals(org.cohesa.core.blend.ProcessUse.rate(lib.resolve("test", "toluene")).rer(), asOriginal.reference().rer(), 1e-12);
        robot.interact(() -> fx.session.replacingProperty().set(""));
        assertEquals(org.cohesa.core.blend.ProcessUse.GENERAL, m.process.get());

        // exclude the aromatic family: every solvent with aromatic among its families goes, whatever its first family
        List<BlendModel.Row> noAromatic = search(robot, () -> robot.lookup("#blend-exclude-families").queryAs(TextField.class).setText("aromatic"));
        assertFalse(noAromatic.isEmpty());
        assertFalse(any(noAromatic, s -> s.inFamily("aromatic")), "no solvent of the aromatic family, by any of its families");
        assertTrue(fx.workbench.caseModel().current() == null, "without a case the search still runs");

        // an unknown family is named with the ones the library has
        robot.interact(() -> {
            robot.lookup("#blend-exclude-families").queryAs(TextField.class).setText("aromatik");
            robot.lookup("#blend-search").queryAs(Button.class).fire();
        });
        String msg = fx.session.jobs().messageProperty().get();
        assertTrue(msg.contains("aromatik") && msg.contains("aromatic"), msg);

        // only esters: every candidate has ester among its families
        List<BlendModel.Row> esters = search(robot, () -> {
            robot.lookup("#blend-exclude-families").queryAs(TextField.class).setText("");
            robot.lookup("#blend-families").queryAs(TextField.class).setText("ester");
        });
        assertFalse(esters.isEmpty());
        assertTrue(esters.stream().allMatch(r -> r.blend().components().stream().allMatch(c -> c.solvent().inFamily("ester"))));

        // reactive solvents left out: no acid, amine, nitro or peroxide former
        List<BlendModel.Row> calm = search(robot, () -> {
            robot.lookup("#blend-families").queryAs(TextField.class).setText("");
            for (ReactiveFlag f : ReactiveFlag.values()) {
                robot.lookup("#blend-reactive-" + f.word()).queryAs(CheckBox.class).setSelected(true);
            }
        });
        assertFalse(calm.isEmpty());
        for (ReactiveFlag f : ReactiveFlag.values()) {
            assertFalse(any(calm, f::applies), f.label() + " left out");
        }
        assertTrue(any(base, ReactiveFlag.PEROXIDE::applies) || any(base, ReactiveFlag.AMINE::applies) || any(base, ReactiveFlag.ACID::applies),
                "the unrestricted search had a reactive solvent, so the check above can fail");

        // the safety defaults: what they left out is listed, with the switch that lets it in
        Label leftOut = robot.lookup("#blend-left-out").queryAs(Label.class);
        assertTrue(leftOut.isVisible());
        assertTrue(leftOut.getText().contains("CMR (") && leftOut.getText().contains("No CMR"), leftOut.getText());
        assertTrue(leftOut.getText().contains("ICH Q3C class 1") && leftOut.getText().contains("benzene"), leftOut.getText());
        assertTrue(m.leftOutBySafety().stream().anyMatch(l -> l.contains("benzene")));
        assertFalse(any(base, s -> s.ichClass() != null && s.ichClass() == 1), "ICH class 1 left out by default, as on the command line");

        // a blend flash-point limit: 2-component blends all at or above 40 °C computed, and the note says it was the blend's
        List<BlendModel.Row> hot = search(robot, () -> {
            for (ReactiveFlag f : ReactiveFlag.values()) {
                robot.lookup("#blend-reactive-" + f.word()).queryAs(CheckBox.class).setSelected(false);
            }
            m.maxComponents.set(2);
            m.top.set(8);
            robot.lookup("#blend-min-blend-flash").queryAs(TextField.class).setText("40");
        });
        assertFalse(hot.isEmpty());
        for (BlendModel.Row r : hot) {
            assertTrue(r.safety() != null && r.safety().flashPoint().celsius() != null && r.safety().flashPoint().celsius() >= 40 - 1e-6
                    || r.safety() != null && r.safety().flashPoint().status() != org.cohesa.core.safety.SafetyProfile.FlashPointStatus.UNKNOWN
                    && r.safety().flashPoint().celsius() == null, r.blend().describe() + " " + (r.safety() == null ? "" : r.safety().flashPoint()));
        }
        assertTrue(robot.lookup("#blend-search-note").queryAs(Label.class).getText().contains("blend's computed flash point"));

        // separates from water (an extraction solvent): each candidate judged immiscible with water
        List<BlendModel.Row> extraction = search(robot, () -> {
            robot.lookup("#blend-min-blend-flash").queryAs(TextField.class).setText("");
            m.maxComponents.set(1);
            m.top.set(10);
            @SuppressWarnings("unchecked")
            ComboBox<String> water = robot.lookup("#blend-with-water").queryAs(ComboBox.class);
            water.setValue(BlendModel.WATER_SEPARATES);
        });
        assertFalse(extraction.isEmpty());
        Solvent water = fx.session.solvents().stream().filter(org.cohesa.core.activity.WaterMiscibility::isWater).findFirst().orElseThrow();
        for (BlendModel.Row r : extraction) {
            var w = org.cohesa.core.activity.WaterMiscibility.withWater(r.blend().solvents(), r.blend().fractions(), water, 298.15,
                    org.cohesa.store.WaterMiscibilityCsv.bundled());
            assertEquals(org.cohesa.core.activity.WaterBehaviour.Kind.IMMISCIBLE, w.kind(), r.blend().describe());
        }

        // the limits round-trip through the map a case stores
        var limits = m.limits();
        assertEquals(BlendModel.WATER_SEPARATES, limits.get("with-water"));
        robot.interact(() -> {
            m.withWater.set(BlendModel.WATER_ANY);
            m.applyLimits(limits);
        });
        assertEquals(BlendModel.WATER_SEPARATES, m.withWater.get());
    }

    @Test
    void theParameterPanelSaysHowFarInsideAndWhichWayOut(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        SolubilitySphere t = SolubilitySphere.of(18.5, 9.0, 8.0, 8.0); // invented demo sphere
        robot.interact(() -> fx.session.targetProperty().set(new TargetChoice("demo resin (invented)", t, "typed in")));
        List<BlendModel.Row> rows = search(robot, () -> {
            fx.workbench.blendModel().maxComponents.set(2);
            fx.workbench.blendModel().top.set(6);
        });
        assertFalse(rows.isEmpty());
        var panel = fx.workbench.insideOut();
        assertEquals(InsideOut.bestPlane(t, rows.stream().map(r -> r.suggestion().blend().point()).toList()), panel.plane());
        BlendModel.Row first = rows.get(0);
        robot.interact(() -> fx.session.selectedBlendProperty().set(first.blend()));
        InsideOut.Standing st = InsideOut.standing(t, first.suggestion().blend().point());
        String text = panel.summaryText();
        assertTrue(text.startsWith("#1 "), text);
        assertTrue(text.contains(String.format(java.util.Locale.ROOT, "RED %.2f", first.suggestion().blend().red())), text);
        assertTrue(text.contains(String.format(java.util.Locale.ROOT, "%.1f MPa½ inside the surface", st.margin())), text);
        assertTrue(text.contains(st.mainAxis() + " carries it"), text);
        @SuppressWarnings("unchecked")
        ComboBox<String> plane = robot.lookup("#inside-out-plane").queryAs(ComboBox.class);
        robot.interact(() -> plane.setValue("2δD–δH"));
        assertEquals(InsideOut.Plane.D_H, panel.plane());
    }
}
