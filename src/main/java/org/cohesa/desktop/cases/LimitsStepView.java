package org.cohesa.desktop.cases;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.stream.Collectors;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.desktop.blend.BlendModel;

/**
 * The Limits step: the form of what the liquid may not be (left) and, beside it, what the last search ran with, what it
 * found and what it left out, and whether the form still says the same (a changed form means searching again).
 */
public final class LimitsStepView {

    /** The stored limit keys in the form's words, in the form's order. */
    static final Map<String, String> WORDS = words();

    private final CaseModel model;
    private final BorderPane root = new BorderPane();
    private final Label state = new Label();
    private final GridPane searched = new GridPane();

    /**
     * @param form           the limits form with its Search button
     * @param openCandidates shows the Candidates step
     */
    public LimitsStepView(CaseModel model, Node form, Runnable openCandidates) {
        this.model = model;
        BlendModel blends = model.blends();
        root.setId("limits-step");
        Label head = new Label("Limits: what the liquid may not be");
        head.getStyleClass().add("headline");
        Label intro = new Label("Set what a replacement must respect, then Search: every 1- to 4-component subset of the library "
                + "is searched exactly, and the candidates open on the next step. By default the search leaves out CMR solvents and "
                + "ICH class 1; two-phase blends never qualify.");
        intro.setWrapText(true);
        intro.getStyleClass().add("hint");
        intro.setMinHeight(Region.USE_PREF_SIZE);
        state.setId("limits-state");
        state.setWrapText(true);
        state.setMinHeight(Region.USE_PREF_SIZE);
        Button show = new Button("Show the candidates");
        show.setId("limits-show-candidates");
        show.disableProperty().bind(Bindings.isEmpty(blends.rows()));
        show.setOnAction(e -> openCandidates.run());
        Label searchedTitle = new Label("The last search ran with");
        searchedTitle.getStyleClass().add("section-title");
        searched.setId("limits-searched");
        searched.setHgap(14);
        searched.setVgap(3);
        Label note = new Label();
        note.setId("limits-search-note");
        note.setWrapText(true);
        note.getStyleClass().add("hint");
        note.setMinHeight(Region.USE_PREF_SIZE);
        note.textProperty().bind(blends.searchNoteProperty());
        Label leftOut = new Label();
        leftOut.setId("limits-left-out");
        leftOut.setWrapText(true);
        leftOut.getStyleClass().add("left-out");
        leftOut.setMinHeight(Region.USE_PREF_SIZE);
        leftOut.textProperty().bind(Bindings.createStringBinding(() -> blends.leftOutBySafety().isEmpty() ? ""
                : "Left out by the defaults (CMR, ICH class 1, salt formers with the material, and in a replacement what the replaced liquid's water "
                        + "behaviour and reactivity rule out; switch them in the form):\n"
                        + blends.leftOutBySafety().stream().map(x -> "• " + x).collect(Collectors.joining("\n")), blends.leftOutBySafety()));
        leftOut.visibleProperty().bind(Bindings.isNotEmpty(blends.leftOutBySafety()));
        leftOut.managedProperty().bind(leftOut.visibleProperty());
        VBox summary = new VBox(10, head, intro, state, show, searchedTitle, searched, note, leftOut);
        summary.setPadding(new Insets(14));
        summary.setMaxWidth(820);
        ScrollPane right = new ScrollPane(summary);
        right.setFitToWidth(true);
        right.setId("limits-summary");
        // the form has the step to itself: wide enough that its choices read whole
        if (form instanceof Region r) {
            r.setPrefWidth(480);
        }
        root.setLeft(form);
        root.setCenter(right);
        Runnable refresh = this::refresh;
        model.progressBinding().addListener((o, a, b) -> refresh.run());
        blends.rows().addListener((javafx.collections.ListChangeListener<BlendModel.Row>) c -> refresh.run());
        blends.session().targetProperty().addListener((o, a, b) -> refresh.run());
        refresh();
    }

    public Node node() {
        return root;
    }

    /** The line that says where the step stands (for tests). */
    public String stateText() {
        return state.getText();
    }

    private void refresh() {
        SubstitutionCase c = model.current();
        var target = model.session().target();
        searched.getChildren().clear();
        state.getStyleClass().removeAll("form-problems", "check-done");
        if (target == null) {
            state.setText("○ No material yet: pick one on the Material step first; the limits are kept.");
        } else if (c == null || c.limits().isEmpty()) {
            state.setText("○ For " + target.name() + ": no search run yet. Set the limits and press Search blends.");
        } else if (model.limitsChangedProperty().get()) {
            state.setText("○ The form differs from the limits the candidates were found with (marked below): search again.");
            state.getStyleClass().add("form-problems");
        } else {
            state.setText("✓ For " + target.name() + ": " + c.found().size() + " candidate" + (c.found().size() == 1 ? "" : "s")
                    + " found with these limits" + (c.chosen().isEmpty() ? "." : ", " + c.chosen().size() + " chosen for the checks."));
            state.getStyleClass().add("check-done");
        }
        if (c == null || c.limits().isEmpty()) {
            searched.add(new Label("No search yet."), 0, 0);
            return;
        }
        Map<String, String> form = model.blends().limits();
        int row = 0;
        for (Map.Entry<String, String> w : WORDS.entrySet()) {
            String was = c.limits().get(w.getKey());
            if (was == null) {
                continue;
            }
            String now = form.get(w.getKey());
            boolean changed = now != null && !now.strip().equals(was.strip());
            if (was.isBlank() && !changed) {
                continue; // an empty limit searched is no limit: say only those that were set
            }
            Label k = new Label(w.getValue());
            Label v = new Label(shown(w.getKey(), was) + (changed ? "   → now " + shown(w.getKey(), now) : ""));
            v.setWrapText(true);
            if (changed) {
                v.getStyleClass().add("form-problems");
                v.setId("limits-changed-" + w.getKey());
            }
            searched.addRow(row++, k, v);
        }
    }

    private static String shown(String key, String v) {
        if (v == null || v.isBlank()) {
            return "(none)";
        }
        if (v.equals("true") || v.equals("false")) {
            return v.equals("true") ? "yes" : "no";
        }
        if (key.equals("process")) {
            return java.util.Arrays.stream(org.cohesa.core.blend.ProcessUse.values()).filter(u -> u.word().equals(v)).findFirst()
                    .map(u -> u == org.cohesa.core.blend.ProcessUse.AS_ORIGINAL ? "as the replaced liquid (its evaporation rate ÷× 3)"
                            : u.word() + " — " + u.meaning()).orElse(v);
        }
        if (key.equals("rank-by")) {
            return java.util.Arrays.stream(org.cohesa.core.blend.RankBy.values()).filter(r -> r.name().equals(v)).findFirst()
                    .map(org.cohesa.desktop.blend.BlendView::rankWord).orElse(v);
        }
        return v.replace(";", ", ");
    }

    private static Map<String, String> words() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("max-components", "Most components");
        m.put("top", "Candidates listed");
        m.put("rank-by", "Rank by");
        m.put("process", "Leaves the process by");
        m.put("include", "Include only");
        m.put("exclude", "Exclude");
        m.put("families", "Families only");
        m.put("exclude-families", "Exclude families");
        m.put("fixed", "Fixed");
        m.put("min-fraction", "Minimum fraction (%)");
        m.put("bp-min", "Boiling point min. (°C)");
        m.put("bp-max", "Boiling point max. (°C)");
        m.put("min-flash", "Minimum flash point (°C)");
        m.put("min-blend-flash", "Minimum blend flash point (°C)");
        m.put("ich", "ICH Q3C classes");
        m.put("allow-ich-class-1", "Allow ICH class 1");
        m.put("no-cmr", "No CMR");
        m.put("with-water", "With water");
        m.put("exclude-reactive", "Leave out reactive");
        m.put("reactive-as-replaced", BlendModel.REACTIVE_AS_REPLACED);
        m.put("replaced-because", "Replaced because");
        m.put("max-cost", "Maximum cost per litre");
        m.put("red-limit", "RED limit");
        m.put("temperature", "Temperature (°C)");
        return m;
    }
}
