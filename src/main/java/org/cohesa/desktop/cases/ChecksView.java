package org.cohesa.desktop.cases;

import java.util.function.Consumer;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SplitPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.cohesa.core.cases.SubstitutionCase.ChosenCandidate;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Numbers;

/**
 * The Checks step: the candidates chosen for the case, each with its three checks (safety, drying, phases with and without
 * water) marked done or missing, and for the selected one the safety panel and the checks' findings in full.
 */
public final class ChecksView {

    private final CaseModel model;
    private final SplitPane root = new SplitPane();
    private final ObservableList<ChosenCandidate> chosen = FXCollections.observableArrayList();
    private final ListView<ChosenCandidate> list = new ListView<>(chosen);
    private final VBox detail = new VBox(10);

    /** @param openDrying shows a blend's drying path on the drying screen */
    public ChecksView(CaseModel model, Consumer<Blend> openDrying) {
        this.model = model;
        root.setId("checks-screen");
        list.setId("checks-list");
        list.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(ChosenCandidate c, boolean empty) {
                super.updateItem(c, empty);
                setText(null);
                setGraphic(empty || c == null ? null : cell(c, l.widthProperty()));
            }
        });
        list.setPlaceholder(new Label("No candidate chosen yet: on the Candidates step select cards and press “Choose for checks”."));
        ((Label) list.getPlaceholder()).setWrapText(true);
        Button run = new Button("_Run the checks");
        run.setId("checks-run");
        run.disableProperty().bind(javafx.beans.binding.Bindings.isEmpty(chosen));
        run.setOnAction(e -> {
            try {
                model.runChecks(null);
            } catch (RuntimeException ex) {
                model.session().jobs().complain(ErrorText.of(ex));
            }
        });
        Button drying = new Button("Drying _path…");
        drying.setId("checks-drying");
        drying.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        drying.setOnAction(e -> {
            try {
                openDrying.accept(CaseModel.parse(new SolventLibrary(java.util.List.copyOf(model.session().solvents())),
                        list.getSelectionModel().getSelectedItem().blend()));
            } catch (RuntimeException ex) {
                model.session().jobs().complain(ErrorText.of(ex));
            }
        });
        Button remove = new Button("Take out of the case");
        remove.setId("checks-remove");
        remove.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        remove.setOnAction(e -> model.unchoose(list.getSelectionModel().getSelectedItem().blend()));
        Label head = new Label("Chosen candidates");
        head.getStyleClass().add("headline");
        Label hint = new Label("Each candidate gets three checks: its safety profile, its drying path against the material, "
                + "and whether it stays one liquid, alone and with water.");
        hint.setWrapText(true);
        hint.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        hint.getStyleClass().add("hint");
        VBox left = new VBox(8, head, hint, new HBox(8, run, drying, remove), list);
        VBox.setVgrow(list, Priority.ALWAYS);
        left.setPadding(new Insets(10));
        detail.setId("checks-detail");
        detail.setPadding(new Insets(10));
        ScrollPane sp = new ScrollPane(detail);
        sp.setFitToWidth(true);
        root.getItems().addAll(left, sp);
        root.setDividerPositions(0.36);
        model.currentProperty().addListener((o, a, c) -> refresh());
        model.checks().addListener((javafx.collections.MapChangeListener<String, CandidateChecks>) ch -> showDetail());
        list.getSelectionModel().selectedItemProperty().addListener((o, a, c) -> showDetail());
        refresh();
    }

    public Node node() {
        return root;
    }

    private void refresh() {
        String selected = list.getSelectionModel().getSelectedItem() == null ? null : list.getSelectionModel().getSelectedItem().blend();
        if (!chosen.equals(model.chosen())) {
            chosen.setAll(model.chosen());
        }
        int keep = 0;
        for (int i = 0; i < chosen.size(); i++) {
            if (chosen.get(i).blend().equals(selected)) {
                keep = i;
            }
        }
        if (!chosen.isEmpty() && list.getSelectionModel().getSelectedIndex() != keep) {
            list.getSelectionModel().clearAndSelect(keep);
        }
        showDetail();
    }

    private Node cell(ChosenCandidate c, javafx.beans.value.ObservableDoubleValue width) {
        Label name = new Label(percent(c.blend()) + "   RED " + Numbers.two(c.red()));
        name.getStyleClass().add("checks-name");
        VBox box = new VBox(2, name, check("Safety", c.safety()), check("Drying", c.drying()), check("Phases", c.miscibility()));
        for (Node n : box.getChildren()) {
            Label l = (Label) n;
            l.setWrapText(true);
            l.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
            l.maxWidthProperty().bind(javafx.beans.binding.Bindings.max(160, javafx.beans.binding.Bindings.subtract(width, 36)));
            l.prefWidthProperty().bind(l.maxWidthProperty());
        }
        return box;
    }

    private static Label check(String what, String result) {
        Label l = new Label((result == null ? "○ " + what + ": not checked yet" : "✓ " + what + ": " + result));
        l.getStyleClass().add(result == null ? "check-missing" : "check-done");
        return l;
    }

    private void showDetail() {
        detail.getChildren().clear();
        ChosenCandidate c = list.getSelectionModel().getSelectedItem();
        if (c == null) {
            return;
        }
        Label head = new Label(percent(c.blend()));
        head.getStyleClass().add("headline");
        head.setWrapText(true);
        detail.getChildren().add(head);
        CandidateChecks full = model.checks().get(c.blend());
        if (full == null) {
            Label l = new Label(c.checksDone() == 0 ? "Not checked yet: press “Run the checks”."
                    : "Stored findings of the last run (press “Run the checks” to see the full safety panel again).");
            l.setWrapText(true);
            l.getStyleClass().add("hint");
            detail.getChildren().add(l);
        }
        detail.getChildren().add(title("Safety"));
        if (full != null) {
            detail.getChildren().add(SafetyPanel.of(full.safety(), full.blend()));
        } else if (c.safety() != null) {
            detail.getChildren().add(text(c.safety()));
        }
        detail.getChildren().add(title("Drying"));
        detail.getChildren().add(text(full != null ? full.dryingLine() : c.drying() == null ? "not checked yet" : c.drying()));
        if (full != null && full.drying() != null) {
            full.drying().notes().forEach(n -> detail.getChildren().add(text("• " + n)));
        }
        detail.getChildren().add(title("Phases, alone and with water"));
        detail.getChildren().add(text(full != null ? full.phaseLine() : c.miscibility() == null ? "not checked yet" : c.miscibility()));
        if (full != null && full.water() != null && full.water().detail() != null) {
            detail.getChildren().add(text(full.water().detail()));
        }
    }

    private static Label title(String t) {
        Label l = new Label(t);
        l.getStyleClass().add("section-title");
        return l;
    }

    private static Label text(String t) {
        Label l = new Label(t);
        l.setWrapText(true);
        return l;
    }

    /** "acetone:0.3,ethanol:0.7" → "acetone 30 % + ethanol 70 %" (the notation itself when the library cannot read it). */
    private String percent(String blend) {
        return model.percentText(blend);
    }
}
