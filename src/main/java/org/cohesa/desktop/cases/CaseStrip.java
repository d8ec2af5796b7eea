package org.cohesa.desktop.cases;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.cohesa.core.cases.CaseProgress;
import org.cohesa.core.cases.CaseStep;
import org.cohesa.core.cases.SubstitutionCase;

/**
 * The strip along the top of the window: the open case, its five steps each with what is done or missing (a mark and
 * words, so colour is never the only cue), and the reference screens at the right end.
 */
public final class CaseStrip {

    /** A reference screen reachable from the strip: its label and what opens it. */
    public record Reference(String label, String id, Runnable open) {
    }

    private static final double STEP_HEIGHT = 62; // title and two lines of text, with the current step's thicker border

    private final CaseModel model;
    private final HBox root = new HBox(6);
    private final Label caseLabel = new Label();
    private final Map<CaseStep, Button> steps = new EnumMap<>(CaseStep.class);
    private final Map<CaseStep, Label> stepText = new EnumMap<>(CaseStep.class);
    private CaseStep showing;

    public CaseStrip(CaseModel model, Consumer<CaseStep> goStep, Runnable goCases, List<Reference> references) {
        this.model = model;
        root.setId("case-strip");
        root.getStyleClass().add("case-strip");
        root.setAlignment(Pos.TOP_LEFT);
        root.setMinHeight(Region.USE_PREF_SIZE);
        root.setMaxHeight(Region.USE_PREF_SIZE);
        root.setPadding(new Insets(6, 10, 6, 10));
        Button cases = new Button("Cases");
        cases.setId("strip-cases");
        cases.setOnAction(e -> goCases.run());
        caseLabel.setId("strip-case");
        caseLabel.getStyleClass().add("strip-case");
        caseLabel.setWrapText(true);
        caseLabel.setMaxWidth(230);
        caseLabel.setPrefWidth(230);
        caseLabel.setMinWidth(120);
        caseLabel.setMaxHeight(34);
        VBox head = new VBox(2, caseLabel, cases);
        root.getChildren().add(head);
        int i = 1;
        for (CaseStep s : CaseStep.values()) {
            Label title = new Label(i++ + "  " + s.title());
            title.getStyleClass().add("step-title");
            Label text = new Label();
            text.getStyleClass().add("step-text");
            text.setWrapText(true);
            text.setMaxHeight(32); // two lines; the full line is the tooltip
            text.setId("step-text-" + s.name().toLowerCase(java.util.Locale.ROOT));
            VBox box = new VBox(1, title, text);
            Button b = new Button();
            b.setGraphic(box);
            b.setId("step-" + s.name().toLowerCase(java.util.Locale.ROOT));
            b.getStyleClass().add("step");
            b.setMaxWidth(Double.MAX_VALUE);
            b.setMinWidth(110);
            b.setPrefWidth(190);
            b.setMinHeight(STEP_HEIGHT);
            b.setPrefHeight(STEP_HEIGHT);
            b.setMaxHeight(STEP_HEIGHT);
            b.setAlignment(Pos.TOP_LEFT);
            HBox.setHgrow(b, Priority.ALWAYS);
            b.setOnAction(e -> goStep.accept(s));
            steps.put(s, b);
            stepText.put(s, text);
            root.getChildren().add(b);
        }
        Region gap = new Region();
        gap.setMinWidth(8);
        VBox refs = new VBox(2);
        refs.setMinWidth(Region.USE_PREF_SIZE);
        Label refTitle = new Label("Reference");
        refTitle.getStyleClass().add("hint");
        refs.getChildren().add(refTitle);
        HBox refRow = new HBox(4);
        for (Reference r : references) {
            Button b = new Button(r.label());
            b.setId(r.id());
            b.getStyleClass().add("reference-link");
            b.setMinWidth(Region.USE_PREF_SIZE);
            b.setOnAction(e -> r.open().run());
            refRow.getChildren().add(b);
        }
        refs.getChildren().add(refRow);
        root.getChildren().addAll(gap, refs);
        model.currentProperty().addListener((o, a, c) -> refresh());
        model.progressBinding().addListener((o, a, c) -> refresh());
        refresh();
    }

    public Node node() {
        return root;
    }

    /** Marks the step whose pane is showing (null: a reference screen or the case list). */
    public void showing(CaseStep s) {
        showing = s;
        refresh();
    }

    /** The line a step shows now (for tests). */
    public String text(CaseStep s) {
        return stepText.get(s).getText();
    }

    private void refresh() {
        SubstitutionCase c = model.current();
        // a title that names the liquid already says what the case replaces
        boolean named = c != null && !c.replaced().isEmpty() && c.title().toLowerCase(java.util.Locale.ROOT).contains(c.replaced().toLowerCase(java.util.Locale.ROOT));
        caseLabel.setText(c == null ? "No case open" : c.title() + (c.replaced().isEmpty() || named ? "" : " · replaces " + c.replaced()));
        caseLabel.setTooltip(c == null ? null : new javafx.scene.control.Tooltip(c.kind().words() + ": " + c.title()
                + (c.replaced().isEmpty() ? "" : "\nreplaces: " + c.replaced())
                + (c.process().isEmpty() ? "" : "\nprocess: " + c.process())));
        List<CaseProgress.State> states = model.progress();
        for (CaseStep s : CaseStep.values()) {
            Button b = steps.get(s);
            b.getStyleClass().removeAll("step-done", "step-missing", "step-current");
            if (c == null) {
                stepText.get(s).setText(s.question());
            } else {
                CaseProgress.State st = states.get(s.ordinal());
                stepText.get(s).setText((st.done() ? "✓ " : "○ ") + st.text());
                b.setTooltip(new javafx.scene.control.Tooltip(s.title() + ": " + s.question() + "\n" + (st.done() ? "done: " : "missing: ") + st.text()));
                b.getStyleClass().add(st.done() ? "step-done" : "step-missing");
            }
            if (s == showing) {
                b.getStyleClass().add("step-current");
            }
        }
    }
}
