package org.cohesa.desktop.space;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import javafx.animation.AnimationTimer;
import javafx.geometry.Point2D;
import javafx.geometry.Point3D;
import javafx.scene.AmbientLight;
import javafx.scene.Group;
import javafx.scene.Node;
import javafx.scene.PerspectiveCamera;
import javafx.scene.PointLight;
import javafx.scene.SceneAntialiasing;
import javafx.scene.SubScene;
import javafx.scene.control.Label;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.PickResult;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Pane;
import javafx.scene.layout.StackPane;
import javafx.scene.paint.Color;
import javafx.scene.paint.PhongMaterial;
import javafx.scene.shape.Box;
import javafx.scene.shape.CullFace;
import javafx.scene.shape.DrawMode;
import javafx.scene.shape.MeshView;
import javafx.scene.shape.Sphere;
import javafx.scene.transform.Rotate;
import javafx.scene.transform.Translate;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.desktop.common.Palette;
import org.cohesa.desktop.common.Session;

/**
 * The interactive 3D view of Hansen space: solvents as coloured points, the target sphere translucent, the
 * selected solvent ringed, the selected blend with lines to its components and its drying path.
 *
 * <p>World coordinates: x = δD (or 2δD when doubled), y = −δH (up on screen), z = δP, one world unit per
 * MPa^½. Drag rotates, the wheel zooms, a right/middle or shift drag pans, arrow keys rotate, +/− zoom, R resets.
 * Axis and tick labels are 2D labels laid over the 3D scene at the projected 3D anchor points, so they stay
 * upright and legible from every angle.
 */
public final class Space3DView {

    static final double POINT_RADIUS = 0.38;
    private static final double DEFAULT_RX = -22;
    private static final double DEFAULT_RY = -32;

    private final SpaceModel model;
    private final Session session;
    private final StackPane container = new StackPane();
    private final Group world = new Group();
    private final Group axes = new Group();
    private final Group pointGroup = new Group();
    private final Group blendGroup = new Group();
    private final Group pathGroup = new Group();
    private final Sphere targetSphere = new Sphere(1, 20);
    private final Sphere targetCentre = new Sphere(0.3, 12);
    private final Sphere selectedMarker = new Sphere(POINT_RADIUS * 2.2, 16);
    private final Pane overlay = new Pane();
    private final Label hover = new Label();
    private final Rotate rx = new Rotate(DEFAULT_RX, Rotate.X_AXIS);
    private final Rotate ry = new Rotate(DEFAULT_RY, Rotate.Y_AXIS);
    private final Translate pan = new Translate();
    private final Translate centre = new Translate();
    private final PerspectiveCamera camera = new PerspectiveCamera(true);
    private final SubScene subScene;
    private final List<Label> labels = new ArrayList<>();
    private final List<Point3D> labelAnchors = new ArrayList<>();
    private final List<PhongMaterial> categoryMaterials = new ArrayList<>();
    private static final int WARM_UP_FRAMES = 5;
    private double defaultDistance = 140;
    private double defaultPanX;
    private double defaultPanY;
    /** The plotted box's corners relative to the pivot, in world units (for fitting the camera). */
    private final List<Point3D> corners = new ArrayList<>();
    private double pressX;
    private double pressY;
    private boolean dragged;

    public Space3DView(SpaceModel model, SceneAntialiasing antialiasing) {
        this.model = model;
        this.session = model.session();
        Group root = new Group();
        world.getTransforms().addAll(pan, rx, ry, centre);
        targetSphere.setId("target-sphere");
        targetCentre.setId("target-centre");
        selectedMarker.setId("selected-point");
        axes.setId("axes");
        pointGroup.setId("points");
        blendGroup.setId("blend");
        pathGroup.setId("drying-path");
        // the target is an opaque wire cage, not a translucent surface: a point inside keeps its own hue (no blending
        // with a glass colour), and a software renderer draws a few hundred lines far faster than a filled, blended sphere
        PhongMaterial cage = new PhongMaterial(Palette.TARGET);
        cage.setSpecularColor(Color.TRANSPARENT);
        targetSphere.setMaterial(cage);
        targetSphere.setDrawMode(DrawMode.LINE);
        targetSphere.setCullFace(CullFace.NONE);
        targetCentre.setMaterial(new PhongMaterial(Palette.TARGET));
        PhongMaterial ring = new PhongMaterial(Palette.SELECTION);
        selectedMarker.setMaterial(ring);
        selectedMarker.setDrawMode(DrawMode.LINE);
        selectedMarker.setVisible(false);
        // the translucent sphere is added last: JavaFX blends in scene-graph order, so everything behind it
        // must already be drawn
        world.getChildren().addAll(axes, pointGroup, selectedMarker, blendGroup, pathGroup, targetCentre, targetSphere);
        // one ambient light only: each point is a few pixels wide, so shading adds nothing a reader can see, while every
        // extra light costs a software renderer per-pixel work (docs/performance.md); colours stay their palette hue
        AmbientLight ambient = new AmbientLight(Color.WHITE);
        root.getChildren().addAll(world, ambient);
        camera.setFieldOfView(32);
        camera.setNearClip(0.5);
        camera.setFarClip(5000);
        camera.setTranslateZ(-defaultDistance);
        subScene = new SubScene(root, 600, 500, true, antialiasing);
        subScene.setId("space3d");
        subScene.setCamera(camera);
        subScene.setFill(Palette.INK);
        subScene.setFocusTraversable(true);
        subScene.widthProperty().bind(container.widthProperty());
        subScene.heightProperty().bind(container.heightProperty());
        overlay.setMouseTransparent(true);
        overlay.setId("space3d-labels");
        hover.setId("space3d-hover");
        hover.getStyleClass().add("plot-hover");
        hover.setVisible(false);
        hover.setManaged(false);
        container.getChildren().addAll(subScene, overlay);
        container.setMinSize(200, 200);
        container.setPrefSize(900, 640);
        container.setStyle("-fx-background-color: " + Palette.css(Palette.INK) + ";");
        installInteraction();
        model.pointsProperty().addListener((o, a, b) -> rebuild());
        subScene.widthProperty().addListener((o, a, b) -> refit());
        subScene.heightProperty().addListener((o, a, b) -> refit());
        model.doubledDdProperty().addListener((o, a, b) -> rebuild());
        session.selectedSolventProperty().addListener((o, a, b) -> placeSelection());
        session.selectedBlendProperty().addListener((o, a, b) -> drawBlend());
        session.dryingPathProperty().addListener((o, a, b) -> drawPath());
        for (javafx.beans.Observable obs : Arrays.asList(rx.angleProperty(), ry.angleProperty(), pan.xProperty(), pan.yProperty(),
                camera.translateZProperty(), subScene.widthProperty(), subScene.heightProperty())) {
            obs.addListener(x -> layoutLabels());
        }
        rebuild();
    }

    /** The node to put in a layout: the 3D scene with its label overlay. */
    public StackPane node() {
        return container;
    }

    public SubScene subScene() {
        return subScene;
    }

    /** World position of a parameter point (x = δD or 2δD, y = −δH, z = δP). */
    public Point3D world(HansenParameters h) {
        double k = model.doubledDdProperty().get() ? 2 : 1;
        return new Point3D(k * h.dD(), -h.dH(), h.dP());
    }

    /** Where a library solvent's point is drawn, in the 3D sub-scene's coordinates; null when it is not drawn. */
    public Point3D scenePositionOf(String solventName) {
        for (Node n : pointGroup.getChildren()) {
            @SuppressWarnings("unchecked")
            List<PlotPoint> pts = (List<PlotPoint>) n.getUserData();
            for (PlotPoint p : pts) {
                if (p.name().equalsIgnoreCase(solventName)) {
                    return world.localToScene(world(p.hansen()));
                }
            }
        }
        return null;
    }

    /** Number of points drawn (all colour groups). */
    public int pointCount() {
        int n = 0;
        for (Node node : pointGroup.getChildren()) {
            n += ((List<?>) node.getUserData()).size();
        }
        return n;
    }

    /**
     * The camera distance at which the plotted box, seen at the starting angle, fills the frame with an 8 % margin:
     * each corner, turned as the view turns it, must project inside the frame (perspective: |x| / (d + z) ≤ tan of
     * half the field of view, the horizontal one widened by the frame's aspect ratio).
     */
    private double fitDistance() {
        double w = Math.max(1, subScene.getWidth());
        double h = Math.max(1, subScene.getHeight());
        double tv = Math.tan(Math.toRadians(camera.getFieldOfView() / 2)) * 0.86; // room for the axis titles
        double th = tv * w / h;
        Rotate sx = new Rotate(DEFAULT_RX, Rotate.X_AXIS);
        Rotate sy = new Rotate(DEFAULT_RY, Rotate.Y_AXIS);
        List<Point3D> turned = new ArrayList<>();
        double minX = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE;
        double minY = Double.MAX_VALUE;
        double maxY = -Double.MAX_VALUE;
        for (Point3D c : corners) {
            Point3D q = sx.transform(sy.transform(c));
            turned.add(q);
            minX = Math.min(minX, q.getX());
            maxX = Math.max(maxX, q.getX());
            minY = Math.min(minY, q.getY());
            maxY = Math.max(maxY, q.getY());
        }
        // the box is centred by a camera-space shift; the pivot (the target) stays the point rotation and zoom keep fixed
        defaultPanX = turned.isEmpty() ? 0 : -(minX + maxX) / 2;
        defaultPanY = turned.isEmpty() ? 0 : -(minY + maxY) / 2;
        double d = 20;
        for (Point3D q : turned) {
            d = Math.max(d, Math.max(Math.abs(q.getX() + defaultPanX) / th, Math.abs(q.getY() + defaultPanY) / tv) - q.getZ());
        }
        return Math.min(2000, d);
    }

    /** Refits the camera when the frame changes size, unless the user has zoomed. */
    private void refit() {
        boolean atDefault = Math.abs(camera.getTranslateZ() + defaultDistance) < 1e-6;
        defaultDistance = fitDistance();
        if (atDefault) {
            resetView();
        }
    }

    /** Back to the starting angle, zoom and position. */
    public void resetView() {
        rx.setAngle(DEFAULT_RX);
        ry.setAngle(DEFAULT_RY);
        pan.setX(defaultPanX);
        pan.setY(defaultPanY);
        camera.setTranslateZ(-defaultDistance);
    }

    public void rotateBy(double dxDegrees, double dyDegrees) {
        ry.setAngle(ry.getAngle() + dxDegrees);
        rx.setAngle(Math.max(-89, Math.min(89, rx.getAngle() - dyDegrees)));
    }

    /**
     * Zooms about the target: the camera moves along its axis and the camera-space shift scales with the distance,
     * so the target (the pivot) keeps its place on the screen while everything else grows or shrinks around it.
     */
    public void zoomBy(double factor) {
        double before = -camera.getTranslateZ();
        double d = Math.max(20, Math.min(2000, before * factor));
        double k = d / before;
        pan.setX(pan.getX() * k);
        pan.setY(pan.getY() * k);
        camera.setTranslateZ(-d);
    }

    /**
     * Rotates the view steadily for {@code seconds} and reports the intervals between rendered frames
     * (ms) to {@code done}: how interactive the view stays with the current number of points.
     */
    public void measureFrames(double seconds, Consumer<double[]> done) {
        List<Double> intervals = new ArrayList<>();
        AnimationTimer timer = new AnimationTimer() {
            private long start = -1;
            private long last = -1;

            private int frames;

            @Override
            public void handle(long now) {
                // the first frames upload meshes and compile shaders: they are not what the user feels while rotating
                frames++;
                if (frames == WARM_UP_FRAMES) {
                    start = now;
                } else if (frames > WARM_UP_FRAMES) {
                    intervals.add((now - last) / 1e6);
                }
                last = now;
                rotateBy(0.75, 0.1 * Math.sin(frames / 60.0));
                if (start > 0 && now - start > seconds * 1e9) {
                    stop();
                    done.accept(intervals.stream().mapToDouble(Double::doubleValue).toArray());
                }
            }
        };
        timer.start();
    }

    private void installInteraction() {
        subScene.addEventHandler(MouseEvent.MOUSE_PRESSED, e -> {
            pressX = e.getSceneX();
            pressY = e.getSceneY();
            dragged = false;
            subScene.requestFocus();
        });
        subScene.addEventHandler(MouseEvent.MOUSE_DRAGGED, e -> {
            double dx = e.getSceneX() - pressX;
            double dy = e.getSceneY() - pressY;
            if (Math.abs(dx) + Math.abs(dy) > 2) {
                dragged = true;
            }
            pressX = e.getSceneX();
            pressY = e.getSceneY();
            if (e.getButton() == MouseButton.PRIMARY && !e.isShiftDown()) {
                rotateBy(dx * 0.4, dy * 0.4);
            } else {
                double perPixel = -camera.getTranslateZ() / Math.max(200, subScene.getHeight()) * 0.6;
                pan.setX(pan.getX() + dx * perPixel);
                pan.setY(pan.getY() + dy * perPixel);
            }
            hover.setVisible(false);
        });
        subScene.addEventHandler(ScrollEvent.SCROLL, e -> zoomBy(Math.exp(-e.getDeltaY() / 300)));
        subScene.addEventHandler(MouseEvent.MOUSE_MOVED, e -> showHover(e.getPickResult(), e.getSceneX(), e.getSceneY()));
        subScene.addEventHandler(MouseEvent.MOUSE_EXITED, e -> hover.setVisible(false));
        subScene.addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            if (dragged || e.getButton() != MouseButton.PRIMARY) {
                return;
            }
            PlotPoint p = pointAt(e.getPickResult());
            if (p != null && p.solvent() != null) {
                session.selectedSolventProperty().set(p.solvent());
            }
        });
        subScene.setOnKeyPressed(e -> {
            KeyCode k = e.getCode();
            switch (k) {
                case LEFT -> rotateBy(-5, 0);
                case RIGHT -> rotateBy(5, 0);
                case UP -> rotateBy(0, -5);
                case DOWN -> rotateBy(0, 5);
                case PLUS, ADD, EQUALS -> zoomBy(0.85);
                case MINUS, SUBTRACT -> zoomBy(1 / 0.85);
                case R, HOME -> resetView();
                default -> {
                    return;
                }
            }
            e.consume();
        });
    }

    private PlotPoint pointAt(PickResult pr) {
        if (pr == null || !(pr.getIntersectedNode() instanceof MeshView mv) || !(mv.getUserData() instanceof List<?> pts)) {
            return null;
        }
        int face = pr.getIntersectedFace();
        int i = face / PointMesh.FACES_PER_POINT;
        return face >= 0 && i < pts.size() ? (PlotPoint) pts.get(i) : null;
    }

    private void showHover(PickResult pr, double sceneX, double sceneY) {
        PlotPoint p = pointAt(pr);
        if (p == null) {
            hover.setVisible(false);
            return;
        }
        hover.setText(describe(p));
        Point2D at = overlay.sceneToLocal(sceneX, sceneY);
        hover.autosize();
        double x = Math.min(at.getX() + 14, overlay.getWidth() - hover.getWidth() - 4);
        double y = Math.min(at.getY() + 14, overlay.getHeight() - hover.getHeight() - 4);
        hover.relocate(Math.max(0, x), Math.max(0, y));
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

    private void rebuild() {
        AxisRanges r = model.rangesProperty().get();
        double k = model.doubledDdProperty().get() ? 2 : 1;
        double x0 = k * r.dMin();
        double x1 = k * r.dMax();
        double cx = (x0 + x1) / 2;
        double cy = -(r.hMin() + r.hMax()) / 2;
        double cz = (r.pMin() + r.pMax()) / 2;
        SolubilitySphere t = model.targetSphere();
        if (t != null) {
            // rotation and zoom turn about the target: it stays in the middle of the frame at every angle and zoom
            Point3D tc = world(t.centre());
            cx = tc.getX();
            cy = tc.getY();
            cz = tc.getZ();
        }
        centre.setX(-cx);
        centre.setY(-cy);
        centre.setZ(-cz);
        corners.clear();
        for (double x : new double[] {x0, x1}) {
            for (double y : new double[] {-r.hMin(), -r.hMax()}) {
                for (double z : new double[] {r.pMin(), r.pMax()}) {
                    corners.add(new Point3D(x - cx, y - cy, z - cz));
                }
            }
        }
        double oldDefault = defaultDistance;
        defaultDistance = fitDistance();
        if (Math.abs(camera.getTranslateZ() + oldDefault) < 1e-6) {
            resetView();
        }
        buildAxes(r, k);
        buildPoints();
        placeTarget();
        placeSelection();
        drawBlend();
        drawPath();
        layoutLabels();
    }

    private void buildAxes(AxisRanges r, double k) {
        axes.getChildren().clear();
        overlay.getChildren().clear();
        labels.clear();
        labelAnchors.clear();
        PhongMaterial axisMat = new PhongMaterial(Palette.AXIS);
        PhongMaterial gridMat = new PhongMaterial(Palette.GRID.brighter());
        double x0 = k * r.dMin();
        double x1 = k * r.dMax();
        Point3D o = new Point3D(x0, -r.hMin(), r.pMin());
        axes.getChildren().add(Segments.between(o, new Point3D(x1, -r.hMin(), r.pMin()), 0.09, axisMat));
        axes.getChildren().add(Segments.between(o, new Point3D(x0, -r.hMax(), r.pMin()), 0.09, axisMat));
        axes.getChildren().add(Segments.between(o, new Point3D(x0, -r.hMin(), r.pMax()), 0.09, axisMat));
        // δD ticks: every 2 MPa^½ of δD (4 of 2δD), with a floor grid line across δP
        for (double d = r.dMin(); d <= r.dMax() + 1e-9; d += AxisRanges.D_STEP) {
            double x = k * d;
            if (d > r.dMin()) {
                axes.getChildren().add(Segments.between(new Point3D(x, 0, r.pMin()), new Point3D(x, 0, r.pMax()), 0.03, gridMat));
            }
            label(Numbers.plain(k * d), new Point3D(x, 0, r.pMin() - 2.2), "tick");
        }
        double pStep = r.phStep(r.pMax() - r.pMin());
        for (double p = r.pMin(); p <= r.pMax() + 1e-9; p += pStep) {
            if (p > r.pMin()) {
                axes.getChildren().add(Segments.between(new Point3D(x0, 0, p), new Point3D(x1, 0, p), 0.03, gridMat));
            }
            if (p > r.pMin()) {
                label(Numbers.plain(p), new Point3D(x0 - 2.2, 0, p), "tick");
            }
        }
        double hStep = r.phStep(r.hMax() - r.hMin());
        for (double h = r.hMin(); h <= r.hMax() + 1e-9; h += hStep) {
            if (h > r.hMin()) {
                axes.getChildren().add(Segments.between(new Point3D(x0, -h, r.pMin()), new Point3D(x0 + 1.2, -h, r.pMin()), 0.06, axisMat));
                axes.getChildren().add(Segments.between(new Point3D(x0, -h, r.pMin()), new Point3D(x0, -h, r.pMin() + 1.2), 0.06, axisMat));
            }
            if (h > r.hMin()) {
                label(Numbers.plain(h), new Point3D(x0 - 1.8, -h, r.pMin() - 1.8), "tick");
            }
        }
        label((k == 2 ? "2δD" : "δD") + " (MPa½)", new Point3D(x1 + 9, 0, r.pMin() - 3), "axis-title");
        label("δP (MPa½)", new Point3D(x0 - 3, 0, r.pMax() + 7), "axis-title");
        label("δH (MPa½)", new Point3D(x0, -r.hMax() - 4, r.pMin()), "axis-title");
        overlay.getChildren().add(hover);
    }

    private void label(String text, Point3D anchor, String style) {
        Label l = new Label(text);
        l.getStyleClass().addAll("plot-label", "plot-" + style);
        l.setManaged(false);
        labels.add(l);
        labelAnchors.add(anchor);
        overlay.getChildren().add(l);
    }

    /** Places every label at the screen position of its 3D anchor (centred on it). */
    /**
     * Places every label over its projected anchor, then hides the tick labels that would overlap a label already
     * placed: axis titles first, then the ticks in axis order, so at a steep angle every other tick goes, never a title.
     */
    private void layoutLabels() {
        List<javafx.geometry.Bounds> placed = new ArrayList<>();
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < labels.size(); i++) {
            if (labels.get(i).getStyleClass().contains("plot-axis-title")) {
                order.add(0, i);
            } else {
                order.add(i);
            }
        }
        for (int i : order) {
            Label l = labels.get(i);
            Point3D s = world.localToScene(labelAnchors.get(i), true);
            Point2D local = overlay.sceneToLocal(s.getX(), s.getY());
            l.autosize();
            if (local == null) {
                continue;
            }
            l.relocate(local.getX() - l.getWidth() / 2, local.getY() - l.getHeight() / 2);
            javafx.geometry.Bounds b = new javafx.geometry.BoundingBox(l.getLayoutX() - 2, l.getLayoutY(), l.getWidth() + 4, l.getHeight());
            boolean clash = placed.stream().anyMatch(b::intersects);
            boolean title = l.getStyleClass().contains("plot-axis-title");
            l.setVisible(title || !clash);
            if (l.isVisible()) {
                placed.add(b);
            }
        }
    }

    /** The labels drawn over the 3D view now (for tests: none may overlap another). */
    public List<Label> visibleLabels() {
        return labels.stream().filter(Label::isVisible).toList();
    }

    private void buildPoints() {
        pointGroup.getChildren().clear();
        List<Colouring.Category> cats = model.colouringProperty().get().categories();
        categoryMaterials.clear();
        List<List<PlotPoint>> byCat = new ArrayList<>();
        for (Colouring.Category c : cats) {
            byCat.add(new ArrayList<>());
            PhongMaterial m = new PhongMaterial(c.colour());
            m.setSpecularColor(Color.gray(0.35));
            m.setSpecularPower(24);
            categoryMaterials.add(m);
        }
        for (PlotPoint p : model.points()) {
            byCat.get(Math.min(p.category(), cats.size() - 1)).add(p);
        }
        for (int c = 0; c < cats.size(); c++) {
            List<PlotPoint> pts = byCat.get(c);
            if (pts.isEmpty()) {
                continue;
            }
            List<Point3D> centres = pts.stream().map(p -> world(p.hansen())).toList();
            MeshView mv = new MeshView(PointMesh.of(centres, POINT_RADIUS));
            mv.setMaterial(categoryMaterials.get(c));
            mv.setCullFace(CullFace.NONE);
            mv.setUserData(List.copyOf(pts));
            mv.setId("points-" + cats.get(c).label().split("[ ,(]")[0].toLowerCase(Locale.ROOT) + "-" + c);
            mv.getStyleClass().add("point-cloud");
            pointGroup.getChildren().add(mv);
        }
    }

    private void placeTarget() {
        SolubilitySphere t = model.targetSphere();
        targetSphere.setVisible(t != null);
        targetCentre.setVisible(t != null);
        if (t == null) {
            return;
        }
        Point3D c = world(t.centre());
        double k = model.doubledDdProperty().get() ? 2 : 1;
        targetSphere.setRadius(t.r0());
        // Ra² = 4ΔδD² + ΔδP² + ΔδH²: the sphere spans ±R0/2 in δD, so ±R0 on a 2δD axis and ±R0/2 on a δD axis
        targetSphere.setScaleX(k / 2);
        for (Node n : List.of(targetSphere, targetCentre)) {
            n.setTranslateX(c.getX());
            n.setTranslateY(c.getY());
            n.setTranslateZ(c.getZ());
        }
    }

    private void placeSelection() {
        Solvent s = session.selectedSolventProperty().get();
        if (s == null || !s.hasHansen()) {
            selectedMarker.setVisible(false);
            return;
        }
        Point3D p = world(s.hansen());
        selectedMarker.setTranslateX(p.getX());
        selectedMarker.setTranslateY(p.getY());
        selectedMarker.setTranslateZ(p.getZ());
        selectedMarker.setVisible(true);
    }

    private void drawBlend() {
        blendGroup.getChildren().clear();
        Blend b = session.selectedBlendProperty().get();
        if (b == null || !b.hasHansen()) {
            return;
        }
        Point3D m = world(b.hansen());
        PhongMaterial mat = new PhongMaterial(Palette.BLEND);
        Box marker = new Box(1.1, 1.1, 1.1);
        marker.setId("blend-point");
        marker.setMaterial(mat);
        marker.getTransforms().addAll(new Translate(m.getX(), m.getY(), m.getZ()), new Rotate(45, Rotate.Z_AXIS), new Rotate(35, Rotate.X_AXIS));
        blendGroup.getChildren().add(marker);
        Group links = new Group();
        links.setId("blend-links");
        PhongMaterial linkMat = new PhongMaterial(Palette.BLEND.deriveColor(0, 1, 0.85, 1));
        for (BlendComponent c : b.components()) {
            links.getChildren().add(Segments.between(m, world(c.solvent().hansen()), 0.07, linkMat));
        }
        blendGroup.getChildren().add(links);
    }

    private void drawPath() {
        pathGroup.getChildren().clear();
        List<HansenParameters> path = session.dryingPathProperty().get();
        if (path == null || path.size() < 2) {
            return;
        }
        PhongMaterial mat = new PhongMaterial(Palette.SELECTION);
        Point3D prev = world(path.get(0));
        for (int i = 1; i < path.size(); i++) {
            Point3D next = world(path.get(i));
            if (next.distance(prev) > 1e-6) {
                pathGroup.getChildren().add(Segments.between(prev, next, 0.11, mat));
                prev = next;
            }
        }
        Sphere end = new Sphere(0.35, 12);
        end.setId("drying-path-end");
        end.setMaterial(mat);
        end.setTranslateX(prev.getX());
        end.setTranslateY(prev.getY());
        end.setTranslateZ(prev.getZ());
        pathGroup.getChildren().add(end);
    }
}
