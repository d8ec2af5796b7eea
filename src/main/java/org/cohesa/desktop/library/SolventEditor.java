package org.cohesa.desktop.library;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javafx.event.ActionEvent;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.RowError;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Jobs;
import org.cohesa.desktop.structure.StructurePane;
import org.cohesa.store.SolventFields;
import org.cohesa.store.StructureEntries;

/**
 * The form for the user's own solvent entries. It validates with the same rules as a CSV import
 * ({@link SolventFields#fromRow}): every problem is listed under the form, the fields concerned are marked,
 * and the dialog stays open until the entry is valid. Editing keeps every column the form does not show.
 *
 * <p>With a SMILES the form estimates what is missing ({@link StructureEntries#fillSolventRow}, the same as
 * {@code solvents add --smiles}): empty fields are filled and marked, values the user typed stay, and the UNIFAC
 * groups, the structure and a note naming each route and its expected error are kept with the entry.
 */
public final class SolventEditor {

    /** Form fields: column name and label. */
    private static final String[][] FIELDS = {
        {"name", "Name *"}, {"synonyms", "Synonyms (separated by ;)"}, {"cas", "CAS number"}, {"formula", "Formula"},
        {"family", "Family (e.g. ester, ketone)"}, {"molar_mass", "Molar mass (g/mol)"}, {"density", "Density (g/cm³)"},
        {"molar_volume", "Molar volume (cm³/mol)"}, {"dD", "δD (MPa½)"}, {"dP", "δP (MPa½)"}, {"dH", "δH (MPa½)"},
        {"boiling_point_c", "Boiling point (°C)"}, {"flash_point_c", "Flash point, closed cup (°C)"},
        {"ich_class", "ICH Q3C class (1, 2, 3 or empty)"}, {"hazard_statements", "H-statements (e.g. H225 H319)"},
        {"oel_twa_ppm", "OEL, 8 h TWA (ppm)"}, {"price_per_litre", "Price per litre"}, {"src_hsp", "Source of δD, δP, δH"},
        {"note", "Note"}};

    private final Map<String, TextField> fields = new LinkedHashMap<>();
    private final Map<String, String> original;
    private final Label problems = new Label();
    private final Dialog<Solvent> dialog = new Dialog<>();
    private final StructurePane structure;
    private javafx.scene.control.ScrollPane scroller;
    private final Label filledHint = new Label();
    /** Fields the last estimate filled, with the text it put there (re-estimating replaces them). */
    private final Map<String, String> filledByEstimate = new LinkedHashMap<>();
    /** Columns the form does not show that the last estimate set (smiles, UNIFAC groups, their sources). */
    private final Map<String, String> structureColumns = new LinkedHashMap<>();
    private String structureNote;
    private String estimatedSmiles;
    /** True while the estimate that shows a stored entry's structure runs: it draws and lists, it fills nothing. */
    private boolean showingStored;
    private Solvent result;

    static final StructureEntries.Fields STRUCTURE_FIELDS = new StructureEntries.Fields("SMILES", "δD/δP/δH",
            "type the missing component(s) in the δD, δP and δH fields", "");

    /** @param existing the entry to edit, or null for a new one */
    public SolventEditor(Solvent existing) {
        this(existing, null);
    }

    /**
     * @param existing the entry to edit, or null for a new one
     * @param jobs     the session's job runner; with it the form offers the estimate from a SMILES (null: no structure part)
     */
    public SolventEditor(Solvent existing, Jobs jobs) {
        original = existing == null ? new LinkedHashMap<>() : new LinkedHashMap<>(SolventFields.toRow(existing));
        dialog.setTitle(existing == null ? "New solvent entry" : "Edit " + existing.name());
        dialog.setHeaderText(existing == null ? "Your own solvent: kept in your database, never changed by updates."
                : "Editing your own entry; columns not shown here are kept.");
        GridPane grid = new GridPane();
        grid.setHgap(10);
        grid.setVgap(6);
        grid.setPadding(new Insets(10));
        ColumnConstraints c0 = new ColumnConstraints();
        ColumnConstraints c1 = new ColumnConstraints(220, 260, Double.MAX_VALUE);
        c1.setHgrow(Priority.ALWAYS);
        ColumnConstraints c2 = new ColumnConstraints();
        ColumnConstraints c3 = new ColumnConstraints(160, 200, Double.MAX_VALUE);
        c3.setHgrow(Priority.ALWAYS);
        // the labels keep their words whole (the form may scroll, which takes a scroll bar's width)
        c0.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        c2.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        grid.getColumnConstraints().addAll(c0, c1, c2, c3);
        for (int i = 0; i < FIELDS.length; i++) {
            String col = FIELDS[i][0];
            TextField tf = new TextField(original.getOrDefault(col, ""));
            tf.setId("field-" + col);
            Label l = new Label(FIELDS[i][1]);
            l.setLabelFor(tf);
            fields.put(col, tf);
            // a value typed over an estimate is the user's: the estimate's outline goes
            tf.textProperty().addListener((o, was, now) -> {
                if (filledByEstimate.containsKey(col) && !filledByEstimate.get(col).equals(now)) {
                    tf.getStyleClass().remove("field-estimated");
                }
            });
            // two columns of fields: identity and properties left, the rest right
            int half = (FIELDS.length + 1) / 2;
            int row = i < half ? i : i - half;
            int colIndex = i < half ? 0 : 2;
            grid.add(l, colIndex, row);
            grid.add(tf, colIndex + 1, row);
        }
        problems.setId("editor-problems");
        problems.getStyleClass().add("form-problems");
        problems.setWrapText(true);
        problems.setMaxWidth(880);
        problems.setVisible(false);
        problems.setManaged(false);
        VBox content = new VBox(8);
        if (jobs != null) {
            structure = new StructurePane(jobs, "SMILES");
            structure.smilesProperty().set(original.getOrDefault("smiles", ""));
            structure.setMeasured(this::measured);
            structure.setOnShown(this::fitWindow);
            structure.setOnEstimated(r -> {
                if (showingStored) {
                    showingStored = false;
                } else {
                    fillFromEstimate(r.estimate(), r.measured());
                }
            });
            Label intro = new Label("From a structure (optional): give a SMILES and the empty fields are estimated; values you type stay.");
            intro.getStyleClass().add("hint");
            filledHint.setId("editor-filled");
            filledHint.getStyleClass().add("hint");
            filledHint.setWrapText(true);
            filledHint.setMaxWidth(880);
            filledHint.setVisible(false);
            filledHint.setManaged(false);
            content.getChildren().addAll(intro, structure.node(), new javafx.scene.control.Separator());
        } else {
            structure = null;
        }
        content.getChildren().addAll(grid, filledHint, problems);
        if (structure != null && !original.getOrDefault("smiles", "").isBlank()) {
            showingStored = true;
            structure.estimate();
        }
        // on a small screen the form scrolls, so Save stays in the window
        scroller = new javafx.scene.control.ScrollPane(content);
        scroller.setFitToWidth(true);
        scroller.setHbarPolicy(javafx.scene.control.ScrollPane.ScrollBarPolicy.NEVER);
        dialog.getDialogPane().setContent(scroller);
        dialog.setOnShown(e -> fitWindow());
        dialog.getDialogPane().setPrefWidth(920);
        dialog.getDialogPane().getButtonTypes().addAll(ButtonType.OK, ButtonType.CANCEL);
        Button ok = (Button) dialog.getDialogPane().lookupButton(ButtonType.OK);
        ok.setText("Save");
        ok.setId("editor-save");
        ok.addEventFilter(ActionEvent.ACTION, e -> {
            if (!validate()) {
                e.consume();
            }
        });
        dialog.setResultConverter(b -> b == ButtonType.OK ? result : null);
        dialog.setResizable(true);
    }

    public Dialog<Solvent> dialog() {
        return dialog;
    }

    public TextField field(String column) {
        return fields.get(column);
    }

    /** The structure part of the form, or null when the form was made without jobs. */
    public StructurePane structure() {
        return structure;
    }

    private MeasuredProperties measured() {
        String text = fields.get("density").getText() == null ? "" : fields.get("density").getText().strip();
        if (text.isEmpty()) {
            return MeasuredProperties.NONE;
        }
        double rho;
        try {
            rho = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            throw new InvalidInputException(labelOf("density"), text, "not a number (use a dot as decimal separator)");
        }
        try {
            return new MeasuredProperties(rho, null, null, null);
        } catch (InvalidInputException e) {
            throw new InvalidInputException(labelOf("density"), text, e.reason());
        }
    }

    /** Fills the empty fields (and those the previous estimate filled) from a fresh estimate. */
    private void fillFromEstimate(org.cohesa.core.structure.StructureEstimate e, MeasuredProperties measured) {
        filledByEstimate.forEach((col, text) -> {
            TextField tf = fields.get(col);
            if (text.equals(tf.getText())) {
                tf.setText("");
            }
            tf.getStyleClass().remove("field-estimated");
        });
        filledByEstimate.clear();
        structureColumns.clear();
        structureNote = null;
        estimatedSmiles = null;
        Map<String, String> row = new LinkedHashMap<>(original);
        fields.forEach((col, tf) -> row.put(col, tf.getText() == null ? "" : tf.getText().strip()));
        row.values().removeIf(String::isBlank);
        row.remove("note");
        String smiles = e.structure().smiles();
        try {
            StructureEntries.fillSolventRow(row, e, STRUCTURE_FIELDS, smiles);
        } catch (InvalidInputException ex) {
            structure.showProblem(ErrorText.of(ex));
            showFilled(null);
            return;
        }
        // a ΔHvap measured in the structure part is kept with the entry as the user's value, unless the entry has one
        if (measured != null && measured.hvapKjPerMol() != null && !row.containsKey("hvap_kj_mol")) {
            row.put("hvap_kj_mol", String.format(java.util.Locale.ROOT, "%s", measured.hvapKjPerMol()));
            row.put("src_hvap", "user");
        }
        List<String> filled = new ArrayList<>();
        row.forEach((col, value) -> {
            TextField tf = fields.get(col);
            if (col.equals("note")) {
                structureNote = value;
            } else if (tf == null) {
                structureColumns.put(col, value);
            } else if (tf.getText() == null || tf.getText().isBlank()) {
                tf.setText(value);
                tf.getStyleClass().add("field-estimated");
                filledByEstimate.put(col, value);
                filled.add(shortName(col));
            }
        });
        estimatedSmiles = smiles;
        showFilled("Filled from the structure (marked): " + (filled.isEmpty() ? "nothing, every field was given" : String.join(", ", filled))
                + (structureColumns.containsKey("unifac_groups") ? "; UNIFAC groups " + structureColumns.get("unifac_groups") + " kept with the entry" : "")
                + ". The note keeps each route and its expected error; type over any value you have measured.");
    }

    private static String shortName(String col) {
        return switch (col) {
            case "dD" -> "δD";
            case "dP" -> "δP";
            case "dH" -> "δH";
            case "src_hsp" -> "their source";
            default -> col.replace('_', ' ');
        };
    }

    /** The dialog grows with what the structure part shows, so Save never moves out of the window. */
    private void fitWindow() {
        if (scroller == null) {
            return;
        }
        // as tall as the content, but never taller than the screen leaves room for (header and buttons: about 170 px)
        double limit = javafx.stage.Screen.getPrimary().getVisualBounds().getHeight() - 170;
        javafx.scene.Node content = scroller.getContent();
        double width = scroller.getWidth() > 0 ? scroller.getWidth() : 900;
        scroller.setPrefViewportHeight(Math.max(200, Math.min(content.prefHeight(width), limit)));
        if (dialog.getDialogPane().getScene() != null && dialog.getDialogPane().getScene().getWindow() != null) {
            dialog.getDialogPane().getScene().getWindow().sizeToScene();
        }
    }

    private void showFilled(String text) {
        filledHint.setText(text == null ? "" : text);
        filledHint.setVisible(text != null);
        filledHint.setManaged(text != null);
        fitWindow();
    }

    /** Adds the structure's columns to the row, or returns the line that says why they cannot be used. */
    private String mergeStructure(Map<String, String> row) {
        if (structure == null) {
            return null;
        }
        String smiles = structure.smilesProperty().get() == null ? "" : structure.smilesProperty().get().strip();
        if (smiles.isEmpty()) {
            row.put("smiles", "");
            return null;
        }
        if (structure.isStale()) {
            return "SMILES '" + smiles + "': a measured value changed since the estimate; press Estimate again before saving";
        }
        if (!smiles.equals(estimatedSmiles)) {
            if (smiles.equals(original.getOrDefault("smiles", ""))) {
                return null; // the entry's stored structure, unchanged
            }
            return "SMILES '" + smiles + "': press Estimate so the entry is checked against this structure before it is saved";
        }
        row.putAll(structureColumns);
        boolean hspEdited = List.of("dD", "dP", "dH").stream()
                .anyMatch(c -> filledByEstimate.containsKey(c) && !filledByEstimate.get(c).equals(row.get(c).strip()));
        if (hspEdited && (StructureEntries.HSP_SOURCE.equals(row.get("src_hsp")) || StructureEntries.HSP_SOURCE_MATHIEU.equals(row.get("src_hsp")))) {
            row.put("src_hsp", "user");
        }
        if (structureNote != null) {
            String note = row.get("note");
            row.put("note", note == null || note.isBlank() ? structureNote : note.strip() + "; " + structureNote);
        }
        return null;
    }

    /** Checks the form; on success the entry is ready as the dialog's result. */
    public boolean validate() {
        Map<String, String> row = new LinkedHashMap<>(original);
        fields.forEach((col, tf) -> row.put(col, tf.getText() == null ? "" : tf.getText()));
        List<RowError> errors = new ArrayList<>();
        String structureProblem = mergeStructure(row);
        if (structureProblem != null) {
            structure.showProblem(structureProblem);
            problems.setText("• " + structureProblem);
            problems.setVisible(true);
            problems.setManaged(true);
            return false;
        }
        Solvent s = SolventFields.fromRow(row, 0, true, errors);
        fields.values().forEach(tf -> tf.getStyleClass().remove("field-error"));
        if (s != null) {
            result = s;
            problems.setVisible(false);
            problems.setManaged(false);
            return true;
        }
        List<String> lines = new ArrayList<>();
        for (RowError e : errors) {
            for (String col : e.column().split("[/.]+")) {
                TextField tf = fields.get(col);
                if (tf != null && !tf.getStyleClass().contains("field-error")) {
                    tf.getStyleClass().add("field-error");
                }
            }
            lines.add("• " + labelOf(e.column()) + (e.value().isEmpty() ? "" : " '" + e.value() + "'") + ": " + e.reason());
        }
        problems.setText(String.join("\n", lines));
        problems.setVisible(true);
        problems.setManaged(true);
        if (dialog.getDialogPane().getScene() != null
                && dialog.getDialogPane().getScene().getWindow() instanceof javafx.stage.Stage st) {
            st.sizeToScene();
        }
        Node first = fields.get(errors.get(0).column().split("[/.]+")[0]);
        if (first != null) {
            first.requestFocus();
        }
        return false;
    }

    private static String labelOf(String column) {
        for (String[] f : FIELDS) {
            if (f[0].equals(column)) {
                return f[1].replace(" *", "");
            }
        }
        return column;
    }

    public Solvent result() {
        return result;
    }
}
