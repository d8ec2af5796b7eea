package org.cohesa.desktop.blend;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import javafx.beans.value.ObservableValue;
import javafx.collections.ListChangeListener;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.chart.LineChart;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Label;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.cohesa.core.blend.ParetoFront;
import org.cohesa.core.blend.RankedBlend;

/**
 * The candidates' trade-offs as a chart: solvent power (RED) against hazard, and against cost when every candidate
 * has prices. The marks are the candidates' rank numbers; a candidate on the trade-off front
 * ({@link ParetoFront}: no other listed candidate is at least as good on RED, hazard and cost and better on one) is
 * a filled blue square tile (joined to the others of the front by a dashed line when cost does not take part, so the
 * front is that of the two scores drawn), a candidate another one beats is an open grey rounded tile,
 * so the shape and the fill carry the meaning and the colour only repeats it (Okabe–Ito blue, docs/desktop.md).
 * Clicking a tile selects that candidate's card; the selected candidate is framed in orange, larger. The screen draws:
 * the front and the scores come from the core.
 */
public final class TradeOffChart {

    static final String FRONT = "on the trade-off front";
    static final String BEATEN = "beaten by another candidate";

    private final ObservableList<BlendModel.Row> rows;
    private final Consumer<BlendModel.Row> pick;
    private final LineChart<Number, Number> hazardChart;
    private final LineChart<Number, Number> costChart;
    private final Label summary = new Label();
    private final Label costNote = new Label();
    private final VBox root;
    /** Rank → the tiles drawn for it (one per chart). */
    private final Map<Integer, List<StackPane>> tiles = new LinkedHashMap<>();
    private final Set<Integer> onFront = new HashSet<>();
    private int selectedRank = -1;

    /**
     * @param rows     the candidates listed (the chart follows the list)
     * @param selected the candidate selected on the cards
     * @param pick     selects a candidate's card (a click on its tile)
     */
    public TradeOffChart(ObservableList<BlendModel.Row> rows, ObservableValue<BlendModel.Row> selected, Consumer<BlendModel.Row> pick) {
        this.rows = rows;
        this.pick = pick;
        hazardChart = chart("Hazard score (lower is safer)", "tradeoff-hazard-chart");
        costChart = chart("Cost per litre (lower is cheaper)", "tradeoff-cost-chart");
        summary.setId("tradeoff-summary");
        summary.setWrapText(true);
        costNote.setId("tradeoff-cost-note");
        costNote.setWrapText(true);
        costNote.getStyleClass().add("hint");
        Label key = new Label("Numbered squares are the candidates' ranks on the front: no other candidate listed is at least as good on "
                + "RED, hazard and cost and better on one. Rings: another candidate is. RED is the distance from the material's "
                + "centre over R0; the hazard score weighs each component's H-statements by its volume fraction (docs/methods.md); "
                + "cost is Σ volume fraction × your price per litre. Click a mark to see its card.");
        key.setWrapText(true);
        key.getStyleClass().add("hint");
        javafx.scene.layout.FlowPane legend = new javafx.scene.layout.FlowPane(14, 4, legendEntry(true, FRONT), legendEntry(false, BEATEN));
        legend.setId("tradeoff-legend");
        for (Label l : List.of(summary, costNote, key)) {
            l.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        }
        root = new VBox(6, summary, legend, hazardChart, costChart, costNote, key);
        root.setId("tradeoff-panel");
        root.setPadding(new Insets(6));
        VBox.setVgrow(hazardChart, Priority.ALWAYS);
        VBox.setVgrow(costChart, Priority.ALWAYS);
        rows.addListener((ListChangeListener<BlendModel.Row>) ch -> redraw());
        selected.addListener((o, a, r) -> select(r == null ? -1 : r.rank()));
        redraw();
    }

    public Node node() {
        return root;
    }

    /** The ranks drawn as on the front (for tests and the summary). */
    public Set<Integer> frontRanks() {
        return Set.copyOf(onFront);
    }

    /** The tile of a rank in the hazard chart, or null. */
    public StackPane tileOf(int rank) {
        List<StackPane> t = tiles.get(rank);
        return t == null || t.isEmpty() ? null : t.get(0);
    }

    public LineChart<Number, Number> hazardChart() {
        return hazardChart;
    }

    public LineChart<Number, Number> costChart() {
        return costChart;
    }

    private static LineChart<Number, Number> chart(String yTitle, String id) {
        NumberAxis x = new NumberAxis();
        x.setLabel("RED (lower dissolves better)");
        x.setForceZeroInRange(false);
        NumberAxis y = new NumberAxis();
        y.setLabel(yTitle);
        y.setForceZeroInRange(true);
        LineChart<Number, Number> c = new LineChart<>(x, y);
        c.setId(id);
        c.getStyleClass().add("tradeoff-chart");
        c.setAnimated(false);
        c.setLegendVisible(false);
        c.setCreateSymbols(true);
        c.setAxisSortingPolicy(LineChart.SortingPolicy.X_AXIS);
        c.setMinHeight(190);
        return c;
    }

    private void redraw() {
        tiles.clear();
        onFront.clear();
        hazardChart.getData().clear();
        costChart.getData().clear();
        if (rows.isEmpty()) {
            summary.setText("Search first: each candidate listed becomes a tile here.");
            costNote.setText("");
            show(costChart, false);
            return;
        }
        List<RankedBlend> blends = rows.stream().map(r -> r.suggestion().blend()).toList();
        List<ParetoFront.Point> front = ParetoFront.of(blends);
        Set<RankedBlend> frontBlends = new HashSet<>();
        front.forEach(p -> frontBlends.add(p.blend()));
        List<ParetoFront.Point> all = blends.stream().map(ParetoFront::score).toList();
        boolean withCost = all.stream().noneMatch(p -> Double.isNaN(p.cost()));
        for (int i = 0; i < rows.size(); i++) {
            if (frontBlends.contains(blends.get(i))) {
                onFront.add(rows.get(i).rank());
            }
        }
        bounds((NumberAxis) hazardChart.getXAxis(), all.stream().mapToDouble(ParetoFront.Point::red).toArray(), false);
        bounds((NumberAxis) hazardChart.getYAxis(), all.stream().mapToDouble(ParetoFront.Point::hazard).toArray(), true);
        fill(hazardChart, all, false, !withCost);
        show(costChart, withCost);
        if (withCost) {
            bounds((NumberAxis) costChart.getXAxis(), all.stream().mapToDouble(ParetoFront.Point::red).toArray(), false);
            bounds((NumberAxis) costChart.getYAxis(), all.stream().mapToDouble(ParetoFront.Point::cost).toArray(), true);
            fill(costChart, all, true, false);
            costNote.setText("");
        } else {
            long unpriced = all.stream().filter(p -> Double.isNaN(p.cost())).count();
            costNote.setText(String.format(Locale.ROOT, "Cost is not drawn and does not decide the front: %d of %d candidates have a "
                    + "component without a price. Enter prices in the Library (Edit…, “Price per litre”) or with "
                    + "'cohesa solvents price NAME PRICE'.", unpriced, all.size()));
        }
        summary.setText(String.format(Locale.ROOT, "%d of the %d candidates listed are on the trade-off front of %s.",
                onFront.size(), rows.size(), withCost ? "RED, hazard and cost" : "RED and hazard"));
        select(selectedRank);
    }

    /** @param line join the front's tiles: only where the front is that of this chart's two scores alone (no third score hides in it) */
    private void fill(LineChart<Number, Number> chart, List<ParetoFront.Point> all, boolean cost, boolean line) {
        XYChart.Series<Number, Number> frontSeries = new XYChart.Series<>();
        frontSeries.setName(FRONT);
        XYChart.Series<Number, Number> beatenSeries = new XYChart.Series<>();
        beatenSeries.setName(BEATEN);
        for (int i = 0; i < rows.size(); i++) {
            BlendModel.Row r = rows.get(i);
            ParetoFront.Point p = all.get(i);
            boolean front = onFront.contains(r.rank());
            XYChart.Data<Number, Number> d = new XYChart.Data<>(p.red(), cost ? p.cost() : p.hazard());
            StackPane tile = tile(r, p, front);
            // the chart resets the style classes of a data node, so the tile sits inside a bare holder
            StackPane holder = new StackPane(tile);
            holder.setPickOnBounds(false);
            d.setNode(holder);
            tiles.computeIfAbsent(r.rank(), k -> new ArrayList<>()).add(tile);
            (front ? frontSeries : beatenSeries).getData().add(d);
        }
        chart.getData().add(frontSeries);
        chart.getData().add(beatenSeries);
        frontSeries.getNode().getStyleClass().add(line ? "tradeoff-front-line" : "tradeoff-no-line");
        beatenSeries.getNode().getStyleClass().add("tradeoff-no-line");
    }

    private StackPane tile(BlendModel.Row r, ParetoFront.Point p, boolean front) {
        Label n = new Label(String.valueOf(r.rank()));
        n.getStyleClass().add("tradeoff-rank");
        n.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE); // a number is never shortened to "…"
        // a beaten candidate is a small open ring (its number shows when it is selected), so the front stands out
        show(n, front);
        StackPane t = new StackPane(n);
        t.setId("tradeoff-tile-" + r.rank());
        t.getStyleClass().add(front ? "tradeoff-tile-front" : "tradeoff-tile-beaten");
        Tooltip.install(t, new Tooltip(String.format(Locale.ROOT, "#%d %s%nRED %.2f · hazard score %.1f · %s%n%s", r.rank(),
                BlendView.percentText(r.blend()), p.red(), p.hazard(),
                Double.isNaN(p.cost()) ? "cost unknown (a component has no price)" : String.format(Locale.ROOT, "cost %.2f per litre", p.cost()),
                front ? "on the trade-off front" : "another candidate is at least as good on every score and better on one")));
        t.setOnMouseClicked(e -> pick.accept(r));
        t.setCursor(javafx.scene.Cursor.HAND);
        return t;
    }

    /**
     * Bounds that keep every tile inside the plot: a margin of a tenth of the spread (at least a little) beyond the
     * extremes; {@code fromZero} starts at 0 (no listed hazard, no cost), RED starts near the nearest candidate.
     */
    static void bounds(NumberAxis axis, double[] values, boolean fromZero) {
        double lo = java.util.Arrays.stream(values).min().orElse(0);
        double hi = java.util.Arrays.stream(values).max().orElse(1);
        double pad = Math.max((hi - lo) * 0.1, Math.max(Math.abs(hi) * 0.05, 0.05));
        double low = fromZero ? 0 : Math.max(0, lo - pad);
        double high = hi + pad;
        double step = niceStep((high - low) / 6);
        axis.setAutoRanging(false);
        // a mark at 0 sits a step above the axis line, so it is not cut (ticks stay on whole steps); no value below 0 is named
        axis.setLowerBound(fromZero ? -step : Math.floor(low / step) * step);
        axis.setUpperBound(Math.ceil(high / step) * step);
        axis.setTickUnit(step);
        axis.setMinorTickVisible(false);
        axis.setTickLabelFormatter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(Number n) {
                double v = n.doubleValue();
                if (v < -1e-9) {
                    return "";
                }
                v = Math.abs(v) < 1e-9 ? 0 : v;
                return step >= 1 ? String.format(Locale.ROOT, "%.0f", v) : step >= 0.1 ? String.format(Locale.ROOT, "%.1f", v)
                        : String.format(Locale.ROOT, "%.2f", v);
            }

            @Override
            public Number fromString(String s) {
                return Double.valueOf(s);
            }
        });
    }

    /** 1, 2 or 5 times a power of ten, at least {@code raw}. */
    static double niceStep(double raw) {
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * p >= raw) {
                return m * p;
            }
        }
        return 10 * p;
    }

    private void select(int rank) {
        selectedRank = rank;
        tiles.forEach((k, list) -> list.forEach(t -> {
            t.getStyleClass().remove("tradeoff-tile-selected");
            boolean beaten = t.getStyleClass().contains("tradeoff-tile-beaten");
            if (beaten) {
                show(t.getChildren().get(0), k == rank);
            }
            if (k == rank) {
                t.getStyleClass().add("tradeoff-tile-selected");
                if (t.getParent() != null) {
                    t.getParent().toFront();
                }
            }
        }));
        // the marks changed size: the charts place them again
        hazardChart.requestLayout();
        costChart.requestLayout();
    }

    private static Node legendEntry(boolean front, String text) {
        Label n = new Label("1");
        n.getStyleClass().add("tradeoff-rank");
        show(n, front);
        StackPane t = new StackPane(n);
        t.getStyleClass().add(front ? "tradeoff-tile-front" : "tradeoff-tile-beaten");
        Label l = new Label(text);
        HBox h = new HBox(6, t, l);
        h.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        return h;
    }

    private static void show(Node n, boolean visible) {
        n.setVisible(visible);
        n.setManaged(visible);
    }
}
