package org.cohesa.desktop.space;

import java.nio.IntBuffer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import javafx.animation.AnimationTimer;
import javafx.application.Platform;
import javafx.geometry.Point2D;
import javafx.geometry.Point3D;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Label;
import javafx.scene.image.ImageView;
import javafx.scene.image.PixelBuffer;
import javafx.scene.image.PixelFormat;
import javafx.scene.image.WritableImage;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.Text;
import javafx.scene.text.TextAlignment;
import org.cohesa.core.geometry.OrbitProjection;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.Palette;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;

/**
 * The 3D view of Hansen space, drawn by our own projection onto a 2D canvas: the points turned about the target
 * ({@link OrbitProjection}), sorted by depth and painted back to front, the target as a wire cage, the selected
 * solvent ringed, the selected blend with lines to its components and its drying path.
 *
 * <p>Why a canvas and not a JavaFX 3D sub-scene: on a machine without a GPU the sub-scene is filled by a software
 * rasteriser pixel by pixel, every frame, which held 1,000 points at about 21 fps on an idle 2-core machine; a
 * canvas draws a few thousand small discs and lines, and nothing else (docs/performance.md has both measurements).
 *
 * <p>World coordinates, relative to the pivot: x = δD (or 2δD when doubled) to the right, y = δH up, z = −δP (δP
 * runs away from the viewer at the front view), one unit per MPa^½. Drag rotates, the wheel zooms about the target, a
 * right/middle or shift drag pans, arrow keys rotate, +/− zoom, R resets.
 */
public final class Space3DView {

    static final double DEFAULT_YAW = 38;
    static final double DEFAULT_PITCH = 22;
    /** How the picture is framed: the target's neighbourhood (RED up to {@link #NEAR_RED}) or every liquid. */
    public enum Framing {
        NEAR("around the target (RED ≤ 2)"),
        ALL("every liquid");

        private final String words;

        Framing(String words) {
            this.words = words;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    /** Liquids up to this RED frame the "around the target" view: twice the sphere's radius, room for the candidates. */
    static final double NEAR_RED = 2.0;

    private final javafx.beans.property.ObjectProperty<Framing> framing = new javafx.beans.property.SimpleObjectProperty<>(Framing.NEAR);

    /** What the picture is fitted to; a change refits at the current angle. */
    public javafx.beans.property.ObjectProperty<Framing> framingProperty() {
        return framing;
    }

    /** True when point i frames the picture (every point, or those near the target when there is one to be near). */
    private boolean frames(int i) {
        if (framing.get() == Framing.ALL || targetRadius <= 0) {
            return true;
        }
        Double red = points.get(i).red();
        return red != null && red <= NEAR_RED;
    }

    /** The discs of the points that frame the picture (for tests). */
    public List<double[]> framedDiscs() {
        drawIfScheduled();
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            if (frames(i)) {
                out.add(new double[] {sx[i], sy[i], sr[i]});
            }
        }
        return out;
    }

    /** How many points lie outside the frame in the last drawing. */
    public int pointsOutsideFrame() {
        drawIfScheduled();
        int n = 0;
        for (int i = 0; i < points.size(); i++) {
            if (sx[i] < 0 || sy[i] < 0 || sx[i] > canvas.getWidth() || sy[i] > canvas.getHeight()) {
                n++;
            }
        }
        return n;
    }

    /** Pixels kept free around the fitted content: room for the tick labels and axis titles. */
    static final double MARGIN = 48;
    private static final int WARM_UP_FRAMES = 5;
    private static final Font TICK_FONT = Font.font("System", 12);
    private static final Font TITLE_FONT = Font.font("System", javafx.scene.text.FontWeight.BOLD, 13);
    private static final Font MARK_FONT = Font.font("System", javafx.scene.text.FontWeight.BOLD, 12);

    private final SpaceModel model;
    private final Session session;
    private final Pane container = new Pane();
    /** The picture: points and lines rasterised by {@link PixelRaster}, shown as one image. */
    private final ImageView picture = new ImageView();
    /** Over the picture: the labels (text only, a few dozen draw calls), and the mouse. */
    private final Canvas canvas = new Canvas();
    private final Label hover = new Label();
    private PixelRaster raster = new PixelRaster(1, 1);
    private PixelBuffer<IntBuffer> pixelBuffer;

    private double yaw = DEFAULT_YAW;
    private double pitch = DEFAULT_PITCH;
    /** Multiplies the fitted scale; 1 = fitted. */
    private double zoom = 1;
    /** Pixels the user has panned the picture by. */
    private double shiftX;
    private double shiftY;
    private OrbitProjection.Fit fit = new OrbitProjection.Fit(10, 300, 250);
    private double eye = 100;
    private boolean scheduled;

    // the scene, rebuilt when the model changes; coordinates relative to the pivot
    private double[] pivot = {0, 0, 0};
    private List<PlotPoint> points = List.of();
    private Color[] pointColour = new Color[0];
    private double[] pointXyz = new double[0];
    /** Lines sorted with the points by depth: the axes, the floor grid, the target cage. */
    private double[] segXyz = new double[0];
    private SegmentKind[] segKind = new SegmentKind[0];
    private final List<Anchor> anchors = new ArrayList<>();
    private double targetRadius;

    // the last frame
    private double[] pu = new double[0];
    private double[] pv = new double[0];
    private double[] pw = new double[0];
    private double[] sx = new double[0];
    private double[] sy = new double[0];
    private double[] sr = new double[0];
    private long[] order = new long[0];
    private final List<PlacedLabel> shown = new ArrayList<>();
    private final Map<String, Double> textWidths = new HashMap<>();

    private double pressX;
    private double pressY;
    private boolean dragged;

    private enum SegmentKind { AXIS, GRID, CAGE }

    /**
     * A label's text and its 3D anchor (relative to the pivot); {@code side} &lt; 0 puts the label to the left of the
     * projected anchor (its right edge 8 px from it), 0 centres it on the anchor.
     */
    private record Anchor(String text, String kind, double x, double y, double z, int side) {
    }

    /**
     * A label as drawn in the last frame: kind "title" (axis title), "tick" (tick value) or "mark" (the target, the
     * selected solvent, the selected blend and its components); x, y, width, height in canvas pixels.
     */
    public record PlacedLabel(String text, String kind, double x, double y, double width, double height) {
        boolean overlaps(double ox, double oy, double ow, double oh) {
            return x < ox + ow && ox < x + width && y < oy + oh && oy < y + height;
        }

        boolean overlaps(PlacedLabel o) {
            return overlaps(o.x, o.y, o.width, o.height);
        }

        /** True when a disc (a drawn point) touches the label's box. */
        boolean touchesDisc(double cx, double cy, double r) {
            double nx = Math.max(x, Math.min(cx, x + width));
            double ny = Math.max(y, Math.min(cy, y + height));
            return (nx - cx) * (nx - cx) + (ny - cy) * (ny - cy) < r * r;
        }
    }

    public Space3DView(SpaceModel model) {
        this.model = model;
        this.session = model.session();
        container.setId("space3d-pane");
        canvas.setId("space3d");
        canvas.setFocusTraversable(true);
        canvas.widthProperty().bind(container.widthProperty());
        canvas.heightProperty().bind(container.heightProperty());
        hover.setId("space3d-hover");
        hover.getStyleClass().add("plot-hover");
        hover.setVisible(false);
        hover.setManaged(false);
        hover.setMouseTransparent(true);
        picture.setMouseTransparent(true);
        picture.setId("space3d-picture");
        container.getChildren().addAll(picture, canvas, hover);
        container.setMinSize(200, 200);
        container.setPrefSize(900, 640);
        container.setStyle("-fx-background-color: " + Palette.css(Palette.INK) + ";");
        installInteraction();
        model.pointsProperty().addListener((o, a, b) -> rebuild());
        model.doubledDdProperty().addListener((o, a, b) -> rebuild());
        canvas.widthProperty().addListener((o, a, b) -> refit());
        canvas.heightProperty().addListener((o, a, b) -> refit());
        framing.addListener((o, a, b) -> {
            zoom = 1;
            shiftX = 0;
            shiftY = 0;
            refit();
        });
        session.selectedSolventProperty().addListener((o, a, b) -> requestDraw());
        session.selectedBlendProperty().addListener((o, a, b) -> requestDraw());
        session.dryingPathProperty().addListener((o, a, b) -> requestDraw());
        rebuild();
    }

    /** The node to put in a layout. */
    public Pane node() {
        return container;
    }

    public Canvas canvas() {
        return canvas;
    }

    /** World position of a parameter point, not yet relative to the pivot: {k·δD, δH, −δP}. */
    double[] world(HansenParameters h) {
        double k = model.doubledDdProperty().get() ? 2 : 1;
        return new double[] {k * h.dD(), h.dH(), -h.dP()};
    }

    private double[] relative(HansenParameters h) {
        double[] p = world(h);
        return new double[] {p[0] - pivot[0], p[1] - pivot[1], p[2] - pivot[2]};
    }

    /** Number of points drawn. */
    public int pointCount() {
        return points.size();
    }

    /**
     * Where a library solvent sits after the view's turn, relative to the pivot (camera space, before the perspective
     * division): rotation keeps distances, so the distance between two of these is their distance in the plot.
     */
    public Point3D turnedPositionOf(String solventName) {
        for (PlotPoint p : points) {
            if (p.name().equalsIgnoreCase(solventName)) {
                double[] r = relative(p.hansen());
                double[] t = projection().turn(r[0], r[1], r[2]);
                return new Point3D(t[0], t[1], t[2]);
            }
        }
        return null;
    }

    /** Where a library solvent's point is drawn on the canvas (pixels); null when it is not drawn. */
    public Point2D screenPositionOf(String solventName) {
        for (PlotPoint p : points) {
            if (p.name().equalsIgnoreCase(solventName)) {
                return toScreen(relative(p.hansen()));
            }
        }
        return null;
    }

    /** Where the pivot (the target's centre, or the middle of the box without a target) is drawn (pixels). */
    public Point2D pivotScreenPosition() {
        return toScreen(new double[] {0, 0, 0});
    }

    /** The target's outline radius on the canvas (pixels); 0 without a target. */
    public double targetScreenRadius() {
        return targetRadius <= 0 ? 0 : silhouetteRadius();
    }

    /** The labels drawn in the last frame (for tests: no tick label may overlap another label or a point). */
    public List<PlacedLabel> visibleLabels() {
        drawIfScheduled();
        return List.copyOf(shown);
    }

    /** Screen discs of the points in the last frame: {x, y, r} each (for tests). */
    public List<double[]> drawnDiscs() {
        drawIfScheduled();
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            out.add(new double[] {sx[i], sy[i], sr[i]});
        }
        return out;
    }

    /** The hover text for the point under a canvas position, or null (what the tooltip would show). */
    public String hoverTextAt(double x, double y) {
        PlotPoint p = pointAt(x, y);
        return p == null ? null : describe(p);
    }

    private OrbitProjection projection() {
        return new OrbitProjection(yaw, pitch, eye);
    }

    private Point2D toScreen(double[] rel) {
        OrbitProjection o = projection();
        double[] t = o.turn(rel[0], rel[1], rel[2]);
        double f = o.perspective(t[2]);
        double s = fit.scale() * zoom;
        return new Point2D(fit.offsetX() + shiftX + s * t[0] * f, fit.offsetY() + shiftY - s * t[1] * f);
    }

    /** Back to the starting angle, fitted to the frame. */
    public void resetView() {
        yaw = DEFAULT_YAW;
        pitch = DEFAULT_PITCH;
        zoom = 1;
        shiftX = 0;
        shiftY = 0;
        fit = fitFrame();
        requestDraw();
    }

    /** Fits the picture to the frame at the angle it is turned to now (zoom and pan back to none). */
    public void fitToFrame() {
        zoom = 1;
        shiftX = 0;
        shiftY = 0;
        fit = fitFrame();
        requestDraw();
    }

    public void rotateBy(double dxDegrees, double dyDegrees) {
        yaw = (yaw + dxDegrees) % 360;
        pitch = Math.max(-89, Math.min(89, pitch + dyDegrees));
        requestDraw();
    }

    /** Zooms about the target: its place on the screen stays while everything else grows or shrinks around it. */
    public void zoomBy(double factor) {
        zoom = Math.max(0.2, Math.min(12, zoom * factor));
        requestDraw();
    }

    /**
     * Rotates the view steadily for {@code seconds} and reports the intervals between rendered frames (ms) to
     * {@code done}: how interactive the view stays with the current number of points. {@code onStart} runs when the
     * warm-up frames are over and timing begins.
     */
    public void measureFrames(double seconds, Runnable onStart, Consumer<double[]> done) {
        List<Double> intervals = new ArrayList<>();
        AnimationTimer timer = new AnimationTimer() {
            private long start = -1;
            private long last = -1;
            private int frames;

            @Override
            public void handle(long now) {
                // the first frames lay out and cache glyphs: they are not what the user feels while rotating
                frames++;
                if (frames == WARM_UP_FRAMES) {
                    start = now;
                    onStart.run();
                } else if (frames > WARM_UP_FRAMES) {
                    intervals.add((now - last) / 1e6);
                }
                last = now;
                rotateBy(0.75, 0.1 * Math.sin(frames / 60.0));
                drawNow();
                if (start > 0 && now - start > seconds * 1e9) {
                    stop();
                    done.accept(intervals.stream().mapToDouble(Double::doubleValue).toArray());
                }
            }
        };
        timer.start();
    }

    private void installInteraction() {
        canvas.addEventHandler(MouseEvent.MOUSE_PRESSED, e -> {
            pressX = e.getX();
            pressY = e.getY();
            dragged = false;
            canvas.requestFocus();
        });
        canvas.addEventHandler(MouseEvent.MOUSE_DRAGGED, e -> {
            double dx = e.getX() - pressX;
            double dy = e.getY() - pressY;
            if (Math.abs(dx) + Math.abs(dy) > 2) {
                dragged = true;
            }
            pressX = e.getX();
            pressY = e.getY();
            if (e.getButton() == MouseButton.PRIMARY && !e.isShiftDown()) {
                rotateBy(dx * 0.4, dy * 0.4);
            } else {
                shiftX += dx;
                shiftY += dy;
                requestDraw();
            }
            hover.setVisible(false);
        });
        canvas.addEventHandler(ScrollEvent.SCROLL, e -> zoomBy(Math.exp(e.getDeltaY() / 300)));
        canvas.addEventHandler(MouseEvent.MOUSE_MOVED, e -> showHover(e.getX(), e.getY()));
        canvas.addEventHandler(MouseEvent.MOUSE_EXITED, e -> hover.setVisible(false));
        canvas.addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            if (dragged || e.getButton() != MouseButton.PRIMARY) {
                return;
            }
            PlotPoint p = pointAt(e.getX(), e.getY());
            if (p != null && p.solvent() != null) {
                session.selectedSolventProperty().set(p.solvent());
            }
        });
        canvas.setOnKeyPressed(e -> {
            KeyCode k = e.getCode();
            switch (k) {
                case LEFT -> rotateBy(-5, 0);
                case RIGHT -> rotateBy(5, 0);
                case UP -> rotateBy(0, -5);
                case DOWN -> rotateBy(0, 5);
                case PLUS, ADD, EQUALS -> zoomBy(1 / 0.85);
                case MINUS, SUBTRACT -> zoomBy(0.85);
                case R, HOME -> resetView();
                default -> {
                    return;
                }
            }
            e.consume();
        });
    }

    /** The front-most point whose disc (plus 3 px) covers the position, or null. */
    private PlotPoint pointAt(double x, double y) {
        drawIfScheduled();
        int best = -1;
        for (int i = 0; i < points.size() && i < sx.length; i++) {
            double r = sr[i] + 3;
            double d = (sx[i] - x) * (sx[i] - x) + (sy[i] - y) * (sy[i] - y);
            if (d <= r * r && (best < 0 || pw[i] > pw[best])) {
                best = i;
            }
        }
        return best < 0 ? null : points.get(best);
    }

    private void showHover(double x, double y) {
        PlotPoint p = pointAt(x, y);
        if (p == null) {
            hover.setVisible(false);
            return;
        }
        hover.setText(describe(p));
        hover.autosize();
        double hx = Math.min(x + 14, container.getWidth() - hover.getWidth() - 4);
        double hy = Math.min(y + 14, container.getHeight() - hover.getHeight() - 4);
        hover.relocate(Math.max(0, hx), Math.max(0, hy));
        hover.setVisible(true);
    }

    static String describe(PlotPoint p) {
        HansenParameters h = p.hansen();
        String text = p.name() + "\nδD " + Numbers.one(h.dD()) + "   δP " + Numbers.one(h.dP()) + "   δH " + Numbers.one(h.dH())
                + " MPa½";
        if (p.red() != null) {
            text += "\nRED " + Numbers.two(p.red());
        }
        return text;
    }

    // ---- the scene -------------------------------------------------------------------------------------------

    private void rebuild() {
        AxisRanges r = model.rangesProperty().get();
        double k = model.doubledDdProperty().get() ? 2 : 1;
        double x0 = k * r.dMin();
        double x1 = k * r.dMax();
        SolubilitySphere t = model.targetSphere();
        // rotation and zoom turn about the target, so it keeps its place at every angle and zoom
        pivot = t != null ? world(t.centre()) : new double[] {(x0 + x1) / 2, (r.hMin() + r.hMax()) / 2, -(r.pMin() + r.pMax()) / 2};
        points = model.points();
        List<Colouring.Category> cats = model.colouringProperty().get().categories();
        int n = points.size();
        pointColour = new Color[n];
        pointXyz = new double[3 * n];
        for (int i = 0; i < n; i++) {
            PlotPoint p = points.get(i);
            pointColour[i] = cats.get(Math.min(p.category(), cats.size() - 1)).colour();
            double[] q = relative(p.hansen());
            System.arraycopy(q, 0, pointXyz, 3 * i, 3);
        }
        buildLines(r, k, t);
        // a mild perspective: the eye three times as far from the pivot as the farthest corner of the box
        double far = 1;
        for (double[] c : boxCorners(r, k)) {
            far = Math.max(far, Math.sqrt(c[0] * c[0] + c[1] * c[1] + c[2] * c[2]));
        }
        eye = 3 * far;
        zoom = 1;
        shiftX = 0;
        shiftY = 0;
        fit = fitFrame();
        requestDraw();
    }

    private List<double[]> boxCorners(AxisRanges r, double k) {
        List<double[]> out = new ArrayList<>();
        for (double d : new double[] {r.dMin(), r.dMax()}) {
            for (double h : new double[] {r.hMin(), r.hMax()}) {
                for (double p : new double[] {r.pMin(), r.pMax()}) {
                    out.add(new double[] {k * d - pivot[0], h - pivot[1], -p - pivot[2]});
                }
            }
        }
        return out;
    }

    private void buildLines(AxisRanges r, double k, SolubilitySphere t) {
        List<double[]> segs = new ArrayList<>();
        List<SegmentKind> kinds = new ArrayList<>();
        anchors.clear();
        double x0 = k * r.dMin();
        double x1 = k * r.dMax();
        // the three axes from the corner at (δD min, δP 0, δH 0)
        line(segs, kinds, SegmentKind.AXIS, x0, r.hMin(), r.pMin(), x1, r.hMin(), r.pMin());
        line(segs, kinds, SegmentKind.AXIS, x0, r.hMin(), r.pMin(), x0, r.hMax(), r.pMin());
        line(segs, kinds, SegmentKind.AXIS, x0, r.hMin(), r.pMin(), x0, r.hMin(), r.pMax());
        // the floor grid (δH = 0) and the ticks
        for (double d = r.dMin(); d <= r.dMax() + 1e-9; d += AxisRanges.D_STEP) {
            if (d > r.dMin()) {
                line(segs, kinds, SegmentKind.GRID, k * d, r.hMin(), r.pMin(), k * d, r.hMin(), r.pMax());
            }
            anchor(Numbers.plain(k * d), "tick", k * d, r.hMin(), r.pMin() - 2.4);
        }
        double pStep = r.phStep(r.pMax() - r.pMin());
        for (double p = r.pMin() + pStep; p <= r.pMax() + 1e-9; p += pStep) {
            line(segs, kinds, SegmentKind.GRID, x0, r.hMin(), p, x1, r.hMin(), p);
            anchor(Numbers.plain(p), "tick", x0 - 2.6, r.hMin(), p);
        }
        double hStep = r.phStep(r.hMax() - r.hMin());
        for (double h = r.hMin() + hStep; h <= r.hMax() + 1e-9; h += hStep) {
            line(segs, kinds, SegmentKind.AXIS, x0, h, r.pMin(), x0 + 1.2, h, r.pMin());
            line(segs, kinds, SegmentKind.AXIS, x0, h, r.pMin(), x0, h, r.pMin() + 1.2);
            // beside the vertical axis on the screen, whatever the angle, so the axis never runs through the number
            anchors.add(new Anchor(Numbers.plain(h), "tick", x0 - pivot[0], h - pivot[1], -r.pMin() - pivot[2], -1));
        }
        axisOrigin = new double[] {x0 - pivot[0], r.hMin() - pivot[1], -r.pMin() - pivot[2]};
        anchor((k == 2 ? "2δD" : "δD") + " (MPa½)", "title", x1 + 6, r.hMin(), r.pMin() - 3);
        anchor("δP (MPa½)", "title", x0 - 3, r.hMin(), r.pMax() + 5);
        anchor("δH (MPa½)", "title", x0, r.hMax() + 4, r.pMin());
        targetRadius = 0;
        if (t != null) {
            // a wire cage of latitude and longitude lines; Ra² = 4ΔδD² + ΔδP² + ΔδH², so the sphere spans ±R0/2 in δD:
            // ±R0 on a 2δD axis (round) and ±R0/2 on a δD axis (an ellipsoid)
            targetRadius = t.r0();
            double[] c = world(t.centre());
            double rx = t.r0() * k / 2;
            double rr = t.r0();
            int around = 40;
            for (int lat = -60; lat <= 60; lat += 30) {
                double y = rr * Math.sin(Math.toRadians(lat));
                double ring = Math.cos(Math.toRadians(lat));
                for (int j = 0; j < around; j++) {
                    double a0 = 2 * Math.PI * j / around;
                    double a1 = 2 * Math.PI * (j + 1) / around;
                    cage(segs, kinds, c, rx * ring * Math.cos(a0), y, rr * ring * Math.sin(a0), rx * ring * Math.cos(a1), y, rr * ring * Math.sin(a1));
                }
            }
            for (int lon = 0; lon < 180; lon += 30) {
                double cl = Math.cos(Math.toRadians(lon));
                double sl = Math.sin(Math.toRadians(lon));
                for (int j = 0; j < around; j++) {
                    double a0 = 2 * Math.PI * j / around;
                    double a1 = 2 * Math.PI * (j + 1) / around;
                    cage(segs, kinds, c, rx * Math.cos(a0) * cl, rr * Math.sin(a0), rr * Math.cos(a0) * sl,
                            rx * Math.cos(a1) * cl, rr * Math.sin(a1), rr * Math.cos(a1) * sl);
                }
            }
        }
        segXyz = new double[segs.size() * 6];
        for (int i = 0; i < segs.size(); i++) {
            System.arraycopy(segs.get(i), 0, segXyz, 6 * i, 6);
        }
        segKind = kinds.toArray(new SegmentKind[0]);
    }

    /** A line between two points given as (k·δD, δH, δP). */
    private void line(List<double[]> segs, List<SegmentKind> kinds, SegmentKind kind, double xa, double ha, double pa, double xb, double hb,
            double pb) {
        segs.add(new double[] {xa - pivot[0], ha - pivot[1], -pa - pivot[2], xb - pivot[0], hb - pivot[1], -pb - pivot[2]});
        kinds.add(kind);
    }

    /** A cage line from offsets (world axes) about the sphere's centre c (world). */
    private void cage(List<double[]> segs, List<SegmentKind> kinds, double[] c, double ax, double ay, double az, double bx, double by, double bz) {
        segs.add(new double[] {c[0] + ax - pivot[0], c[1] + ay - pivot[1], c[2] + az - pivot[2], c[0] + bx - pivot[0], c[1] + by - pivot[1],
            c[2] + bz - pivot[2]});
        kinds.add(SegmentKind.CAGE);
    }

    /** The corner the three axes start from, relative to the pivot. */
    private double[] axisOrigin = {0, 0, 0};

    private void anchor(String text, String kind, double x, double h, double p) {
        anchors.add(new Anchor(text, kind, x - pivot[0], h - pivot[1], -p - pivot[2], 0));
    }

    /**
     * The scale and offset that fit the framing points (every liquid, or those near the target), the selected blend with
     * its components and the target into the frame at the current angle, with {@link #MARGIN} pixels free on each side
     * (the box alone when there is nothing).
     */
    private OrbitProjection.Fit fitFrame() {
        OrbitProjection o = projection();
        double[] b = {Double.MAX_VALUE, -Double.MAX_VALUE, Double.MAX_VALUE, -Double.MAX_VALUE};
        AxisRanges r = model.rangesProperty().get();
        double k = model.doubledDdProperty().get() ? 2 : 1;
        // the data decide the scale: the points and the target's cage; the box, its grid and the axis titles may reach past
        // the frame (the titles are then placed on the visible part of their axis, see placeTitle)
        int framed = 0;
        for (int i = 0; i < points.size(); i++) {
            if (frames(i)) {
                grow(b, o, pointXyz[3 * i], pointXyz[3 * i + 1], pointXyz[3 * i + 2]);
                framed++;
            }
        }
        if (framed == 0) { // nothing near the target: every liquid
            for (int i = 0; i < points.size(); i++) {
                grow(b, o, pointXyz[3 * i], pointXyz[3 * i + 1], pointXyz[3 * i + 2]);
            }
        }
        // the selected blend and its components stay in the picture whatever frames it
        Blend sb = session.selectedBlendProperty().get();
        if (sb != null && sb.hasHansen()) {
            double[] q = relative(sb.hansen());
            grow(b, o, q[0], q[1], q[2]);
            for (BlendComponent c : sb.components()) {
                if (c.solvent().hasHansen()) {
                    double[] cq = relative(c.solvent().hansen());
                    grow(b, o, cq[0], cq[1], cq[2]);
                }
            }
        }
        for (int i = 0; i < segKind.length; i++) {
            if (segKind[i] == SegmentKind.CAGE) {
                grow(b, o, segXyz[6 * i], segXyz[6 * i + 1], segXyz[6 * i + 2]);
                grow(b, o, segXyz[6 * i + 3], segXyz[6 * i + 4], segXyz[6 * i + 5]);
            }
        }
        if (b[0] > b[1]) { // nothing to show: the box
            for (double[] c : boxCorners(r, k)) {
                grow(b, o, c[0], c[1], c[2]);
            }
        }
        double w = Math.max(1, canvas.getWidth());
        double h = Math.max(1, canvas.getHeight());
        double margin = Math.min(MARGIN, Math.min(w, h) / 6);
        return OrbitProjection.fit(b[0], b[1], b[2], b[3], w, h, margin);
    }

    private static void grow(double[] b, OrbitProjection o, double x, double y, double z) {
        double[] t = o.turn(x, y, z);
        double f = o.perspective(t[2]);
        b[0] = Math.min(b[0], t[0] * f);
        b[1] = Math.max(b[1], t[0] * f);
        b[2] = Math.min(b[2], t[1] * f);
        b[3] = Math.max(b[3], t[1] * f);
    }

    /** Refits to a new frame size, keeping the user's zoom and pan. */
    private void refit() {
        fit = fitFrame();
        requestDraw();
    }

    private double silhouetteRadius() {
        // a sphere of radius r at the pivot's depth, seen from distance e, outlines a circle of radius r·e/√(e² − r²)
        double r = targetRadius;
        return fit.scale() * zoom * r * eye / Math.sqrt(Math.max(1e-9, eye * eye - r * r));
    }

    // ---- drawing -------------------------------------------------------------------------------------------

    private void requestDraw() {
        if (!scheduled) {
            scheduled = true;
            Platform.runLater(this::drawIfScheduled);
        }
    }

    private void drawIfScheduled() {
        if (scheduled) {
            drawNow();
        }
    }

    /** Draws one frame: everything projected, sorted far to near, rasterised; the marks over it, the labels on top. */
    void drawNow() {
        scheduled = false;
        int w = (int) Math.max(1, Math.round(canvas.getWidth()));
        int h = (int) Math.max(1, Math.round(canvas.getHeight()));
        if (raster.width != w || raster.height != h || pixelBuffer == null) {
            raster = new PixelRaster(w, h);
            pixelBuffer = new PixelBuffer<>(w, h, IntBuffer.wrap(raster.pixels), PixelFormat.getIntArgbPreInstance());
            picture.setImage(new WritableImage(pixelBuffer));
        }
        PixelRaster px = raster;
        px.clear(PixelRaster.rgb(Palette.INK));
        int n = points.size();
        int m = segKind.length;
        ensureCapacity(n, m);
        OrbitProjection o = projection();
        double s = fit.scale() * zoom;
        double ox = fit.offsetX() + shiftX;
        double oy = fit.offsetY() + shiftY;
        o.projectAll(pointXyz, n, pu, pv, pw);
        for (int i = 0; i < n; i++) {
            sx[i] = ox + s * pu[i];
            sy[i] = oy - s * pv[i];
            double f = o.perspective(pw[i]);
            sr[i] = Math.max(2.5, Math.min(9, 4.2 * f * Math.sqrt(zoom)));
        }
        o.projectAll(segXyz, 2 * m, su, sv, sw);
        // painter's order: points and lines by camera depth (the segment's middle), far first; the target's outline at
        // the pivot's depth. Key = depth in 1/1000 units, shifted, with the index in the low 20 bits.
        int total = n + m + (targetRadius > 0 ? 1 : 0);
        for (int i = 0; i < n; i++) {
            order[i] = (Math.round(pw[i] * 1000) << 20) | i;
        }
        for (int j = 0; j < m; j++) {
            double depth = (sw[2 * j] + sw[2 * j + 1]) / 2;
            order[n + j] = (Math.round(depth * 1000) << 20) | (n + j);
        }
        if (targetRadius > 0) {
            order[n + m] = n + m;
        }
        Arrays.sort(order, 0, total);
        int ink = PixelRaster.rgb(Palette.INK);
        int axis = PixelRaster.rgb(Palette.AXIS);
        int grid = PixelRaster.rgb(Palette.GRID.brighter());
        int cageNear = PixelRaster.rgb(Palette.TARGET);
        // the cage's far half in a darker shade of the same hue: opaque lines, so nothing behind or inside changes colour
        int cageFar = PixelRaster.rgb(Palette.TARGET.deriveColor(0, 1, 0.5, 1));
        int[] colours = new int[pointColour.length];
        for (int i = 0; i < colours.length; i++) {
            colours[i] = PixelRaster.rgb(pointColour[i]);
        }
        for (int q = 0; q < total; q++) {
            int id = (int) (order[q] & 0xFFFFF);
            if (id < n) {
                px.disc(sx[id], sy[id], sr[id], colours[id], ink, 0.9);
            } else if (id < n + m) {
                int j = id - n;
                double xa = ox + s * su[2 * j];
                double ya = oy - s * sv[2 * j];
                double xb = ox + s * su[2 * j + 1];
                double yb = oy - s * sv[2 * j + 1];
                switch (segKind[j]) {
                    case AXIS -> px.line(xa, ya, xb, yb, 1.4, axis, 0, 0);
                    case GRID -> px.line(xa, ya, xb, yb, 0.8, grid, 0, 0);
                    default -> {
                        boolean near = (sw[2 * j] + sw[2 * j + 1]) / 2 >= 0;
                        px.line(xa, ya, xb, yb, near ? 1.1 : 0.8, near ? cageNear : cageFar, 0, 0);
                    }
                }
            } else {
                px.ring(ox, oy, silhouetteRadius(), 1.6, cageNear);
            }
        }
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.clearRect(0, 0, canvas.getWidth(), canvas.getHeight());
        shown.clear();
        // axis titles first (always shown), then the names of the marks around them, then the tick values in what is left
        drawLabels(g, o, s, ox, oy, "title");
        drawMarks(px, g);
        pixelBuffer.updateBuffer(b -> null);
        drawLabels(g, o, s, ox, oy, "tick");
        int outside = 0;
        for (int i = 0; i < n; i++) {
            if (sx[i] < 0 || sy[i] < 0 || sx[i] > w || sy[i] > h) {
                outside++;
            }
        }
        if (outside > 0) {
            // said, so a liquid past the frame is never mistaken for one missing from the library
            g.setFont(TICK_FONT);
            g.setFill(Palette.AXIS);
            g.setTextAlign(TextAlignment.LEFT);
            g.setTextBaseline(VPos.BOTTOM);
            g.fillText(outside + (outside == 1 ? " liquid lies" : " liquids lie") + " beyond the frame (Frame: every liquid shows them)", 8, h - 6);
        }
    }

    private double[] su = new double[0];
    private double[] sv = new double[0];
    private double[] sw = new double[0];

    private void ensureCapacity(int n, int m) {
        if (pu.length < n) {
            pu = new double[n];
            pv = new double[n];
            pw = new double[n];
            sx = new double[n];
            sy = new double[n];
            sr = new double[n];
        }
        if (su.length < 2 * m) {
            su = new double[2 * m];
            sv = new double[2 * m];
            sw = new double[2 * m];
        }
        if (order.length < n + m + 1) {
            order = new long[n + m + 1];
        }
    }

    /** The target's centre and name, the selected solvent ringed and named, the blend with its components named. */
    private void drawMarks(PixelRaster px, GraphicsContext g) {
        int ink = PixelRaster.rgb(Palette.INK);
        int blend = PixelRaster.rgb(Palette.BLEND);
        int white = PixelRaster.rgb(Palette.SELECTION);
        TargetChoice target = session.target();
        if (targetRadius > 0) {
            Point2D c = pivotScreenPosition();
            px.disc(c.getX(), c.getY(), 3.5, PixelRaster.rgb(Palette.TARGET), ink, 0.9);
            String name = target == null || target.name() == null ? "target" : target.name();
            markLabel(g, name + " · R0 " + Numbers.one(targetRadius), c.getX(), c.getY() - silhouetteRadius(), Palette.TARGET, true);
        }
        Blend b = session.selectedBlendProperty().get();
        if (b != null && b.hasHansen()) {
            Point2D m = toScreen(relative(b.hansen()));
            for (BlendComponent c : b.components()) {
                if (c.solvent().hasHansen()) {
                    Point2D p = toScreen(relative(c.solvent().hansen()));
                    px.line(m.getX(), m.getY(), p.getX(), p.getY(), 1.4, blend, 6, 4);
                }
            }
            List<HansenParameters> path = session.dryingPathProperty().get();
            if (path != null && path.size() > 1) {
                Point2D prev = toScreen(relative(path.get(0)));
                for (int i = 1; i < path.size(); i++) {
                    Point2D next = toScreen(relative(path.get(i)));
                    px.line(prev.getX(), prev.getY(), next.getX(), next.getY(), 2, white, 0, 0);
                    prev = next;
                }
                px.disc(prev.getX(), prev.getY(), 3.5, white, ink, 0.9);
            }
            px.diamond(m.getX(), m.getY(), 8, blend, ink);
            markLabel(g, "selected blend", m.getX(), m.getY(), Palette.BLEND, false);
            for (BlendComponent c : b.components()) {
                if (c.solvent().hasHansen()) {
                    Point2D p = toScreen(relative(c.solvent().hansen()));
                    px.ring(p.getX(), p.getY(), 7, 1.6, blend);
                    markLabel(g, c.solvent().name() + " " + Numbers.percent(c.fraction()), p.getX(), p.getY(), Palette.BLEND, false);
                }
            }
        }
        Solvent sel = session.selectedSolventProperty().get();
        if (sel != null && sel.hasHansen()) {
            Point2D p = toScreen(relative(sel.hansen()));
            px.ring(p.getX(), p.getY(), 9, 2, white);
            // a component of the selected blend is named already, with its fraction
            boolean named = b != null && b.components().stream().anyMatch(c -> c.solvent().name().equalsIgnoreCase(sel.name()));
            if (!named) {
                markLabel(g, sel.name(), p.getX(), p.getY(), Palette.SELECTION, false);
            }
        }
    }

    /**
     * Names a mark beside it: the first of sixteen places around the mark that covers no label already placed and no
     * point, else the first that covers no label, else to the right. Drawn with a dark rim so it reads over the points.
     */
    private void markLabel(GraphicsContext g, String text, double x, double y, Color colour, boolean above) {
        double tw = textWidth(text, MARK_FONT);
        double th = 16;
        double gap = 11;
        double[][] places = above
                ? new double[][] {{-tw / 2, -th - 4}, {gap, -th}, {-tw - gap, -th}, {-tw / 2, 4}}
                : new double[][] {{gap, -th / 2}, {gap, -th - 2}, {gap, 2}, {-tw - gap, -th / 2}, {-tw - gap, -th - 2}, {-tw - gap, 2},
                    {-tw / 2, -th - gap}, {-tw / 2, gap},
                    // farther out, when the near places are taken
                    {gap, -1.6 * th - 4}, {gap, 0.6 * th + 4}, {-tw - gap, -1.6 * th - 4}, {-tw - gap, 0.6 * th + 4},
                    {-tw / 2, -2 * th - gap}, {-tw / 2, th + gap}, {2.5 * gap, -th / 2}, {-tw - 2.5 * gap, -th / 2}};
        PlacedLabel chosen = null;
        PlacedLabel noLabelClash = null;
        for (double[] pl : places) {
            PlacedLabel c = new PlacedLabel(text, "mark", x + pl[0], y + pl[1], tw, th);
            if (shown.stream().anyMatch(c::overlaps) || outside(c)) {
                continue;
            }
            if (noLabelClash == null) {
                noLabelClash = c;
            }
            if (!coversPoint(c)) {
                chosen = c;
                break;
            }
        }
        if (chosen == null) {
            chosen = noLabelClash != null ? noLabelClash : new PlacedLabel(text, "mark", x + places[0][0], y + places[0][1], tw, th);
        }
        shown.add(chosen);
        g.setFont(MARK_FONT);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.CENTER);
        g.setStroke(Palette.INK);
        g.setLineWidth(3.5);
        g.strokeText(text, chosen.x(), chosen.y() + th / 2);
        g.setFill(colour);
        g.fillText(text, chosen.x(), chosen.y() + th / 2);
    }

    private boolean outside(PlacedLabel c) {
        return c.x() < 2 || c.y() < 2 || c.x() + c.width() > canvas.getWidth() - 2 || c.y() + c.height() > canvas.getHeight() - 2;
    }

    private boolean coversPoint(PlacedLabel c) {
        for (int i = 0; i < points.size(); i++) {
            if (c.touchesDisc(sx[i], sy[i], sr[i] + 1)) {
                return true;
            }
        }
        return false;
    }

    /**
     * The axis titles at their anchors (always shown), then the tick values: a tick value that would cover a label
     * already placed, a point or the target's outline is left out for this angle.
     */
    private void drawLabels(GraphicsContext g, OrbitProjection o, double s, double ox, double oy, String... kinds) {
        Point2D piv = pivotScreenPosition();
        double cageR = targetRadius > 0 ? silhouetteRadius() : 0;
        for (String kind : kinds) {
            boolean title = kind.equals("title");
            Font font = title ? TITLE_FONT : TICK_FONT;
            g.setFont(font);
            g.setFill(title ? Palette.TEXT : Palette.AXIS);
            g.setTextAlign(TextAlignment.CENTER);
            g.setTextBaseline(VPos.CENTER);
            for (Anchor a : anchors) {
                if (!a.kind().equals(kind)) {
                    continue;
                }
                double[] t = o.turn(a.x(), a.y(), a.z());
                double f = o.perspective(t[2]);
                double x = ox + s * t[0] * f;
                double y = oy - s * t[1] * f;
                double tw = textWidth(a.text(), font) + 4;
                if (a.side() < 0) {
                    x -= tw / 2 + 8;
                }
                double th = title ? 17 : 15;
                PlacedLabel l = new PlacedLabel(a.text(), kind, x - tw / 2, y - th / 2, tw, th);
                if (title) {
                    l = placeTitle(a, l, o, s, ox, oy, piv, cageR);
                } else {
                    boolean clash = shown.stream().anyMatch(l::overlaps) || coversPoint(l) || outside(l)
                            || (cageR > 0 && l.touchesDisc(piv.getX(), piv.getY(), cageR + 2));
                    if (clash) {
                        continue;
                    }
                }
                shown.add(l);
                g.fillText(a.text(), l.x() + l.width() / 2, l.y() + l.height() / 2);
            }
        }
    }

    /**
     * Where an axis title goes: at its axis' end when that is inside the frame and clear, else slid back along the axis
     * towards the corner it starts from, and a little to either side of it, to the first place inside the frame that
     * covers no other title, no point and not the target; failing that, the nearest such place around the axis' end;
     * failing that, the first place inside the frame, else the end pulled into the frame.
     */
    private PlacedLabel placeTitle(Anchor a, PlacedLabel atEnd, OrbitProjection o, double s, double ox, double oy, Point2D piv, double cageR) {
        double[] t0 = o.turn(axisOrigin[0], axisOrigin[1], axisOrigin[2]);
        double f0 = o.perspective(t0[2]);
        double sx0 = ox + s * t0[0] * f0;
        double sy0 = oy - s * t0[1] * f0;
        double ex = atEnd.x() + atEnd.width() / 2;
        double ey = atEnd.y() + atEnd.height() / 2;
        double len = Math.max(1, Math.hypot(ex - sx0, ey - sy0));
        double nx = -(ey - sy0) / len; // the axis' normal on the screen
        double ny = (ex - sx0) / len;
        double w = atEnd.width();
        double h = atEnd.height();
        PlacedLabel firstInside = null;
        for (double along = 1.0; along >= 0.3; along -= 0.05) {
            for (double side : new double[] {0, 1, -1, 2, -2}) {
                double cx = sx0 + along * (ex - sx0) + side * nx * (h + 2);
                double cy = sy0 + along * (ey - sy0) + side * ny * (h + 2);
                PlacedLabel c = new PlacedLabel(a.text(), "title", cx - w / 2, cy - h / 2, w, h);
                if (outside(c)) {
                    continue;
                }
                if (firstInside == null) {
                    firstInside = c;
                }
                boolean clash = shown.stream().anyMatch(c::overlaps) || coversPoint(c)
                        || (cageR > 0 && c.touchesDisc(piv.getX(), piv.getY(), cageR + 2));
                if (!clash) {
                    return c;
                }
            }
        }
        // no clear place by the axis: the nearest clear place around its end (rings 12 px apart), still beside the axis
        double endX = Math.max(w / 2 + 3, Math.min(canvas.getWidth() - w / 2 - 3, ex));
        double endY = Math.max(h / 2 + 3, Math.min(canvas.getHeight() - h / 2 - 3, ey));
        for (double rad = 12; rad <= 360; rad += 12) {
            for (int k = 0; k < 24; k++) {
                double ang = 2 * Math.PI * k / 24;
                double cx = endX + rad * Math.cos(ang);
                double cy = endY + rad * Math.sin(ang);
                PlacedLabel c = new PlacedLabel(a.text(), "title", cx - w / 2, cy - h / 2, w, h);
                if (outside(c) || shown.stream().anyMatch(c::overlaps) || coversPoint(c)
                        || (cageR > 0 && c.touchesDisc(piv.getX(), piv.getY(), cageR + 2))) {
                    continue;
                }
                return c;
            }
        }
        if (firstInside != null) {
            return firstInside;
        }
        double cw = canvas.getWidth();
        double ch = canvas.getHeight();
        return new PlacedLabel(a.text(), "title", Math.max(3, Math.min(cw - w - 3, atEnd.x())), Math.max(3, Math.min(ch - h - 3, atEnd.y())), w, h);
    }

    private double textWidth(String text, Font font) {
        return textWidths.computeIfAbsent(font.getSize() + "|" + font.getStyle() + "|" + text, key -> {
            Text t = new Text(text);
            t.setFont(font);
            return t.getLayoutBounds().getWidth();
        });
    }
}
