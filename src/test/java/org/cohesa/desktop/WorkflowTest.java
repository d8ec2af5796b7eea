package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.Group;
import javafx.scene.SubScene;
import javafx.scene.chart.LineChart;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.cohesa.core.target.Material;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** The main workflow as a user walks it: pick a material, then follow a blend's drying path and read its cautions. */
@ExtendWith(ApplicationExtension.class)
class WorkflowTest {

    private DesktopFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new DesktopFixture(stage);
    }

    @Test
    void fitASphereFromTheDemoTestsAndSeeTheReport(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // the invented demo series of the repository (demo-blends/resin-k17-tests.csv says it is invented)
        java.nio.file.Path demo = java.nio.file.Path.of("demo-blends", "resin-k17-tests.csv");
        org.junit.jupiter.api.Assumptions.assumeTrue(java.nio.file.Files.isRegularFile(demo), "demo series not found");
        String csv = java.nio.file.Files.readString(demo);
        robot.interact(() -> {
            fx.workbench.show(Screen.TARGET);
            robot.lookup("#fit-csv").queryAs(TextArea.class).setText(csv);
            robot.lookup("#fit-name").queryAs(TextField.class).setText("Resin K-17 (invented)");
            robot.lookup("#fit-run").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        assertEquals("Resin K-17 (invented)", fx.session.target().name());
        String report = robot.lookup("#fit-report").queryAs(TextArea.class).getText();
        assertTrue(report.startsWith("Fitted sphere: δD"), report);
        assertTrue(report.contains("Good liquids inside:"), report);

        // a broken table is refused with every bad cell listed, and the target stays
        robot.interact(() -> {
            robot.lookup("#fit-csv").queryAs(TextArea.class).setText("liquid,score\nacetone,yes\nno such liquid,1\n");
            robot.lookup("#fit-run").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        report = robot.lookup("#fit-report").queryAs(TextArea.class).getText();
        assertTrue(report.startsWith("The fit could not run"), report);
        assertTrue(report.contains("line 2"), report);
        assertEquals("Resin K-17 (invented)", fx.session.target().name());
    }

    @Test
    void pickAMaterialThenFollowABlendsDryingPath(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> fx.workbench.show(Screen.TARGET));
        @SuppressWarnings("unchecked")
        ListView<Material> materials = robot.lookup("#material-list").queryAs(ListView.class);
        assertFalse(materials.getItems().isEmpty(), "the material library is listed");
        robot.interact(() -> {
            materials.getSelectionModel().select(0);
            robot.lookup("#material-use").queryAs(Button.class).fire();
        });
        Material picked = materials.getItems().get(0);
        assertNotNull(fx.session.target());
        assertEquals(picked.name(), fx.session.target().name());
        assertTrue(robot.lookup("#target-current").queryAs(Label.class).getText().startsWith(picked.name()));
        assertTrue(robot.lookup("#status-target").queryAs(Label.class).getText().contains(picked.name()));

        robot.interact(() -> {
            fx.workbench.show(Screen.DRYING);
            robot.lookup("#drying-blend").queryAs(TextField.class).setText("acetone:0.5,toluene:0.5");
            robot.lookup("#drying-run").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        String summary = robot.lookup("#drying-summary").queryAs(TextArea.class).getText();
        // acetone is far more volatile than toluene (common practice: acetone bp 56 °C, toluene 111 °C), so toluene is left last
        assertTrue(summary.contains("Last solvent left: toluene"), summary);
        assertTrue(summary.contains("Cautions"), summary);
        assertTrue(summary.contains("screening estimates"), "every safety text ends with the reminder");
        LineChart<?, ?> composition = robot.lookup("#drying-composition-chart").queryAs(LineChart.class);
        assertEquals(2, composition.getData().size(), "one line per component");
        LineChart<?, ?> red = robot.lookup("#drying-red-chart").queryAs(LineChart.class);
        assertFalse(red.getData().isEmpty(), "RED to the picked material is charted");

        // the blend and its path appear in the parameter space
        robot.interact(() -> fx.workbench.show(Screen.SPACE));
        SubScene sub = robot.lookup("#space3d").queryAs(SubScene.class);
        Group path = (Group) sub.getRoot().lookup("#drying-path");
        assertTrue(path.getChildren().size() > 3, "the drying path is drawn as a polyline");
        assertNotNull(sub.getRoot().lookup("#blend-point"));
        Group links = (Group) sub.getRoot().lookup("#blend-links");
        assertEquals(2, links.getChildren().size(), "one line to each component");

        // record the substitution: filed as a draft, approved after review, the register verifies
        robot.interact(() -> {
            fx.workbench.show(Screen.RECORDS);
            fx.workbench.recordsModel().file(new org.cohesa.desktop.records.RecordsModel.Filing("demo enamel (invented)", null,
                    "xylene", "acetone:0.5,toluene:0.5", "test of the register screen", "tester", true), null);
        });
        fx.awaitJobs();
        @SuppressWarnings("unchecked")
        javafx.scene.control.TableView<org.cohesa.core.records.SubstitutionRecord> records =
                robot.lookup("#records-table").queryAs(javafx.scene.control.TableView.class);
        assertEquals(1, records.getItems().size());
        long id = records.getItems().get(0).id();
        assertEquals(org.cohesa.core.records.RecordStatus.DRAFT, records.getItems().get(0).status());
        robot.interact(() -> fx.workbench.recordsModel().changeStatus(id, org.cohesa.core.records.RecordStatus.IN_REVIEW, "tester", null, null));
        fx.awaitJobs();
        robot.interact(() -> fx.workbench.recordsModel().changeStatus(id, org.cohesa.core.records.RecordStatus.APPROVED, "lead", "ok", null));
        fx.awaitJobs();
        assertEquals(org.cohesa.core.records.RecordStatus.APPROVED, records.getItems().get(0).status());
        robot.interact(() -> fx.workbench.recordsModel().verify(null));
        fx.awaitJobs();
        assertTrue(fx.session.jobs().messageProperty().get().startsWith("Register intact"), fx.session.jobs().messageProperty().get());
    }
}
