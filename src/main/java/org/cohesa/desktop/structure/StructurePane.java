package org.cohesa.desktop.structure;

import java.util.Locale;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.StringProperty;
import javafx.concurrent.Worker;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.image.Image;
import javafx.scene.image.ImageView;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.cohesa.core.structure.EstimatedValue;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.Structure;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.structure.StructureEstimator;
import org.cohesa.core.structure.StructureParser;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Jobs;
import org.cohesa.store.StructureEntries;

/**
 * A SMILES field with what Cohesa estimates from it: the 2D drawing beside the values (δD, δP, δH, molar volume),
 * each with its route and the error that route showed on the published table, the UNIFAC groups, and the
 * cautions (families the method handles badly, parts it does not cover). Parsing, estimating and drawing run off
 * the FX thread as one job; a structure the methods refuse gets one line naming the field and the value.
 * Nothing is stored here: the forms that hold this pane decide what to keep.
 */
public final class StructurePane {

    /** A structure with its estimate and drawing (drawing null when CDK could not lay it out). */
    public record Result(StructureEstimate estimate, Image drawing, String drawingProblem) {
    }

    private final int drawingWidth;
    private final int drawingHeight;

    private final Jobs jobs;
    private final String field;
    private final TextField smiles = new TextField();
    private final Button run = new Button("_Estimate");
    private final Label problem = new Label();
    private final ImageView drawing = new ImageView();
    private final Label drawingNote = new Label("Type a SMILES and press Estimate to see the structure.");
    private final Label facts = new Label();
    private final GridPane values = new GridPane();
    private final Label groups = new Label();
    private final VBox cautions = new VBox(3);
    private final VBox root;
    private final ReadOnlyObjectWrapper<Result> result = new ReadOnlyObjectWrapper<>();
    private Supplier<MeasuredProperties> measured = () -> MeasuredProperties.NONE;
    private Consumer<Result> onEstimated = r -> { };
    private Runnable onShown = () -> { };

    /**
     * @param jobs  the session's job runner (the work runs off the FX thread, the status bar shows it)
     * @param field the name of the SMILES field in messages, e.g. "SMILES"
     */
    public StructurePane(Jobs jobs, String field) {
        this(jobs, field, 280, 210);
    }

    /** With a drawing of {@code drawingWidth} × {@code drawingHeight} pixels (narrow places take a smaller one). */
    public StructurePane(Jobs jobs, String field, int drawingWidth, int drawingHeight) {
        this.jobs = jobs;
        this.field = field;
        this.drawingWidth = drawingWidth;
        this.drawingHeight = drawingHeight;
        smiles.setId("structure-smiles");
        smiles.setPromptText("e.g. CCOC(C)=O for ethyl acetate");
        smiles.setPrefColumnCount(34);
        smiles.setOnAction(e -> estimate());
        HBox.setHgrow(smiles, Priority.ALWAYS);
        Label label = new Label("S_MILES");
        label.setMnemonicParsing(true);
        label.setLabelFor(smiles);
        run.setId("structure-estimate");
        run.setMnemonicParsing(true);
        run.setOnAction(e -> estimate());
        HBox input = new HBox(8, label, smiles, run);
        input.setAlignment(Pos.CENTER_LEFT);

        problem.setId("structure-problem");
        problem.getStyleClass().add("form-problems");
        problem.setWrapText(true);
        show(problem, false);

        drawing.setId("structure-drawing");
        drawing.setFitWidth(drawingWidth);
        drawing.setFitHeight(drawingHeight);
        drawing.setPreserveRatio(true);
        drawingNote.setId("structure-drawing-note");
        drawingNote.getStyleClass().add("hint");
        drawingNote.setWrapText(true);
        drawingNote.setMaxWidth(drawingWidth - 20);
        StackPane frame = new StackPane(drawing, drawingNote);
        frame.getStyleClass().add("structure-frame");
        frame.setMinSize(drawingWidth + 2, drawingHeight + 2);
        frame.setMaxSize(drawingWidth + 2, drawingHeight + 2);

        facts.setId("structure-facts");
        facts.getStyleClass().add("section-title");
        values.setId("structure-values");
        values.setHgap(10);
        values.setVgap(3);
        for (int i = 0; i < 4; i++) {
            javafx.scene.layout.ColumnConstraints c = new javafx.scene.layout.ColumnConstraints();
            c.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            values.getColumnConstraints().add(c);
        }
        javafx.scene.layout.ColumnConstraints routeColumn = new javafx.scene.layout.ColumnConstraints(120, 200, 340);
        routeColumn.setHgrow(Priority.ALWAYS);
        values.getColumnConstraints().add(routeColumn);
        groups.setId("structure-groups");
        groups.setWrapText(true);
        cautions.setId("structure-cautions");
        VBox estimate = new VBox(6, facts, values, groups, cautions);
        facts.setWrapText(true);
        // drawing beside the values where there is room (the values take the rest of the width), above them in a
        // narrow side panel (the values take the whole width)
        javafx.scene.layout.FlowPane body = new javafx.scene.layout.FlowPane(14, 8, frame, estimate);
        root = new VBox(8, input, problem, body);
        body.prefWrapLengthProperty().bind(root.widthProperty());
        estimate.prefWidthProperty().bind(javafx.beans.binding.Bindings.createDoubleBinding(() -> {
            double beside = root.getWidth() - (drawingWidth + 2) - 14 - 1;
            return beside >= 400 ? beside : Math.max(300, root.getWidth() - 1);
        }, root.widthProperty()));
        root.setId("structure-pane");
        root.setPadding(new Insets(4, 0, 4, 0));
    }

    public Node node() {
        return root;
    }

    public StringProperty smilesProperty() {
        return smiles.textProperty();
    }

    /** The last estimate shown, or null (none yet, or the last SMILES was refused). */
    public ReadOnlyObjectProperty<Result> resultProperty() {
        return result.getReadOnlyProperty();
    }

    /** Measured properties to pass to the estimate (e.g. a density typed in the same form); may throw to refuse. */
    public void setMeasured(Supplier<MeasuredProperties> measured) {
        this.measured = measured;
    }

    /** Called on the FX thread after each successful estimate. */
    public void setOnEstimated(Consumer<Result> onEstimated) {
        this.onEstimated = onEstimated;
    }

    /** Called on the FX thread whenever the pane's content changed size (an estimate or a problem shown). */
    public void setOnShown(Runnable onShown) {
        this.onShown = onShown;
    }

    /** Shows a problem of the form that holds this pane (one line), or hides it with null. */
    public void showProblem(String text) {
        problem.setText(text == null ? "" : text);
        show(problem, text != null);
        smiles.getStyleClass().remove("field-error");
        if (text != null && text.startsWith(field + " ")) {
            smiles.getStyleClass().add("field-error");
        }
        onShown.run();
    }

    /** Parses, estimates and draws the SMILES in the field off the FX thread. */
    public void estimate() {
        String text = smiles.getText() == null ? "" : smiles.getText().strip();
        MeasuredProperties m;
        try {
            m = measured.get();
        } catch (RuntimeException ex) {
            fail(ErrorText.of(ex));
            return;
        }
        run.setDisable(true);
        var task = jobs.run("Estimating from " + (text.length() > 40 ? text.substring(0, 40) + "…" : text), p -> {
            Structure st = StructureParser.parse(field, text);
            StructureEstimate e = StructureEstimator.estimate(st, m);
            Image img = null;
            String why = null;
            try {
                img = StructureDrawing.draw(st, drawingWidth, drawingHeight);
            } catch (RuntimeException ex) {
                why = ErrorText.of(ex);
            }
            return new Result(e, img, why);
        }, r -> {
            run.setDisable(false);
            show(r);
        }, this::fail);
        task.stateProperty().addListener((o, a, s) -> {
            if (s == Worker.State.CANCELLED) {
                run.setDisable(false);
            }
        });
    }

    private void fail(String text) {
        run.setDisable(false);
        result.set(null);
        clearEstimate();
        showProblem(text);
    }

    private void clearEstimate() {
        drawing.setImage(null);
        drawingNote.setText("No structure to draw.");
        show(drawingNote, true);
        facts.setText("");
        values.getChildren().clear();
        groups.setText("");
        cautions.getChildren().clear();
    }

    private void show(Result r) {
        showProblem(null);
        StructureEstimate e = r.estimate();
        drawing.setImage(r.drawing());
        drawingNote.setText(r.drawing() == null ? "No drawing: " + r.drawingProblem() : "");
        show(drawingNote, r.drawing() == null);
        facts.setText(String.format(Locale.ROOT, "%s · %.2f g/mol · %d heavy atoms · family: %s", e.structure().formula(),
                e.structure().molarMass(), e.structure().heavyAtoms(), e.family()));
        values.getChildren().clear();
        values.addRow(0, head(""), head("Value"), head("Mean error"), head("90 % within"), head("Route"));
        row(1, "δD (MPa½)", e.dD());
        row(2, "δP (MPa½)", e.dP());
        row(3, "δH (MPa½)", e.dH());
        row(4, "Vm (cm³/mol)", e.molarVolume());
        groups.setText("UNIFAC groups: " + (e.unifac().complete() ? StructureEntries.groupNames(e.unifac().groups())
                : "none (atoms " + String.join(", ", e.unifac().unplaced()) + " have no group; activity falls back to Flory–Huggins)"));
        cautions.getChildren().clear();
        for (String w : e.warnings()) {
            Label l = new Label("⚠ " + w);
            l.setWrapText(true);
            l.getStyleClass().add(w.contains("much less well") || w.contains("no published increment") ? "form-problems" : "hint");
            cautions.getChildren().add(l);
        }
        result.set(r);
        onEstimated.accept(r);
        onShown.run();
    }

    private void row(int i, String label, EstimatedValue v) {
        if (v == null) {
            values.addRow(i, new Label(label), new Label("—"), new Label(""), new Label(""), new Label("not covered by the method"));
            return;
        }
        boolean one = label.startsWith("δ");
        Label value = new Label(String.format(Locale.ROOT, one ? "%.1f" : "%.0f", v.value()));
        value.setId("structure-value-" + i);
        value.getStyleClass().add("section-title");
        Label mae = new Label(v.estimated() ? String.format(Locale.ROOT, one ? "± %.1f" : "± %.0f", v.expectedMae()) : "measured");
        Label p90 = new Label(v.estimated() ? String.format(Locale.ROOT, one ? "%.1f" : "%.0f", v.expectedP90()) : "");
        Label route = new Label(v.route());
        route.setWrapText(true);
        route.getStyleClass().add("hint");
        values.addRow(i, new Label(label), value, mae, p90, route);
    }

    private static Label head(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("section-title");
        return l;
    }

    private static void show(Node n, boolean visible) {
        n.setVisible(visible);
        n.setManaged(visible);
    }
}
