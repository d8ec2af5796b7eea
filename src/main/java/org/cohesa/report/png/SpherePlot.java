package org.cohesa.report.png;

import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.target.TestResult;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYShapeAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A fitted sphere and the tested liquids as a PNG of three projections. In Hansen's distance
 * Ra² = 4ΔδD² + ΔδP² + ΔδH² (Hansen 2007, ch. 1) the sphere's shadow on the δP–δH plane is a circle of radius R0 and
 * on the δD–δP and δD–δH planes an ellipse with half-axis R0/2 along δD: that is what is drawn. Liquids that dissolve
 * are filled circles, liquids that do not are crosses, partial results are triangles (shape and colour both tell).
 */
public final class SpherePlot {

    private SpherePlot() {
    }

    public static void png(SolubilitySphere sphere, List<TestResult> results, String title, OutputStream out) throws IOException {
        HansenParameters c = sphere.centre();
        double r = sphere.r0();
        List<JFreeChart> charts = List.of(
                panel(title + ": δP–δH", "δP (MPa½)", "δH (MPa½)", results, HansenParameters::dP, HansenParameters::dH,
                        new Ellipse2D.Double(c.dP() - r, c.dH() - r, 2 * r, 2 * r), c.dP(), c.dH()),
                panel("δD–δP", "δD (MPa½)", "δP (MPa½)", results, HansenParameters::dD, HansenParameters::dP,
                        new Ellipse2D.Double(c.dD() - r / 2, c.dP() - r, r, 2 * r), c.dD(), c.dP()),
                panel("δD–δH", "δD (MPa½)", "δH (MPa½)", results, HansenParameters::dD, HansenParameters::dH,
                        new Ellipse2D.Double(c.dD() - r / 2, c.dH() - r, r, 2 * r), c.dD(), c.dH()));
        PlotStyle.writeRow(charts, 1500, 520, out);
    }

    private static JFreeChart panel(String title, String xLabel, String yLabel, List<TestResult> results,
                                    ToDoubleFunction<HansenParameters> fx, ToDoubleFunction<HansenParameters> fy, Shape section,
                                    double cx, double cy) {
        XYSeries good = new XYSeries("dissolves", false, true);
        XYSeries bad = new XYSeries("does not", false, true);
        XYSeries partial = new XYSeries("partly", false, true);
        XYSeries centre = new XYSeries("fitted centre", false, true);
        centre.add(cx, cy);
        for (TestResult t : results) {
            XYSeries s = t.score() >= 0.99 ? good : t.score() <= 0.01 ? bad : partial;
            s.add(fx.applyAsDouble(t.liquid()), fy.applyAsDouble(t.liquid()));
        }
        XYSeriesCollection data = new XYSeriesCollection();
        List<java.awt.Paint> paints = new ArrayList<>();
        List<Shape> shapes = new ArrayList<>();
        addIfAny(data, good, paints, PlotStyle.INSIDE, shapes, new Ellipse2D.Double(-4, -4, 8, 8));
        addIfAny(data, bad, paints, PlotStyle.OUTSIDE, shapes, cross());
        addIfAny(data, partial, paints, PlotStyle.PARTIAL, shapes, triangle());
        addIfAny(data, centre, paints, java.awt.Color.BLACK, shapes, new Rectangle2D.Double(-3, -3, 6, 6));
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        for (int i = 0; i < paints.size(); i++) {
            r.setSeriesPaint(i, paints.get(i));
            r.setSeriesShape(i, shapes.get(i));
        }
        NumberAxis x = new NumberAxis(xLabel);
        NumberAxis y = new NumberAxis(yLabel);
        x.setAutoRangeIncludesZero(false);
        y.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, r);
        PlotStyle.plain(plot);
        plot.addAnnotation(new XYShapeAnnotation(section, PlotStyle.stroke(1), PlotStyle.INSIDE));
        Rectangle2D b = section.getBounds2D();
        double[] xr = span(b.getMinX(), b.getMaxX(), data, true);
        double[] yr = span(b.getMinY(), b.getMaxY(), data, false);
        x.setRange(xr[0], xr[1]);
        y.setRange(yr[0], yr[1]);
        JFreeChart chart = new JFreeChart(null, PlotStyle.LABEL, plot, true);
        chart.setTitle(new TextTitle(title, PlotStyle.TITLE));
        return chart;
    }

    private static void addIfAny(XYSeriesCollection data, XYSeries s, List<java.awt.Paint> paints, java.awt.Paint p, List<Shape> shapes,
                                 Shape shape) {
        if (s.getItemCount() > 0) {
            data.addSeries(s);
            paints.add(p);
            shapes.add(shape);
        }
    }

    /** Range covering the sphere's section and every point, with a margin. */
    private static double[] span(double lo, double hi, XYSeriesCollection data, boolean domain) {
        for (int s = 0; s < data.getSeriesCount(); s++) {
            for (int i = 0; i < data.getItemCount(s); i++) {
                double v = domain ? data.getXValue(s, i) : data.getYValue(s, i);
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        double pad = Math.max(0.5, 0.06 * (hi - lo));
        return new double[] {lo - pad, hi + pad};
    }

    private static Shape cross() {
        Path2D p = new Path2D.Double();
        p.moveTo(-4, -4);
        p.lineTo(4, 4);
        p.moveTo(-4, 4);
        p.lineTo(4, -4);
        return new java.awt.BasicStroke(2f).createStrokedShape(p);
    }

    private static Shape triangle() {
        Path2D p = new Path2D.Double();
        p.moveTo(0, -5);
        p.lineTo(4.5, 4);
        p.lineTo(-4.5, 4);
        p.closePath();
        return p;
    }
}
