package org.cohesa.desktop.cases;

import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import org.cohesa.core.cases.CaseStep;
import org.cohesa.core.cases.CaseProgress;

/**
 * The Candidates step: the cards of the last search, under a line that says what they were found with (the Limits
 * step's line) and how many are chosen, with the way back to the limits.
 */
public final class CandidatesStepView {

    private final CaseModel model;
    private final BorderPane root = new BorderPane();
    private final Label foundWith = new Label();

    /**
     * @param cards      the candidates with their panels
     * @param openLimits shows the Limits step
     */
    public CandidatesStepView(CaseModel model, Node cards, Runnable openLimits) {
        this.model = model;
        root.setId("candidates-step");
        foundWith.setId("candidates-found-with");
        foundWith.setWrapText(true);
        foundWith.setMaxWidth(Double.MAX_VALUE);
        HBox.setHgrow(foundWith, Priority.ALWAYS);
        Button limits = new Button("Change the limits…");
        limits.setId("candidates-change-limits");
        limits.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        limits.setOnAction(e -> openLimits.run());
        HBox bar = new HBox(10, foundWith, limits);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(6, 10, 6, 10));
        bar.getStyleClass().add("toolbar-strip");
        root.setTop(bar);
        root.setCenter(cards);
        model.progressBinding().addListener((o, a, b) -> refresh());
        model.session().targetProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    public Node node() {
        return root;
    }

    /** The line above the cards (for tests). */
    public String foundWithText() {
        return foundWith.getText();
    }

    private void refresh() {
        var target = model.session().target();
        foundWith.getStyleClass().remove("form-problems");
        if (model.current() == null || model.current().limits().isEmpty()) {
            foundWith.setText(target == null ? "No material yet: the Material step comes first, then the Limits."
                    : "For " + target.name() + ": no search yet — set the limits on the Limits step and search.");
            return;
        }
        var states = model.progress();
        CaseProgress.State lim = states.get(CaseStep.LIMITS.ordinal());
        CaseProgress.State cand = states.get(CaseStep.CANDIDATES.ordinal());
        if (!lim.done()) {
            foundWith.setText("These cards were found with earlier limits: the form has changed since. " + cand.text() + ".");
            foundWith.getStyleClass().add("form-problems");
        } else {
            foundWith.setText("For " + (target == null ? "the material" : target.name()) + " · found with " + lim.text() + " · " + cand.text() + ".");
        }
    }
}
