package org.cohesa.desktop.structure;

import java.util.List;
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
    public record Result(StructureEstimate estimate, Image drawing, String drawingProblem, MeasuredProperties measured) {
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
    /** Each group method's own values before they were combined. */
    private final Label methods = new Label();
    private final VBox cautions = new VBox(3);
    private final Label check = new Label();
    private final VBox root;
    /** Measured properties typed in the pane (optional), each moving its component to the property route. */
    private final TextField density = measuredField("structure-density", "e.g. 0.789");
    private final TextField refractiveIndex = measuredField("structure-refractive-index", "e.g. 1.361");
    private final TextField dipole = measuredField("structure-dipole", "e.g. 1.69");
    private final TextField hvap = measuredField("structure-hvap", "e.g. 42.3");
    private final HBox densityBox;
    private boolean hostGivesDensity;
    /** True when a measured value changed after the last estimate (the values shown are no longer this input's). */
    private boolean stale;
    static final String STALE = "A measured value changed since the estimate: press Estimate again.";
    private final ReadOnlyObjectWrapper<Result> result = new ReadOnlyObjectWrapper<>();
    private Supplier<MeasuredProperties> host = () -> MeasuredProperties.NONE;
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
        densityBox = labelled(DENSITY, density);
        Label measuredTitle = new Label("Measured (optional):");
        measuredTitle.getStyleClass().add("hint");
        measuredTitle.setTooltip(new javafx.scene.control.Tooltip("Each measured value moves its component to the property route: "
                + "n_D → δD (molar refraction), μ → δP (Hansen–Beerbower), density → molar volume (M/ρ), ΔHvap → δt as a check"));
        javafx.scene.layout.FlowPane measuredRow = new javafx.scene.layout.FlowPane(14, 4, measuredTitle, densityBox,
                labelled(REFRACTIVE_INDEX, refractiveIndex), labelled(DIPOLE, dipole), labelled(HVAP, hvap));
        measuredRow.setId("structure-measured");
        measuredRow.setAlignment(Pos.CENTER_LEFT);
        // a value changed after the estimate makes it stale, as a changed SMILES does
        for (TextField f : List.of(density, refractiveIndex, dipole, hvap)) {
            f.textProperty().addListener((o, a, b) -> {
                f.getStyleClass().remove("field-error");
                if (result.get() != null) {
                    result.set(null);
                    stale = true;
                    showProblem(STALE);
                }
            });
        }

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
        methods.setId("structure-methods");
        methods.setWrapText(true);
        methods.getStyleClass().add("hint");
        cautions.setId("structure-cautions");
        check.setId("structure-check");
        check.setWrapText(true);
        check.getStyleClass().add("hint");
        show(check, false);
        VBox estimate = new VBox(6, facts, values, methods, check, groups, cautions);
        facts.setWrapText(true);
        // drawing beside the values where there is room (the values take the rest of the width), above them in a
        // narrow side panel (the values take the whole width)
        javafx.scene.layout.FlowPane body = new javafx.scene.layout.FlowPane(14, 8, frame, estimate);
        root = new VBox(8, input, measuredRow, problem, body);
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

    /**
     * The density comes from the form that holds the pane (its own density field; may throw to refuse): the pane's
     * density field goes, its refractive index, dipole moment and ΔHvap stay.
     */
    public void setMeasured(Supplier<MeasuredProperties> measured) {
        this.host = measured;
        hostGivesDensity = true;
        show(densityBox, false);
    }

    /** True when a measured value changed after the estimate shown: the form must estimate again before it keeps anything. */
    public boolean isStale() {
        return stale;
    }

    /** The measured field of the pane: "density", "refractive-index", "dipole" or "hvap" (for tests and forms). */
    public TextField measuredField(String which) {
        return switch (which) {
            case "density" -> density;
            case "refractive-index" -> refractiveIndex;
            case "dipole" -> dipole;
            case "hvap" -> hvap;
            default -> throw new IllegalArgumentException(which);
        };
    }

    /** The measured properties the form holds now; a bad field is refused in one line naming it and its value (and outlined). */
    public MeasuredProperties measured() {
        MeasuredProperties h = host.get();
        Double rho = hostGivesDensity ? h.density() : number(DENSITY, density, 0.3, 3.5);
        Double n = number(REFRACTIVE_INDEX, refractiveIndex, 1.2, 1.9);
        Double mu = number(DIPOLE, dipole, 0, 12);
        Double dh = number(HVAP, hvap, 5, 200);
        return new MeasuredProperties(rho, n, mu, dh);
    }

    static final String DENSITY = "Density (g/cm³)";
    static final String REFRACTIVE_INDEX = "Refractive index n_D";
    static final String DIPOLE = "Dipole moment (D)";
    static final String HVAP = "ΔHvap at 25 °C (kJ/mol)";

    /**
     * An optional number in its physical range (the ranges of {@link MeasuredProperties}: liquids at 20–25 °C):
     * empty → null; anything else wrong → one line naming the field and the value.
     */
    private static Double number(String label, TextField f, double min, double max) {
        String t = f.getText() == null ? "" : f.getText().strip();
        if (t.isEmpty()) {
            return null;
        }
        double v;
        try {
            v = Double.parseDouble(t);
        } catch (NumberFormatException e) {
            mark(f);
            throw new org.cohesa.core.InvalidInputException(label, t, "not a number (use a dot as decimal separator)");
        }
        if (!Double.isFinite(v) || v < min || v > max) {
            mark(f);
            throw new org.cohesa.core.InvalidInputException(label, t, "must lie between " + plain(min) + " and " + plain(max)
                    + (label.equals(REFRACTIVE_INDEX) ? " (organic liquids)" : ""));
        }
        return v;
    }

    private static String plain(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    private static void mark(TextField f) {
        if (!f.getStyleClass().contains("field-error")) {
            f.getStyleClass().add("field-error");
        }
    }

    private static TextField measuredField(String id, String prompt) {
        TextField f = new TextField();
        f.setId(id);
        f.setPromptText(prompt);
        f.setPrefColumnCount(6);
        return f;
    }

    private static HBox labelled(String text, TextField f) {
        Label l = new Label(text);
        l.setLabelFor(f);
        HBox h = new HBox(6, l, f);
        h.setAlignment(Pos.CENTER_LEFT);
        return h;
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
            m = measured();
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
            return new Result(e, img, why, m);
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
        show(check, false);
    }

    /**
     * With a measured ΔHvap: δt by the property route as its own row, the sum of the three components against it, and
     * (with n_D and μ as well) δH as the remainder of δt beside the group δH that is kept.
     */
    private void showCheck(Result r) {
        StructureEstimate e = r.estimate();
        EstimatedValue total = StructureEstimator.totalFromVaporisation(e, r.measured());
        if (total == null) {
            show(check, false);
            return;
        }
        row(5, "δt (MPa½)", total);
        StringBuilder b = new StringBuilder();
        if (e.hasHansen()) {
            double sum = Math.sqrt(e.dD().value() * e.dD().value() + e.dP().value() * e.dP().value() + e.dH().value() * e.dH().value());
            double gap = Math.abs(sum - total.value());
            b.append(String.format(Locale.ROOT, "Check: √(δD² + δP² + δH²) = %.1f against δt %.1f from ΔHvap, a gap of %.1f MPa½%s.", sum,
                    total.value(), gap, gap > total.expectedP90() ? " — more than 90 % of that route's errors: one of the values above is likely off"
                            : " (within 90 % of that route's errors)"));
        }
        EstimatedValue rest = StructureEstimator.hydrogenBondingRemainder(e, r.measured());
        if (rest != null) {
            b.append(b.length() == 0 ? "" : " ").append(String.format(Locale.ROOT, "δH as the remainder of δt: %.1f (± %.1f, 90 %% within %.1f); "
                    + "the group δH above is kept, it was closer on the published table (± %.1f).", rest.value(), rest.expectedMae(),
                    rest.expectedP90(), e.dH() == null ? Double.NaN : e.dH().expectedMae()));
        } else if (e.dD() != null && e.dP() != null) {
            b.append(b.length() == 0 ? "" : " ").append("δH as the remainder of δt needs δD and δP from measured values too (give n_D and the dipole moment).");
        }
        check.setText(b.toString());
        show(check, b.length() > 0);
    }

    private static String one(Double v) {
        return v == null ? "—" : String.format(Locale.ROOT, "%.1f", v);
    }

    private void show(Result r) {
        stale = false;
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
        StringBuilder m = new StringBuilder("Group methods before combining —");
        for (org.cohesa.core.structure.GroupMethodValues g : e.groupMethods()) {
            m.append(m.charAt(m.length() - 1) == '—' ? " " : " · ").append(g.method()).append(": ")
                    .append(g.dD() == null && g.dP() == null && g.dH() == null ? "not applicable (" + g.uncovered().get(0) + ")"
                            : "δD " + one(g.dD()) + ", δP " + one(g.dP()) + ", δH " + one(g.dH()));
        }
        methods.setText(m.toString());
        showCheck(r);
        groups.setText("UNIFAC groups: " + (e.unifac().complete() ? StructureEntries.groupNames(e.unifac().groups())
                : "none (atoms " + String.join(", ", e.unifac().unplaced()) + " have no group; activity falls back to Flory–Huggins)"));
        cautions.getChildren().clear();
        for (String w : e.warnings()) {
            Label l = new Label("⚠ " + w);
            l.setWrapText(true);
            l.getStyleClass().add(w.contains("much less well") || (w.contains("no published increment") && !w.contains("instead")) ? "form-problems" : "hint");
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
