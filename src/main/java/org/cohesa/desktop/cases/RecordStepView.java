package org.cohesa.desktop.cases;

import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.core.cases.SubstitutionCase.ChosenCandidate;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.records.RecordsModel;

/**
 * The Record step: files the case's substitution in the register (the same evidence the command line files), with the
 * liquid replaced and process from the case and the replacement picked from the chosen candidates; then shows the
 * record's number and state. Review and approval happen in the register.
 */
public final class RecordStepView {

    private final CaseModel model;
    private final VBox root = new VBox(12);
    private final TextField replaced = new TextField();
    private final ComboBox<String> replacement = new ComboBox<>();
    private final TextField process = new TextField();
    private final TextField site = new TextField();
    private final TextField reason = new TextField();
    private final TextField author = new TextField(System.getProperty("user.name", ""));
    private final CheckBox withTarget = new CheckBox("File the case's material as the target (parameters and distances in the evidence)");
    private final Label state = new Label();
    private final Label unchecked = new Label();

    /** @param openRegister shows the register screen */
    public RecordStepView(CaseModel model, Runnable openRegister) {
        this.model = model;
        root.setId("record-step");
        root.setPadding(new Insets(14));
        Label head = new Label("File the substitution");
        head.getStyleClass().add("headline");
        replaced.setId("record-step-replaced");
        replacement.setId("record-step-replacement");
        replacement.setMaxWidth(Double.MAX_VALUE);
        replacement.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(String blend) {
                return blend == null ? "" : model.percentText(blend);
            }

            @Override
            public String fromString(String text) {
                return text;
            }
        });
        process.setId("record-step-process");
        site.setId("record-step-site");
        reason.setId("record-step-reason");
        reason.setPromptText("why the liquid is replaced, e.g. reprotoxic (H360D)");
        author.setId("record-step-author");
        withTarget.setSelected(true);
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(8);
        int r = 0;
        g.addRow(r++, new Label("Liquid replaced"), replaced);
        g.addRow(r++, new Label("Replacement"), replacement);
        g.addRow(r++, new Label("Process"), process);
        g.addRow(r++, new Label("Site"), site);
        g.addRow(r++, new Label("Reason"), reason);
        g.addRow(r++, new Label("Filed by"), author);
        g.add(withTarget, 0, r++, 2, 1);
        GridPane.setHgrow(replacement, Priority.ALWAYS);
        g.setMaxWidth(760);
        unchecked.setWrapText(true);
        unchecked.getStyleClass().add("form-problems");
        unchecked.setId("record-step-unchecked");
        Button file = new Button("_File the record");
        file.setId("record-step-file");
        file.setOnAction(e -> {
            try {
                String to = replacement.getValue();
                model.fileRecord(new RecordsModel.Filing(process.getText(), site.getText(), replaced.getText(), to == null ? "" : to,
                        reason.getText(), author.getText(), withTarget.isSelected()), null);
            } catch (RuntimeException ex) {
                model.session().jobs().complain(ErrorText.of(ex));
            }
        });
        state.setId("record-step-state");
        state.setWrapText(true);
        Button register = new Button("Open the register (review, approve, PDF)");
        register.setId("record-step-register");
        register.setOnAction(e -> openRegister.run());
        Label note = new Label("The record takes a snapshot of the evidence when it is filed: parameters, distances, both liquids' "
                + "safety profiles and drying paths, and every data source. Review and approval are done by others in the register.");
        note.setWrapText(true);
        note.getStyleClass().add("hint");
        root.getChildren().addAll(head, g, unchecked, file, state, register, note);
        model.currentProperty().addListener((o, a, c) -> refresh(a, c));
        model.records().records().addListener((javafx.collections.ListChangeListener<SubstitutionRecord>) ch -> showState());
        refresh(null, model.current());
    }

    public Node node() {
        return root;
    }

    private void refresh(SubstitutionCase before, SubstitutionCase c) {
        if (c == null) {
            replacement.getItems().clear();
            state.setText("No case open.");
            return;
        }
        if (before == null || before.id() != c.id() && before.id() != 0) {
            replaced.setText(c.replaced());
            process.setText(c.process());
        }
        String pick = replacement.getValue();
        replacement.getItems().setAll(c.chosen().stream().map(ChosenCandidate::blend).toList());
        replacement.setValue(pick != null && replacement.getItems().contains(pick) ? pick
                : replacement.getItems().isEmpty() ? null : replacement.getItems().get(0));
        long open = c.chosen().stream().filter(x -> x.checksDone() < 3).count();
        unchecked.setText(c.chosen().isEmpty() ? "No candidate chosen: the record needs a replacement (Candidates step)."
                : open == 0 ? "" : open + " chosen candidate" + (open == 1 ? " has" : "s have") + " checks not yet run (Checks step).");
        showState();
    }

    private void showState() {
        SubstitutionCase c = model.current();
        if (c == null || c.recordId() == null) {
            state.setText(c == null ? "No case open." : "Not filed yet.");
            return;
        }
        String status = model.records().records().stream().filter(x -> x.id() == c.recordId()).findFirst()
                .map(x -> x.status().label()).orElse("in the register");
        state.setText("Filed as record " + c.recordId() + " — " + status + ".");
    }
}
