package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.Spinner;
import javafx.stage.Stage;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.desktop.common.TargetChoice;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The defects found when the workbench was tried as a new user would (issue 16), one check each. */
@ExtendWith(ApplicationExtension.class)
class DefectsTest {

    /** An invented demo sphere (the same as docs/screenshots/take.sh uses). */
    private static final TargetChoice DEMO = new TargetChoice("demo sphere (invented)", SolubilitySphere.of(18.5, 9, 8, 8), "typed in");

    private static java.nio.file.Path shared;
    private DesktopFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        if (shared == null) {
            shared = java.nio.file.Files.createTempDirectory("cohesa-defects-test");
        }
        fx = new DesktopFixture(stage, shared);
    }

    @Test
    void cancelStopsAFourComponentSearchWithinASecondAndSaysSo(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.session.targetProperty().set(DEMO);
            // a wide search the bounds cannot cut short: 4 components, every liquid, a loose RED limit, ranked by hazard
            fx.workbench.blendModel().maxComponents.set(4);
            fx.workbench.blendModel().noCmr.set(false);
            fx.workbench.blendModel().rankBy.set(org.cohesa.core.blend.RankBy.HAZARD);
            fx.workbench.blendModel().redLimit.set("5");
            fx.workbench.blendModel().top.set(100);
            fx.workbench.blendModel().search(null);
        });
        Thread.sleep(400);
        assertTrue(fx.session.jobs().runningProperty().get(), "this 4-component search takes longer than 0.4 s");
        robot.interact(() -> fx.session.jobs().cancel());
        // waitFor fails the test with a TimeoutException when the condition is not met within the second
        WaitForAsyncUtils.waitFor(1, TimeUnit.SECONDS, () -> !fx.session.jobs().runningProperty().get());
        Thread.sleep(500); // late progress messages of the stopped search must not overwrite the word
        WaitForAsyncUtils.waitForFxEvents();
        String status = fx.session.jobs().messageProperty().get();
        assertTrue(status.contains("cancelled"), status);
        // the worker is free again: the next job starts and finishes at once, not after the stopped search
        boolean[] ran = {false};
        robot.interact(() -> fx.session.jobs().run("Next job", p -> 1, v -> ran[0] = true));
        WaitForAsyncUtils.waitFor(1, TimeUnit.SECONDS, () -> ran[0]);
        WaitForAsyncUtils.waitForFxEvents();
        Thread.sleep(300);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(fx.workbench.blendModel().rows().isEmpty(), "a cancelled search lists nothing");
    }

    @Test
    void aNewTargetClearsTheOldSuggestionsAndTheHint(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.workbench.show(Screen.BLENDS);
            assertTrue(robot.lookup("#blend-placeholder").queryAs(Label.class).getText().startsWith("Set a target"));
            fx.session.targetProperty().set(DEMO);
            fx.workbench.blendModel().maxComponents.set(1);
            fx.workbench.blendModel().search(null);
        });
        fx.awaitJobs();
        assertFalse(fx.workbench.blendModel().rows().isEmpty());
        assertFalse(robot.lookup("#blend-placeholder").queryAs(Label.class).getText().contains("Set a target"),
                "the set-a-target hint is gone once a target is set");
        robot.interact(() -> fx.session.targetProperty().set(new TargetChoice("another sphere (invented)",
                SolubilitySphere.of(16, 4, 4, 6), "typed in")));
        assertTrue(fx.workbench.blendModel().rows().isEmpty(), "suggestions for the old target are not listed under the new one");
    }

    @Test
    void aFitAsksBeforeReplacingTheCurrentTarget(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // four liquids from the bundled library, scores invented for the test (a demo series, no source)
        String csv = "liquid,score\nacetone,1\ntoluene,1\nethyl acetate,1\nmethanol,0\nwater,0\nn-hexane,0\n"
                + "tetrahydrofuran,1\ncyclohexane,0\n";
        robot.interact(() -> {
            fx.session.targetProperty().set(DEMO);
            fx.workbench.show(Screen.TARGET);
            robot.lookup("#fit-csv").queryAs(javafx.scene.control.TextArea.class).setText(csv);
            robot.lookup("#fit-run").queryAs(javafx.scene.control.Button.class).fire();
        });
        fx.awaitJobs();
        assertEquals(DEMO, fx.session.target(), "the fit did not replace the target on its own");
        assertTrue(robot.lookup("#fit-question").query().isVisible(), "the fit pane asks");
        robot.interact(() -> robot.lookup("#fit-keep-target").queryAs(javafx.scene.control.Button.class).fire());
        assertEquals(DEMO, fx.session.target());
        assertFalse(robot.lookup("#fit-question").query().isVisible());
        robot.interact(() -> robot.lookup("#fit-run").queryAs(javafx.scene.control.Button.class).fire());
        fx.awaitJobs();
        robot.interact(() -> robot.lookup("#fit-replace-target").queryAs(javafx.scene.control.Button.class).fire());
        assertTrue(fx.session.target().source().startsWith("fit of"), fx.session.target().source());
    }

    @Test
    void theStatusDropsTheErrorColourWhenTheNextJobRuns(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        Label status = robot.lookup("#status").queryAs(Label.class);
        robot.interact(() -> fx.session.jobs().complain("something failed"));
        assertTrue(status.getStyleClass().contains("status-problem"));
        robot.interact(() -> fx.session.jobs().run("Next job", p -> {
            Thread.sleep(1500);
            return 1;
        }, v -> { }));
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(status.getStyleClass().contains("status-problem"), "the running job is not shown as a failure");
        fx.awaitJobs();
    }

    @Test
    void theMostComponentsSpinnerCommitsTypedInput(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> fx.workbench.show(Screen.BLENDS));
        @SuppressWarnings("unchecked")
        Spinner<Integer> k = robot.lookup("#blend-max-components").queryAs(Spinner.class);
        robot.interact(() -> k.getEditor().setText("2"));
        // typing without Enter, then leaving the field (the search button takes the focus)
        robot.interact(() -> robot.lookup("#blend-search").query().requestFocus());
        assertEquals(2, fx.workbench.blendModel().maxComponents.get());
        // beyond the range, then Search: the search takes the clamped value (it fails for want of a target, which is fine here)
        robot.interact(() -> {
            k.getEditor().setText("9");
            robot.lookup("#blend-search").queryAs(javafx.scene.control.Button.class).fire();
        });
        assertEquals(4, fx.workbench.blendModel().maxComponents.get(), "a typed value beyond the range is clamped to 4");
    }

    @Test
    void aDryingPathThatCannotBeComputedSaysWhyInThePane(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // first a path that works, so there is a curve and an axis to be left over
        robot.interact(() -> {
            fx.session.targetProperty().set(DEMO);
            fx.workbench.show(Screen.DRYING);
            fx.workbench.dryingModel().blendTextProperty().set("acetone:0.3,n-butyl acetate:0.4,toluene:0.3");
            fx.workbench.dryingModel().run(null);
        });
        fx.awaitJobs();
        javafx.scene.chart.LineChart<?, ?> red = robot.lookup("#drying-red-chart").queryAs(javafx.scene.chart.LineChart.class);
        assertFalse(red.getData().isEmpty());
        // then one that cannot be computed (a liquid the library does not know stands for any failure of the computation)
        String blend = "acetone:0.5,no such liquid:0.5";
        robot.interact(() -> {
            fx.workbench.dryingModel().blendTextProperty().set(blend);
            fx.workbench.dryingModel().run(null);
        });
        fx.awaitJobs();
        Label problem = robot.lookup("#drying-problem").queryAs(Label.class);
        assertTrue(problem.isVisible() && problem.getText().contains("could not be computed"), problem.getText());
        assertTrue(problem.getText().contains("no such liquid"), problem.getText());
        String summary = robot.lookup("#drying-summary").queryAs(javafx.scene.control.TextArea.class).getText();
        assertTrue(summary.contains("could not be computed"), "the summary pane says it too, instead of the Type-a-blend prompt: " + summary);
        assertTrue(red.getData().isEmpty(), "no curve of an earlier blend is left");
        assertEquals(1.5, ((javafx.scene.chart.NumberAxis) red.getYAxis()).getUpperBound(), 1e-9, "the RED axis is reset");
    }

    @Test
    void theRegisterFormTakesTheReplacedLiquidFromTheCaseNotFromALibraryClick(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> fx.session.selectedSolventProperty().set(fx.session.solvents().get(0)));
        assertEquals("", fx.workbench.recordsModel().startingFiling().replaced(), "browsing the library decides nothing");
        robot.interact(() -> fx.session.replacingProperty().set("toluene"));
        assertEquals("toluene", fx.workbench.recordsModel().startingFiling().replaced());
    }

    @Test
    void recordDetailsShowTheEvidenceWithItsContent(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.session.targetProperty().set(DEMO);
            fx.workbench.show(Screen.RECORDS);
            fx.workbench.recordsModel().file(new org.cohesa.desktop.records.RecordsModel.Filing("test line (invented)", null,
                    "toluene", "acetone:0.5,ethyl acetate:0.5", "test of the record details", "tester", true), null);
        });
        fx.awaitJobs();
        @SuppressWarnings("unchecked")
        javafx.scene.control.TableView<org.cohesa.core.records.SubstitutionRecord> records =
                robot.lookup("#records-table").queryAs(javafx.scene.control.TableView.class);
        robot.interact(() -> records.getSelectionModel().select(records.getItems().size() - 1));
        String details = robot.lookup("#record-details").queryAs(javafx.scene.control.TextArea.class).getText();
        String evidence = details.substring(details.indexOf("Evidence"));
        assertTrue(evidence.contains("Safety"), evidence);
        assertTrue(evidence.toLowerCase(java.util.Locale.ROOT).contains("flash point"), "the sections' content, not only their names: " + evidence);
        assertTrue(evidence.contains("ethyl acetate"), evidence);
        assertFalse(details.contains("Z  "), "times are local, not raw UTC stamps: " + details);
    }

    @Test
    void aFirstStartSaysTheDatabaseIsBeingBuilt(FxRobot robot) throws Exception {
        java.nio.file.Path fresh = java.nio.file.Files.createTempDirectory("cohesa-first-start");
        org.cohesa.desktop.common.Session s = new org.cohesa.desktop.common.Session(fresh.resolve("cohesa.db"));
        Workbench[] w = new Workbench[1];
        boolean[] covered = new boolean[1];
        String[] headline = new String[1];
        // read the notice in the same FX turn as load(): the build's completion is delivered on the FX thread, so on a
        // fast machine it could otherwise remove the notice before the test looks
        robot.interact(() -> {
            w[0] = new Workbench(s);
            w[0].load(null);
            covered[0] = w[0].starting();
            headline[0] = ((Label) w[0].root().lookup("#start-overlay").lookupAll(".headline").iterator().next()).getText();
        });
        assertTrue(covered[0], "the window is covered by the start notice while the database is built");
        assertTrue(headline[0].startsWith("First start: building the solvent database"), headline[0]);
        WaitForAsyncUtils.waitFor(90, TimeUnit.SECONDS, () -> !s.jobs().runningProperty().get() && !s.solvents().isEmpty());
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(w[0].starting(), "the notice goes once the library is shown");
    }

    @Test
    void noCandidateNameIsClippedAt1280By800(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // the eight longest names of the library that can take part in a search: the hardest case for the layout
        String longest = fx.session.solvents().stream().filter(x -> x.hasHansen() && !x.isCmr())
                .sorted(java.util.Comparator.comparingInt((org.cohesa.core.solvent.Solvent x) -> x.name().length()).reversed())
                .limit(8).map(org.cohesa.core.solvent.Solvent::name).collect(java.util.stream.Collectors.joining(";"));
        robot.interact(() -> {
            fx.session.targetProperty().set(DEMO);
            fx.workbench.show(Screen.BLENDS);
            fx.workbench.blendModel().maxComponents.set(3);
            fx.workbench.blendModel().include.set(longest);
            fx.workbench.blendModel().redLimit.set("3");
            fx.workbench.blendModel().search(null);
        });
        fx.awaitJobs();
        assertFalse(fx.workbench.blendModel().rows().isEmpty(), fx.session.jobs().messageProperty().get());
        javafx.scene.Node list = robot.lookup("#blend-cards").query();
        javafx.geometry.Bounds frame = list.localToScene(list.getLayoutBounds());
        var chips = list.lookupAll(".card-component");
        assertFalse(chips.isEmpty());
        for (javafx.scene.Node n : chips) {
            Label chip = (Label) n;
            if (!chip.isVisible() || chip.getScene() == null) {
                continue;
            }
            javafx.scene.text.Text shown = (javafx.scene.text.Text) chip.lookup(".text");
            assertEquals(chip.getText(), shown.getText(), "the name is shown whole, not shortened");
            javafx.geometry.Bounds b = chip.localToScene(chip.getLayoutBounds());
            assertTrue(b.getMinX() >= frame.getMinX() - 0.5 && b.getMaxX() <= frame.getMaxX() + 0.5,
                    chip.getText() + " lies inside the list: " + b + " in " + frame);
        }
        // flash point and ICH class no longer run together ("86 2"): each is its own labelled fact, apart from the other
        Label flash = (Label) list.lookup(".card-flash");
        Label ich = (Label) list.lookup(".card-ich");
        assertTrue(flash.getText().startsWith("Flash point") || flash.getText().startsWith("No "), flash.getText());
        assertTrue(ich.getText().startsWith("ICH Q3C"), ich.getText());
        assertFalse(flash.localToScene(flash.getLayoutBounds()).intersects(ich.localToScene(ich.getLayoutBounds())), "the two facts do not touch");
    }
}
