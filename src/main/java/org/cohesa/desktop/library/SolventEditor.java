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
import org.cohesa.core.RowError;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.store.SolventFields;

/**
 * The form for the user's own solvent entries. It validates with the same rules as a CSV import
 * ({@link SolventFields#fromRow}): every problem is listed under the form, the fields concerned are marked,
 * and the dialog stays open until the entry is valid. Editing keeps every column the form does not show.
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
    private Solvent result;

    /** @param existing the entry to edit, or null for a new one */
    public SolventEditor(Solvent existing) {
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
        grid.getColumnConstraints().addAll(c0, c1, c2, c3);
        for (int i = 0; i < FIELDS.length; i++) {
            String col = FIELDS[i][0];
            TextField tf = new TextField(original.getOrDefault(col, ""));
            tf.setId("field-" + col);
            Label l = new Label(FIELDS[i][1]);
            l.setLabelFor(tf);
            fields.put(col, tf);
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
        VBox content = new VBox(8, grid, problems);
        dialog.getDialogPane().setContent(content);
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

    /** Checks the form; on success the entry is ready as the dialog's result. */
    public boolean validate() {
        Map<String, String> row = new LinkedHashMap<>(original);
        fields.forEach((col, tf) -> row.put(col, tf.getText() == null ? "" : tf.getText()));
        List<RowError> errors = new ArrayList<>();
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
