package org.cohesa.desktop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.application.ConditionalFeature;
import javafx.application.Platform;
import javafx.geometry.Point3D;
import javafx.scene.Node;
import javafx.scene.PerspectiveCamera;
import javafx.scene.SubScene;
import javafx.scene.control.TableView;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.PhongMaterial;
import javafx.scene.shape.Sphere;
import javafx.stage.Stage;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.desktop.space.Space3DView;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The 3D view through its scene graph (works headless, where nothing 3D is rendered), and its pixels where
 * 3D renders (under Xvfb with -Pxvfb).
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
    void sceneGraphShowsEveryLiquidTheTargetAndTheSelection(FxRobot robot) throws Exception {
        fx.awaitLibrary();
        // a typed-in sphere (values invented for the test)
        robot.interact(() -> {
            fx.workbench.show(Screen.SPACE);
            fx.session.targetProperty().set(new TargetChoice("test sphere", SolubilitySphere.of(18, 8, 7, 6), "test"));
        });
        SubScene sub = robot.lookup("#space3d").queryAs(SubScene.class);
        assertTrue(sub.getCamera() instanceof PerspectiveCamera);
        assertTrue(sub.isDepthBuffer());
        Space3DView view = fx.workbench.spaceView().view3d();
        long withParameters = fx.session.solvents().stream().filter(Solvent::hasHansen).count();
        assertEquals(withParameters, view.pointCount(), "one point per liquid with Hansen parameters");

        Sphere sphere = (Sphere) sub.getRoot().lookup("#target-sphere");
        assertTrue(sphere.isVisible());
        // an opaque wire cage: points inside keep their hue (no translucent surface blends over them)
        assertEquals(1.0, ((PhongMaterial) sphere.getMaterial()).getDiffuseColor().getOpacity(), 1e-12);
        assertEquals(javafx.scene.shape.DrawMode.LINE, sphere.getDrawMode());
        // zoom centres on the target: its projected place on the screen (x / depth, y / depth) stays while the camera moves
        javafx.scene.Node centreNode = sub.getRoot().lookup("#target-centre");
        Point3D before = centreNode.localToScene(0, 0, 0);
        double camBefore = sub.getCamera().getTranslateZ();
        robot.interact(() -> view.zoomBy(0.5));
        Point3D after = centreNode.localToScene(0, 0, 0);
        double camAfter = sub.getCamera().getTranslateZ();
        assertTrue(Math.abs(camAfter) < Math.abs(camBefore), "the camera moved in");
        assertEquals(before.getX() / (before.getZ() - camBefore), after.getX() / (after.getZ() - camAfter), 1e-9, "target keeps its x on screen");
        assertEquals(before.getY() / (before.getZ() - camBefore), after.getY() / (after.getZ() - camAfter), 1e-9, "target keeps its y on screen");
        robot.interact(view::resetView);

        // no tick label covers another, at the starting angle and turned steeply
        for (double turn : new double[] {0, 70}) {
            robot.interact(() -> view.rotateBy(turn, turn / 2));
            var shown = view.visibleLabels();
            for (int i = 0; i < shown.size(); i++) {
                for (int j = i + 1; j < shown.size(); j++) {
                    var a = shown.get(i);
                    var b = shown.get(j);
                    boolean overlap = a.getBoundsInParent().intersects(b.getBoundsInParent());
                    boolean titles = a.getStyleClass().contains("plot-axis-title") && b.getStyleClass().contains("plot-axis-title");
                    assertFalse(overlap && !titles, a.getText() + " overlaps " + b.getText() + " after turning " + turn + "°");
                }
            }
        }
        robot.interact(view::resetView);
        assertEquals(6, sphere.getRadius(), 1e-12);
        // with the doubled δD axis the sphere is round (Hansen 2007, ch. 1: Ra uses 4ΔδD²)
        assertEquals(1.0, sphere.getScaleX(), 1e-12);

        // world positions follow the parameters: toluene vs ethanol (library values, whatever they are)
        Solvent tol = find("toluene");
        Solvent eth = find("ethanol");
        Point3D pt = view.scenePositionOf("toluene");
        Point3D pe = view.scenePositionOf("ethanol");
        assertNotNull(pt);
        Point3D centre = sub.getRoot().lookup("#target-centre").localToScene(0, 0, 0);
        // the 3D world is rotated, so compare distances, which rotation keeps: with 2δD on the axis the
        // Euclidean distance between two points is the Hansen distance Ra
        double ra = Math.sqrt(4 * Math.pow(tol.hansen().dD() - eth.hansen().dD(), 2) + Math.pow(tol.hansen().dP() - eth.hansen().dP(), 2)
                + Math.pow(tol.hansen().dH() - eth.hansen().dH(), 2));
        assertEquals(ra, pt.distance(pe), 1e-6);
        double raTarget = SolubilitySphere.of(18, 8, 7, 6).ra(tol.hansen());
        assertEquals(raTarget, pt.distance(centre), 1e-6);

        // undoubled: the sphere becomes an ellipsoid with half the extent along δD
        robot.interact(() -> fx.workbench.spaceModel().doubledDdProperty().set(false));
        assertEquals(0.5, ((Sphere) sub.getRoot().lookup("#target-sphere")).getScaleX(), 1e-12);
        robot.interact(() -> fx.workbench.spaceModel().doubledDdProperty().set(true));

        // selecting in the library table rings the point in 3D
        Node marker = sub.getRoot().lookup("#selected-point");
        assertFalse(marker.isVisible());
        @SuppressWarnings("unchecked")
        TableView<Solvent> table = robot.lookup("#solvent-table").queryAs(TableView.class);
        robot.interact(() -> {
            for (int i = 0; i < table.getItems().size(); i++) {
                if (table.getItems().get(i).name().equals("toluene")) {
                    table.getSelectionModel().clearAndSelect(i);
                }
            }
        });
        assertTrue(marker.isVisible());
        assertEquals(0, marker.localToScene(0, 0, 0).distance(view.scenePositionOf("toluene")), 1e-6);
    }

    @Test
    void rendersRealPixelsWhereThreeDIsSupported(FxRobot robot) throws Exception {
        Assumptions.assumeTrue(Platform.isSupported(ConditionalFeature.SCENE3D), "3D is not rendered here (headless Monocle); run with -Pxvfb");
        fx.awaitLibrary();
        robot.interact(() -> fx.workbench.show(Screen.SPACE));
        SubScene sub = robot.lookup("#space3d").queryAs(SubScene.class);
        WritableImage[] img = new WritableImage[1];
        robot.interact(() -> img[0] = sub.snapshot(null, null));
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
    }
}
