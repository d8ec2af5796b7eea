package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.TimeUnit;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.cohesa.core.cases.CaseStep;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.core.target.Material;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.store.CaseRepository;
import org.cohesa.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * One substitution case from material to record, as a user walks it (issue 16): start the case, pick the material, set
 * limits and search, choose two candidates, run their checks, file the record; then reopen the saved case in a fresh
 * workbench and find everything again. The case (toluene out of an invented thinner) is a demo of our own.
 */
@ExtendWith(ApplicationExtension.class)
class CaseWorkflowTest {

    private DesktopFixture fx;
    private Stage stage;

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        fx = new DesktopFixture(stage);
    }

    @Test
    void aCaseRunsFromMaterialToRecordAndReopensAsItWasLeft(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        assertEquals(Screen.CASES, fx.workbench.currentScreen(), "the app opens on the case list");
        // a replacement case needs the liquid it replaces: the field is named
        robot.interact(() -> {
            robot.lookup("#case-title").queryAs(TextField.class).setText("Thinner for line 2 (invented demo)");
            robot.lookup("#case-start").queryAs(Button.class).fire();
        });
        assertTrue(fx.session.jobs().messageProperty().get().toLowerCase(java.util.Locale.ROOT).contains("replaced liquid"), fx.session.jobs().messageProperty().get());
        assertNull(fx.workbench.caseModel().current());
        robot.interact(() -> {
            robot.lookup("#case-replaced").queryAs(TextField.class).setText("toluene");
            robot.lookup("#case-process").queryAs(TextField.class).setText("alkyd enamel thinner");
            robot.lookup("#case-start").queryAs(Button.class).fire();
        });
        SubstitutionCase c = fx.workbench.caseModel().current();
        assertNotNull(c);
        assertEquals("toluene", fx.session.replacingProperty().get());
        assertEquals(Screen.TARGET, fx.workbench.currentScreen(), "a new case goes on to its material");
        assertEquals("○ no material yet", fx.workbench.caseStrip().text(CaseStep.MATERIAL));
        assertTrue(robot.lookup("#strip-case").queryAs(Label.class).getText().contains("replaces toluene"));

        // 1 Material: PMMA from the library
        @SuppressWarnings("unchecked")
        ListView<Material> materials = robot.lookup("#material-list").queryAs(ListView.class);
        Material pmma = materials.getItems().stream().filter(m -> m.name().equals("poly(methyl methacrylate)")).findFirst()
                .orElse(materials.getItems().get(0));
        robot.interact(() -> {
            materials.getSelectionModel().select(pmma);
            robot.lookup("#material-use").queryAs(Button.class).fire();
        });
        assertTrue(fx.workbench.caseStrip().text(CaseStep.MATERIAL).startsWith("✓ " + pmma.name()), fx.workbench.caseStrip().text(CaseStep.MATERIAL));
        assertEquals(pmma.name(), fx.workbench.caseModel().current().material().name());

        // 2 Limits and 3 Candidates: a plant's own solvents, two components at most, a blend flash-point limit
        robot.interact(() -> {
            fx.workbench.showStep(CaseStep.LIMITS);
            fx.workbench.blendModel().maxComponents.set(2);
            fx.workbench.blendModel().top.set(6);
            robot.lookup("#blend-include").queryAs(TextField.class).setText(
                    "acetone;ethanol;toluene;ethyl acetate;n-butyl acetate;1-butanol;2-propanol;methyl ethyl ketone;tetrahydrofuran");
            robot.lookup("#blend-exclude").queryAs(TextField.class).setText("toluene");
            robot.lookup("#blend-search").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        @SuppressWarnings("unchecked")
        ListView<BlendModel.Row> cards = robot.lookup("#blend-cards").queryAs(ListView.class);
        assertTrue(cards.getItems().size() >= 2, "candidates: " + cards.getItems().size() + " " + fx.session.jobs().messageProperty().get());
        SubstitutionCase afterSearch = fx.workbench.caseModel().current();
        assertEquals("2", afterSearch.limits().get("max-components"));
        assertEquals(cards.getItems().size(), afterSearch.found().size());
        assertTrue(fx.workbench.caseStrip().text(CaseStep.LIMITS).startsWith("✓ RED ≤ 0.8"), fx.workbench.caseStrip().text(CaseStep.LIMITS));
        assertTrue(fx.workbench.caseStrip().text(CaseStep.CANDIDATES).contains("none chosen yet"));
        String first = cards.getItems().get(0).blend().describe();
        String second = cards.getItems().get(1).blend().describe();
        robot.interact(() -> {
            cards.getSelectionModel().clearSelection();
            cards.getSelectionModel().selectIndices(0, 1);
            robot.lookup("#blend-choose").queryAs(Button.class).fire();
        });
        assertEquals(2, fx.workbench.caseModel().current().chosen().size());
        assertTrue(fx.workbench.caseStrip().text(CaseStep.CHECKS).contains("0 of 6 checks done"), fx.workbench.caseStrip().text(CaseStep.CHECKS));

        // 4 Checks: safety, drying and phases of both, off the FX thread
        robot.interact(() -> {
            fx.workbench.showStep(CaseStep.CHECKS);
            robot.lookup("#checks-run").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        assertTrue(fx.workbench.caseStrip().text(CaseStep.CHECKS).startsWith("✓ 6 of 6 checks done"), fx.workbench.caseStrip().text(CaseStep.CHECKS));
        var chosen = fx.workbench.caseModel().current().chosen().get(0);
        assertTrue(chosen.safety().contains("Flash point"), chosen.safety());
        assertTrue(chosen.drying().contains("sphere") || chosen.drying().contains("could not"), chosen.drying());
        assertTrue(chosen.miscibility().contains("with water"), chosen.miscibility());
        assertNotNull(robot.lookup("#safety-panel").tryQuery().orElse(null), "the safety panel of the selected candidate is shown");
        assertTrue(robot.lookup("#safety-cautions").queryAs(javafx.scene.layout.VBox.class).getChildren().stream()
                .map(n -> ((Label) n).getText()).anyMatch(t -> t.toLowerCase(java.util.Locale.ROOT).contains("safety data sheet")
                        || t.contains("SDS")), "the cautions defer to the SDS");

        // 5 Record: filed from the case, with the replacement picked from the chosen candidates
        robot.interact(() -> {
            fx.workbench.showStep(CaseStep.RECORD);
            assertEquals("toluene", robot.lookup("#record-step-replaced").queryAs(TextField.class).getText());
            assertEquals("alkyd enamel thinner", robot.lookup("#record-step-process").queryAs(TextField.class).getText());
            @SuppressWarnings("unchecked")
            ComboBox<String> to = robot.lookup("#record-step-replacement").queryAs(ComboBox.class);
            assertEquals(java.util.List.of(first, second), to.getItems());
            robot.lookup("#record-step-reason").queryAs(TextField.class).setText("reprotoxic aromatic (H361d)");
            robot.lookup("#record-step-author").queryAs(TextField.class).setText("R. Formulator");
            robot.lookup("#record-step-file").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        Long record = fx.workbench.caseModel().current().recordId();
        assertNotNull(record, fx.session.jobs().messageProperty().get());
        assertEquals("○ record " + record + " draft: send it to review", fx.workbench.caseStrip().text(CaseStep.RECORD));
        assertTrue(robot.lookup("#record-step-state").queryAs(Label.class).getText().contains("draft"),
                robot.lookup("#record-step-state").queryAs(Label.class).getText());
        assertEquals(first, fx.workbench.recordsModel().records().get(0).content().replacement());

        // the case was saved as it went: the database holds what the screen shows
        SubstitutionCase shown = fx.workbench.caseModel().current();
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> shown.equals(fx.workbench.caseModel().storedProperty().get()));
        try (Database db = Database.open(fx.folder.resolve("cohesa.db"))) {
            assertEquals(shown, new CaseRepository(db).find(shown.id()).orElseThrow());
        }

        // a fresh workbench on the same database: the case is listed and reopens with its material, limits, candidates and checks
        robot.interact(() -> {
            try {
                fx = new DesktopFixture(stage, fx.folder);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
        });
        fx.awaitLibrary();
        fx.awaitJobs();
        assertEquals(1, fx.workbench.caseModel().saved().size());
        assertNull(fx.workbench.caseModel().current());
        @SuppressWarnings("unchecked")
        javafx.scene.control.TableView<CaseRepository.Summary> list = robot.lookup("#case-list").queryAs(javafx.scene.control.TableView.class);
        robot.interact(() -> {
            list.getSelectionModel().select(0);
            robot.lookup("#case-open").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> fx.workbench.caseModel().checks().size() == 2);
        WaitForAsyncUtils.waitForFxEvents();
        SubstitutionCase back = fx.workbench.caseModel().current();
        assertEquals(shown.id(), back.id());
        assertEquals(pmma.name(), fx.session.target().name());
        assertEquals(2, fx.workbench.blendModel().maxComponents.get());
        assertEquals("toluene", fx.workbench.blendModel().exclude.get());
        assertFalse(fx.workbench.blendModel().rows().isEmpty(), "the search ran again with the stored limits");
        assertEquals(java.util.List.of(first, second), back.chosen().stream().map(SubstitutionCase.ChosenCandidate::blend).toList());
        assertEquals(record, back.recordId());
        assertEquals("○ record " + record + " draft: send it to review", fx.workbench.caseStrip().text(CaseStep.RECORD));
    }
}
