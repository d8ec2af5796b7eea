package org.cohesa.desktop.space;

import java.util.ArrayList;
import java.util.List;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Label;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.Palette;
import org.cohesa.desktop.common.Session;

/**
 * Base of the 2D plots: a canvas that fills its pane and redraws when the model, the selection or the size
 * changes; hover names the nearest point, a click selects it (synced with the tables through the session).
 */
abstract class CanvasPlot {

    protected static final Font TICK_FONT = Font.font("System", 12);
    protected static final Font TITLE_FONT = Font.font("System", FontWeight.BOLD, 13);

    protected final SpaceModel model;
    protected final Session session;
    private final Pane pane = new Pane();
    private final Canvas canvas = new Canvas();
    private final Label hover = new Label();
    private final List<Hit> hits = new ArrayList<>();

    /** A drawn point and where it landed on screen. */
    protected record Hit(double x, double y, PlotPoint point) {
    }

    CanvasPlot(SpaceModel model, String id) {
        this.model = model;
        this.session = model.session();
        pane.setId(id);
        pane.getChildren().addAll(canvas, hover);
        pane.setMinSize(200, 200);
        pane.setPrefSize(900, 640);
        hover.getStyleClass().add("plot-hover");
        hover.setManaged(false);
        hover.setVisible(false);
        hover.setMouseTransparent(true);
        canvas.widthProperty().bind(pane.widthProperty());
        canvas.heightProperty().bind(pane.heightProperty());
        canvas.widthProperty().addListener(x -> redraw());
        canvas.heightProperty().addListener(x -> redraw());
        model.pointsProperty().addListener(x -> redraw());
        model.doubledDdProperty().addListener(x -> redraw());
        session.selectedSolventProperty().addListener(x -> redraw());
        session.selectedBlendProperty().addListener(x -> redraw());
        session.dryingPathProperty().addListener(x -> redraw());
        canvas.setOnMouseMoved(e -> {
            Hit h = nearest(e.getX(), e.getY());
            if (h == null) {
                hover.setVisible(false);
                return;
            }
            hover.setText(Space3DView.describe(h.point()));
            hover.autosize();
            hover.relocate(Math.max(0, Math.min(e.getX() + 14, pane.getWidth() - hover.getWidth() - 4)),
                    Math.max(0, Math.min(e.getY() + 14, pane.getHeight() - hover.getHeight() - 4)));
            hover.setVisible(true);
        });
        canvas.setOnMouseExited(e -> hover.setVisible(false));
        canvas.setOnMouseClicked(e -> {
            Hit h = nearest(e.getX(), e.getY());
            if (e.getButton() == MouseButton.PRIMARY && h != null && h.point().solvent() != null) {
                session.selectedSolventProperty().set(h.point().solvent());
            }
        });
    }

    Pane node() {
        return pane;
    }

    /** The nearest drawn point within 8 px, or null. */
    Hit nearest(double x, double y) {
        Hit best = null;
        double bestD = 64;
        for (Hit h : hits) {
            double d = (h.x() - x) * (h.x() - x) + (h.y() - y) * (h.y() - y);
            if (d <= bestD) {
                bestD = d;
                best = h;
            }
        }
        return best;
    }

    List<Hit> hits() {
        return hits;
    }

    final void redraw() {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.setFill(Palette.INK);
        g.fillRect(0, 0, w, h);
        hits.clear();
        if (w < 50 || h < 50) {
            return;
        }
        draw(g, w, h);
    }

    /** Draws the plot; returns screen positions through {@link #mark}. */
    protected abstract void draw(GraphicsContext g, double w, double h);

    /** Screen position of a parameter point in this plot. */
    protected abstract double[] toScreen(HansenParameters p);

    protected void drawPoints(GraphicsContext g) {
        List<Colouring.Category> cats = model.colouringProperty().get().categories();
        for (PlotPoint p : model.points()) {
            double[] s = toScreen(p.hansen());
            Color c = cats.get(Math.min(p.category(), cats.size() - 1)).colour();
            g.setFill(c);
            g.fillOval(s[0] - 4, s[1] - 4, 8, 8);
            g.setStroke(Palette.INK);
            g.setLineWidth(0.8);
            g.strokeOval(s[0] - 4, s[1] - 4, 8, 8);
            hits.add(new Hit(s[0], s[1], p));
        }
    }

    /** The selected solvent ringed, the selected blend as a diamond with lines to its parts, the drying path. */
    protected void drawSelection(GraphicsContext g) {
        Blend b = session.selectedBlendProperty().get();
        if (b != null && b.hasHansen()) {
            double[] m = toScreen(b.hansen());
            g.setStroke(Palette.BLEND);
            g.setLineWidth(1.2);
            g.setLineDashes(5, 4);
            for (BlendComponent c : b.components()) {
                double[] s = toScreen(c.solvent().hansen());
                g.strokeLine(m[0], m[1], s[0], s[1]);
            }
            g.setLineDashes();
            List<HansenParameters> path = session.dryingPathProperty().get();
            if (path != null && path.size() > 1) {
                g.setStroke(Palette.SELECTION);
                g.setLineWidth(2);
                double[] xs = new double[path.size()];
                double[] ys = new double[path.size()];
                for (int i = 0; i < path.size(); i++) {
                    double[] s = toScreen(path.get(i));
                    xs[i] = s[0];
                    ys[i] = s[1];
                }
                g.strokePolyline(xs, ys, xs.length);
                g.setFill(Palette.SELECTION);
                g.fillOval(xs[xs.length - 1] - 3, ys[ys.length - 1] - 3, 6, 6);
            }
            g.setFill(Palette.BLEND);
            g.fillPolygon(new double[] {m[0], m[0] + 7, m[0], m[0] - 7}, new double[] {m[1] - 7, m[1], m[1] + 7, m[1]}, 4);
        }
        Solvent s = session.selectedSolventProperty().get();
        if (s != null && s.hasHansen()) {
            double[] p = toScreen(s.hansen());
            g.setStroke(Palette.SELECTION);
            g.setLineWidth(2);
            g.strokeOval(p[0] - 8, p[1] - 8, 16, 16);
            g.setFill(Palette.TEXT);
            g.setFont(TICK_FONT);
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.BOTTOM);
            g.fillText(s.name(), p[0] + 10, p[1] - 6);
        }
    }
}
