package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

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

/** The main workflow as a user walks it: pick a material, search blends, open the first one's drying path, record it. */
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
        // the likelihood fit's own findings, as the command line prints them: its region with whether the data bound
        // it, the likely misfits (or none) and the model note
        assertTrue(report.contains("95 % likelihood region: centres up to Ra"), report);
        assertTrue(report.contains("Likely misfits"), report);
        assertTrue(report.contains("Note: model: P(dissolves)"), report);
        assertFalse(report.contains("resamples)"), "the likelihood fit has no bootstrap: " + report);
        // the findings as rows: misfits and next tests; a next test goes into the test table with one click
        @SuppressWarnings("unchecked")
        javafx.scene.control.TableView<Object> findings = robot.lookup("#fit-findings").queryAs(javafx.scene.control.TableView.class);
        var fit = fx.workbench.targetView();
        assertFalse(findings.getItems().isEmpty(), "the fit lists its misfits and next tests");
        // the likelihood fit gives each result on its unexpected side its probability (demo series: chloroform did not
        // dissolve although inside, 1,4-dioxane did although outside)
        assertTrue(findings.getItems().stream().map(Object::toString).anyMatch(x -> x.contains("probability of this result")),
                findings.getItems().toString());
        int next = -1;
        for (int i = 0; i < findings.getItems().size(); i++) {
            if (findings.getItems().get(i).toString().contains("next test")) {
                next = i;
                break;
            }
        }
        org.junit.jupiter.api.Assertions.assertTrue(next >= 0, "a next test is suggested: " + findings.getItems());
        int row = next;
        robot.interact(() -> {
            findings.getSelectionModel().select(row);
            robot.lookup("#fit-add-test").queryAs(Button.class).fire();
        });
        String table = robot.lookup("#fit-csv").queryAs(TextArea.class).getText();
        assertTrue(table.length() > csv.length() && table.strip().endsWith(","), "the next test's liquid is added with an empty score");
        assertEquals(fit, fx.workbench.targetView());
        // the tested liquids are kept with the fitted sphere for the parameter panel
        assertEquals(fx.session.target().sphere(), fx.session.testedLiquidsProperty().get().sphere());
        assertTrue(fx.session.testedLiquidsProperty().get().tests().size() >= 10);
        robot.interact(() -> robot.lookup("#fit-csv").queryAs(TextArea.class).setText(csv));

        // the fit is saved as the user's own material and appears in the material list
        robot.interact(() -> robot.lookup("#fit-save").queryAs(Button.class).fire());
        fx.awaitJobs();
        assertTrue(fx.session.materials().stream().anyMatch(m -> m.name().equals("Resin K-17 (invented)") && m.userEntry()),
                "saved material missing");

        // a typed-in sphere: a bad field is named in the form, a good one is kept as the user's own material
        robot.interact(() -> {
            robot.lookup("#target-dd").queryAs(TextField.class).setText("abc");
            robot.lookup("#target-keep").queryAs(Button.class).fire();
        });
        javafx.scene.control.Label problem = robot.lookup("#target-problem").queryAs(javafx.scene.control.Label.class);
        assertTrue(problem.isVisible() && problem.getText().contains("δD"), problem.getText());
        robot.interact(() -> {
            robot.lookup("#target-name").queryAs(TextField.class).setText("house binder (invented)");
            robot.lookup("#target-dd").queryAs(TextField.class).setText("18.2");
            robot.lookup("#target-dp").queryAs(TextField.class).setText("6");
            robot.lookup("#target-dh").queryAs(TextField.class).setText("5.5");
            robot.lookup("#target-r0").queryAs(TextField.class).setText("7.5");
            robot.lookup("#target-keep").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        assertTrue(fx.session.materials().stream().anyMatch(m -> m.name().equals("house binder (invented)") && m.userEntry()),
                "typed-in material missing");
        assertEquals("house binder (invented)", fx.session.target().name());

        // a broken table is refused with every bad cell listed, and the target stays
        robot.interact(() -> {
            robot.lookup("#fit-csv").queryAs(TextArea.class).setText("liquid,score\nacetone,maybe\nno such liquid,1\n");
            robot.lookup("#fit-run").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        report = robot.lookup("#fit-report").queryAs(TextArea.class).getText();
        assertTrue(report.startsWith("The fit could not run"), report);
        assertTrue(report.contains("line 2"), report);
        assertEquals("house binder (invented)", fx.session.target().name());
    }

    @Test
    void pickAMaterialSearchBlendsOpenTheFirstBlendsDryingPathAndRecordIt(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> fx.workbench.show(Screen.TARGET));
        @SuppressWarnings("unchecked")
        ListView<Material> materials = robot.lookup("#material-list").queryAs(ListView.class);
        assertFalse(materials.getItems().isEmpty(), "the material library is listed");
        // PMMA: a resin a coatings plant's solvents dissolve (the list's first entry depends on the bundled data)
        Material picked = materials.getItems().stream().filter(m -> m.name().equals("poly(methyl methacrylate)")).findFirst()
                .orElse(materials.getItems().get(0));
        robot.interact(() -> {
            materials.getSelectionModel().select(picked);
            robot.lookup("#material-use").queryAs(Button.class).fire();
        });
        assertNotNull(fx.session.target());
        assertEquals(picked.name(), fx.session.target().name());
        assertTrue(robot.lookup("#target-current").queryAs(Label.class).getText().startsWith("✓ " + picked.name()));
        assertTrue(robot.lookup("#status-target").queryAs(Label.class).getText().contains(picked.name()));

        // blend search: two components at most keeps the test quick
        robot.interact(() -> {
            fx.workbench.show(Screen.BLENDS);
            fx.workbench.blendModel().maxComponents.set(2);
            fx.workbench.blendModel().top.set(5);
            // the plant's own solvents (each has a vapour-pressure correlation in the library, so the drying path can be computed)
            robot.lookup("#blend-include").queryAs(TextField.class).setText(
                    "acetone;ethanol;toluene;ethyl acetate;n-butyl acetate;1-butanol;2-propanol;methyl ethyl ketone;tetrahydrofuran");
            robot.lookup("#blend-search").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        @SuppressWarnings("unchecked")
        javafx.scene.control.ListView<org.cohesa.desktop.blend.BlendModel.Row> blends =
                robot.lookup("#blend-cards").queryAs(javafx.scene.control.ListView.class);
        assertFalse(blends.getItems().isEmpty(), "the search suggests blends");
        var first = blends.getItems().get(0);
        // ranked by hazard among the blends inside the sphere (the default), which come first
        assertTrue(first.suggestion().blend().red() <= 1.0 + 1e-9, "the best suggestion lies within the RED limit 1.0: " + fx.session.target()
                + " " + first.blend().describe() + " RED " + first.suggestion().blend().red());
        for (var r : blends.getItems()) {
            assertTrue(r.blend().size() <= 2);
            assertTrue(r.blend().components().stream().allMatch(c -> c.solvent().vapourPressure() != null), "only the included solvents");
            assertTrue(r.blend().components().stream().noneMatch(c -> c.solvent().isCmr()), "CMR solvents are left out by default");
        }
        robot.interact(() -> blends.getSelectionModel().clearAndSelect(0));
        String profile = robot.lookup("#blend-details").queryAs(TextArea.class).getText();
        assertTrue(profile.contains("Flash point"), profile);
        assertTrue(profile.contains("screening estimates"), "every safety text ends with the reminder");
        assertEquals(first.blend(), fx.session.selectedBlendProperty().get());
        robot.interact(() -> robot.lookup("#blend-drying").queryAs(Button.class).fire());
        fx.awaitJobs();
        String summary = robot.lookup("#drying-summary").queryAs(TextArea.class).getText();
        assertTrue(summary.startsWith("Drying path"), "summary: " + summary + " status: " + fx.session.jobs().messageProperty().get() + " blend: " + first.blend().describe());
        assertTrue(summary.contains("Last solvent left: "), summary);
        assertTrue(summary.contains("Cautions"), summary);
        LineChart<?, ?> composition = robot.lookup("#drying-composition-chart").queryAs(LineChart.class);
        assertEquals(first.blend().size(), composition.getData().size(), "one line per component");
        LineChart<?, ?> red = robot.lookup("#drying-red-chart").queryAs(LineChart.class);
        assertFalse(red.getData().isEmpty(), "RED to the picked material is charted");

        // the blend and its path appear in the parameter space
        robot.interact(() -> fx.workbench.show(Screen.SPACE));
        // the 3D view names the selected blend and each of its components
        java.util.List<String> marks = new java.util.ArrayList<>();
        robot.interact(() -> fx.workbench.spaceView().view3d().visibleLabels().stream().filter(l -> l.kind().equals("mark"))
                .forEach(l -> marks.add(l.text())));
        assertTrue(marks.contains("selected blend"), marks.toString());
        for (var c : first.blend().components()) {
            assertTrue(marks.stream().anyMatch(m -> m.startsWith(c.solvent().name() + " ")), c.solvent().name() + " named in 3D: " + marks);
        }
        assertTrue(fx.session.dryingPathProperty().get() != null && !fx.session.dryingPathProperty().get().isEmpty(), "the drying path is there to draw");

        // record the substitution: filed as a draft, approved after review, the register verifies
        robot.interact(() -> {
            fx.workbench.show(Screen.RECORDS);
            fx.workbench.recordsModel().file(new org.cohesa.desktop.records.RecordsModel.Filing("demo enamel (invented)", null,
                    "xylene", first.blend().describe(), "test of the register screen", "tester", true), null);
        });
        fx.awaitJobs();
        @SuppressWarnings("unchecked")
        javafx.scene.control.TableView<org.cohesa.core.records.SubstitutionRecord> records =
                robot.lookup("#records-table").queryAs(javafx.scene.control.TableView.class);
        assertEquals(1, records.getItems().size());
        long id = records.getItems().get(0).id();
        assertEquals(org.cohesa.core.records.RecordStatus.DRAFT, records.getItems().get(0).status());
        // a record filed from the app carries the same evidence as one filed from the command line
        org.cohesa.core.records.Evidence filed = records.getItems().get(0).evidence();
        assertTrue(filed.section(org.cohesa.core.records.Evidence.Sections.SAFETY).isPresent(), filed.sections().toString());
        assertTrue(filed.section(org.cohesa.core.records.Evidence.Sections.DRYING).isPresent(), filed.sections().toString());
        // the reviewer and the lead each at their own operating-system account (the four-eyes rule compares accounts)
        try (org.cohesa.store.LocalAccount.Scope reviewer = org.cohesa.store.LocalAccount.actAsInThisProcess("reviewer")) {
            robot.interact(() -> fx.workbench.recordsModel().changeStatus(id, org.cohesa.core.records.RecordStatus.IN_REVIEW, "reviewer", null, null));
            fx.awaitJobs();
        }
        try (org.cohesa.store.LocalAccount.Scope lead = org.cohesa.store.LocalAccount.actAsInThisProcess("lead")) {
            robot.interact(() -> fx.workbench.recordsModel().changeStatus(id, org.cohesa.core.records.RecordStatus.APPROVED, "lead", "ok", null));
            fx.awaitJobs();
        }
        assertEquals(org.cohesa.core.records.RecordStatus.APPROVED, records.getItems().get(0).status());
        robot.interact(() -> fx.workbench.recordsModel().verify(null));
        fx.awaitJobs();
        assertTrue(fx.session.jobs().messageProperty().get().startsWith("Register intact"), fx.session.jobs().messageProperty().get());
    }
}
