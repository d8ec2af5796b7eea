package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import javafx.geometry.Point2D;
import javafx.geometry.Point3D;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.TableView;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.desktop.space.Space3DView;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The 3D view: what it draws where (fit, zoom about the target, labels that keep clear, picking, the marks) and its
 * pixels. The view is drawn by our own projection onto an image, so all of it runs headless as well as under Xvfb.
 */
@ExtendWith(ApplicationExtension.class)
class Space3DViewTest {

    private DesktopFixture fx;

    @Start
    void start(Stage stage) throws Exception {
        fx = new DesktopFixture(stage);
    }

    private Solvent find(String name) {
        return fx.session.solvents().stream().filter(s -> s.name().equalsIgnoreCase(name)).findFirst().orElseThrow();
    }

    @Test
    void showsEveryLiquidTheTargetAndTheSelectionAndFitsTheFrame(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // a typed-in sphere (values invented for the test)
        robot.interact(() -> {
            fx.workbench.show(Screen.SPACE);
            fx.session.targetProperty().set(new TargetChoice("test sphere", SolubilitySphere.of(18, 8, 7, 6), "test"));
        });
        Space3DView view = fx.workbench.spaceView().view3d();
        Canvas canvas = robot.lookup("#space3d").queryAs(Canvas.class);
        long withParameters = fx.session.solvents().stream().filter(Solvent::hasHansen).count();
        assertEquals(withParameters, view.pointCount(), "one point per liquid with Hansen parameters");

        // framed to every liquid, the scene fits its frame: every point and the target's outline inside, with the margin
        robot.interact(() -> {
            view.framingProperty().set(Space3DView.Framing.ALL);
            view.resetView();
        });
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        assertTrue(w > 300 && h > 200, "the view has room: " + w + "×" + h);
        for (double[] d : onFx(robot, view::drawnDiscs)) {
            assertTrue(d[0] >= 10 && d[0] <= w - 10 && d[1] >= 10 && d[1] <= h - 10, "point at " + d[0] + "," + d[1] + " in " + w + "×" + h);
        }
        Point2D centre = onFx(robot, view::pivotScreenPosition);
        double r = onFx(robot, view::targetScreenRadius);
        assertTrue(r > 5, "the target is drawn: outline radius " + r);
        assertTrue(centre.getX() - r >= 0 && centre.getX() + r <= w && centre.getY() - r >= 0 && centre.getY() + r <= h, "the target fits");

        // zoom centres on the target: its place on the screen stays while the rest grows
        Point2D tolBefore = onFx(robot, () -> view.screenPositionOf("toluene"));
        robot.interact(() -> view.zoomBy(2));
        Point2D after = onFx(robot, view::pivotScreenPosition);
        assertEquals(centre.getX(), after.getX(), 1e-9, "target keeps its x on screen");
        assertEquals(centre.getY(), after.getY(), 1e-9, "target keeps its y on screen");
        assertEquals(2 * r, onFx(robot, view::targetScreenRadius), 1e-9, "the outline doubles");
        Point2D tolAfter = onFx(robot, () -> view.screenPositionOf("toluene"));
        assertEquals(2 * tolBefore.distance(centre), tolAfter.distance(after), 1e-6, "a point twice as far from the target on screen");
        robot.interact(view::resetView);

        // tick labels never cover each other, a point or the target, at the starting angle and turned steeply
        for (double[] turn : new double[][] {{0, 0}, {70, 35}, {95, -40}, {150, 30}}) {
            robot.interact(() -> view.rotateBy(turn[0], turn[1]));
            List<Space3DView.PlacedLabel> shown = onFx(robot, view::visibleLabels);
            List<double[]> discs = onFx(robot, view::drawnDiscs);
            assertTrue(shown.stream().anyMatch(l -> l.kind().equals("tick")), "some ticks stay after turning " + Arrays.toString(turn));
            for (Space3DView.PlacedLabel a : shown) {
                if (!a.kind().equals("tick")) {
                    continue;
                }
                for (Space3DView.PlacedLabel b : shown) {
                    boolean overlap = a != b && a.x() < b.x() + b.width() && b.x() < a.x() + a.width() && a.y() < b.y() + b.height()
                            && b.y() < a.y() + a.height();
                    assertFalse(overlap, a.text() + " overlaps " + b.text() + " after turning " + Arrays.toString(turn));
                }
                for (double[] d : discs) {
                    double nx = Math.max(a.x(), Math.min(d[0], a.x() + a.width()));
                    double ny = Math.max(a.y(), Math.min(d[1], a.y() + a.height()));
                    assertTrue(Math.hypot(nx - d[0], ny - d[1]) >= d[2], "tick " + a.text() + " covers a point after turning " + Arrays.toString(turn));
                }
            }
            assertEquals(3, shown.stream().filter(l -> l.kind().equals("title")).count(), "the three axis titles stay");
        }
        robot.interact(view::resetView);

        // rotation keeps distances: with 2δD on the axis the distance between two points is the Hansen distance Ra
        Solvent tol = find("toluene");
        Solvent eth = find("ethanol");
        Point3D pt = onFx(robot, () -> view.turnedPositionOf("toluene"));
        Point3D pe = onFx(robot, () -> view.turnedPositionOf("ethanol"));
        assertNotNull(pt);
        double ra = Math.sqrt(4 * Math.pow(tol.hansen().dD() - eth.hansen().dD(), 2) + Math.pow(tol.hansen().dP() - eth.hansen().dP(), 2)
                + Math.pow(tol.hansen().dH() - eth.hansen().dH(), 2));
        assertEquals(ra, pt.distance(pe), 1e-6);
        // the pivot is the target's centre
        assertEquals(SolubilitySphere.of(18, 8, 7, 6).ra(tol.hansen()), pt.distance(Point3D.ZERO), 1e-6);

        // hover names the point under the mouse, with its RED
        Point2D at = onFx(robot, () -> view.screenPositionOf("toluene"));
        String hover = onFx(robot, () -> view.hoverTextAt(at.getX(), at.getY()));
        assertNotNull(hover);
        assertTrue(hover.contains("RED"), hover);

        // selecting in the library table rings and names the point
        @SuppressWarnings("unchecked")
        TableView<Solvent> table = robot.lookup("#solvent-table").queryAs(TableView.class);
        robot.interact(() -> {
            for (int i = 0; i < table.getItems().size(); i++) {
                if (table.getItems().get(i).name().equals("toluene")) {
                    table.getSelectionModel().clearAndSelect(i);
                }
            }
        });
        List<Space3DView.PlacedLabel> marks = onFx(robot, view::visibleLabels).stream().filter(l -> l.kind().equals("mark")).toList();
        assertTrue(marks.stream().anyMatch(l -> l.text().equals("toluene")), "the selected solvent is named: " + marks);
        assertTrue(marks.stream().anyMatch(l -> l.text().startsWith("test sphere")), "the target is named: " + marks);

        // a selected blend is named with its components
        robot.interact(() -> fx.session.selectedBlendProperty().set(new org.cohesa.core.solvent.Blend(
                List.of(new org.cohesa.core.solvent.BlendComponent(tol, 0.6), new org.cohesa.core.solvent.BlendComponent(eth, 0.4)))));
        List<String> names = onFx(robot, view::visibleLabels).stream().filter(l -> l.kind().equals("mark")).map(Space3DView.PlacedLabel::text).toList();
        assertTrue(names.contains("selected blend"), names.toString());
        assertTrue(names.contains("toluene 60 %") && names.contains("ethanol 40 %"), names.toString());
        robot.interact(() -> fx.session.selectedBlendProperty().set(null));

        // undoubled: the target becomes an ellipsoid and the points move closer along δD; distances follow δD, not 2δD
        robot.interact(() -> fx.workbench.spaceModel().doubledDdProperty().set(false));
        Point3D pt1 = onFx(robot, () -> view.turnedPositionOf("toluene"));
        Point3D pe1 = onFx(robot, () -> view.turnedPositionOf("ethanol"));
        double plain = Math.sqrt(Math.pow(tol.hansen().dD() - eth.hansen().dD(), 2) + Math.pow(tol.hansen().dP() - eth.hansen().dP(), 2)
                + Math.pow(tol.hansen().dH() - eth.hansen().dH(), 2));
        assertEquals(plain, pt1.distance(pe1), 1e-6);
        robot.interact(() -> fx.workbench.spaceModel().doubledDdProperty().set(true));
    }

    @Test
    void pointsKeepTheirPaletteColourInsideTheTarget(FxRobot robot) throws Exception {
        // the canvas view draws under headless Monocle as well, so its pixels are checked in every run
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.workbench.show(Screen.SPACE);
            fx.session.targetProperty().set(new TargetChoice("wide test sphere", SolubilitySphere.of(17, 8, 8, 9), "test"));
        });
        Space3DView view = fx.workbench.spaceView().view3d();
        // zoomed in about the target, so the points inside it spread apart on screen
        robot.interact(() -> {
            view.resetView();
            view.zoomBy(4);
        });
        WritableImage[] img = new WritableImage[1];
        robot.interact(() -> img[0] = view.node().snapshot(null, null));
        int bg = img[0].getPixelReader().getArgb(1, 1);
        int differing = 0;
        for (int y = 0; y < img[0].getHeight(); y += 2) {
            for (int x = 0; x < img[0].getWidth(); x += 2) {
                if (img[0].getPixelReader().getArgb(x, y) != bg) {
                    differing++;
                }
            }
        }
        assertTrue(differing > 500, "points and axes are drawn: " + differing + " sampled pixels differ from the background");
        // a point inside the sphere keeps its hue: no translucent surface is laid over it. The centre pixel of a point
        // inside that no other point touches on screen is exactly its palette colour, unless a cage line crosses it
        java.util.Set<Integer> palette = new java.util.HashSet<>();
        for (var c : fx.workbench.spaceModel().colouringProperty().get().categories()) {
            palette.add(0xFF000000 | ((int) Math.round(c.colour().getRed() * 255) << 16) | ((int) Math.round(c.colour().getGreen() * 255) << 8)
                    | (int) Math.round(c.colour().getBlue() * 255));
        }
        SolubilitySphere t = SolubilitySphere.of(17, 8, 8, 9);
        List<double[]> discs = onFx(robot, view::drawnDiscs);
        List<org.cohesa.desktop.space.PlotPoint> pts = fx.workbench.spaceModel().points();
        int inside = 0;
        int exact = 0;
        for (int i = 0; i < pts.size(); i++) {
            double[] d = discs.get(i);
            boolean alone = true;
            for (int j = 0; j < discs.size() && alone; j++) {
                double[] e = discs.get(j);
                alone = i == j || Math.hypot(d[0] - e[0], d[1] - e[1]) > d[2] + e[2] + 1;
            }
            boolean onImage = d[0] >= 0 && d[1] >= 0 && d[0] < img[0].getWidth() && d[1] < img[0].getHeight();
            if (alone && onImage && t.red(pts.get(i).hansen()) < 0.9) {
                inside++;
                if (palette.contains(img[0].getPixelReader().getArgb((int) d[0], (int) d[1]))) {
                    exact++;
                }
            }
        }
        assertTrue(inside >= 5, "the test sphere holds points that stand alone on screen: " + inside);
        assertTrue(exact >= 0.7 * inside, exact + " of " + inside + " lone points inside the target show their palette colour exactly");
    }

    /**
     * The scene is scaled to its frame by the data (the points and the target), not by the empty box around them: in the
     * wide frame of the window the data reach the margin on the limiting side; and the axis titles, wherever the turn
     * puts their axis' end, stay inside the frame, clear of each other, the points, the target and the tick values.
     */
    @Test
    void theDataFillTheFrameAndTheAxisTitlesKeepClear(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        robot.interact(() -> {
            fx.workbench.show(Screen.SPACE);
            fx.session.targetProperty().set(new TargetChoice("test sphere", SolubilitySphere.of(18, 8, 7, 6), "test"));
        });
        Space3DView view = fx.workbench.spaceView().view3d();
        Canvas canvas = robot.lookup("#space3d").queryAs(Canvas.class);
        double[] radius = new double[2];
        for (Space3DView.Framing framing : Space3DView.Framing.values()) {
        for (double[] turn : new double[][] {{0, 0}, {115, 18}, {-60, 30}, {200, -25}}) {
            robot.interact(() -> {
                view.framingProperty().set(framing);
                view.resetView();
                view.rotateBy(turn[0], turn[1]);
                view.fitToFrame();
            });
            double w = canvas.getWidth();
            double h = canvas.getHeight();
            double minX = Double.MAX_VALUE;
            double maxX = -Double.MAX_VALUE;
            double minY = Double.MAX_VALUE;
            double maxY = -Double.MAX_VALUE;
            List<double[]> discs = onFx(robot, view::drawnDiscs);
            for (double[] d : onFx(robot, view::framedDiscs)) {
                minX = Math.min(minX, d[0]);
                maxX = Math.max(maxX, d[0]);
                minY = Math.min(minY, d[1]);
                maxY = Math.max(maxY, d[1]);
            }
            Point2D c = onFx(robot, view::pivotScreenPosition);
            double r = onFx(robot, view::targetScreenRadius);
            minX = Math.min(minX, c.getX() - r);
            maxX = Math.max(maxX, c.getX() + r);
            minY = Math.min(minY, c.getY() - r);
            maxY = Math.max(maxY, c.getY() + r);
            double margin = 48;
            double fill = Math.max((maxX - minX) / (w - 2 * margin), (maxY - minY) / (h - 2 * margin));
            // common practice, no source: a fitted picture touches the margin on its limiting side (2 % for the disc
            // centres against the cage's outline and the mild perspective)
            assertTrue(fill > 0.9 && fill < 1.02, framing + ": the data fill " + fill + " of the frame " + w + "×" + h + " after " + Arrays.toString(turn));
            assertTrue(minX >= 0 && maxX <= w && minY >= 0 && maxY <= h, framing + ": all framing data inside after " + Arrays.toString(turn));
            if (turn[0] == 0) {
                radius[framing.ordinal()] = r;
            }
            List<Space3DView.PlacedLabel> shown = onFx(robot, view::visibleLabels);
            List<Space3DView.PlacedLabel> titles = shown.stream().filter(l -> l.kind().equals("title")).toList();
            assertEquals(3, titles.size());
            for (Space3DView.PlacedLabel t : titles) {
                assertTrue(t.x() >= 0 && t.y() >= 0 && t.x() + t.width() <= w && t.y() + t.height() <= h,
                        t.text() + " inside the frame after " + Arrays.toString(turn));
                for (Space3DView.PlacedLabel o : shown) {
                    boolean overlap = o != t && t.x() < o.x() + o.width() && o.x() < t.x() + t.width() && t.y() < o.y() + o.height()
                            && o.y() < t.y() + t.height();
                    assertFalse(overlap, t.text() + " overlaps " + o.text() + " after " + Arrays.toString(turn));
                }
                for (double[] d : discs) {
                    double nx = Math.max(t.x(), Math.min(d[0], t.x() + t.width()));
                    double ny = Math.max(t.y(), Math.min(d[1], t.y() + t.height()));
                    assertTrue(Math.hypot(nx - d[0], ny - d[1]) >= d[2], t.text() + " covers a point after " + Arrays.toString(turn));
                }
                double nx = Math.max(t.x(), Math.min(c.getX(), t.x() + t.width()));
                double ny = Math.max(t.y(), Math.min(c.getY(), t.y() + t.height()));
                assertTrue(Math.hypot(nx - c.getX(), ny - c.getY()) >= r, t.text() + " covers the target after " + Arrays.toString(turn));
            }
        }
        }
        // around the target the sphere is drawn larger than with every liquid (water alone sets the height then)
        assertTrue(radius[0] > 1.2 * radius[1], "target radius around it " + radius[0] + " against every liquid " + radius[1]);
        assertEquals(0, onFx(robot, view::pointsOutsideFrame), "framed to every liquid, none lies beyond the frame");
    }

    private static <T> T onFx(FxRobot robot, java.util.function.Supplier<T> s) {
        Object[] out = new Object[1];
        robot.interact(() -> out[0] = s.get());
        @SuppressWarnings("unchecked")
        T t = (T) out[0];
        return t;
    }
}
