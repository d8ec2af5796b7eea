package org.cohesa.desktop.cases;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javafx.geometry.Insets;
import javafx.geometry.VPos;
import javafx.scene.Node;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Pane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.InsideOut;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.desktop.blend.BlendModel;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.Session;

/**
 * The case's parameter panel: "how far inside, and which way out". On the coordinate plane of the scaled space
 * (2δD, δP, δH) that spreads the candidates most ({@link InsideOut#bestPlane}), the material's RED = 0.5, the RED limit
 * and RED = 1 as rings with the inside shaded deeper towards the centre; the candidates with lines to their components;
 * for the selected one its own cut through the sphere, an arrow along the shortest way out, and in words its RED, its
 * distance to the surface and the parameter that carries it out most. The drying path of the selected blend is drawn
 * when it has been computed. Colours from the Okabe–Ito set as on the other plots; every mark is also named in words.
 */
public final class InsideOutPanel {

    static final Color BACKGROUND = Color.web("#1B222C");
    static final Color SPHERE = Color.web("#56B4E9");
    static final Color CANDIDATE = Color.web("#FFD166");
    static final Color COMPONENT = Color.web("#AEB8C2");
    static final Color AXIS = Color.web("#8A96A3");
    /** tested liquids of a fit: Okabe–Ito bluish green, filled when they dissolved the material */
    static final Color TESTED = Color.web("#009E73");
    private static final Font FONT = Font.font("System", 12);
    private static final Font BOLD = Font.font("System", FontWeight.BOLD, 12);

    private final BlendModel model;
    private final Session session;
    private final Pane pane = new Pane();
    private final Canvas canvas = new Canvas();
    private final Label summary = new Label();
    private final ComboBox<String> planeChoice = new ComboBox<>();
    private final VBox root;
    private InsideOut.Plane shown = InsideOut.Plane.P_H;

    public InsideOutPanel(BlendModel model) {
        this.model = model;
        this.session = model.session();
        pane.setId("inside-out");
        pane.getChildren().add(canvas);
        pane.setMinSize(240, 240);
        canvas.widthProperty().bind(pane.widthProperty());
        canvas.heightProperty().bind(pane.heightProperty());
        canvas.widthProperty().addListener(x -> redraw());
        canvas.heightProperty().addListener(x -> redraw());
        planeChoice.setId("inside-out-plane");
        planeChoice.getItems().setAll("best for these candidates", "δP–δH", "2δD–δP", "2δD–δH");
        planeChoice.setValue(planeChoice.getItems().get(0));
        planeChoice.valueProperty().addListener(x -> redraw());
        summary.setId("inside-out-summary");
        summary.setWrapText(true);
        summary.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        Label viewLabel = new Label("Plane");
        HBox bar = new HBox(8, viewLabel, planeChoice);
        bar.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        Label legend = new Label("Rings (key top left): the sphere's outline in this plane at RED 1, the RED limit and RED 0.5, deeper shading nearer the centre (2δD, so the sphere is round). "
                + "Diamonds: candidates (rank), lines to their components (dots). Selected: white ring, dashed circle = where this "
                + "plane through it meets the sphere, arrow = shortest way out. Green circles: the liquids of your fit, filled if they dissolved it, "
                + "open if not.");
        legend.setWrapText(true);
        legend.getStyleClass().add("hint");
        legend.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        root = new VBox(6, bar, pane, summary, legend);
        root.setPadding(new Insets(6));
        VBox.setVgrow(pane, Priority.ALWAYS);
        model.rows().addListener((javafx.collections.ListChangeListener<BlendModel.Row>) c -> redraw());
        session.targetProperty().addListener(x -> redraw());
        session.selectedBlendProperty().addListener(x -> redraw());
        session.dryingPathProperty().addListener(x -> redraw());
        session.testedLiquidsProperty().addListener(x -> redraw());
        model.redLimit.addListener(x -> redraw());
        redraw();
    }

    public Node node() {
        return root;
    }

    /** The plane drawn now (for tests). */
    public InsideOut.Plane plane() {
        return shown;
    }

    /** The words under the plot (for tests). */
    public String summaryText() {
        return summary.getText();
    }

    private BlendModel.Row selectedRow() {
        Blend sel = session.selectedBlendProperty().get();
        return sel == null ? null : model.rows().stream().filter(r -> r.blend().equals(sel)).findFirst().orElse(null);
    }

    private double limit() {
        try {
            double v = Double.parseDouble(model.redLimit.get().strip());
            return v > 0 && v < 1 ? v : 0.8;
        } catch (RuntimeException e) {
            return 0.8;
        }
    }

    private void redraw() {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.setFill(BACKGROUND);
        g.fillRect(0, 0, w, h);
        SolubilitySphere t = session.target() == null ? null : session.target().sphere();
        if (t == null || w < 50 || h < 50) {
            summary.setText(t == null ? "No material yet: the panel shows the candidates against the material's sphere." : "");
            g.setFill(AXIS);
            g.setFont(FONT);
            g.fillText(t == null ? "no material" : "", 12, 20);
            return;
        }
        List<BlendModel.Row> rows = List.copyOf(model.rows());
        List<HansenParameters> points = rows.stream().map(r -> r.suggestion().blend().point()).toList();
        shown = switch (planeChoice.getValue() == null ? "" : planeChoice.getValue()) {
            case "δP–δH" -> InsideOut.Plane.P_H;
            case "2δD–δP" -> InsideOut.Plane.D_P;
            case "2δD–δH" -> InsideOut.Plane.D_H;
            default -> InsideOut.bestPlane(t, points);
        };
        InsideOut.Plane pl = shown;
        double cx = pl.x(t.centre());
        double cy = pl.y(t.centre());
        // the window: the sphere with a margin, widened to every candidate and component
        double half = 1.35 * t.r0();
        Map<String, HansenParameters> components = new LinkedHashMap<>();
        for (BlendModel.Row r : rows) {
            for (BlendComponent c : r.blend().components()) {
                if (c.solvent().hansen() != null) {
                    components.put(c.solvent().name(), c.solvent().hansen());
                }
            }
        }
        List<HansenParameters> all = new ArrayList<>(points);
        all.addAll(components.values());
        fittedTests(t).forEach(r -> all.add(r.liquid()));
        for (HansenParameters p : all) {
            half = Math.max(half, 1.08 * Math.max(Math.abs(pl.x(p) - cx), Math.abs(pl.y(p) - cy)));
        }
        double left = 56;
        double bottom = 40;
        double size = Math.min(w - left - 16, h - bottom - 16);
        double scale = size / (2 * half);
        double ox = left + (w - left - 16 - size) / 2 + size / 2;
        double oy = 16 + (h - bottom - 16 - size) / 2 + size / 2;
        Projector pr = new Projector(pl, cx, cy, scale, ox, oy);
        axes(g, pr, half, pl);
        // distance shading: deeper towards the centre, in three steps that match the rings
        double lim = limit();
        double[] reds = {1.0, lim, 0.5};
        double[] alpha = {0.10, 0.10, 0.12};
        for (int i = 0; i < reds.length; i++) {
            double r = reds[i] * t.r0() * scale;
            g.setFill(SPHERE.deriveColor(0, 1, 1, alpha[i]));
            g.fillOval(ox - r, oy - r, 2 * r, 2 * r);
        }
        ring(g, ox, oy, t.r0() * scale, 2.2, null);
        ring(g, ox, oy, lim * t.r0() * scale, 1.4, new double[] {7, 5});
        ring(g, ox, oy, 0.5 * t.r0() * scale, 1.0, new double[] {2, 4});
        ringKey(g, lim);
        g.setStroke(SPHERE);
        g.setLineWidth(1.5);
        g.strokeLine(ox - 6, oy, ox + 6, oy);
        g.strokeLine(ox, oy - 6, ox, oy + 6);
        BlendModel.Row sel = selectedRow();
        // lines to the components, under the marks
        for (BlendModel.Row r : rows) {
            if (r.blend().size() < 2) {
                continue;
            }
            HansenParameters p = r.suggestion().blend().point();
            g.setStroke(CANDIDATE.deriveColor(0, 1, 1, r == sel ? 0.95 : 0.30));
            g.setLineWidth(r == sel ? 1.6 : 1.0);
            for (BlendComponent c : r.blend().components()) {
                if (c.solvent().hansen() != null) {
                    g.strokeLine(pr.x(p), pr.y(p), pr.x(c.solvent().hansen()), pr.y(c.solvent().hansen()));
                }
            }
        }
        // the tested liquids of the fit: filled = dissolved (score ≥ 0.5), open = did not; only when the target is that fit
        List<org.cohesa.core.target.TestResult> tests = fittedTests(t);
        for (org.cohesa.core.target.TestResult r : tests) {
            double x = pr.x(r.liquid());
            double y = pr.y(r.liquid());
            boolean good = r.score() >= org.cohesa.core.target.TestResult.GOOD_THRESHOLD;
            g.setLineWidth(1.6);
            g.setStroke(TESTED);
            if (good) {
                g.setFill(TESTED);
                g.fillOval(x - 4.5, y - 4.5, 9, 9);
            } else {
                g.strokeOval(x - 4.5, y - 4.5, 9, 9);
            }
        }
        g.setFill(COMPONENT);
        for (HansenParameters c : components.values()) {
            g.fillOval(pr.x(c) - 3, pr.y(c) - 3, 6, 6);
        }
        List<HansenParameters> path = session.dryingPathProperty().get();
        if (sel != null && path != null && path.size() > 1 && sel.blend().equals(session.selectedBlendProperty().get())) {
            g.setStroke(Color.WHITE.deriveColor(0, 1, 1, 0.8));
            g.setLineWidth(1.5);
            g.setLineDashes(3, 3);
            for (int i = 1; i < path.size(); i++) {
                g.strokeLine(pr.x(path.get(i - 1)), pr.y(path.get(i - 1)), pr.x(path.get(i)), pr.y(path.get(i)));
            }
            g.setLineDashes();
        }
        g.setFont(BOLD);
        g.setTextBaseline(VPos.CENTER);
        for (int i = rows.size() - 1; i >= 0; i--) {
            BlendModel.Row r = rows.get(i);
            HansenParameters p = r.suggestion().blend().point();
            double x = pr.x(p);
            double y = pr.y(p);
            g.setFill(CANDIDATE);
            g.fillPolygon(new double[] {x, x + 6, x, x - 6}, new double[] {y - 6, y, y + 6, y}, 4);
            if (r.rank() <= 5 || r == sel) { // the first five and the selected one are numbered; more would cover each other
                g.setFill(Color.web("#E8E8E8"));
                g.setTextAlign(TextAlignment.LEFT);
                g.fillText(String.valueOf(r.rank()), x + 8, y - 7);
            }
        }
        if (sel == null) {
            summary.setText(rows.isEmpty() ? "No candidates yet: run the search." : rows.size() + " candidates on the " + pl.xTitle() + "–"
                    + pl.yTitle() + " plane (the one that spreads them most" + (planeChoice.getSelectionModel().getSelectedIndex() > 0 ? ", or as chosen" : "")
                    + "). Select a card to see how far inside it is and which way out.");
            return;
        }
        HansenParameters p = sel.suggestion().blend().point();
        double x = pr.x(p);
        double y = pr.y(p);
        g.setStroke(Color.WHITE);
        g.setLineWidth(2);
        g.strokeOval(x - 10, y - 10, 20, 20);
        double slice = InsideOut.sliceRadius(t, pl, p) * scale;
        if (slice > 0) {
            g.setLineDashes(5, 4);
            g.setLineWidth(1.2);
            g.strokeOval(ox - slice, oy - slice, 2 * slice, 2 * slice);
            g.setLineDashes();
        }
        // the shortest way out is radially away from the centre; drawn to where this plane meets the surface
        double dx = x - ox;
        double dy = y - oy;
        double len = Math.hypot(dx, dy);
        if (len > 1 && slice > 0) {
            double ux = dx / len;
            double uy = dy / len;
            double ex = ox + ux * slice;
            double ey = oy + uy * slice;
            g.setStroke(Color.WHITE);
            g.setLineWidth(1.8);
            g.setLineCap(StrokeLineCap.ROUND);
            g.strokeLine(x, y, ex, ey);
            double ah = 8;
            double sx = Math.signum((ex - x) * ux + (ey - y) * uy);
            double bx = ex - sx * ux * ah;
            double by = ey - sx * uy * ah;
            g.strokeLine(ex, ey, bx - uy * ah * 0.6, by + ux * ah * 0.6);
            g.strokeLine(ex, ey, bx + uy * ah * 0.6, by - ux * ah * 0.6);
        }
        InsideOut.Standing st = InsideOut.standing(t, p);
        summary.setText(String.format(Locale.ROOT, "#%d %s: RED %.2f — %s. %s carries it towards the surface most "
                        + "(share of Ra²: δD %d %%, δP %d %%, δH %d %%).", sel.rank(), percent(sel.blend()), st.red(),
                st.margin() >= 0 ? String.format(Locale.ROOT, "%.1f MPa½ inside the surface (Ra %.1f of R0 %.1f)", st.margin(), t.r0() - st.margin(), t.r0())
                        : String.format(Locale.ROOT, "%.1f MPa½ outside the surface", -st.margin()),
                st.mainAxis() == null ? "Nothing" : st.mainAxis(), Math.round(st.shareD() * 100), Math.round(st.shareP() * 100),
                Math.round(st.shareH() * 100)) + (st.mainAxis() != null && !pl.xTitle().endsWith(st.mainAxis().substring(1))
                && !pl.yTitle().endsWith(st.mainAxis().substring(1)) ? " This plane hides " + st.mainAxis() + ": pick a plane with it to see that way out." : ""));
    }

    /** The fit's test results, when the current target is the sphere fitted to them (a picked material has none). */
    private List<org.cohesa.core.target.TestResult> fittedTests(SolubilitySphere t) {
        Session.FittedTests f = session.testedLiquidsProperty().get();
        return f == null || !f.sphere().equals(t) ? List.of() : f.tests();
    }

    private static String percent(Blend b) {
        return String.join(" + ", b.components().stream().map(c -> c.solvent().name() + " " + Math.round(c.fraction() * 100) + " %").toList());
    }

    private static void ring(GraphicsContext g, double ox, double oy, double r, double width, double[] dashes) {
        g.setStroke(SPHERE);
        g.setLineWidth(width);
        if (dashes != null) {
            g.setLineDashes(dashes);
        }
        g.strokeOval(ox - r, oy - r, 2 * r, 2 * r);
        g.setLineDashes();
    }

    /** The rings' key in the plot's top-left corner: a sample of each line with its RED. */
    private void ringKey(GraphicsContext g, double lim) {
        double x = 64;
        double y = 22;
        g.setFill(BACKGROUND.deriveColor(0, 1, 1, 0.85));
        g.fillRect(x - 6, y - 12, 150, 58);
        String[] words = {"RED 1 (surface)", "RED " + Numbers.two(lim) + " (limit)", "RED 0.5"};
        double[] widths = {2.2, 1.4, 1.0};
        double[][] dashes = {null, {7, 5}, {2, 4}};
        g.setFont(FONT);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.CENTER);
        for (int i = 0; i < 3; i++) {
            double yy = y + i * 17;
            g.setStroke(SPHERE);
            g.setLineWidth(widths[i]);
            if (dashes[i] != null) {
                g.setLineDashes(dashes[i]);
            }
            g.strokeLine(x, yy, x + 28, yy);
            g.setLineDashes();
            g.setFill(SPHERE);
            g.fillText(words[i], x + 34, yy);
        }
    }

    private void axes(GraphicsContext g, Projector pr, double half, InsideOut.Plane pl) {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        double step = 1;
        for (double s : new double[] {1, 2, 5, 10, 20}) {
            step = s;
            if (s * pr.scale >= 38) {
                break;
            }
        }
        g.setStroke(AXIS.deriveColor(0, 1, 1, 0.25));
        g.setLineWidth(1);
        g.setFill(AXIS);
        g.setFont(FONT);
        double x0 = pr.cx - half;
        double x1 = pr.cx + half;
        for (double v = Math.ceil(x0 / step) * step; v <= x1; v += step) {
            double sx = pr.ox + (v - pr.cx) * pr.scale;
            g.strokeLine(sx, 12, sx, h - 36);
            g.setTextAlign(TextAlignment.CENTER);
            g.setTextBaseline(VPos.TOP);
            g.fillText(Numbers.plain(v), sx, h - 34);
        }
        double y0 = pr.cy - half;
        double y1 = pr.cy + half;
        for (double v = Math.ceil(y0 / step) * step; v <= y1; v += step) {
            double sy = pr.oy - (v - pr.cy) * pr.scale;
            g.strokeLine(52, sy, w - 12, sy);
            g.setTextAlign(TextAlignment.RIGHT);
            g.setTextBaseline(VPos.CENTER);
            g.fillText(Numbers.plain(v), 48, sy);
        }
        g.setFont(BOLD);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.BOTTOM);
        g.fillText(pl.xTitle() + " (MPa½)", pr.ox, h - 2);
        g.save();
        g.translate(14, pr.oy);
        g.rotate(-90);
        g.setTextBaseline(VPos.CENTER);
        g.fillText(pl.yTitle() + " (MPa½)", 0, 0);
        g.restore();
    }

    /** World (scaled MPa½) to canvas pixels for one plane; y grows upwards. */
    private record Projector(InsideOut.Plane plane, double cx, double cy, double scale, double ox, double oy) {
        double x(HansenParameters p) {
            return ox + (plane.x(p) - cx) * scale;
        }

        double y(HansenParameters p) {
            return oy - (plane.y(p) - cy) * scale;
        }
    }
}
