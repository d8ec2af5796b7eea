package org.cohesa.desktop.target;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.transformation.SortedList;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.cohesa.core.target.Material;
import org.cohesa.desktop.common.Columns;
import org.cohesa.desktop.common.Dialogs;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.TableTools;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.desktop.structure.StructureTargetForm;

/**
 * The target screen: set the solubility sphere the other screens work against, and see the library's
 * liquids ranked by RED to it.
 */
public final class TargetView {

    private final TargetModel model;
    private final FitModel fitModel;
    private final BorderPane root = new BorderPane();
    private final VBox side = new VBox(12);
    private final TableView<TargetModel.Ranked> table = new TableView<>();
    private final Label formProblem = new Label();

    public TargetView(TargetModel model) {
        this.model = model;
        this.fitModel = new FitModel(model.session());
        root.setId("target-screen");
        GridPane form = new GridPane();
        form.setHgap(8);
        form.setVgap(6);
        TextField name = field("target-name", model.nameProperty(), 16);
        TextField dD = field("target-dd", model.dDProperty(), 6);
        TextField dP = field("target-dp", model.dPProperty(), 6);
        TextField dH = field("target-dh", model.dHProperty(), 6);
        TextField r0 = field("target-r0", model.r0Property(), 6);
        addRow(form, 0, "_Name", name);
        addRow(form, 1, "δ_D (MPa½)", dD);
        addRow(form, 2, "δ_P (MPa½)", dP);
        addRow(form, 3, "δ_H (MPa½)", dH);
        addRow(form, 4, "R_0 (MPa½)", r0);
        Button apply = new Button("_Set target");
        apply.setId("target-apply");
        apply.setDefaultButton(true);
        apply.setOnAction(e -> apply());
        formProblem.setId("target-problem");
        formProblem.getStyleClass().add("form-problems");
        formProblem.setWrapText(true);
        formProblem.setManaged(false);
        formProblem.setVisible(false);
        Button keep = new Button("_Keep as my material");
        keep.setId("target-keep");
        keep.setOnAction(e -> keepAsMaterial());
        VBox typed = new VBox(8, new Label("A sphere from a publication or your own fit:"), form, new HBox(8, apply, keep), formProblem);
        typed.setPadding(new Insets(8));
        VBox typedPane = typed;
        typedPane.setId("target-typed");

        Label current = new Label();
        current.setId("target-current");
        current.getStyleClass().add("headline");
        current.setWrapText(true);
        current.setMinHeight(Region.USE_PREF_SIZE);
        current.textProperty().bind(Bindings.createStringBinding(() -> (model.session().target() == null ? "○ " : "✓ ")
                + describe(model.session().target()), model.session().targetProperty()));
        javafx.scene.control.TabPane ways = new javafx.scene.control.TabPane(
                new javafx.scene.control.Tab("Material", materialPicker()),
                new javafx.scene.control.Tab("Fit your tests", fitPane()),
                new javafx.scene.control.Tab("From structure", new StructureTargetForm(model.session()).node()),
                new javafx.scene.control.Tab("Type in", typedPane));
        ways.setTabClosingPolicy(javafx.scene.control.TabPane.TabClosingPolicy.UNAVAILABLE);
        ways.setId("target-ways");
        ways.getStyleClass().add("material-ways"); // the way cards above choose the pane; the tab headers are hidden
        ways.getTabs().get(1).setId("target-fit-tab");
        ways.getTabs().get(2).setId("target-structure-tab");
        // the test table, the drawing and the estimate table need room: the side widens while their pane is open
        ways.getSelectionModel().selectedIndexProperty().addListener((o, a, i) -> side.setPrefWidth(switch (i.intValue()) {
            case 1 -> 500;
            case 2 -> 660;
            default -> 390;
        }));
        VBox.setVgrow(ways, Priority.ALWAYS);
        side.getChildren().addAll(ways);
        side.setPadding(new Insets(4, 10, 10, 10));
        side.setPrefWidth(390);
        side.setMinWidth(300);
        root.setTop(stepHead(current, ways));

        table.setId("target-ranking");
        SortedList<TargetModel.Ranked> sorted = new SortedList<>(model.ranked());
        sorted.comparatorProperty().bind(table.comparatorProperty());
        table.setItems(sorted);
        table.getColumns().addAll(List.of(
                Columns.text("Liquid", r -> r.solvent().name(), 240),
                Columns.number("δD", r -> r.solvent().hansen().dD(), 60, 1),
                Columns.number("δP", r -> r.solvent().hansen().dP(), 60, 1),
                Columns.number("δH", r -> r.solvent().hansen().dH(), 60, 1),
                Columns.number("Ra (MPa½)", TargetModel.Ranked::ra, 85, 2),
                Columns.number("RED", TargetModel.Ranked::red, 65, 2),
                Columns.text("Inside", r -> r.red() < 1 ? "yes" : "", 60),
                Columns.number("bp (°C)", r -> r.solvent().boilingPointC(), 70, 0),
                Columns.number("Flash pt (°C)", r -> r.solvent().flashPointC(), 108, 0),
                // "class 2", not a bare digit beside the right-aligned flash point ("86 2" read as one number)
                Columns.text("ICH Q3C", r -> r.solvent().ichClass() == null ? "not listed" : "class " + r.solvent().ichClass(), 80)));
        table.setPlaceholder(new Label("Set a target to rank the library's liquids by RED."));
        TableTools.equip(table, this::exportCsv);
        table.getSelectionModel().selectedItemProperty().addListener((o, a, r) -> {
            if (r != null) {
                model.session().selectedSolventProperty().set(r.solvent());
            }
        });
        Label tableTitle = new Label("Library liquids by RED to the target (RED < 1: predicted to dissolve it)");
        tableTitle.getStyleClass().add("section-title");
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        Button export = new Button("E_xport CSV…");
        export.setOnAction(e -> exportCsv());
        HBox tableBar = new HBox(8, tableTitle, grow, export);
        tableBar.setAlignment(Pos.CENTER_LEFT);
        tableBar.setPadding(new Insets(8, 10, 8, 10));
        BorderPane right = new BorderPane(table);
        right.setTop(tableBar);
        javafx.scene.control.TextArea report = new javafx.scene.control.TextArea();
        report.setId("fit-report");
        report.setEditable(false);
        report.setWrapText(true);
        report.getStyleClass().add("details");
        report.textProperty().bind(fitModel.reportProperty());
        report.visibleProperty().bind(fitModel.reportProperty().isNotEmpty());
        report.managedProperty().bind(report.visibleProperty());
        report.setPrefRowCount(12);
        report.setPrefColumnCount(46);
        right.setBottom(findings(report));
        root.setLeft(side);
        root.setCenter(right);
    }

    /** The four ways to the case's material, as cards that say what each takes. */
    static final String[][] WAYS = {
        {"Pick from the library", "a published sphere (polymers, resins, drugs, pigments) or one you kept"},
        {"Fit from your tests", "dissolves / does not, one row per liquid: the sphere that explains them"},
        {"Estimate from a structure", "a SMILES: the centre by group contribution, R0 a default until you test"},
        {"Type in a sphere", "δD, δP, δH and R0 from a paper or another fit"}};

    /** The step's head: what it answers, the material the case has (or that it has none), and the four ways to one. */
    private Node stepHead(Label current, javafx.scene.control.TabPane ways) {
        Label title = new Label("Material: what must dissolve");
        title.getStyleClass().add("step-head");
        javafx.scene.control.ToggleGroup group = new javafx.scene.control.ToggleGroup();
        HBox cards = new HBox(8);
        cards.setId("material-ways");
        for (int i = 0; i < WAYS.length; i++) {
            Label t = new Label((i + 1) + "  " + WAYS[i][0]);
            t.getStyleClass().add("step-title");
            Label d = new Label(WAYS[i][1]);
            d.getStyleClass().add("step-text");
            d.setWrapText(true);
            javafx.scene.control.ToggleButton b = new javafx.scene.control.ToggleButton();
            b.setGraphic(new VBox(2, t, d));
            b.setToggleGroup(group);
            b.setId("material-way-" + (i + 1));
            b.getStyleClass().add("way");
            b.setAlignment(Pos.TOP_LEFT);
            b.setMaxWidth(Double.MAX_VALUE);
            b.setPrefWidth(260);
            b.setMinWidth(150);
            b.setPrefHeight(66);
            b.setMinHeight(66);
            b.setWrapText(true);
            // the description wraps inside the card (two lines) rather than being cut
            d.prefWidthProperty().bind(b.widthProperty().subtract(20));
            d.setMinHeight(30);
            d.setMaxHeight(34);
            HBox.setHgrow(b, Priority.ALWAYS);
            int index = i;
            b.setOnAction(e -> {
                ways.getSelectionModel().select(index);
                b.setSelected(true); // a way stays chosen: clicking it again does not leave none
            });
            cards.getChildren().add(b);
        }
        Runnable mark = () -> ((javafx.scene.control.ToggleButton) cards.getChildren().get(ways.getSelectionModel().getSelectedIndex())).setSelected(true);
        ways.getSelectionModel().selectedIndexProperty().addListener((o, a, i) -> mark.run());
        mark.run();
        VBox head = new VBox(6, new HBox(14, title, current), cards);
        ((HBox) head.getChildren().get(0)).setAlignment(Pos.BASELINE_LEFT);
        head.setPadding(new Insets(10, 10, 6, 10));
        head.setId("material-head");
        return head;
    }

    /** One row of the fit's findings: a misfit or a suggested next test. */
    record Finding(String kind, String liquid, Double score, double red, String note) {
    }

    /**
     * The fit's findings as rows to act on, beside the summary: misfits (results on the wrong side of the surface) and
     * the next tests that would tighten the fit most; "Add to my tests" puts a next test's liquid into the test table.
     */
    private Node findings(javafx.scene.control.TextArea report) {
        javafx.scene.control.TableView<Finding> t = new javafx.scene.control.TableView<>();
        t.setId("fit-findings");
        t.getColumns().addAll(List.of(
                Columns.text("Finding", Finding::kind, 90),
                Columns.text("Liquid", Finding::liquid, 190),
                Columns.number("Score", Finding::score, 60, 2),
                Columns.number("RED", Finding::red, 60, 2),
                Columns.text("Why", Finding::note, 320)));
        t.setPlaceholder(new Label("After a fit: results on their unexpected side and the next tests to run, one row each."));
        t.setPrefHeight(200);
        TableTools.equip(t, () -> { });
        fitModel.resultProperty().addListener((o, a, r) -> {
            java.util.List<Finding> rows = new java.util.ArrayList<>();
            if (r != null) {
                if (r.region() != null) {
                    // the likelihood fit: every result on its unexpected side, least likely first, with its probability
                    for (var p : r.probabilities()) {
                        if (p.probability() >= 0.5) {
                            continue;
                        }
                        String why = p.nearSurface() ? "near the surface: cannot be told from noise, either way"
                                : p.score() >= org.cohesa.core.target.TestResult.GOOD_THRESHOLD ? "dissolved, but outside the sphere: retest, or check its parameters"
                                : "did not dissolve, but inside the sphere: retest, or check its parameters";
                        rows.add(new Finding(p.likelyMisfit() ? "likely misfit" : "wrong side", p.name(), p.score(), p.red(),
                                String.format(java.util.Locale.ROOT, "probability of this result %.2f; %s", p.probability(), why)));
                    }
                } else {
                    for (var m : r.quality().misfits()) {
                        rows.add(new Finding("misfit", m.name(), m.score(), m.red(), m.score() >= org.cohesa.core.target.TestResult.GOOD_THRESHOLD
                                ? "dissolved, but outside the sphere: retest, or check its parameters" : "did not dissolve, but inside the sphere: retest, or check its parameters"));
                    }
                }
                for (var n : r.nextTests()) {
                    rows.add(new Finding("next test", n.name(), null, n.red(), n.reason()));
                }
            }
            t.getItems().setAll(rows);
        });
        Button add = new Button("Add to my tests");
        add.setId("fit-add-test");
        add.disableProperty().bind(javafx.beans.binding.Bindings.createBooleanBinding(() -> t.getSelectionModel().getSelectedItem() == null
                || !"next test".equals(t.getSelectionModel().getSelectedItem().kind()), t.getSelectionModel().selectedItemProperty()));
        add.setOnAction(e -> {
            Finding f = t.getSelectionModel().getSelectedItem();
            String csv = fitModel.csvProperty().get() == null ? "" : fitModel.csvProperty().get();
            String name = f.liquid().contains(",") ? "\"" + f.liquid() + "\"" : f.liquid(); // RFC 4180: names with commas are quoted
            fitModel.csvProperty().set(csv + (csv.isEmpty() || csv.endsWith("\n") ? "" : "\n") + name + ",");
            model.session().jobs().say("Added " + f.liquid() + " to the test table: type its score after the comma, then fit again.");
        });
        Label title = new Label("Findings of the fit");
        title.getStyleClass().add("section-title");
        VBox table = new VBox(6, new HBox(10, title, add), t);
        VBox.setVgrow(t, Priority.ALWAYS);
        HBox box = new HBox(8, report, table);
        HBox.setHgrow(table, Priority.ALWAYS);
        box.setPadding(new Insets(6));
        box.visibleProperty().bind(fitModel.reportProperty().isNotEmpty());
        box.managedProperty().bind(box.visibleProperty());
        return box;
    }

    private Node materialPicker() {
        TextField find = new TextField();
        find.setId("material-filter");
        find.setPromptText("Filter materials by name or kind");
        javafx.collections.transformation.FilteredList<Material> filtered = new javafx.collections.transformation.FilteredList<>(
                model.session().materials(), m -> true);
        find.textProperty().addListener((o, a, t) -> filtered.setPredicate(m -> t == null || t.isBlank()
                || m.name().toLowerCase(java.util.Locale.ROOT).contains(t.strip().toLowerCase(java.util.Locale.ROOT))
                || m.kind().key().contains(t.strip().toLowerCase(java.util.Locale.ROOT))
                || m.synonyms().stream().anyMatch(x -> x.toLowerCase(java.util.Locale.ROOT).contains(t.strip().toLowerCase(java.util.Locale.ROOT)))));
        javafx.scene.control.ListView<Material> list = new javafx.scene.control.ListView<>(filtered.sorted(
                java.util.Comparator.comparing(m -> m.name().toLowerCase(java.util.Locale.ROOT))));
        list.setId("material-list");
        list.setPrefHeight(420);
        list.setCellFactory(v -> new javafx.scene.control.ListCell<>() {
            @Override
            protected void updateItem(Material m, boolean empty) {
                super.updateItem(m, empty);
                setText(empty || m == null ? null : m.name() + "  · " + m.kind().key());
            }
        });
        Button use = new Button("_Use as target");
        use.setId("material-use");
        use.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        use.setOnAction(e -> useMaterial(list.getSelectionModel().getSelectedItem()));
        list.setOnMouseClicked(e -> {
            if (e.getClickCount() == 2 && list.getSelectionModel().getSelectedItem() != null) {
                useMaterial(list.getSelectionModel().getSelectedItem());
            }
        });
        Label note = new Label("Published spheres; the source of each is shown with the target.");
        note.getStyleClass().add("hint");
        note.setWrapText(true);
        VBox box = new VBox(6, find, list, use, note);
        box.setPadding(new Insets(8));
        box.setId("target-materials");
        return box;
    }

    private Node fitPane() {
        javafx.scene.control.TextArea csv = new javafx.scene.control.TextArea();
        csv.setId("fit-csv");
        csv.textProperty().bindBidirectional(fitModel.csvProperty());
        csv.setPrefRowCount(10);
        csv.getStyleClass().add("details");
        TextField name = new TextField();
        name.setId("fit-name");
        name.textProperty().bindBidirectional(fitModel.nameProperty());
        Button load = new Button("_Load CSV…");
        load.setOnAction(e -> {
            Path f = Dialogs.openFile(root, "Load test results", "CSV files", "*.csv");
            if (f != null) {
                try {
                    fitModel.csvProperty().set(java.nio.file.Files.readString(f, java.nio.charset.StandardCharsets.UTF_8));
                } catch (java.io.IOException | RuntimeException ex) {
                    model.session().jobs().complain(ErrorText.of(ex));
                }
            }
        });
        Button fit = new Button("_Fit sphere");
        fit.setId("fit-run");
        fit.setOnAction(e -> fitModel.fit(null));
        Label help = new Label("One row per liquid tested: a library liquid (pick or type), a blend NAME:FRACTION;NAME:FRACTION, "
                + "or a label with its δD, δP, δH; score 1 dissolves, 0 does not, between for partly. Paste rows from a "
                + "spreadsheet with Ctrl+V.");
        help.setWrapText(true);
        help.getStyleClass().add("hint");
        Label nameLabel = new Label("Material name");
        Button save = new Button("_Save as my material");
        save.setId("fit-save");
        save.disableProperty().bind(fitModel.resultProperty().isNull());
        save.setOnAction(e -> fitModel.saveAsMaterial(null));
        Label ask = new Label();
        ask.setWrapText(true);
        ask.textProperty().bind(Bindings.createStringBinding(() -> fitModel.pendingProperty().get() == null ? ""
                : "Replace the current target " + (model.session().target() == null ? "" : "\u201c" + model.session().target().name() + "\u201d ")
                + "by the fitted sphere " + describe(fitModel.pendingProperty().get()) + "?", fitModel.pendingProperty(), model.session().targetProperty()));
        Button replace = new Button("_Replace the target");
        replace.setId("fit-replace-target");
        replace.setOnAction(e -> fitModel.acceptPending());
        Button keepTarget = new Button("K_eep the current target");
        keepTarget.setId("fit-keep-target");
        keepTarget.setOnAction(e -> fitModel.keepCurrent());
        VBox question = new VBox(6, ask, new HBox(8, replace, keepTarget));
        question.setId("fit-question");
        question.getStyleClass().add("question");
        question.visibleProperty().bind(fitModel.pendingProperty().isNotNull());
        question.managedProperty().bind(question.visibleProperty());
        javafx.collections.ObservableList<String> liquids = javafx.collections.FXCollections.observableArrayList();
        Runnable names = () -> liquids.setAll(model.session().solvents().stream().map(x -> x.name())
                .sorted(String.CASE_INSENSITIVE_ORDER).toList());
        model.session().solvents().addListener((javafx.collections.ListChangeListener<org.cohesa.core.solvent.Solvent>) c -> names.run());
        names.run();
        TestTable tests = new TestTable(fitModel.csvProperty(), liquids);
        testTable = tests;
        javafx.scene.control.ToggleButton asText = new javafx.scene.control.ToggleButton("As text (CSV)");
        asText.setId("fit-as-text");
        csv.visibleProperty().bind(asText.selectedProperty());
        csv.managedProperty().bind(csv.visibleProperty());
        VBox box = new VBox(6, help, tests.node(), asText, csv, new HBox(8, nameLabel, name), new HBox(8, load, fit, save), question);
        VBox.setVgrow(tests.node(), Priority.ALWAYS);
        box.setPadding(new Insets(8));
        return box;
    }

    private void useMaterial(Material m) {
        if (m != null) {
            model.useMaterial(m);
            model.session().jobs().say("Target set: " + describe(model.session().target()));
        }
    }

    public Node node() {
        return root;
    }

    /** Extra panes (material picker, fit) added by later features, above the typed-in sphere. */
    public void addSection(Node section) {
        side.getChildren().add(1, section);
    }

    private TestTable testTable;

    /** The fit's tests as a table (for tests). */
    public TestTable testTable() {
        return testTable;
    }

    public TableView<TargetModel.Ranked> table() {
        return table;
    }

    private void apply() {
        try {
            model.applyTypedSphere();
            formProblem.setVisible(false);
            formProblem.setManaged(false);
            model.session().jobs().say("Target set: " + describe(model.session().target()));
        } catch (RuntimeException ex) {
            formProblem.setText(ErrorText.of(ex));
            formProblem.setVisible(true);
            formProblem.setManaged(true);
        }
    }

    private void keepAsMaterial() {
        try {
            model.saveTypedSphereAsMaterial(null);
            formProblem.setVisible(false);
            formProblem.setManaged(false);
        } catch (RuntimeException ex) {
            formProblem.setText(ErrorText.of(ex));
            formProblem.setVisible(true);
            formProblem.setManaged(true);
        }
    }

    static String describe(TargetChoice t) {
        if (t == null) {
            return "No target yet: pick a material or type in a sphere.";
        }
        var c = t.sphere().centre();
        return t.name() + ": δD " + Numbers.one(c.dD()) + ", δP " + Numbers.one(c.dP()) + ", δH " + Numbers.one(c.dH())
                + ", R0 " + Numbers.one(t.sphere().r0()) + " MPa½" + (t.source().isBlank() ? "" : " (" + t.source() + ")");
    }

    private void exportCsv() {
        TableTools.exportWithDialog(root, table, "Export the ranking to CSV", "cohesa-ranking.csv", model.session().jobs());
    }

    private static TextField field(String id, javafx.beans.property.StringProperty p, int cols) {
        TextField tf = new TextField();
        tf.setId(id);
        tf.setPrefColumnCount(cols);
        tf.textProperty().bindBidirectional(p);
        return tf;
    }

    private static void addRow(GridPane g, int row, String label, TextField tf) {
        Label l = new Label(label);
        l.setMnemonicParsing(true);
        l.setLabelFor(tf);
        g.addRow(row, l, tf);
    }
}
