package org.cohesa.desktop.drying;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.PathPoint;
import org.cohesa.desktop.Snapshots;
import org.cohesa.desktop.common.Dialogs;
import org.cohesa.desktop.common.ErrorText;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.SafetyText;

/**
 * The drying screen: RED to the target and the blend's composition against the fraction evaporated, the
 * point where the blend leaves the sphere marked, and beside them the path's summary and the blend's safety
 * profile with its cautions.
 */
public final class DryingView {

    private final DryingModel model;
    private final BorderPane root = new BorderPane();
    private final LineChart<Number, Number> redChart;
    private final LineChart<Number, Number> compositionChart;
    private final TextArea summary = new TextArea();
    private final Label problem = new Label();

    public DryingView(DryingModel model) {
        this.model = model;
        root.setId("drying-screen");
        TextField blend = new TextField();
        blend.setId("drying-blend");
        blend.setPromptText("e.g. acetone:0.3,n-butyl acetate:0.4,toluene:0.3");
        blend.textProperty().bindBidirectional(model.blendTextProperty());
        HBox.setHgrow(blend, Priority.ALWAYS);
        Label blendLabel = new Label("_Blend");
        blendLabel.setMnemonicParsing(true);
        blendLabel.setLabelFor(blend);
        TextField temp = new TextField();
        temp.setId("drying-temperature");
        temp.setPrefColumnCount(4);
        temp.textProperty().bindBidirectional(model.temperatureProperty());
        Label tempLabel = new Label("_Temperature (°C)");
        tempLabel.setMnemonicParsing(true);
        tempLabel.setLabelFor(temp);
        CheckBox ideal = new CheckBox("_Ideal solution (for comparison)");
        ideal.selectedProperty().bindBidirectional(model.idealProperty());
        Button run = new Button("_Compute path");
        run.setId("drying-run");
        run.setDefaultButton(true);
        run.setOnAction(e -> run());
        Button png = new Button("Save charts as _PNG…");
        png.setOnAction(e -> savePng());
        HBox bar = new HBox(8, blendLabel, blend, tempLabel, temp, ideal, run, png);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(8, 10, 8, 10));
        bar.getStyleClass().add("toolbar-strip");

        redChart = chart("RED to the target", "drying-red-chart");
        compositionChart = chart("Volume fraction left", "drying-composition-chart");
        ((NumberAxis) compositionChart.getYAxis()).setAutoRanging(false);
        ((NumberAxis) compositionChart.getYAxis()).setUpperBound(1);
        ((NumberAxis) compositionChart.getYAxis()).setTickUnit(0.2);
        SplitPane charts = new SplitPane(redChart, compositionChart);
        charts.setOrientation(Orientation.VERTICAL);
        summary.setId("drying-summary");
        summary.setEditable(false);
        summary.setWrapText(true);
        summary.getStyleClass().add("details");
        summary.setPromptText("Type a blend (or pick one on the blend screen) and compute its path.");
        SplitPane split = new SplitPane(charts, summary);
        split.setDividerPositions(0.62);
        root.setCenter(split);
        model.resultProperty().addListener((o, a, r) -> show(r));
        problem.setId("drying-problem");
        problem.getStyleClass().add("problem-box");
        problem.setWrapText(true);
        problem.setMaxWidth(Double.MAX_VALUE);
        problem.setPadding(new Insets(8, 10, 8, 10));
        problem.textProperty().bind(model.problemProperty());
        problem.visibleProperty().bind(model.problemProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());
        model.problemProperty().addListener((o, a, p) -> {
            if (p != null && !p.isEmpty()) {
                show(null);
                summary.setText(p + (p.contains("vapour") ? "\n\nWhat helps: pick a blend whose components all have vapour-pressure "
                        + "data in the library (the library lists the source of each), or add the missing data as your own entry." : ""));
            }
        });
        root.setTop(new javafx.scene.layout.VBox(bar, problem));
    }

    public Node node() {
        return root;
    }

    private void run() {
        try {
            model.run(null);
        } catch (RuntimeException ex) {
            model.session().jobs().complain(ErrorText.of(ex));
        }
    }

    private static LineChart<Number, Number> chart(String yTitle, String id) {
        NumberAxis x = new NumberAxis(0, 100, 10);
        x.setLabel("Fraction of the initial volume evaporated (%)");
        NumberAxis y = new NumberAxis();
        y.setLabel(yTitle);
        y.setForceZeroInRange(true);
        LineChart<Number, Number> c = new LineChart<>(x, y);
        c.setId(id);
        c.setAnimated(false);
        c.setCreateSymbols(true);
        c.setMinHeight(200);
        return c;
    }

    private void show(DryingModel.Result r) {
        redChart.getData().clear();
        compositionChart.getData().clear();
        if (r == null) {
            // back to the empty frame: no axis left over from the last path
            NumberAxis y = (NumberAxis) redChart.getYAxis();
            y.setAutoRanging(false);
            y.setLowerBound(0);
            y.setUpperBound(1.5);
            y.setTickUnit(0.25);
            summary.clear();
            return;
        }
        ((NumberAxis) redChart.getYAxis()).setAutoRanging(true);
        DryingPath path = r.path();
        boolean hasRed = path.points().stream().anyMatch(p -> p.red() != null);
        if (hasRed) {
            XYChart.Series<Number, Number> red = new XYChart.Series<>();
            red.setName("RED of the liquid left");
            for (PathPoint p : path.points()) {
                if (p.red() != null) {
                    red.getData().add(new XYChart.Data<>(p.evaporated() * 100, p.red()));
                }
            }
            XYChart.Series<Number, Number> edge = new XYChart.Series<>();
            edge.setName("sphere surface (RED = 1)");
            edge.getData().add(new XYChart.Data<>(0, 1));
            edge.getData().add(new XYChart.Data<>(100, 1));
            redChart.getData().add(red);
            redChart.getData().add(edge);
            if (path.leavesSphereAt() != null) {
                XYChart.Series<Number, Number> exit = new XYChart.Series<>();
                exit.setName("leaves the sphere at " + Numbers.percent(path.leavesSphereAt()) + " evaporated");
                exit.getData().add(new XYChart.Data<>(path.leavesSphereAt() * 100, 1));
                redChart.getData().add(exit);
            }
            hideSymbols(red);
            hideSymbols(edge);
        }
        Map<String, XYChart.Series<Number, Number>> bySolvent = new LinkedHashMap<>();
        for (PathPoint p : path.points()) {
            for (Map.Entry<String, Double> e : p.composition().entrySet()) {
                bySolvent.computeIfAbsent(e.getKey(), k -> {
                    XYChart.Series<Number, Number> s = new XYChart.Series<>();
                    s.setName(k);
                    return s;
                }).getData().add(new XYChart.Data<>(p.evaporated() * 100, e.getValue()));
            }
        }
        compositionChart.getData().addAll(new ArrayList<>(bySolvent.values()));
        bySolvent.values().forEach(DryingView::hideSymbols);
        summary.setText(describe(r));
    }

    private static void hideSymbols(XYChart.Series<Number, Number> s) {
        for (XYChart.Data<Number, Number> d : s.getData()) {
            if (d.getNode() != null) {
                d.getNode().setVisible(false);
            }
        }
    }

    static String describe(DryingModel.Result r) {
        DryingPath path = r.path();
        StringBuilder b = new StringBuilder("Drying path\n");
        if (path.points().stream().noneMatch(p -> p.red() != null)) {
            b.append("No target set: the path is computed, RED is not (set one on the target screen).\n");
        } else if (path.leavesSphereAt() == null) {
            b.append("Stays inside the sphere up to ").append(Numbers.percent(path.end().evaporated())).append(" evaporated.\n");
        } else if (path.leavesSphereAt() == 0) {
            b.append("Starts outside the sphere (RED ").append(Numbers.two(path.points().get(0).red())).append(").\n");
        } else {
            b.append("Leaves the sphere at ").append(Numbers.percent(path.leavesSphereAt())).append(" evaporated: the material may "
                    + "come out of solution before the film sets.\n");
        }
        b.append("Last solvent left: ").append(path.lastSolvent()).append('\n');
        for (DryingPath.Exhaustion e : path.exhausted()) {
            b.append(e.solvent()).append(" is gone at ").append(Numbers.percent(e.evaporated())).append(" evaporated\n");
        }
        b.append("Activity model: ").append(path.model()).append(path.modelNote() == null || path.modelNote().isBlank() ? "" : " (" + path.modelNote() + ")").append('\n');
        for (String n : path.notes()) {
            b.append("Note: ").append(n).append('\n');
        }
        PathPoint end = path.end();
        b.append(String.format(Locale.ROOT, "End point: δD %.1f, δP %.1f, δH %.1f MPa½%s%n", end.hansen().dD(), end.hansen().dP(),
                end.hansen().dH(), end.red() == null ? "" : ", RED " + Numbers.two(end.red())));
        b.append("\nSafety profile\n").append(SafetyText.describe(r.safety()));
        return b.toString();
    }

    private void savePng() {
        java.nio.file.Path file = Dialogs.saveFile(root, "Save the drying charts as PNG", "cohesa-drying.png", "PNG image", "*.png");
        if (file == null) {
            return;
        }
        try {
            Snapshots.savePng(((SplitPane) ((SplitPane) root.getCenter()).getItems().get(0)).snapshot(null, null), file);
            model.session().jobs().say("Saved " + file);
        } catch (RuntimeException ex) {
            model.session().jobs().complain(ErrorText.of(ex));
        }
    }

    /** Series names currently charted (for tests). */
    List<String> seriesNames() {
        List<String> n = new ArrayList<>();
        redChart.getData().forEach(s -> n.add(s.getName()));
        compositionChart.getData().forEach(s -> n.add(s.getName()));
        return n;
    }
}
