package org.cohesa.report.png;

import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.PathPoint;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A drying path as a PNG: the liquid's composition (volume fractions) against the evaporated share of the initial
 * volume and, with a target, RED along the path with the sphere surface (RED = 1) marked and the point where the
 * path leaves it.
 */
public final class DryingPlot {

    private DryingPlot() {
    }

    public static void png(DryingPath path, String title, OutputStream out) throws IOException {
        List<JFreeChart> charts = new ArrayList<>();
        charts.add(composition(path, title));
        if (!path.points().isEmpty() && path.points().get(0).red() != null) {
            charts.add(red(path));
        }
        PlotStyle.writeRow(charts, 560 * charts.size(), 440, out);
    }

    private static JFreeChart composition(DryingPath path, String title) {
        XYSeriesCollection data = new XYSeriesCollection();
        List<String> names = new ArrayList<>(path.points().get(0).composition().keySet());
        for (String n : names) {
            XYSeries s = new XYSeries(n, false, true);
            for (PathPoint p : path.points()) {
                s.add(100 * p.evaporated(), p.composition().get(n));
            }
            data.addSeries(s);
        }
        NumberAxis x = new NumberAxis("evaporated (% of the initial volume)");
        x.setRange(0, 100);
        NumberAxis y = new NumberAxis("volume fraction of the liquid left");
        y.setRange(0, 1.0);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < names.size(); i++) {
            r.setSeriesPaint(i, PlotStyle.SERIES[i % PlotStyle.SERIES.length]);
            r.setSeriesStroke(i, PlotStyle.stroke(i));
        }
        XYPlot plot = new XYPlot(data, x, y, r);
        PlotStyle.plain(plot);
        JFreeChart c = new JFreeChart(null, PlotStyle.LABEL, plot, true);
        c.setTitle(new TextTitle(title, PlotStyle.TITLE));
        return c;
    }

    private static JFreeChart red(DryingPath path) {
        XYSeries s = new XYSeries("RED to the target", false, true);
        double max = 1.2;
        for (PathPoint p : path.points()) {
            s.add(100 * p.evaporated(), p.red());
            max = Math.max(max, p.red() * 1.1);
        }
        NumberAxis x = new NumberAxis("evaporated (% of the initial volume)");
        x.setRange(0, 100);
        NumberAxis y = new NumberAxis("RED (1 = sphere surface)");
        y.setRange(0, max);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setSeriesPaint(0, PlotStyle.SERIES[0]);
        r.setSeriesStroke(0, PlotStyle.stroke(0));
        XYPlot plot = new XYPlot(new XYSeriesCollection(s), x, y, r);
        PlotStyle.plain(plot);
        ValueMarker surface = new ValueMarker(1.0, PlotStyle.OUTSIDE, PlotStyle.stroke(1));
        surface.setLabel("sphere surface");
        surface.setLabelFont(PlotStyle.LABEL);
        surface.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_RIGHT);
        surface.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_RIGHT);
        surface.setLabelBackgroundColor(java.awt.Color.WHITE);
        plot.addRangeMarker(surface);
        if (path.leavesSphereAt() != null && path.leavesSphereAt() > 0) {
            ValueMarker leaves = new ValueMarker(100 * path.leavesSphereAt(), PlotStyle.PARTIAL, PlotStyle.stroke(2));
            leaves.setLabel(String.format(java.util.Locale.ROOT, "leaves at %.1f %%", 100 * path.leavesSphereAt()));
            leaves.setLabelFont(PlotStyle.LABEL);
            leaves.setLabelBackgroundColor(java.awt.Color.WHITE);
            leaves.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.BOTTOM_RIGHT);
            leaves.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.BOTTOM_LEFT);
            plot.addDomainMarker(leaves);
        }
        JFreeChart c = new JFreeChart(null, PlotStyle.LABEL, plot, false);
        c.setTitle(new TextTitle("RED along the path, last left: " + path.lastSolvent(), PlotStyle.TITLE));
        return c;
    }
}
