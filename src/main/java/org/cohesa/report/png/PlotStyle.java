package org.cohesa.report.png;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import javax.imageio.ImageIO;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;

/**
 * The look of Cohesa's PNG plots: white ground, light grid, one colour-blind-safe palette (Okabe &amp; Ito, "Color
 * Universal Design", 2008: the same hues the desktop uses, docs/desktop.md) and a line style per series as well, so
 * nothing depends on telling colours apart.
 */
final class PlotStyle {

    static final Color[] SERIES = {
            new Color(0x0072B2), new Color(0xD55E00), new Color(0x009E73), new Color(0xCC79A7),
            new Color(0xE69F00), new Color(0x56B4E9), new Color(0x000000), new Color(0xF0E442)};
    static final Color INSIDE = new Color(0x0072B2);
    static final Color OUTSIDE = new Color(0xD55E00);
    static final Color PARTIAL = new Color(0x7F7F7F);
    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 15);
    static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);

    private PlotStyle() {
    }

    static BasicStroke stroke(int series) {
        float w = 2.0f;
        return switch (series % 4) {
            case 0 -> new BasicStroke(w);
            case 1 -> new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {8f, 4f}, 0f);
            case 2 -> new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {2f, 3f}, 0f);
            default -> new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {10f, 3f, 2f, 3f}, 0f);
        };
    }

    static void plain(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xDDDDDD));
        plot.setRangeGridlinePaint(new Color(0xDDDDDD));
        plot.setOutlinePaint(new Color(0x999999));
        plot.getDomainAxis().setLabelFont(LABEL);
        plot.getRangeAxis().setLabelFont(LABEL);
    }

    /** Draws the charts side by side (one row) into one PNG of {@code width} × {@code height} pixels. */
    static void writeRow(List<JFreeChart> charts, int width, int height, OutputStream out) throws IOException {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, width, height);
            int w = width / charts.size();
            for (int i = 0; i < charts.size(); i++) {
                JFreeChart c = charts.get(i);
                c.setBackgroundPaint(Color.WHITE);
                c.draw(g, new java.awt.geom.Rectangle2D.Double(i * w, 0, w, height));
            }
        } finally {
            g.dispose();
        }
        if (!ImageIO.write(img, "png", out)) {
            throw new IOException("no PNG writer available");
        }
    }
}
