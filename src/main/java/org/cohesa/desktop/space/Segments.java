package org.cohesa.desktop.space;

import javafx.geometry.Point3D;
import javafx.scene.paint.Material;
import javafx.scene.shape.Cylinder;
import javafx.scene.transform.Rotate;
import javafx.scene.transform.Translate;

/** Straight 3D lines drawn as thin cylinders (JavaFX has no 3D line primitive). */
final class Segments {

    private Segments() {
    }

    static Cylinder between(Point3D a, Point3D b, double radius, Material material) {
        Point3D diff = b.subtract(a);
        double h = Math.max(diff.magnitude(), 1e-6);
        Point3D mid = a.midpoint(b);
        Cylinder c = new Cylinder(radius, h, 8);
        c.setMaterial(material);
        c.getTransforms().add(new Translate(mid.getX(), mid.getY(), mid.getZ()));
        Point3D axis = diff.crossProduct(Rotate.Y_AXIS);
        double angle = Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, diff.normalize().dotProduct(Rotate.Y_AXIS)))));
        if (axis.magnitude() > 1e-9) {
            c.getTransforms().add(new Rotate(-angle, axis));
        }
        return c;
    }
}
