package org.cohesa.desktop.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import java.util.stream.Collectors;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SelectionMode;
import javafx.scene.control.Spinner;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.desktop.common.Columns;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.SafetyText;
import org.cohesa.desktop.common.Spinners;
import org.cohesa.desktop.common.TableTools;

/**
 * The blend-design screen: the constraints as a form, the ranked suggestions (parameters, RED, blend flash
 * point, ICH classes, a caution badge, the phase test), the selected blend's full safety profile, and up to
 * four blends compared side by side.
 */
public final class BlendView {

    private final BlendModel model;
    private final BorderPane root = new BorderPane();
    private final ListView<BlendModel.Row> table = new ListView<>();
    private final TextArea details = new TextArea();
    private final TableView<List<String>> comparison = new TableView<>();
    private final TabPane right = new TabPane();
    private final Consumer<Blend> showDrying;
    private final Node limits;
    private Runnable afterSearch;
    private final TradeOffChart tradeOffs;

    /** @param showDrying opens the drying screen for a blend */
    public BlendView(BlendModel model, Consumer<Blend> showDrying) {
        this.model = model;
        this.showDrying = showDrying;
        root.setId("blend-screen");
        limits = form();
        table.setId("blend-cards");
        table.getStyleClass().add("candidate-list");
        table.setItems(model.rows());
        table.setCellFactory(list -> new ListCell<>() {
            @Override
            protected void updateItem(BlendModel.Row r, boolean empty) {
                super.updateItem(r, empty);
                setText(null);
                setGraphic(empty || r == null ? null : CandidateCard.of(r, list.widthProperty()));
            }
        });
        Label placeholder = new Label();
        placeholder.setId("blend-placeholder");
        placeholder.setWrapText(true);
        placeholder.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() -> model.session().target() == null
                ? "Set a target, then Search: candidates appear here, best first."
                : "Press Search: candidates for " + model.session().target().name() + " appear here, best first.",
                model.session().targetProperty()));
        table.setPlaceholder(placeholder);
        table.getSelectionModel().setSelectionMode(SelectionMode.MULTIPLE);
        equipCopy();
        model.rows().addListener((javafx.collections.ListChangeListener<BlendModel.Row>) ch -> {
            if (!model.rows().isEmpty()) {
                table.getSelectionModel().clearAndSelect(0);
            }
        });
        table.getSelectionModel().selectedItemProperty().addListener((o, a, r) -> {
            details.setText(r == null ? "" : describe(r));
            if (r != null) {
                model.session().selectedBlendProperty().set(r.blend());
            }
        });
        details.setId("blend-details");
        details.setEditable(false);
        details.setWrapText(true);
        details.getStyleClass().add("details");
        Button drying = new Button("_Drying path");
        drying.setId("blend-drying");
        drying.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        drying.setOnAction(e -> showDrying.accept(table.getSelectionModel().getSelectedItem().blend()));
        Button compare = new Button("C_ompare (up to 4)");
        compare.setId("blend-compare");
        compare.setOnAction(e -> compareSelected());
        VBox profile = new VBox(6, new HBox(8, drying, compare), details);
        profile.setPadding(new Insets(6));
        javafx.scene.layout.VBox.setVgrow(details, javafx.scene.layout.Priority.ALWAYS);
        comparison.setId("blend-comparison");
        comparison.setPlaceholder(new Label("Select up to four suggestions (Ctrl+click) and press Compare."));
        TableTools.equip(comparison, () -> { });
        tradeOffs = new TradeOffChart(model.rows(), table.getSelectionModel().selectedItemProperty(), r -> {
            table.getSelectionModel().clearAndSelect(model.rows().indexOf(r));
            table.scrollTo(r);
        });
        Tab tradeTab = new Tab("Trade-offs", tradeOffs.node());
        tradeTab.setId("blend-tradeoff-tab");
        right.getTabs().addAll(new Tab("Safety profile", profile), tradeTab, new Tab("Side by side", comparison));
        right.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        right.getTabs().get(2).setId("blend-compare-tab");
        Label note = new Label();
        note.setId("blend-search-note");
        note.setWrapText(true);
        note.getStyleClass().add("hint");
        note.textProperty().bind(model.searchNoteProperty());
        note.visibleProperty().bind(model.searchNoteProperty().isNotEmpty());
        note.managedProperty().bind(note.visibleProperty());
        Label defaults = new Label();
        defaults.setId("blend-left-out");
        defaults.setWrapText(true);
        defaults.getStyleClass().add("left-out");
        Runnable showDefaults = () -> defaults.setText(model.leftOutBySafety().isEmpty() ? ""
                : "Left out by the defaults:\n" + model.leftOutBySafety().stream().map(x -> "• " + x).collect(Collectors.joining("\n")));
        model.leftOutBySafety().addListener((javafx.collections.ListChangeListener<String>) ch -> showDefaults.run());
        defaults.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        Runnable tip = () -> defaults.setTooltip(model.leftOutBySafety().isEmpty() ? null : new javafx.scene.control.Tooltip(defaults.getText()));
        model.leftOutBySafety().addListener((javafx.collections.ListChangeListener<String>) ch -> tip.run());
        defaults.visibleProperty().bind(javafx.beans.binding.Bindings.isNotEmpty(model.leftOutBySafety()));
        defaults.managedProperty().bind(defaults.visibleProperty());
        // at most about five lines high, so the cards keep the room; every line stays in reach by scrolling (and in the tooltip)
        ScrollPane defaultsBox = new ScrollPane(defaults);
        defaultsBox.setId("blend-left-out-box");
        defaultsBox.setFitToWidth(true);
        defaultsBox.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        defaultsBox.setMaxHeight(92);
        // never squeezed below its text (or the five lines) by the cards below it
        defaultsBox.minHeightProperty().bind(javafx.beans.binding.Bindings.createDoubleBinding(() -> Math.min(92, defaults.getHeight() + 2),
                defaults.heightProperty()));
        defaultsBox.getStyleClass().add("left-out-box");
        defaultsBox.visibleProperty().bind(defaults.visibleProperty());
        defaultsBox.managedProperty().bind(defaults.visibleProperty());
        Button choose = new Button("C_hoose for checks");
        choose.setId("blend-choose");
        choose.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        choose.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        choose.setOnAction(e -> {
            if (onChoose != null) {
                onChoose.accept(List.copyOf(table.getSelectionModel().getSelectedItems()));
            }
        });
        Label chooseHint = new Label("Select one or more cards (Ctrl+click) and take them to the checks.");
        chooseHint.getStyleClass().add("hint");
        chooseHint.setWrapText(true);
        HBox chooseBar = new HBox(10, choose, chooseHint);
        chooseBar.setAlignment(Pos.CENTER_LEFT);
        VBox cardsBox = new VBox(6, chooseBar, note, defaultsBox, table);
        cardsBox.setPadding(new Insets(6, 0, 0, 6));
        javafx.scene.layout.VBox.setVgrow(table, javafx.scene.layout.Priority.ALWAYS);
        SplitPane split = new SplitPane(cardsBox, right);
        split.setDividerPositions(0.66);
        // the chart needs room: while its tab is in front the panel takes more of the width, and gives it back after
        double[] cardsShare = {0.66};
        right.getSelectionModel().selectedItemProperty().addListener((o, was, now) -> {
            if (now == tradeTab) {
                cardsShare[0] = split.getDividers().get(0).getPosition();
                split.setDividerPositions(Math.min(cardsShare[0], 0.52));
            } else if (was == tradeTab) {
                split.setDividerPositions(cardsShare[0]);
            }
        });
        root.setCenter(split);
    }

    /** The candidates: the cards with the panels beside them (the Candidates step of a case). */
    public Node node() {
        return root;
    }

    /** The limits form with its Search button (the Limits step of a case). */
    public Node limitsNode() {
        return limits;
    }

    /** What runs once a search started from the form has its candidates (the case moves on to them). */
    public void onSearched(Runnable action) {
        this.afterSearch = action;
    }

    /** The trade-off chart of the candidates (RED, hazard, cost). */
    public TradeOffChart tradeOffs() {
        return tradeOffs;
    }

    /** Brings the trade-off chart to the front of the right-hand panel. */
    public void showTradeOffs() {
        right.getTabs().stream().filter(t -> "blend-tradeoff-tab".equals(t.getId())).findFirst().ifPresent(t -> right.getSelectionModel().select(t));
    }

    private Consumer<List<BlendModel.Row>> onChoose;

    /** What "Choose for checks" does with the selected candidates (the case takes them). */
    public void onChoose(Consumer<List<BlendModel.Row>> action) {
        this.onChoose = action;
    }

    /** Adds a tab to the right-hand panel, first (the parameter panel of the case). */
    public void addPanel(String title, Node content, String id) {
        Tab t = new Tab(title, content);
        t.setId(id);
        right.getTabs().add(0, t);
        right.getSelectionModel().select(0);
    }

    private Node form() {
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        // the labels keep their words whole; the fields take what is left
        javafx.scene.layout.ColumnConstraints labels = new javafx.scene.layout.ColumnConstraints();
        labels.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        javafx.scene.layout.ColumnConstraints fields = new javafx.scene.layout.ColumnConstraints();
        fields.setHgrow(javafx.scene.layout.Priority.ALWAYS);
        fields.setMinWidth(90);
        g.getColumnConstraints().addAll(labels, fields);
        int row = 0;
        Spinner<Integer> k = Spinners.integer(1, 4, model.maxComponents);
        k.setId("blend-max-components");
        Spinner<Integer> top = Spinners.integer(1, 100, model.top);
        top.setId("blend-top");
        ComboBox<RankBy> rank = new ComboBox<>();
        rank.setId("blend-rank-by");
        rank.getItems().setAll(RankBy.DESIRABILITY, RankBy.HAZARD, RankBy.COMPONENTS, RankBy.COST, RankBy.RED, RankBy.EVAPORATION);
        rank.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(RankBy r) {
                return rankWord(r);
            }

            @Override
            public RankBy fromString(String s) {
                return java.util.Arrays.stream(RankBy.values()).filter(r -> rankWord(r).equals(s)).findFirst().orElse(RankBy.HAZARD);
            }
        });
        rank.valueProperty().bindBidirectional(model.rankBy);
        rank.setMaxWidth(Double.MAX_VALUE);
        ComboBox<String> ich = new ComboBox<>();
        ich.getItems().setAll("any", "2 or 3 (no class 1)", "3 only");
        ich.valueProperty().bindBidirectional(model.maxIchClass);
        CheckBox cmr = new CheckBox("No CMR (carcinogens, mutagens, reprotoxics)");
        cmr.selectedProperty().bindBidirectional(model.noCmr);
        g.addRow(row++, new Label("Most components"), k);
        g.addRow(row++, new Label("Candidates listed"), top);
        g.addRow(row++, new Label("Rank by"), rank);
        ComboBox<org.cohesa.core.blend.ProcessUse> process = new ComboBox<>();
        process.setId("blend-process");
        process.getItems().setAll(org.cohesa.core.blend.ProcessUse.values());
        process.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(org.cohesa.core.blend.ProcessUse u) {
                return u == null ? "" : u == org.cohesa.core.blend.ProcessUse.AS_ORIGINAL ? "as the replaced liquid (its evaporation rate ÷× 3)"
                        : u.word() + " — " + u.meaning();
            }

            @Override
            public org.cohesa.core.blend.ProcessUse fromString(String s) {
                return org.cohesa.core.blend.ProcessUse.GENERAL;
            }
        });
        process.valueProperty().bindBidirectional(model.process);
        process.setMaxWidth(Double.MAX_VALUE);
        process.setTooltip(new javafx.scene.control.Tooltip("How the liquid leaves the process: candidates outside that use's"
                + " evaporation or boiling window lose points (docs/methods.md, process term)"));
        g.addRow(row++, new Label("Leaves the process by"), process);
        g.addRow(row++, new Label("Include only (a;b)"), field(model.include, "blend-include"));
        g.addRow(row++, new Label("Exclude (a;b)"), field(model.exclude, "blend-exclude"));
        g.addRow(row++, new Label("Families only (a;b)"), field(model.families, "blend-families"));
        g.addRow(row++, new Label("Exclude families (a;b)"), field(model.excludeFamilies, "blend-exclude-families"));
        g.addRow(row++, new Label("Fixed (NAME:FRACTION)"), field(model.fixed, "blend-fixed"));
        g.addRow(row++, new Label("Minimum fraction (%)"), field(model.minFractionPercent, "blend-min-fraction"));
        g.addRow(row++, new Label("Boiling point min. (°C)"), field(model.boilingMin, "blend-bp-min"));
        g.addRow(row++, new Label("Boiling point max. (°C)"), field(model.boilingMax, "blend-bp-max"));
        g.addRow(row++, new Label("Minimum flash point (°C)"), field(model.minFlashPoint, "blend-min-flash"));
        g.addRow(row++, new Label("Minimum blend flash point (°C)"), field(model.minBlendFlash, "blend-min-blend-flash"));
        g.addRow(row++, new Label("ICH Q3C classes"), ich);
        CheckBox ich1 = new CheckBox("Allow ICH class 1 (to be avoided)");
        ich1.setId("blend-allow-ich1");
        ich1.selectedProperty().bindBidirectional(model.allowIchClass1);
        g.add(ich1, 0, row++, 2, 1);
        cmr.setId("blend-no-cmr");
        g.add(cmr, 0, row++, 2, 1);
        ComboBox<String> water = new ComboBox<>();
        water.setId("blend-with-water");
        water.getItems().setAll(BlendModel.WATER_ANY, BlendModel.WATER_SEPARATES, BlendModel.WATER_MIXES, BlendModel.WATER_NOT_EVEN_AS_REPLACED);
        water.valueProperty().bindBidirectional(model.withWater);
        g.addRow(row++, new Label("With water"), water);
        Label reactiveTitle = new Label("Leave out reactive solvents");
        g.add(reactiveTitle, 0, row++, 2, 1);
        javafx.scene.layout.FlowPane reactive = new javafx.scene.layout.FlowPane(10, 4);
        reactive.setPrefWrapLength(330);
        for (var e : model.excludeReactive.entrySet()) {
            CheckBox box = new CheckBox(e.getKey().label());
            box.setId("blend-reactive-" + e.getKey().word());
            box.selectedProperty().bindBidirectional(e.getValue());
            reactive.getChildren().add(box);
        }
        g.add(reactive, 0, row++, 2, 1);
        // a replacement case's own rule (as `cohesa replace`): shown only in such a case, greyed where it does not apply
        CheckBox asReplaced = new CheckBox(BlendModel.REACTIVE_AS_REPLACED);
        asReplaced.setId("blend-reactive-as-replaced");
        asReplaced.setWrapText(true);
        asReplaced.selectedProperty().bindBidirectional(model.reactiveAsReplaced);
        Label asReplacedNow = new Label();
        asReplacedNow.setId("blend-reactive-rule");
        asReplacedNow.setWrapText(true);
        asReplacedNow.getStyleClass().add("hint");
        asReplacedNow.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        List<javafx.beans.Observable> ruleInputs = new ArrayList<>(List.of(model.session().replacingProperty(), model.process,
                model.reactiveAsReplaced, model.session().solvents()));
        ruleInputs.addAll(model.excludeReactive.values());
        asReplacedNow.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(model::reactiveRuleText,
                ruleInputs.toArray(javafx.beans.Observable[]::new)));
        asReplaced.disableProperty().bind(javafx.beans.binding.Bindings.createBooleanBinding(() -> model.process.get()
                != org.cohesa.core.blend.ProcessUse.AS_ORIGINAL || model.excludeReactive.values().stream().anyMatch(p -> p.get()),
                ruleInputs.toArray(javafx.beans.Observable[]::new)));
        for (Node n : List.of(asReplaced, asReplacedNow)) {
            n.visibleProperty().bind(asReplacedNow.textProperty().isNotEmpty());
            n.managedProperty().bind(n.visibleProperty());
        }
        g.add(asReplaced, 0, row++, 2, 1);
        g.add(asReplacedNow, 0, row++, 2, 1);
        // a replacement case's reasons (as `cohesa replace --because`): shown only in such a case
        Label becauseTitle = new Label("Replaced because (none ticked: its own health statements)");
        becauseTitle.setWrapText(true);
        javafx.scene.layout.FlowPane because = new javafx.scene.layout.FlowPane(10, 4);
        because.setId("blend-because");
        because.setPrefWrapLength(330);
        for (var e : model.replacedBecause.entrySet()) {
            CheckBox box = new CheckBox(BlendModel.REASON_LABELS.get(e.getKey()));
            box.setId("blend-because-" + e.getKey());
            box.selectedProperty().bindBidirectional(e.getValue());
            because.getChildren().add(box);
        }
        Label becauseNow = new Label();
        becauseNow.setId("blend-because-rule");
        becauseNow.setWrapText(true);
        becauseNow.getStyleClass().add("hint");
        becauseNow.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        List<javafx.beans.Observable> becauseInputs = new ArrayList<>(List.of(model.session().replacingProperty(), model.session().solvents()));
        becauseInputs.addAll(model.replacedBecause.values());
        becauseNow.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(model::reasonsRuleText,
                becauseInputs.toArray(javafx.beans.Observable[]::new)));
        for (Node n : List.of(becauseTitle, because, becauseNow)) {
            n.visibleProperty().bind(becauseNow.textProperty().isNotEmpty());
            n.managedProperty().bind(n.visibleProperty());
        }
        g.add(becauseTitle, 0, row++, 2, 1);
        g.add(because, 0, row++, 2, 1);
        g.add(becauseNow, 0, row++, 2, 1);
        CheckBox salt = new CheckBox("Allow salt formers (amines with an acidic material, acids with a basic one)");
        salt.setId("blend-allow-salt-formers");
        salt.setWrapText(true);
        salt.selectedProperty().bindBidirectional(model.allowSaltFormers);
        g.add(salt, 0, row++, 2, 1);
        Label character = new Label();
        character.setId("blend-solute-character");
        character.setWrapText(true);
        character.getStyleClass().add("hint");
        character.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(this::characterText,
                model.session().targetProperty(), model.session().materials()));
        g.add(character, 0, row++, 2, 1);
        g.addRow(row++, new Label("Maximum cost per litre"), field(model.maxCost, "blend-max-cost"));
        g.addRow(row++, new Label("RED limit"), field(model.redLimit, "blend-red-limit"));
        g.addRow(row++, new Label("Temperature (°C)"), field(model.temperatureC, "blend-temperature"));
        Button search = new Button("_Search blends");
        search.setId("blend-search");
        search.setDefaultButton(true);
        search.setOnAction(e -> {
            Spinners.commit(k);
            Spinners.commit(top);
            try {
                model.search(afterSearch);
            } catch (RuntimeException ex) {
                model.session().jobs().complain(ErrorText.of(ex));
            }
        });
        Label hint = new Label("Searches every 1- to 4-component subset of the library exactly; the status bar shows "
                + "progress and a Cancel button. Two-phase blends are left out.");
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        Label target = new Label();
        target.getStyleClass().add("headline");
        target.setWrapText(true);
        target.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() -> model.session().target() == null
                ? "No material yet: pick one on the Material step." : "For: " + model.session().target().name(), model.session().targetProperty()));
        VBox box = new VBox(10, target, g, search, hint);
        box.setPadding(new Insets(10));
        box.setPrefWidth(360);
        ScrollPane sp = new ScrollPane(box);
        sp.setFitToWidth(true);
        sp.setMinWidth(370);
        return sp;
    }

    /** What the target's structure says about salt formation, beside the switch. */
    private String characterText() {
        if (model.session().target() == null) {
            return "";
        }
        var character = model.soluteCharacter();
        if (!character.isEmpty()) {
            return model.session().target().name() + " is " + character.stream().map(c -> c.word() + " (" + c.why() + ")")
                    .collect(Collectors.joining(" and ")) + " by its structure.";
        }
        return model.targetHasStructure() ? "By its structure " + model.session().target().name() + " is neither acidic nor basic."
                : "No structure is known for this target, so salt formers cannot be recognised.";
    }

    private static TextField field(javafx.beans.property.StringProperty p, String id) {
        TextField tf = new TextField();
        tf.setId(id);
        tf.setPrefColumnCount(8);
        tf.textProperty().bindBidirectional(p);
        return tf;
    }

    /** The trade's words for the ranking keys after solvency. */
    public static String rankWord(RankBy r) {
        return r == null ? "" : switch (r) {
            case DESIRABILITY -> "overall (safety first)";
            case HAZARD -> "safety";
            case COMPONENTS -> "simplicity";
            case COST -> "cost";
            case RED -> "closeness";
            case EVAPORATION -> "evaporation rate";
        };
    }

    /** Ctrl+C and the context menu copy the selected candidates as tab-separated rows (they paste into a spreadsheet as cells). */
    private void equipCopy() {
        javafx.scene.control.MenuItem copy = new javafx.scene.control.MenuItem("Copy");
        copy.setOnAction(e -> copySelected());
        table.setContextMenu(new javafx.scene.control.ContextMenu(copy));
        table.setOnKeyPressed(e -> {
            if (e.isShortcutDown() && e.getCode() == javafx.scene.input.KeyCode.C) {
                copySelected();
            }
        });
    }

    private void copySelected() {
        StringBuilder b = new StringBuilder("rank\tblend (volume %)\tδD\tδP\tδH\tRED\tflash point and GHS\tICH Q3C\tcost\n");
        for (BlendModel.Row r : table.getSelectionModel().getSelectedItems()) {
            var p = r.suggestion().blend().point();
            b.append(r.rank()).append('\t').append(percentText(r.blend())).append('\t').append(Numbers.one(p.dD())).append('\t')
                    .append(Numbers.one(p.dP())).append('\t').append(Numbers.one(p.dH())).append('\t').append(Numbers.two(r.suggestion().blend().red()))
                    .append('\t').append(CandidateFacts.flash(r.safety(), r.blend())).append('\t').append(CandidateFacts.worstIch(r.blend()))
                    .append('\t').append(CandidateFacts.cost(r.blend())).append('\n');
        }
        javafx.scene.input.ClipboardContent c = new javafx.scene.input.ClipboardContent();
        c.putString(b.toString());
        javafx.scene.input.Clipboard.getSystemClipboard().setContent(c);
    }

    static String percentText(Blend b) {
        return b.components().stream().map(c -> c.solvent().name() + " " + Math.round(c.fraction() * 100) + " %")
                .collect(Collectors.joining(" + "));
    }

    static String ichText(Blend b) {
        return b.components().stream().map(c -> c.solvent().ichClass() == null ? "–" : String.valueOf(c.solvent().ichClass()))
                .collect(Collectors.joining(" "));
    }

    static String phaseText(BlendModel.Row r) {
        var v = r.suggestion().phase();
        if (v == null || !v.checked()) {
            return r.blend().size() == 1 ? "single liquid" : "not checked";
        }
        return (v.splits() ? "SPLITS" : "one phase") + (v.basis() == null ? "" : " (" + v.basis().replace("measured with water, model elsewhere", "measured + model") + ")");
    }

    static String describe(BlendModel.Row r) {
        StringBuilder b = new StringBuilder();
        var rb = r.suggestion().blend();
        b.append("#").append(r.rank()).append("  ").append(percentText(r.blend())).append('\n');
        b.append(String.format(Locale.ROOT, "δD %.1f  δP %.1f  δH %.1f MPa½  ·  Ra %.2f  ·  RED %.2f%n", rb.point().dD(), rb.point().dP(),
                rb.point().dH(), rb.ra(), rb.red()));
        var v = r.suggestion().phase();
        if (v != null && v.detail() != null) {
            b.append("Phases: ").append(v.detail()).append(v.model() == null ? "" : " (" + v.model() + (v.basis() == null ? "" : "; judged by: " + v.basis()) + ")").append('\n');
        }
        for (String w : r.suggestion().warnings()) {
            b.append("Warning: ").append(w).append('\n');
        }
        b.append('\n');
        if (r.safety() != null) {
            b.append(SafetyText.describe(r.safety()));
        } else {
            b.append("No safety profile: ").append(r.safetyProblem()).append('\n');
            r.suggestion().cautions().forEach(c -> b.append("• ").append(c).append('\n'));
        }
        return b.toString();
    }

    private void compareSelected() {
        List<BlendModel.Row> sel = new ArrayList<>(table.getSelectionModel().getSelectedItems());
        if (sel.isEmpty()) {
            model.session().jobs().complain("Select one to four suggestions first (Ctrl+click).");
            return;
        }
        if (sel.size() > 4) {
            model.session().jobs().complain("Compare up to four blends at a time; the first four selected are shown.");
            sel = sel.subList(0, 4);
        }
        model.compared().setAll(sel);
        comparison.getColumns().clear();
        TableColumn<List<String>, String> what = new TableColumn<>("");
        what.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(cd.getValue().get(0)));
        what.setPrefWidth(150);
        comparison.getColumns().add(what);
        for (int i = 0; i < sel.size(); i++) {
            int col = i + 1;
            TableColumn<List<String>, String> c = new TableColumn<>("#" + sel.get(i).rank());
            c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(cd.getValue().get(col)));
            c.setPrefWidth(190);
            comparison.getColumns().add(c);
        }
        List<List<String>> rows = new ArrayList<>();
        rows.add(row("Blend", sel, r -> percentText(r.blend())));
        rows.add(row("δD, δP, δH", sel, r -> String.format(Locale.ROOT, "%.1f, %.1f, %.1f", r.suggestion().blend().point().dD(),
                r.suggestion().blend().point().dP(), r.suggestion().blend().point().dH())));
        rows.add(row("RED", sel, r -> Numbers.two(r.suggestion().blend().red())));
        rows.add(row("Flash point (°C)", sel, r -> r.safety() == null ? "" : Numbers.plain(r.safety().flashPoint().celsius())));
        rows.add(row("GHS category", sel, r -> r.safety() == null || r.safety().ghs().category() == null ? "–" : String.valueOf(r.safety().ghs().category())));
        rows.add(row("ICH classes", sel, r -> ichText(r.blend())));
        rows.add(row("Guide rank", sel, r -> r.safety() == null || r.safety().guideRank() == null ? "" : r.safety().guideRank().label()));
        rows.add(row("Exposure index", sel, r -> r.safety() == null ? "" : String.format(Locale.ROOT, "%.3g", r.safety().exposure().index())));
        rows.add(row("H-statements", sel, r -> r.blend().components().stream().flatMap((BlendComponent c) -> c.solvent().hazardStatements().stream())
                .distinct().sorted().collect(Collectors.joining(" "))));
        rows.add(row("Cautions", sel, r -> r.safety() == null ? "" : String.valueOf(SafetyText.cautions(r.safety()).size() - 1)));
        rows.add(row("Phases", sel, BlendView::phaseText));
        comparison.getItems().setAll(rows);
        right.getTabs().stream().filter(t -> "blend-compare-tab".equals(t.getId())).findFirst().ifPresent(t -> right.getSelectionModel().select(t));
    }

    private static List<String> row(String label, List<BlendModel.Row> sel, java.util.function.Function<BlendModel.Row, String> f) {
        List<String> r = new ArrayList<>();
        r.add(label);
        sel.forEach(x -> r.add(f.apply(x)));
        return r;
    }
}
