package org.cohesa.core.geometry;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.apache.commons.math3.geometry.euclidean.threed.Rotation;
import org.apache.commons.math3.geometry.euclidean.threed.RotationConvention;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

class OrbitProjectionTest {

    private static final double EPS = 1e-12;

    @Test
    void quarterTurnsWorkedByHand() {
        // common practice, no source: a right-handed quarter turn about +y takes +x to −z and +z to +x
        OrbitProjection yaw90 = new OrbitProjection(90, 0, 100);
        assertArrayEquals(new double[] {0, 0, -1}, yaw90.turn(1, 0, 0), EPS);
        assertArrayEquals(new double[] {1, 0, 0}, yaw90.turn(0, 0, 1), EPS);
        assertArrayEquals(new double[] {0, 1, 0}, yaw90.turn(0, 1, 0), EPS);
        // a right-handed quarter turn about +x takes +y to +z (the top comes towards the viewer) and +z to −y
        OrbitProjection pitch90 = new OrbitProjection(0, 90, 100);
        assertArrayEquals(new double[] {0, 0, 1}, pitch90.turn(0, 1, 0), EPS);
        assertArrayEquals(new double[] {0, -1, 0}, pitch90.turn(0, 0, 1), EPS);
        // yaw first, then pitch: +x → (yaw) −z → (pitch) +y
        assertArrayEquals(new double[] {0, 1, 0}, new OrbitProjection(90, 90, 100).turn(1, 0, 0), EPS);
    }

    @Test
    void thirtyDegreeTurnWorkedByHand() {
        // common practice, no source: yaw 30° takes (1, 0, 0) to (cos 30°, 0, −sin 30°) = (0.8660…, 0, −0.5)
        assertArrayEquals(new double[] {Math.sqrt(3) / 2, 0, -0.5}, new OrbitProjection(30, 0, 50).turn(1, 0, 0), EPS);
        // then pitch 30° on (0.866, 0, −0.5): v = y cos b − z sin b = 0.5 · 0.5 = 0.25, w = y sin b + z cos b = −0.5 · 0.866 = −0.433
        assertArrayEquals(new double[] {Math.sqrt(3) / 2, 0.25, -Math.sqrt(3) / 4}, new OrbitProjection(30, 30, 50).turn(1, 0, 0), EPS);
    }

    @Test
    void agreesWithCommonsMathRotation() {
        // reference: Apache Commons Math 3.6.1, Rotation with the vector-operator convention (right-handed turns)
        Random rnd = new Random(7);
        for (int k = 0; k < 200; k++) {
            double yaw = rnd.nextDouble() * 720 - 360;
            double pitch = rnd.nextDouble() * 180 - 90;
            Rotation ry = new Rotation(Vector3D.PLUS_J, Math.toRadians(yaw), RotationConvention.VECTOR_OPERATOR);
            Rotation rx = new Rotation(Vector3D.PLUS_I, Math.toRadians(pitch), RotationConvention.VECTOR_OPERATOR);
            Rotation both = rx.compose(ry, RotationConvention.VECTOR_OPERATOR); // first ry, then rx
            Vector3D p = new Vector3D(rnd.nextGaussian() * 20, rnd.nextGaussian() * 20, rnd.nextGaussian() * 20);
            Vector3D expected = both.applyTo(p);
            double[] got = new OrbitProjection(yaw, pitch, 80).turn(p.getX(), p.getY(), p.getZ());
            assertArrayEquals(expected.toArray(), got, 1e-9, "yaw " + yaw + " pitch " + pitch);
        }
    }

    @Test
    void turningKeepsDistances() {
        OrbitProjection o = new OrbitProjection(-37, 21, 90);
        double[] a = o.turn(3, -4, 12);
        assertEquals(13, Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]), 1e-12);
    }

    @Test
    void perspectiveWorkedByHand() {
        OrbitProjection o = new OrbitProjection(0, 0, 100);
        // at the pivot's depth nothing changes; halfway to the eye everything is twice as large; twice as far, half
        assertEquals(1, o.perspective(0), EPS);
        assertEquals(2, o.perspective(50), EPS);
        assertEquals(0.5, o.perspective(-100), EPS);
        double[] u = new double[2];
        double[] v = new double[2];
        double[] w = new double[2];
        o.projectAll(new double[] {10, 5, 0, 10, 5, 50}, 2, u, v, w);
        assertArrayEquals(new double[] {10, 20}, u, EPS);
        assertArrayEquals(new double[] {5, 10}, v, EPS);
        assertArrayEquals(new double[] {0, 50}, w, EPS);
    }

    @Test
    void fitCentresTheContentWithTheMargin() {
        // content 40 × 10 plane units into 1000 × 500 px with 50 px margins: the width limits, 900 / 40 = 22.5 px per unit
        OrbitProjection.Fit f = OrbitProjection.fit(-10, 30, 0, 10, 1000, 500, 50);
        assertEquals(22.5, f.scale(), EPS);
        assertEquals(50, f.offsetX() + f.scale() * -10, EPS);
        assertEquals(950, f.offsetX() + f.scale() * 30, EPS);
        // vertically centred: v 0..10 → 225 px tall, centred on 250
        assertEquals(250 + 112.5, f.offsetY() - f.scale() * 0, EPS);
        assertEquals(250 - 112.5, f.offsetY() - f.scale() * 10, EPS);
    }

    @Test
    void refusesANonPositiveEye() {
        assertThrows(IllegalArgumentException.class, () -> new OrbitProjection(0, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new OrbitProjection(Double.NaN, 0, 10));
    }
}
