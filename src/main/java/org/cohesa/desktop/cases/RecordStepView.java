package org.cohesa.desktop.cases;

import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Separator;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.core.cases.SubstitutionCase.ChosenCandidate;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.LocalTimes;
import org.cohesa.desktop.records.RecordsModel;

/**
 * The Record step: files the case's substitution in the register (the same evidence the command line files), with the
 * liquid replaced and process from the case and the replacement picked from the chosen candidates; then takes the record
 * through review to its decision without leaving the case. The register holds the rules: the moves draft → in review →
 * approved | rejected, and four eyes against the account at the keyboard (the author may not review or approve, the
 * reviewer may not approve); a refused step is said here and in the status bar, and nothing is written.
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
    private final GridPane filing = new GridPane();
    private final Button file = new Button("_File the record");
    private final VBox decision = new VBox(8);
    private final VBox history = new VBox(3);
    private final Label next = new Label();
    private final TextField by = new TextField(System.getProperty("user.name", ""));
    private final TextField comment = new TextField();
    private final Button review = new Button("Send to re_view");
    private final Button approve = new Button("_Approve");
    private final Button reject = new Button("Re_ject");
    private final Label refused = new Label();

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
        filing.setHgap(8);
        filing.setVgap(8);
        int r = 0;
        filing.addRow(r++, new Label("Liquid replaced"), replaced);
        filing.addRow(r++, new Label("Replacement"), replacement);
        filing.addRow(r++, new Label("Process"), process);
        filing.addRow(r++, new Label("Site"), site);
        filing.addRow(r++, new Label("Reason"), reason);
        filing.addRow(r++, new Label("Filed by"), author);
        filing.add(withTarget, 0, r++, 2, 1);
        GridPane.setHgrow(replacement, Priority.ALWAYS);
        filing.setMaxWidth(760);
        unchecked.setWrapText(true);
        unchecked.getStyleClass().add("form-problems");
        unchecked.setId("record-step-unchecked");
        unchecked.setMinHeight(Region.USE_PREF_SIZE);
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
        state.getStyleClass().add("section-title");
        Button register = new Button("Open the register (all records, PDF, CSV, verify)");
        register.setId("record-step-register");
        register.setOnAction(e -> openRegister.run());
        Label note = new Label("The record takes a snapshot of the evidence when it is filed: parameters, distances, both liquids' "
                + "safety profiles and drying paths, and every data source. Records are never changed, only appended to.");
        note.setWrapText(true);
        note.getStyleClass().add("hint");
        note.setMinHeight(Region.USE_PREF_SIZE);
        // two columns: what is filed, and what happens to it; each reads whole at 1280 px
        VBox filed = new VBox(12, head, filing, unchecked, file, state, new Separator(), register, note);
        filed.setPrefWidth(600);
        filed.setMaxWidth(700);
        Node decide = decisionPane();
        decision.setPrefWidth(600);
        decision.setMaxWidth(700);
        HBox columns = new HBox(28, filed, decide);
        HBox.setHgrow(filed, Priority.ALWAYS);
        HBox.setHgrow(decide, Priority.ALWAYS);
        root.getChildren().add(columns);
        root.setMaxWidth(1460);
        ScrollPane scroll = new ScrollPane(root);
        scroll.setFitToWidth(true);
        scroll.setId("record-step-scroll");
        this.node = scroll;
        model.currentProperty().addListener((o, a, c) -> refresh(a, c));
        model.records().records().addListener((javafx.collections.ListChangeListener<SubstitutionRecord>) ch -> showState());
        model.records().infoProperty().addListener((o, a, b) -> showState());
        refresh(null, model.current());
    }

    private final Node node;

    public Node node() {
        return node;
    }

    /** Review and decision, here in the case: who acts (as the register sees it), the record's steps so far, the next move. */
    private Node decisionPane() {
        Label head = new Label("Review and decision");
        head.getStyleClass().add("headline");
        Label who = new Label();
        who.setId("record-step-who");
        who.setWrapText(true);
        who.getStyleClass().add("hint");
        who.setMinHeight(Region.USE_PREF_SIZE);
        who.textProperty().bind(Bindings.createStringBinding(() -> {
            RecordsModel.RegisterInfo i = model.records().infoProperty().get();
            if (i == null) {
                return "Register: opening…";
            }
            return "You act as " + (i.login() ? "the database login " : "the operating-system account ") + i.account() + " on the "
                    + ("postgresql".equals(i.kind()) ? "shared" : "local") + " register. "
                    + (i.fourEyes() ? "Four eyes is on: the author of a record cannot review or approve it, and its reviewer cannot "
                            + "approve it — whatever name is typed, the register compares accounts."
                            : "Four eyes is off on this register (one person may file, review and approve).");
        }, model.records().infoProperty()));
        history.setId("record-step-history");
        next.setId("record-step-next");
        next.setWrapText(true);
        next.setMinHeight(Region.USE_PREF_SIZE);
        by.setId("record-step-by");
        by.setPrefColumnCount(18);
        comment.setId("record-step-comment");
        comment.setPromptText("e.g. evidence complete; lab trial 12 passed");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        g.addRow(0, new Label("By"), by);
        g.addRow(1, new Label("Comment"), comment);
        GridPane.setHgrow(comment, Priority.ALWAYS);
        g.setMaxWidth(760);
        review.setId("record-step-review");
        approve.setId("record-step-approve");
        reject.setId("record-step-reject");
        review.setOnAction(e -> decide(RecordStatus.IN_REVIEW));
        approve.setOnAction(e -> decide(RecordStatus.APPROVED));
        reject.setOnAction(e -> decide(RecordStatus.REJECTED));
        Button reread = new Button("Read the register again");
        reread.setId("record-step-reread");
        reread.setOnAction(e -> model.records().reload(null));
        HBox buttons = new HBox(8, review, approve, reject, reread);
        buttons.setAlignment(Pos.CENTER_LEFT);
        refused.setId("record-step-refused");
        refused.setWrapText(true);
        refused.getStyleClass().add("form-problems");
        refused.setMinHeight(Region.USE_PREF_SIZE);
        refused.managedProperty().bind(refused.visibleProperty());
        refused.setVisible(false);
        Label steps = new Label("Steps so far");
        steps.getStyleClass().add("section-title");
        decision.getChildren().addAll(head, who, steps, history, next, g, buttons, refused);
        decision.setId("record-step-decision");
        return decision;
    }

    private void decide(RecordStatus to) {
        SubstitutionCase c = model.current();
        if (c == null || c.recordId() == null) {
            return;
        }
        refused.setVisible(false);
        long id = c.recordId();
        try {
            model.records().changeStatus(id, to, by.getText(), comment.getText(), () -> comment.clear(), why -> {
                refused.setText("Refused, nothing written: " + why);
                refused.setVisible(true);
            });
        } catch (RuntimeException ex) {
            refused.setText(ErrorText.of(ex));
            refused.setVisible(true);
            model.session().jobs().complain(ErrorText.of(ex));
        }
    }

    private void refresh(SubstitutionCase before, SubstitutionCase c) {
        if (c == null) {
            replacement.getItems().clear();
            state.setText("No case open.");
            showState();
            return;
        }
        if (before == null || before.id() != c.id() && before.id() != 0) {
            replaced.setText(c.replaced());
            process.setText(c.process());
            refused.setVisible(false);
        }
        String pick = replacement.getValue();
        replacement.getItems().setAll(c.chosen().stream().map(ChosenCandidate::blend).toList());
        replacement.setValue(pick != null && replacement.getItems().contains(pick) ? pick
                : replacement.getItems().isEmpty() ? null : replacement.getItems().get(0));
        long open = c.chosen().stream().filter(x -> x.checksDone() < 3).count();
        unchecked.setText(c.recordId() != null ? "" : c.chosen().isEmpty() ? "No candidate chosen: the record needs a replacement (Candidates step)."
                : open == 0 ? "" : open + " chosen candidate" + (open == 1 ? " has" : "s have") + " checks not yet run (Checks step).");
        showState();
    }

    private void showState() {
        SubstitutionCase c = model.current();
        boolean filed = c != null && c.recordId() != null;
        filing.setDisable(filed);
        file.setDisable(c == null || filed);
        history.getChildren().clear();
        SubstitutionRecord r = !filed ? null : model.records().records().stream().filter(x -> x.id() == c.recordId()).findFirst().orElse(null);
        RecordStatus status = r == null ? null : r.status();
        review.setDisable(status == null || !status.canMoveTo(RecordStatus.IN_REVIEW));
        approve.setDisable(status == null || !status.canMoveTo(RecordStatus.APPROVED));
        reject.setDisable(status == null || !status.canMoveTo(RecordStatus.REJECTED));
        if (!filed) {
            state.setText(c == null ? "No case open." : "Not filed yet.");
            history.getChildren().add(new Label("Nothing yet: file the record first."));
            next.setText("");
            return;
        }
        if (r == null) {
            state.setText("Filed as record " + c.recordId() + " — not in the register shown now (another register?).");
            history.getChildren().add(new Label("Record " + c.recordId() + " is not in this register: switch registers on the register screen."));
            next.setText("");
            return;
        }
        state.setText("Filed as record " + r.id() + " — " + r.status().label().replace('_', ' ') + ".");
        // the locked form shows what the record holds, not what was typed last
        replaced.setText(r.content().replaced());
        replacement.getItems().setAll(r.content().replacement());
        replacement.setValue(r.content().replacement());
        process.setText(r.content().process());
        site.setText(r.content().site() == null ? "" : r.content().site());
        reason.setText(r.content().reason());
        author.setText(r.author());
        withTarget.setSelected(r.content().target() != null);
        for (StatusChange s : r.history()) {
            Label l = new Label(s.seq() + ".  " + LocalTimes.of(s.at()) + "   " + words(s.kind()) + " by " + s.by()
                    + (s.account() == null || s.account().isBlank() ? "" : " (account " + s.account() + ")")
                    + (s.comment() == null || s.comment().isBlank() ? "" : " — " + s.comment()));
            l.setWrapText(true);
            l.setId("record-step-history-" + s.seq());
            history.getChildren().add(l);
        }
        next.setText(switch (r.status()) {
            case DRAFT -> "Next: someone other than the author sends it to review (it can be done here, under their own account).";
            case IN_REVIEW -> "Next: a third person approves or rejects it — not the author, not the reviewer.";
            case APPROVED -> "✓ Approved: the substitution is decided. A new decision needs a new record (a new case).";
            case REJECTED -> "✓ Rejected: the decision is final. Start a new case for another replacement.";
        });
        // the register does not hold the case's checks; whoever decides should know which are missing
        long open = c.chosen().stream().filter(x -> x.checksDone() < 3).count();
        if (open > 0 && (r.status() == RecordStatus.DRAFT || r.status() == RecordStatus.IN_REVIEW)) {
            next.setText(next.getText() + " Before deciding: " + open + " chosen candidate" + (open == 1 ? " still misses" : "s still miss")
                    + " checks (Checks step).");
        }
    }

    private static String words(String kind) {
        return switch (kind) {
            case "created" -> "filed";
            case "sent_to_review" -> "sent to review";
            default -> kind.replace('_', ' ');
        };
    }
}
