package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.stage.Stage;
import org.cohesa.core.cases.CaseStep;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.desktop.target.TestTable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The Material step as one step of the case (issue 16): it says whether the case has its material, offers the four ways
 * to one as cards (library, fit from a test table, structure, typed in), and the fit's tests are a table — rows pasted
 * from a spreadsheet, names with commas quoted in the CSV the fit reads, a loaded series shown as rows. With
 * {@code -Dcohesa.screenshots=DIR} it writes the fit pane's screenshot there. The series is
 * the repository's invented demo (demo-blends/resin-k17-tests.csv says so).
 */
@ExtendWith(ApplicationExtension.class)
class MaterialStepTest {

    private DesktopFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new DesktopFixture(stage);
    }

    @SuppressWarnings("unchecked")
    private TableView<TestTable.Row> tests(FxRobot robot) {
        return robot.lookup("#fit-tests").queryAs(TableView.class);
    }

    @Test
    void theMaterialStepOffersFourWaysAndFitsFromATestTable(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.workbench.caseModel().start("Binder cleaner (invented demo)", SubstitutionCase.Kind.FIND, "", "");
            robot.lookup("#step-material").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        assertEquals(Screen.TARGET, fx.workbench.currentScreen());
        assertTrue(robot.lookup("#target-current").queryAs(Label.class).getText().startsWith("○ No target yet"));
        TabPane ways = robot.lookup("#target-ways").queryAs(TabPane.class);
        for (int i = 1; i <= 4; i++) {
            int way = i;
            robot.interact(() -> robot.lookup("#material-way-" + way).queryAs(ToggleButton.class).fire());
            assertEquals(way - 1, ways.getSelectionModel().getSelectedIndex(), "card " + way + " opens its pane");
            assertTrue(robot.lookup("#material-way-" + way).queryAs(ToggleButton.class).isSelected());
        }
        robot.interact(() -> robot.lookup("#material-way-2").queryAs(ToggleButton.class).fire());

        // rows pasted from a spreadsheet (tabs, a header line): the CSV the fit reads quotes the name with commas
        TestTable table = fx.workbench.targetView().testTable();
        robot.interact(() -> table.paste("liquid\tscore\nacetone\t1\n1,4-dioxane\t1\nn-hexane\t0\n"));
        assertEquals(3, tests(robot).getItems().size());
        TextArea csv = robot.lookup("#fit-csv").queryAs(TextArea.class);
        assertEquals("liquid,score\nacetone,1\n\"1,4-dioxane\",1\nn-hexane,0\n", csv.getText());
        // a label with explicit parameters: the δ columns join the CSV
        robot.interact(() -> table.paste("my blend X\t0.5\t17.0\t8.0\t9.0\n"));
        assertEquals("liquid,score,dD,dP,dH\nacetone,1,,,\n\"1,4-dioxane\",1,,,\nn-hexane,0,,,\nmy blend X,0.5,17.0,8.0,9.0\n", csv.getText());

        // a whole series loaded as text becomes rows; fitted from the table, the sphere becomes the case's material
        String demo = java.nio.file.Files.readString(java.nio.file.Path.of("demo-blends", "resin-k17-tests.csv"));
        long rows = demo.lines().filter(l -> !l.isBlank() && !l.startsWith("#")).count() - 1;
        robot.interact(() -> csv.setText(demo));
        assertEquals(rows, tests(robot).getItems().size());
        assertEquals("acetone", tests(robot).getItems().get(0).liquid());
        assertEquals("1", tests(robot).getItems().get(0).score());
        assertFalse(robot.lookup("#fit-tests-note").query().isVisible(), "liquid, score, δ and note columns all fit the table");
        robot.interact(() -> {
            robot.lookup("#fit-name").queryAs(TextField.class).setText("Resin K-17 (invented)");
            robot.lookup("#fit-run").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        assertEquals("Resin K-17 (invented)", fx.session.target().name(), fx.session.jobs().messageProperty().get());
        assertEquals(rows, fx.session.testedLiquidsProperty().get().tests().size(), "every row of the table was fitted");
        assertTrue(robot.lookup("#target-current").queryAs(Label.class).getText().startsWith("✓ Resin K-17 (invented)"));
        assertTrue(fx.workbench.caseStrip().text(CaseStep.MATERIAL).startsWith("✓ Resin K-17 (invented) · R0"),
                fx.workbench.caseStrip().text(CaseStep.MATERIAL));

        String dir = System.getProperty("cohesa.screenshots");
        if (dir != null && !dir.isBlank()) {
            org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
            robot.interact(() -> Snapshots.savePng(robot.lookup("#target-ways").query().getScene().snapshot(null),
                    java.nio.file.Path.of(dir, "case-material-fit-1280x800.png")));
        }
        // the ICH column says "class 2", never a bare digit beside the flash point (the issue's "86 2")
        @SuppressWarnings("unchecked")
        TableView<org.cohesa.desktop.target.TargetModel.Ranked> ranking = robot.lookup("#target-ranking").queryAs(TableView.class);
        var ich = ranking.getColumns().get(ranking.getColumns().size() - 1);
        assertEquals("ICH Q3C", ich.getText());
        for (var row : ranking.getItems()) {
            Object cell = ich.getCellData(row);
            assertTrue(String.valueOf(cell).startsWith("class ") || "not listed".equals(cell), String.valueOf(cell));
        }

        // a series with columns the table has no place for stays text, and says so
        robot.interact(() -> csv.setText("liquid,score,temperature_c\nacetone,1,40\n"));
        assertTrue(robot.lookup("#fit-tests-note").query().isVisible());
        assertTrue(robot.lookup("#fit-tests-note").queryAs(Label.class).getText().contains("temperature_c"));
        assertFalse(tests(robot).isEditable());
    }
}
