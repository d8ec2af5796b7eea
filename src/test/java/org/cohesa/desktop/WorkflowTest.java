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
    }
}
