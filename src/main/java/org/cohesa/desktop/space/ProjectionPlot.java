package org.cohesa.desktop.space;

import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.text.TextAlignment;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.Palette;

/**
 * A 2D projection of Hansen space onto two of its axes, drawn to equal scale on both axes so the target's
 * outline keeps its true shape: a circle of radius R0 in δP–δH, and in planes with δD an ellipse with
 * semi-axis R0/2 along δD (a circle again when δD is doubled, Hansen 2007, ch. 1).
 */
final class ProjectionPlot extends CanvasPlot {

    /** Which two parameters span the plane (horizontal, vertical). */
    enum Plane {
        P_H("δP–δH"), D_P("δD–δP"), D_H("δD–δH");

        final String title;

        Plane(String title) {
            this.title = title;
        }
    }

    private static final double LEFT = 64;
    private static final double RIGHT = 24;
    private static final double TOP = 20;
    private static final double BOTTOM = 52;

    private final Plane plane;
    private double scale;
    private double xMin;
    private double yMin;
    private double originX;
    private double originY;

    ProjectionPlot(SpaceModel model, Plane plane) {
        super(model, "projection-" + plane.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        this.plane = plane;
    }

    private double k() {
        return model.doubledDdProperty().get() ? 2 : 1;
    }

    private double xOf(HansenParameters p) {
        return plane == Plane.P_H ? p.dP() : k() * p.dD();
    }

    private double yOf(HansenParameters p) {
        return plane == Plane.D_P ? p.dP() : p.dH();
    }

    @Override
    protected double[] toScreen(HansenParameters p) {
        return new double[] {originX + (xOf(p) - xMin) * scale, originY - (yOf(p) - yMin) * scale};
    }

    @Override
    protected void draw(GraphicsContext g, double w, double h) {
        AxisRanges r = model.rangesProperty().get();
        double k = k();
        double x0 = plane == Plane.P_H ? r.pMin() : k * r.dMin();
        double x1 = plane == Plane.P_H ? r.pMax() : k * r.dMax();
        double y0 = plane == Plane.D_P ? r.pMin() : r.hMin();
        double y1 = plane == Plane.D_P ? r.pMax() : r.hMax();
        double aw = w - LEFT - RIGHT;
        double ah = h - TOP - BOTTOM;
        scale = Math.min(aw / (x1 - x0), ah / (y1 - y0));
        xMin = x0;
        yMin = y0;
        double plotW = (x1 - x0) * scale;
        double plotH = (y1 - y0) * scale;
        originX = LEFT + (aw - plotW) / 2;
        originY = TOP + (ah + plotH) / 2;
        double xStep = plane == Plane.P_H ? r.phStep(x1 - x0) : k * AxisRanges.D_STEP;
        double yStep = r.phStep(y1 - y0);
        g.setLineWidth(1);
        g.setFont(TICK_FONT);
        for (double x = x0; x <= x1 + 1e-9; x += xStep) {
            double sx = originX + (x - x0) * scale;
            g.setStroke(Palette.GRID);
            g.strokeLine(sx, originY, sx, originY - plotH);
            g.setFill(Palette.AXIS);
            g.setTextAlign(TextAlignment.CENTER);
            g.setTextBaseline(VPos.TOP);
            g.fillText(Numbers.plain(x), sx, originY + 6);
        }
        for (double y = y0; y <= y1 + 1e-9; y += yStep) {
            double sy = originY - (y - y0) * scale;
            g.setStroke(Palette.GRID);
            g.strokeLine(originX, sy, originX + plotW, sy);
            g.setFill(Palette.AXIS);
            g.setTextAlign(TextAlignment.RIGHT);
            g.setTextBaseline(VPos.CENTER);
            g.fillText(Numbers.plain(y), originX - 8, sy);
        }
        g.setStroke(Palette.AXIS);
        g.strokeRect(originX, originY - plotH, plotW, plotH);
        g.setFont(TITLE_FONT);
        g.setFill(Palette.TEXT);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.TOP);
        String dName = k == 2 ? "2δD" : "δD";
        g.fillText((plane == Plane.P_H ? "δP" : dName) + " (MPa½)", originX + plotW / 2, originY + 26);
        g.save();
        g.translate(originX - 46, originY - plotH / 2);
        g.rotate(-90);
        g.setTextBaseline(VPos.CENTER);
        g.fillText((plane == Plane.D_P ? "δP" : "δH") + " (MPa½)", 0, 0);
        g.restore();
        g.save();
        g.beginPath();
        g.rect(originX, originY - plotH, plotW, plotH);
        g.clip();
        drawTarget(g, k);
        drawPoints(g);
        drawSelection(g);
        g.restore();
    }

    private void drawTarget(GraphicsContext g, double k) {
        SolubilitySphere t = model.targetSphere();
        if (t == null) {
            return;
        }
        double[] c = toScreen(t.centre());
        double rx = (plane == Plane.P_H ? t.r0() : k * t.r0() / 2) * scale;
        double ry = t.r0() * scale;
        g.setFill(Palette.TARGET.deriveColor(0, 1, 1, 0.18));
        g.fillOval(c[0] - rx, c[1] - ry, 2 * rx, 2 * ry);
        g.setStroke(Palette.TARGET);
        g.setLineWidth(1.5);
        g.strokeOval(c[0] - rx, c[1] - ry, 2 * rx, 2 * ry);
        g.strokeLine(c[0] - 5, c[1], c[0] + 5, c[1]);
        g.strokeLine(c[0], c[1] - 5, c[0], c[1] + 5);
    }
}
