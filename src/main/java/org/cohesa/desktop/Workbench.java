package org.cohesa.desktop;

import java.nio.file.Path;
import java.util.List;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.collections.transformation.FilteredList;
import javafx.collections.transformation.SortedList;
import javafx.concurrent.Task;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.store.Database;
import org.cohesa.store.SolventRepository;

/** The main window: for now the searchable, sortable solvent library. */
public final class Workbench {

    private final Path dbFile;
    private final BorderPane root = new BorderPane();
    private final ObservableList<Solvent> solvents = FXCollections.observableArrayList();
    private final Label status = new Label("Opening the library…");

    public Workbench(Path dbFile) {
        this.dbFile = dbFile;
        root.setId("workbench");
        TextField filter = new TextField();
        filter.setId("library-filter");
        filter.setPromptText("Filter by name, synonym or CAS");
        FilteredList<Solvent> filtered = new FilteredList<>(solvents, s -> true);
        filter.textProperty().addListener((o, a, text) -> filtered.setPredicate(s -> matches(s, text)));
        TableView<Solvent> table = new TableView<>();
        table.setId("solvent-table");
        SortedList<Solvent> sorted = new SortedList<>(filtered);
        sorted.comparatorProperty().bind(table.comparatorProperty());
        table.setItems(sorted);
        table.getColumns().addAll(List.of(
                text("Name", Solvent::name, 220),
                text("CAS", Solvent::cas, 100),
                number("δD", s -> s.hasHansen() ? s.hansen().dD() : null),
                number("δP", s -> s.hasHansen() ? s.hansen().dP() : null),
                number("δH", s -> s.hasHansen() ? s.hansen().dH() : null),
                number("Vm cm³/mol", Solvent::effectiveMolarVolume),
                number("bp °C", Solvent::boilingPointC),
                number("Flash point °C", Solvent::flashPointC),
                text("ICH class", s -> s.ichClass() == null ? "" : s.ichClass().toString(), 80),
                text("Family", Solvent::family, 120)));
        VBox top = new VBox(8, new Label("Solvent library"), filter);
        top.setPadding(new Insets(10));
        root.setTop(top);
        root.setCenter(table);
        HBox bottom = new HBox(status);
        HBox.setHgrow(status, Priority.ALWAYS);
        bottom.setPadding(new Insets(6, 10, 6, 10));
        status.setId("status");
        root.setBottom(bottom);
    }

    public Parent root() {
        return root;
    }

    /** Loads the library off the FX thread. */
    public void load() {
        Task<List<Solvent>> task = new Task<>() {
            @Override
            protected List<Solvent> call() {
                try (Database db = Database.open(dbFile)) {
                    return new SolventRepository(db).all();
                }
            }
        };
        task.setOnSucceeded(e -> {
            solvents.setAll(task.getValue());
            status.setText(solvents.size() + " solvents · database " + dbFile);
        });
        task.setOnFailed(e -> status.setText("Could not open the library: " + task.getException().getMessage()));
        Thread t = new Thread(task, "library-loader");
        t.setDaemon(true);
        t.start();
    }

    private static boolean matches(Solvent s, String text) {
        if (text == null || text.isBlank()) {
            return true;
        }
        String k = text.strip().toLowerCase(java.util.Locale.ROOT);
        return s.name().toLowerCase(java.util.Locale.ROOT).contains(k) || (s.cas() != null && s.cas().contains(k))
                || s.synonyms().stream().anyMatch(x -> x.toLowerCase(java.util.Locale.ROOT).contains(k));
    }

    private static TableColumn<Solvent, String> text(String title, java.util.function.Function<Solvent, String> f, double width) {
        TableColumn<Solvent, String> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(f.apply(cd.getValue())));
        c.setPrefWidth(width);
        return c;
    }

    private static TableColumn<Solvent, Double> number(String title, java.util.function.Function<Solvent, Double> f) {
        TableColumn<Solvent, Double> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(f.apply(cd.getValue())));
        c.setPrefWidth(90);
        c.setStyle("-fx-alignment: CENTER-RIGHT;");
        return c;
    }
}
