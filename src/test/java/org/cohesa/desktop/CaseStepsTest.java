package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.cohesa.core.cases.CaseStep;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.target.Material;
import org.cohesa.store.LocalAccount;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The case's steps as their own panes (issue 16): the Limits step and the Candidates step are apart, each says what it
 * has done or misses, a limit changed after the search opens the Limits step again; and the record is taken from draft
 * to approved on the case's Record step, with the register's four-eyes rule refusing the author and the reviewer
 * (operating-system accounts, as the local register compares them; docs/records.md). The case is an invented demo.
 * With {@code -Dcohesa.screenshots=DIR} it writes the approved Record step's screenshot there.
 */
@ExtendWith(ApplicationExtension.class)
class CaseStepsTest {

    private static final String PLANT = "acetone;ethanol;ethyl acetate;n-butyl acetate;1-butanol;2-propanol;methyl ethyl ketone";

    private DesktopFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new DesktopFixture(stage);
    }

    private void startCaseWithMaterial(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.workbench.caseModel().start("Thinner for line 4 (invented demo)", SubstitutionCase.Kind.REPLACE, "toluene", "enamel thinner");
            Material pmma = fx.session.materials().stream().filter(m -> m.name().equals("poly(methyl methacrylate)")).findFirst()
                    .orElse(fx.session.materials().get(0));
            new org.cohesa.desktop.target.TargetModel(fx.session).useMaterial(pmma);
        });
        fx.awaitJobs();
    }

    private void searchFromTheLimitsStep(FxRobot robot) throws Exception {
        robot.interact(() -> {
            fx.workbench.caseStrip();
            robot.lookup("#step-limits").queryAs(Button.class).fire();
            fx.workbench.blendModel().maxComponents.set(2);
            fx.workbench.blendModel().top.set(5);
            robot.lookup("#blend-include").queryAs(TextField.class).setText(PLANT);
            robot.lookup("#blend-search").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
    }

    private static boolean inside(Node n, Node pane) {
        for (Parent p = n.getParent(); p != null; p = p.getParent()) {
            if (p == pane) {
                return true;
            }
        }
        return false;
    }

    @Test
    void limitsAndCandidatesAreStepsOfTheirOwn(FxRobot robot) throws Exception {
        startCaseWithMaterial(robot);
        Node limits = robot.lookup("#limits-step").query();
        Node candidates = robot.lookup("#candidates-step").query();
        Node form = robot.lookup("#blend-search").query();
        Node cards = robot.lookup("#blend-cards").query();
        assertTrue(inside(form, limits) && !inside(form, candidates), "the form is on the Limits step only");
        assertTrue(inside(cards, candidates) && !inside(cards, limits), "the cards are on the Candidates step only");
        assertTrue(fx.workbench.limitsStep().stateText().startsWith("○ For poly(methyl methacrylate): no search run yet"),
                fx.workbench.limitsStep().stateText());
        assertEquals("○ no search run yet", fx.workbench.caseStrip().text(CaseStep.LIMITS));

        searchFromTheLimitsStep(robot);
        assertEquals(Screen.BLENDS, fx.workbench.currentScreen(), "a search from the Limits step goes on to its candidates");
        int found = fx.workbench.blendModel().rows().size();
        assertTrue(found >= 2, "candidates: " + found);
        assertTrue(fx.workbench.caseStrip().text(CaseStep.LIMITS).startsWith("✓ RED ≤ 0.8 · ≤ 2 components"), fx.workbench.caseStrip().text(CaseStep.LIMITS));
        assertEquals("○ " + found + " found, none chosen yet", fx.workbench.caseStrip().text(CaseStep.CANDIDATES));
        String line = fx.workbench.candidatesStep().foundWithText();
        assertTrue(line.contains("found with RED ≤ 0.8 · ≤ 2 components") && line.contains(found + " found, none chosen yet"), line);
        assertTrue(fx.workbench.limitsStep().stateText().startsWith("✓ For poly(methyl methacrylate): " + found + " candidates found"),
                fx.workbench.limitsStep().stateText());

        // a limit changed after the search: the Limits step is open again and names the change; back as it was, done again
        robot.interact(() -> fx.workbench.blendModel().redLimit.set("0.6"));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("○ changed since the last search: search again", fx.workbench.caseStrip().text(CaseStep.LIMITS));
        assertTrue(fx.workbench.limitsStep().stateText().contains("search again"), fx.workbench.limitsStep().stateText());
        assertEquals("0.8   → now 0.6", robot.lookup("#limits-changed-red-limit").queryAs(Label.class).getText());
        assertTrue(fx.workbench.candidatesStep().foundWithText().startsWith("These cards were found with earlier limits"),
                fx.workbench.candidatesStep().foundWithText());
        robot.interact(() -> fx.workbench.blendModel().redLimit.set("0.8"));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(fx.workbench.caseStrip().text(CaseStep.LIMITS).startsWith("✓ RED ≤ 0.8"), fx.workbench.caseStrip().text(CaseStep.LIMITS));
        assertTrue(robot.lookup("#limits-changed-red-limit").tryQuery().isEmpty());

        // the Candidates step's way back to the limits
        robot.interact(() -> robot.lookup("#candidates-change-limits").queryAs(Button.class).fire());
        assertEquals(Screen.LIMITS, fx.workbench.currentScreen());
        robot.interact(() -> robot.lookup("#limits-show-candidates").queryAs(Button.class).fire());
        assertEquals(Screen.BLENDS, fx.workbench.currentScreen());
    }

    @Test
    void theRecordIsApprovedOnTheCasesRecordStepAsTheRegisterAllows(FxRobot robot) throws Exception {
        startCaseWithMaterial(robot);
        searchFromTheLimitsStep(robot);
        robot.interact(() -> {
            fx.workbench.caseModel().choose(java.util.List.of(fx.workbench.blendModel().rows().get(0)));
            robot.lookup("#step-record").queryAs(Button.class).fire();
            robot.lookup("#record-step-reason").queryAs(TextField.class).setText("reprotoxic aromatic (H361d)");
            robot.lookup("#record-step-author").queryAs(TextField.class).setText("R. Formulator");
            robot.lookup("#record-step-file").queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        Long id = fx.workbench.caseModel().current().recordId();
        assertNotNull(id, fx.session.jobs().messageProperty().get());
        assertEquals("○ record " + id + " draft: send it to review", fx.workbench.caseStrip().text(CaseStep.RECORD));
        assertTrue(robot.lookup("#record-step-file").queryAs(Button.class).isDisabled(), "a filed case cannot file again");
        assertFalse(robot.lookup("#record-step-review").queryAs(Button.class).isDisabled());
        assertTrue(robot.lookup("#record-step-approve").queryAs(Button.class).isDisabled(), "a draft cannot be approved");

        // the author's own account cannot send it to review, whatever name is typed: refused here, nothing written
        decide(robot, "#record-step-review", "Q. Reviewer", "evidence complete");
        String refused = robot.lookup("#record-step-refused").queryAs(Label.class).getText();
        assertTrue(robot.lookup("#record-step-refused").query().isVisible() && refused.startsWith("Refused, nothing written:")
                && refused.contains("four-eyes rule"), refused);
        assertTrue(fx.session.jobs().failedProperty().get());
        assertEquals(RecordStatus.DRAFT, fx.workbench.caseModel().recordStatus());

        try (LocalAccount.Scope bob = LocalAccount.actAsInThisProcess("bob")) {
            decide(robot, "#record-step-review", "Q. Reviewer", "evidence complete");
            assertEquals(RecordStatus.IN_REVIEW, fx.workbench.caseModel().recordStatus(), fx.session.jobs().messageProperty().get());
            assertFalse(robot.lookup("#record-step-refused").query().isVisible());
            assertEquals("○ record " + id + " in review: awaits a decision", fx.workbench.caseStrip().text(CaseStep.RECORD));
            // the reviewer cannot approve it too
            decide(robot, "#record-step-approve", "M. Manager", "trials passed");
            assertTrue(robot.lookup("#record-step-refused").queryAs(Label.class).getText().contains("four-eyes rule"));
            assertEquals(RecordStatus.IN_REVIEW, fx.workbench.caseModel().recordStatus());
        }
        try (LocalAccount.Scope carol = LocalAccount.actAsInThisProcess("carol")) {
            decide(robot, "#record-step-approve", "M. Manager", "trials passed");
            assertEquals(RecordStatus.APPROVED, fx.workbench.caseModel().recordStatus(), fx.session.jobs().messageProperty().get());
        }
        assertEquals("✓ record " + id + " approved", fx.workbench.caseStrip().text(CaseStep.RECORD));
        assertEquals(Screen.RECORD, fx.workbench.currentScreen(), "the case was never left");
        assertTrue(robot.lookup("#record-step-history-2").queryAs(Label.class).getText().contains("sent to review by Q. Reviewer (account bob)"));
        String approved = robot.lookup("#record-step-history-3").queryAs(Label.class).getText();
        assertTrue(approved.contains("approved by M. Manager (account carol) — trials passed"), approved);
        assertTrue(robot.lookup("#record-step-approve").queryAs(Button.class).isDisabled()
                && robot.lookup("#record-step-reject").queryAs(Button.class).isDisabled(), "a decision is final");
        String dir = System.getProperty("cohesa.screenshots");
        if (dir != null && !dir.isBlank()) {
            WaitForAsyncUtils.waitForFxEvents();
            robot.interact(() -> Snapshots.savePng(robot.lookup("#record-step").query().getScene().snapshot(null),
                    java.nio.file.Path.of(dir, "case-record-approved-1280x800.png")));
        }
        // the register, as reference, holds the same
        assertEquals(RecordStatus.APPROVED, fx.workbench.recordsModel().records().stream().filter(r -> r.id() == id).findFirst()
                .orElseThrow().status());
    }

    private void decide(FxRobot robot, String button, String by, String comment) throws Exception {
        robot.interact(() -> {
            robot.lookup("#record-step-by").queryAs(TextField.class).setText(by);
            robot.lookup("#record-step-comment").queryAs(TextField.class).setText(comment);
            robot.lookup(button).queryAs(Button.class).fire();
        });
        fx.awaitJobs();
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> !fx.session.jobs().runningProperty().get());
        WaitForAsyncUtils.waitForFxEvents();
    }
}
