package org.cohesa.desktop.library;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.transformation.SortedList;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.desktop.common.Columns;
import org.cohesa.desktop.common.Dialogs;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.TableTools;

/**
 * The library screen: the solvent table (filter, sort, copy, CSV export), the selected entry's details
 * with the source of each value, and the user's own entries (add, edit, remove, CSV import).
 */
public final class LibraryView {

    private final LibraryModel model;
    private final BorderPane root = new BorderPane();
    private final TableView<Solvent> table = new TableView<>();
    private final TextArea details = new TextArea();
    private boolean syncing;

    public LibraryView(LibraryModel model) {
        this.model = model;
        root.setId("library-screen");
        TextField filter = new TextField();
        filter.setId("library-filter");
        filter.setPromptText("Filter by name, synonym, CAS or family");
        filter.textProperty().bindBidirectional(model.filterProperty());
        filter.setPrefColumnCount(28);
        Label filterLabel = new Label("_Find");
        filterLabel.setMnemonicParsing(true);
        filterLabel.setLabelFor(filter);
        Label count = new Label();
        count.setId("library-count");
        count.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(
                () -> model.filtered().size() + " of " + model.session().solvents().size() + " solvents, "
                        + model.filteredMaterials().size() + " of " + model.session().materials().size() + " materials",
                model.filtered(), model.session().solvents(), model.filteredMaterials(), model.session().materials()));

        Button add = button("_Add…", "library-add", e -> addEntry());
        Button edit = button("_Edit…", "library-edit", e -> editEntry());
        Button remove = button("Re_move", "library-remove", e -> removeEntry());
        Button importCsv = button("_Import CSV…", "library-import", e -> importCsv());
        Button export = button("E_xport CSV…", "library-export", e -> exportCsv());
        edit.disableProperty().bind(javafx.beans.binding.Bindings.createBooleanBinding(
                () -> selected() == null || !selected().userEntry(), table.getSelectionModel().selectedItemProperty()));
        remove.disableProperty().bind(edit.disableProperty());
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        HBox bar = new HBox(8, filterLabel, filter, count, grow, add, edit, remove, importCsv, export);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(8, 10, 8, 10));
        bar.getStyleClass().add("toolbar-strip");

        table.setId("solvent-table");
        SortedList<Solvent> sorted = new SortedList<>(model.filtered());
        sorted.comparatorProperty().bind(table.comparatorProperty());
        table.setItems(sorted);
        table.getColumns().addAll(List.of(
                Columns.<Solvent>text("Name", Solvent::name, 190),
                Columns.<Solvent>text("CAS", Solvent::cas, 90),
                Columns.<Solvent>text("Family", s -> s.family() == null ? "" : s.family().replace('_', ' '), 130),
                Columns.<Solvent>number("δD", s -> s.hasHansen() ? s.hansen().dD() : null, 55, 1),
                Columns.<Solvent>number("δP", s -> s.hasHansen() ? s.hansen().dP() : null, 55, 1),
                Columns.<Solvent>number("δH", s -> s.hasHansen() ? s.hansen().dH() : null, 55, 1),
                Columns.<Solvent>number("Vm (cm³/mol)", Solvent::effectiveMolarVolume, 108, 1),
                Columns.<Solvent>number("bp (°C)", Solvent::boilingPointC, 70, -1),
                Columns.<Solvent>number("Flash pt (°C)", Solvent::flashPointC, 104, -1),
                centred(Columns.<Solvent>text("ICH", s -> s.ichClass() == null ? "" : s.ichClass().toString(), 45)),
                Columns.<Solvent>text("H-statements", s -> String.join(" ", s.hazardStatements()), 200),
                Columns.<Solvent>text("Origin", s -> s.userEntry() ? "yours" : "bundled", 70)));
        table.setPlaceholder(new Label("No solvent matches the filter."));
        TableTools.equip(table, this::exportCsv);
        table.getSelectionModel().selectedItemProperty().addListener((o, a, s) -> {
            details.setText(s == null ? "" : SolventDetails.describe(s));
            if (!syncing && s != null) {
                syncing = true;
                model.session().selectedSolventProperty().set(s);
                syncing = false;
            }
        });
        model.session().selectedSolventProperty().addListener((o, a, s) -> selectInTable(s));
        table.setOnMouseClicked(e -> {
            if (e.getClickCount() == 2 && selected() != null && selected().userEntry()) {
                editEntry();
            }
        });

        details.setId("solvent-details");
        details.setEditable(false);
        details.setWrapText(true);
        details.setPromptText("Select a solvent to see every value with its source.");
        details.getStyleClass().add("details");
        SplitPane split = new SplitPane(table, details);
        split.setDividerPositions(0.8);
        javafx.scene.control.TabPane kinds = new javafx.scene.control.TabPane(
                new javafx.scene.control.Tab("Solvents", split), new javafx.scene.control.Tab("Materials", materialsTable()));
        kinds.setTabClosingPolicy(javafx.scene.control.TabPane.TabClosingPolicy.UNAVAILABLE);
        kinds.getTabs().get(0).setId("library-solvents");
        kinds.getTabs().get(1).setId("library-materials");
        kinds.setId("library-kinds");

        ListView<String> problems = new ListView<>(model.importProblems());
        problems.setId("import-problems");
        problems.setPrefHeight(140);
        Label problemsTitle = new Label();
        problemsTitle.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(
                () -> "The import was refused, nothing was stored. " + model.importProblems().size()
                        + (model.importProblems().size() == 1 ? " problem:" : " problems:"), model.importProblems()));
        problemsTitle.getStyleClass().add("problem-title");
        Button dismiss = new Button("_Dismiss");
        dismiss.setOnAction(e -> model.importProblems().clear());
        Region g2 = new Region();
        HBox.setHgrow(g2, Priority.ALWAYS);
        VBox problemBox = new VBox(4, new HBox(8, problemsTitle, g2, dismiss), problems);
        problemBox.setPadding(new Insets(6, 10, 6, 10));
        problemBox.getStyleClass().add("problem-box");
        problemBox.visibleProperty().bind(javafx.beans.binding.Bindings.isNotEmpty(model.importProblems()));
        problemBox.managedProperty().bind(problemBox.visibleProperty());

        root.setTop(bar);
        root.setCenter(kinds);
        root.setBottom(problemBox);
    }

    public Node node() {
        return root;
    }

    public TableView<Solvent> table() {
        return table;
    }

    private TableView<Material> materialsTable() {
        TableView<Material> mt = new TableView<>();
        mt.setId("material-table");
        SortedList<Material> sortedMaterials = new SortedList<>(model.filteredMaterials());
        sortedMaterials.comparatorProperty().bind(mt.comparatorProperty());
        mt.setItems(sortedMaterials);
        mt.getColumns().addAll(List.of(
                Columns.<Material>text("Name", Material::name, 260),
                Columns.<Material>text("Kind", m -> m.kind().key(), 80),
                Columns.<Material>number("δD", m -> m.sphere().centre().dD(), 60, 1),
                Columns.<Material>number("δP", m -> m.sphere().centre().dP(), 60, 1),
                Columns.<Material>number("δH", m -> m.sphere().centre().dH(), 60, 1),
                Columns.<Material>number("R0", m -> m.sphere().r0(), 60, 1),
                Columns.<Material>text("Source", Material::source, 200),
                Columns.<Material>text("Note", m -> m.note() == null ? "" : m.note(), 360),
                Columns.<Material>text("Origin", m -> m.userEntry() ? "yours" : "bundled", 70)));
        mt.setPlaceholder(new Label("No material matches the filter."));
        TableTools.equip(mt, () -> exportTable(mt, "cohesa-materials.csv"));
        return mt;
    }

    private void exportTable(TableView<?> t, String suggested) {
        TableTools.exportWithDialog(root, t, "Export the table to CSV", suggested, model.session().jobs());
    }

    private Solvent selected() {
        return table.getSelectionModel().getSelectedItem();
    }

    private void selectInTable(Solvent s) {
        if (syncing) {
            return;
        }
        syncing = true;
        try {
            if (s == null) {
                table.getSelectionModel().clearSelection();
                return;
            }
            int i = indexOf(s.name());
            if (i < 0 && !model.filterProperty().get().isBlank()) {
                model.filterProperty().set("");
                i = indexOf(s.name());
            }
            if (i >= 0) {
                table.getSelectionModel().clearAndSelect(i);
                table.scrollTo(Math.max(0, i - 3));
            }
        } finally {
            syncing = false;
        }
    }

    private int indexOf(String name) {
        for (int i = 0; i < table.getItems().size(); i++) {
            if (table.getItems().get(i).name().equalsIgnoreCase(name)) {
                return i;
            }
        }
        return -1;
    }

    private void addEntry() {
        new SolventEditor(null, model.session().jobs()).dialog().showAndWait().ifPresent(s -> model.add(s, () -> model.session().selectedSolventProperty()
                .set(find(s.name()))));
    }

    private void editEntry() {
        Solvent old = selected();
        if (old == null || !old.userEntry()) {
            return;
        }
        new SolventEditor(old, model.session().jobs()).dialog().showAndWait().ifPresent(s -> model.update(old.name(), s,
                () -> model.session().selectedSolventProperty().set(find(s.name()))));
    }

    private void removeEntry() {
        Solvent old = selected();
        if (old != null && old.userEntry() && Dialogs.confirm(root, "Remove entry", "Remove your entry '" + old.name() + "'?")) {
            model.remove(old.name(), null);
        }
    }

    private Solvent find(String name) {
        return model.session().solvents().stream().filter(x -> x.name().equalsIgnoreCase(name)).findFirst().orElse(null);
    }

    private void importCsv() {
        Path file = Dialogs.openFile(root, "Import your solvents from CSV", "CSV files", "*.csv");
        if (file != null) {
            model.importCsv(file, null);
        }
    }

    private void exportCsv() {
        exportTable(table, "cohesa-solvents.csv");
    }

    private static Button button(String text, String id, javafx.event.EventHandler<javafx.event.ActionEvent> action) {
        Button b = new Button(text);
        b.setId(id);
        b.setOnAction(action);
        return b;
    }

    private static <R, T> javafx.scene.control.TableColumn<R, T> centred(javafx.scene.control.TableColumn<R, T> c) {
        c.setStyle("-fx-alignment: CENTER;");
        return c;
    }
}
