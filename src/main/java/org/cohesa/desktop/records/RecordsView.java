package org.cohesa.desktop.records;

import java.nio.file.Path;
import java.util.List;
import javafx.beans.binding.Bindings;
import javafx.collections.transformation.SortedList;
import javafx.event.ActionEvent;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.desktop.common.Columns;
import org.cohesa.desktop.common.Dialogs;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.LocalTimes;
import org.cohesa.desktop.common.TableTools;

/**
 * The register screen: every substitution record with its status; file a new one from the current
 * selection, move it through review (each step with who and why), verify the register, export a record as
 * PDF or the register as CSV.
 */
public final class RecordsView {

    private final RecordsModel model;
    private final BorderPane root = new BorderPane();
    private final TableView<SubstitutionRecord> table = new TableView<>();
    private final TextArea details = new TextArea();

    public RecordsView(RecordsModel model) {
        this.model = model;
        root.setId("records-screen");
        Button file = button("_New record…", "records-new", e -> fileRecord());
        Button review = button("Send to re_view", "records-review", e -> decide(RecordStatus.IN_REVIEW));
        Button approve = button("_Approve…", "records-approve", e -> decide(RecordStatus.APPROVED));
        Button reject = button("Re_ject…", "records-reject", e -> decide(RecordStatus.REJECTED));
        Button pdf = button("Export _PDF…", "records-pdf", e -> exportPdf());
        Button csv = button("Export register _CSV…", "records-csv", e -> exportCsv());
        Button verify = button("_Verify register", "records-verify", e -> model.verify(null));
        Button which = button("Re_gister…", "records-which", e -> chooseRegister());
        review.disableProperty().bind(Bindings.createBooleanBinding(() -> !canMove(RecordStatus.IN_REVIEW), table.getSelectionModel().selectedItemProperty()));
        approve.disableProperty().bind(Bindings.createBooleanBinding(() -> !canMove(RecordStatus.APPROVED), table.getSelectionModel().selectedItemProperty()));
        reject.disableProperty().bind(approve.disableProperty());
        pdf.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        HBox bar = new HBox(8, file, review, approve, reject, grow, verify, pdf, csv, which);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(8, 10, 8, 10));
        bar.getStyleClass().add("toolbar-strip");
        // which register this is, who the register takes the user for, and the rule it holds them to
        Label where = new Label();
        where.setId("records-register");
        where.setWrapText(true);
        where.textProperty().bind(Bindings.createStringBinding(() -> model.infoProperty().get() == null ? "Register: opening…"
                : model.infoProperty().get().describe(), model.infoProperty()));
        where.setPadding(new Insets(0, 10, 6, 10));
        VBox top = new VBox(bar, where);

        table.setId("records-table");
        SortedList<SubstitutionRecord> sorted = new SortedList<>(model.records());
        sorted.comparatorProperty().bind(table.comparatorProperty());
        table.setItems(sorted);
        table.getColumns().addAll(List.of(
                Columns.<SubstitutionRecord>number("No.", r -> (double) r.id(), 50, 0),
                Columns.<SubstitutionRecord>text("Status", r -> r.status().label().replace('_', ' '), 85),
                Columns.<SubstitutionRecord>text("Process", r -> r.content().process(), 170),
                Columns.<SubstitutionRecord>text("Site", r -> r.content().site() == null ? "" : r.content().site(), 100),
                Columns.<SubstitutionRecord>text("Replaced", r -> r.content().replaced(), 160),
                Columns.<SubstitutionRecord>text("Replacement", r -> r.content().replacement(), 220),
                Columns.<SubstitutionRecord>text("Reason", r -> r.content().reason(), 150),
                Columns.<SubstitutionRecord>text("Filed by", SubstitutionRecord::author, 90),
                Columns.<SubstitutionRecord>text("Last step by", RecordsView::lastStep, 150),
                Columns.<SubstitutionRecord>text("Filed (local time)", r -> LocalTimes.of(r.created()), 130)));
        table.setPlaceholder(new Label("No substitution records yet. File one with \"New record…\"."));
        TableTools.equip(table, this::exportCsv);
        table.getSelectionModel().selectedItemProperty().addListener((o, a, r) -> details.setText(r == null ? "" : describe(r)));
        // a register opened shows its first record at once rather than an empty details pane
        model.records().addListener((javafx.collections.ListChangeListener<SubstitutionRecord>) c -> {
            if (table.getSelectionModel().isEmpty() && !table.getItems().isEmpty()) {
                javafx.application.Platform.runLater(() -> {
                    if (table.getSelectionModel().isEmpty() && !table.getItems().isEmpty()) {
                        table.getSelectionModel().select(0);
                    }
                });
            }
        });
        details.setId("record-details");
        details.setEditable(false);
        details.setWrapText(true);
        details.getStyleClass().add("details");
        SplitPane split = new SplitPane(table, details);
        split.setDividerPositions(0.68);
        root.setTop(top);
        root.setCenter(split);
    }

    public Node node() {
        return root;
    }

    private boolean canMove(RecordStatus next) {
        SubstitutionRecord r = table.getSelectionModel().getSelectedItem();
        return r != null && r.status().canMoveTo(next);
    }

    static String describe(SubstitutionRecord r) {
        StringBuilder b = new StringBuilder();
        b.append("Record ").append(r.id()).append(" — ").append(r.status().label().replace('_', ' ')).append('\n');
        b.append("Process: ").append(r.content().process()).append(r.content().site() == null ? "" : " (" + r.content().site() + ")").append('\n');
        b.append("Replaced: ").append(r.content().replaced()).append('\n');
        b.append("Replacement: ").append(r.content().replacement()).append('\n');
        if (r.content().target() != null) {
            b.append("Target: ").append(r.content().target()).append('\n');
        }
        b.append("Reason: ").append(r.content().reason()).append("\n\nHistory\n");
        for (StatusChange c : r.history()) {
            b.append(c.seq()).append(". ").append(LocalTimes.of(c.at())).append("  ").append(c.kind()).append(" by ").append(c.by())
                    .append(c.account() == null || c.account().isBlank() ? "" : " (account " + c.account() + ")")
                    .append(c.comment() == null ? "" : " — " + c.comment()).append('\n');
        }
        b.append("\nEvidence (snapshot taken when the record was filed)\n").append(EvidenceText.of(r.evidence()));
        return b.toString();
    }

    private void fileRecord() {
        Dialog<RecordsModel.Filing> d = new Dialog<>();
        d.setTitle("New substitution record");
        d.setHeaderText("Filed as a draft with a snapshot of the evidence; records are never changed, only appended to.");
        TextField process = new TextField();
        TextField site = new TextField();
        TextField replaced = new TextField();
        TextField replacement = new TextField();
        RecordsModel.Filing start = model.startingFiling();
        replaced.setText(start.replaced());
        replacement.setText(start.replacement());
        TextField reason = new TextField();
        TextField author = new TextField(System.getProperty("user.name", ""));
        CheckBox withTarget = new CheckBox(model.session().target() == null ? "No target set" : "Include the target: " + model.session().target().name());
        withTarget.setSelected(model.session().target() != null);
        withTarget.setDisable(model.session().target() == null);
        process.setId("record-process");
        replaced.setId("record-replaced");
        replacement.setId("record-replacement");
        reason.setId("record-reason");
        author.setId("record-author");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        String[] labels = {"Process or product *", "Site", "Replaced (solvent or NAME:FRACTION,…) *", "Replacement *", "Reason *", "Filed by *"};
        TextField[] fields = {process, site, replaced, replacement, reason, author};
        for (int i = 0; i < fields.length; i++) {
            fields[i].setPrefColumnCount(36);
            g.addRow(i, new Label(labels[i]), fields[i]);
        }
        g.add(withTarget, 1, fields.length);
        Label problem = new Label();
        problem.getStyleClass().add("form-problems");
        problem.setWrapText(true);
        VBox content = new VBox(8, g, problem);
        content.setPadding(new Insets(10));
        d.getDialogPane().setContent(content);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.OK, ButtonType.CANCEL);
        Button ok = (Button) d.getDialogPane().lookupButton(ButtonType.OK);
        ok.setText("File as draft");
        ok.addEventFilter(ActionEvent.ACTION, e -> {
            for (int i : new int[] {0, 2, 3, 4, 5}) {
                if (fields[i].getText() == null || fields[i].getText().isBlank()) {
                    problem.setText(labels[i].replace(" *", "") + ": required.");
                    fields[i].requestFocus();
                    e.consume();
                    return;
                }
            }
        });
        d.setResultConverter(b -> b == ButtonType.OK ? new RecordsModel.Filing(process.getText(), site.getText(), replaced.getText(),
                replacement.getText(), reason.getText(), author.getText(), withTarget.isSelected()) : null);
        d.showAndWait().ifPresent(f -> model.file(f, r -> select(r.id())));
    }

    private void decide(RecordStatus next) {
        SubstitutionRecord r = table.getSelectionModel().getSelectedItem();
        if (r == null) {
            return;
        }
        Dialog<String[]> d = new Dialog<>();
        String verb = switch (next) {
            case IN_REVIEW -> "Send to review";
            case APPROVED -> "Approve";
            case REJECTED -> "Reject";
            default -> next.label();
        };
        d.setTitle(verb + " record " + r.id());
        d.setHeaderText(verb + ": " + r.content().replaced() + " → " + r.content().replacement());
        TextField by = new TextField(System.getProperty("user.name", ""));
        TextField comment = new TextField();
        comment.setPrefColumnCount(40);
        by.setId("decision-by");
        comment.setId("decision-comment");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        g.addRow(0, new Label("By *"), by);
        g.addRow(1, new Label("Comment"), comment);
        RecordsModel.RegisterInfo who = model.infoProperty().get();
        if (who != null) {
            // the four-eyes rule compares this account with the record's author and reviewer, whatever name is typed
            Label signedIn = new Label("Recorded under " + (who.login() ? "the database login " : "the operating-system account ") + who.account()
                    + (who.fourEyes() ? "; four eyes: the author and the reviewer cannot approve" : "; four-eyes rule off"));
            signedIn.setId("decision-account");
            signedIn.setWrapText(true);
            g.add(signedIn, 0, 2, 2, 1);
        }
        g.setPadding(new Insets(10));
        d.getDialogPane().setContent(g);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.OK, ButtonType.CANCEL);
        d.setResultConverter(b -> b == ButtonType.OK ? new String[] {by.getText(), comment.getText()} : null);
        d.showAndWait().ifPresent(a -> model.changeStatus(r.id(), next, a[0], a[1], () -> select(r.id())));
    }

    /** Who took the newest step, with the account it was taken under. */
    static String lastStep(SubstitutionRecord r) {
        StatusChange c = r.history().get(r.history().size() - 1);
        return c.by() + (c.account() == null || c.account().isBlank() ? "" : " (" + c.account() + ")");
    }

    /** Chooses the local register or a shared one on PostgreSQL. */
    private void chooseRegister() {
        Dialog<String> d = new Dialog<>();
        d.setTitle("Which register");
        d.setHeaderText("The local database's register, or a shared register on a PostgreSQL server.");
        TextField address = new TextField(model.sharedAddressProperty().get() == null ? "" : model.sharedAddressProperty().get());
        address.setId("register-address");
        address.setPromptText("postgresql://USER@HOST:PORT/DATABASE (empty: the local register)");
        address.setPrefColumnCount(44);
        Label hint = new Label("The password, if the server needs one, comes from PGPASSWORD; four eyes is held against the login.");
        hint.setWrapText(true);
        VBox box = new VBox(8, new Label("Shared register address"), address, hint);
        box.setPadding(new Insets(10));
        d.getDialogPane().setContent(box);
        ButtonType local = new ButtonType("Use the local register", ButtonBar.ButtonData.LEFT);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.OK, local, ButtonType.CANCEL);
        ((Button) d.getDialogPane().lookupButton(ButtonType.OK)).setText("Connect");
        d.setResultConverter(b -> b == ButtonType.OK ? address.getText() : b == local ? "" : null);
        d.showAndWait().ifPresent(a -> model.useRegister(a, null));
    }

    private void select(long id) {
        for (int i = 0; i < table.getItems().size(); i++) {
            if (table.getItems().get(i).id() == id) {
                table.getSelectionModel().clearAndSelect(i);
                table.scrollTo(i);
            }
        }
    }

    private void exportPdf() {
        SubstitutionRecord r = table.getSelectionModel().getSelectedItem();
        if (r == null) {
            return;
        }
        Path file = Dialogs.saveFile(root, "Export the record as PDF", "cohesa-record-" + r.id() + ".pdf", "PDF document", "*.pdf");
        if (file != null) {
            model.exportPdf(r.id(), file);
        }
    }

    private void exportCsv() {
        Path file = Dialogs.saveFile(root, "Export the register as CSV", "cohesa-register.csv", "CSV files", "*.csv");
        if (file != null) {
            try {
                model.exportCsv(file);
            } catch (RuntimeException ex) {
                model.session().jobs().complain(ErrorText.of(ex));
            }
        }
    }

    private static Button button(String text, String id, javafx.event.EventHandler<ActionEvent> action) {
        Button b = new Button(text);
        b.setId(id);
        b.setOnAction(action);
        return b;
    }
}
