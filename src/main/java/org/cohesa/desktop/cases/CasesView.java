package org.cohesa.desktop.cases;

import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.RadioButton;
import javafx.scene.control.SelectionMode;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.cohesa.core.cases.CaseStep;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.desktop.common.Columns;
import org.cohesa.desktop.common.Dialogs;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.LocalTimes;
import org.cohesa.desktop.common.TableTools;
import org.cohesa.store.CaseRepository;

/** The start page: begin a case (replace a liquid, or find one for a material) or reopen a saved one. */
public final class CasesView {

    private final CaseModel model;
    private final SplitPane root;
    private final Runnable opened;

    /** @param opened runs after a case is started or opened (the workbench moves to its next step) */
    public CasesView(CaseModel model, Runnable opened) {
        this.model = model;
        this.opened = opened;
        root = new SplitPane(startForm(), savedList());
        root.setId("cases-screen");
        root.setDividerPositions(0.42);
    }

    public Node node() {
        return root;
    }

    private Node startForm() {
        Label head = new Label("Start a case");
        head.getStyleClass().add("headline");
        ToggleGroup kind = new ToggleGroup();
        RadioButton replace = new RadioButton("Replace a liquid in a process");
        replace.setId("case-kind-replace");
        replace.setToggleGroup(kind);
        replace.setSelected(true);
        RadioButton find = new RadioButton("Find a liquid for a material");
        find.setId("case-kind-find");
        find.setToggleGroup(kind);
        TextField title = new TextField();
        title.setId("case-title");
        title.setPromptText("e.g. Thinner for the alkyd line");
        TextField replaced = new TextField();
        replaced.setId("case-replaced");
        replaced.setPromptText("a solvent, or NAME:FRACTION,… for a blend");
        replaced.disableProperty().bind(find.selectedProperty());
        TextField process = new TextField();
        process.setId("case-process");
        process.setPromptText("what the liquid does there");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(8);
        g.addRow(0, new Label("Title"), title);
        g.addRow(1, new Label("Liquid replaced"), replaced);
        g.addRow(2, new Label("Process or product"), process);
        GridPane.setHgrow(title, Priority.ALWAYS);
        Button start = new Button("_Start the case");
        start.setId("case-start");
        start.setDefaultButton(true);
        start.setOnAction(e -> {
            try {
                model.start(title.getText(), find.isSelected() ? SubstitutionCase.Kind.FIND : SubstitutionCase.Kind.REPLACE,
                        find.isSelected() ? "" : replaced.getText(), process.getText());
                title.clear();
                replaced.clear();
                process.clear();
                opened.run();
            } catch (RuntimeException ex) {
                model.session().jobs().complain(ErrorText.of(ex));
            }
        });
        StringBuilder steps = new StringBuilder("A case goes through five steps, shown along the top:\n");
        int i = 1;
        for (CaseStep s : CaseStep.values()) {
            steps.append(i++).append(". ").append(s.title()).append(" — ").append(s.question()).append('\n');
        }
        steps.append("Every change is saved as you go; reopen a case from the list at any time. "
                + "The library, the parameter space, the drying tool and the register stay one click away, at the strip's right end.");
        Label how = new Label(steps.toString());
        how.setWrapText(true);
        how.getStyleClass().add("hint");
        VBox box = new VBox(12, head, replace, find, g, start, how);
        box.setPadding(new Insets(14));
        return box;
    }

    private Node savedList() {
        Label head = new Label("Saved cases");
        head.getStyleClass().add("headline");
        TableView<CaseRepository.Summary> table = new TableView<>(model.saved());
        table.setId("case-list");
        table.getColumns().add(Columns.text("Case", CaseRepository.Summary::title, 290));
        table.getColumns().add(Columns.text("Job", s -> s.kind() == org.cohesa.core.cases.SubstitutionCase.Kind.REPLACE ? "replace" : "find", 70));
        // the title reads whole at 1280 px: the other columns give way first
        table.getColumns().get(0).setMinWidth(270);
        table.getColumns().get(1).setMinWidth(62);
        table.getColumns().add(Columns.text("Replaces", CaseRepository.Summary::replaced, 150));
        table.getColumns().add(Columns.text("Material", s -> s.material() == null ? "not chosen yet" : s.material(), 150));
        table.getColumns().add(Columns.text("Last saved", s -> LocalTimes.of(s.updated().toString()), 150));
        table.getSelectionModel().setSelectionMode(SelectionMode.SINGLE);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.setPlaceholder(new Label("No saved case yet: start one on the left."));
        TableTools.equip(table, () -> { });
        Button open = new Button("_Open");
        open.setId("case-open");
        open.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        open.setOnAction(e -> openSelected(table));
        table.setRowFactory(tv -> {
            javafx.scene.control.TableRow<CaseRepository.Summary> row = new javafx.scene.control.TableRow<>();
            row.setOnMouseClicked(ev -> {
                if (ev.getClickCount() == 2 && !row.isEmpty()) {
                    openSelected(table);
                }
            });
            return row;
        });
        Button delete = new Button("Delete…");
        delete.setId("case-delete");
        delete.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        delete.setOnAction(e -> {
            CaseRepository.Summary s = table.getSelectionModel().getSelectedItem();
            if (Dialogs.confirm(root, "Delete the case", "Delete the case “" + s.title() + "”? A record it filed stays in the register.")) {
                model.delete(s.id(), null);
            }
        });
        Button reload = new Button("Refresh");
        reload.setOnAction(e -> model.refreshList(null));
        HBox bar = new HBox(8, open, delete, reload);
        VBox box = new VBox(10, head, table, bar);
        VBox.setVgrow(table, Priority.ALWAYS);
        box.setPadding(new Insets(14));
        return box;
    }

    private void openSelected(TableView<CaseRepository.Summary> table) {
        CaseRepository.Summary s = table.getSelectionModel().getSelectedItem();
        if (s != null) {
            model.open(s.id(), null);
            opened.run();
        }
    }
}
