package org.cohesa.desktop.space;

import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.text.TextAlignment;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.hsp.TeasFractions;
import org.cohesa.desktop.common.Palette;

/**
 * The Teas triangle (Teas, J. Paint Technol. 40 (1968) 19): each liquid at its fractional parameters
 * f_d, f_p, f_h ({@link TeasFractions}), which sum to 1, drawn in barycentric coordinates with grid lines
 * every 10 (the fractions ×100, as Teas printed them). The target is marked at its centre's fractions only:
 * a Hansen sphere has no exact outline on this plot.
 */
final class TeasPlot extends CanvasPlot {

    private double ax;
    private double ay;
    private double bx;
    private double by;
    private double cx;
    private double cy;

    TeasPlot(SpaceModel model) {
        super(model, "teas-plot");
    }

    @Override
    protected double[] toScreen(HansenParameters p) {
        TeasFractions f = TeasFractions.of(p);
        // corners: fd = 1 bottom left (A), fp = 1 bottom right (B), fh = 1 top (C)
        return new double[] {f.fd() * ax + f.fp() * bx + f.fh() * cx, f.fd() * ay + f.fp() * by + f.fh() * cy};
    }

    @Override
    protected void draw(GraphicsContext g, double w, double h) {
        double side = Math.min(w - 200, (h - 110) / (Math.sqrt(3) / 2));
        double height = side * Math.sqrt(3) / 2;
        ax = (w - side) / 2;
        ay = 40 + height;
        bx = ax + side;
        by = ay;
        cx = ax + side / 2;
        cy = ay - height;
        g.setLineWidth(1);
        g.setFont(TICK_FONT);
        for (int i = 1; i < 10; i++) {
            double t = i / 10.0;
            g.setStroke(Palette.GRID);
            // constant fd: from (fd=t, fp=1-t) to (fd=t, fh=1-t)
            line(g, t, 1 - t, 0, t, 0, 1 - t);
            // constant fp
            line(g, 1 - t, t, 0, 0, t, 1 - t);
            // constant fh
            line(g, 1 - t, 0, t, 0, 1 - t, t);
            g.setFill(Palette.AXIS);
            String v = String.valueOf(i * 10);
            double[] onAB = at(1 - t, t, 0);
            g.setTextAlign(TextAlignment.CENTER);
            g.setTextBaseline(VPos.TOP);
            g.fillText(v, onAB[0], onAB[1] + 6);
            double[] onBC = at(0, 1 - t, t);
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.CENTER);
            g.fillText(v, onBC[0] + 8, onBC[1]);
            double[] onCA = at(t, 0, 1 - t);
            g.setTextAlign(TextAlignment.RIGHT);
            g.fillText(v, onCA[0] - 8, onCA[1]);
        }
        g.setStroke(Palette.AXIS);
        g.setLineWidth(1.5);
        g.strokePolygon(new double[] {ax, bx, cx}, new double[] {ay, by, cy}, 3);
        g.setFont(TITLE_FONT);
        g.setFill(Palette.TEXT);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.TOP);
        g.fillText("fp × 100", (ax + bx) / 2, ay + 26);
        rotated(g, "fd × 100", (ax + cx) / 2 - 40, (ay + cy) / 2 - 20, -60);
        rotated(g, "fh × 100", (bx + cx) / 2 + 40, (by + cy) / 2 - 20, 60);
        g.setTextBaseline(VPos.BOTTOM);
        g.fillText("fh = 100", cx, cy - 8);
        g.setTextAlign(TextAlignment.RIGHT);
        g.setTextBaseline(VPos.TOP);
        g.fillText("fd = 100", ax - 6, ay + 4);
        g.setTextAlign(TextAlignment.LEFT);
        g.fillText("fp = 100", bx + 6, by + 4);
        SolubilitySphere t = model.targetSphere();
        if (t != null) {
            double[] c = toScreen(t.centre());
            g.setStroke(Palette.TARGET);
            g.setLineWidth(2);
            g.strokeLine(c[0] - 7, c[1], c[0] + 7, c[1]);
            g.strokeLine(c[0], c[1] - 7, c[0], c[1] + 7);
            g.strokeOval(c[0] - 9, c[1] - 9, 18, 18);
        }
        drawPoints(g);
        drawSelection(g);
    }

    private static void rotated(GraphicsContext g, String text, double x, double y, double degrees) {
        g.save();
        g.translate(x, y);
        g.rotate(degrees);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.CENTER);
        g.fillText(text, 0, 0);
        g.restore();
    }

    private double[] at(double fd, double fp, double fh) {
        return new double[] {fd * ax + fp * bx + fh * cx, fd * ay + fp * by + fh * cy};
    }

    private void line(GraphicsContext g, double d1, double p1, double h1, double d2, double p2, double h2) {
        double[] a = at(d1, p1, h1);
        double[] b = at(d2, p2, h2);
        g.strokeLine(a[0], a[1], b[0], b[1]);
    }
}
