package org.cohesa.core.geometry;

/**
 * Turns points about a pivot and projects them onto a screen plane with a mild perspective: the maths of the
 * desktop's 3D parameter view, kept here so it is tested apart from any drawing.
 *
 * <p>Coordinates are right-handed, relative to the pivot: x to the right, y up, z towards the viewer. The view
 * first turns the points by {@code yaw} about the vertical (y) axis, then by {@code pitch} about the horizontal
 * (x) axis, both right-handed (a positive pitch brings the top of the scene towards the viewer, so a floor
 * is seen from above). In camera space (u right, v up, w towards the eye) the eye sits at w = {@code eye}; a
 * point at camera depth w is scaled by eye / (eye − w), so points at the pivot's depth keep their size, nearer ones
 * grow. The rotation matrices and the pinhole division are common practice, no source (any computer-graphics
 * text; the tests check them against a hand-worked turn and against Commons Math's {@code Rotation}).
 *
 * @param yawDegrees   turn about the vertical axis, degrees
 * @param pitchDegrees turn about the horizontal axis, degrees
 * @param eye          distance from the pivot to the eye, in the points' units (&gt; 0); larger is flatter
 */
public record OrbitProjection(double yawDegrees, double pitchDegrees, double eye) {

    public OrbitProjection {
        if (!Double.isFinite(yawDegrees) || !Double.isFinite(pitchDegrees)) {
            throw new IllegalArgumentException("yaw and pitch must be finite: " + yawDegrees + ", " + pitchDegrees);
        }
        if (!(eye > 0) || !Double.isFinite(eye)) {
            throw new IllegalArgumentException("eye distance must be positive: " + eye);
        }
    }

    /** The 3×3 rotation, row-major: camera = M · point, M = Rx(pitch) · Ry(yaw). */
    public double[] matrix() {
        double a = Math.toRadians(yawDegrees);
        double b = Math.toRadians(pitchDegrees);
        double ca = Math.cos(a);
        double sa = Math.sin(a);
        double cb = Math.cos(b);
        double sb = Math.sin(b);
        // Ry(a) = [ca 0 sa; 0 1 0; -sa 0 ca], Rx(b) = [1 0 0; 0 cb -sb; 0 sb cb]
        return new double[] {
            ca, 0, sa,
            sb * sa, cb, -sb * ca,
            -cb * sa, sb, cb * ca};
    }

    /** The point turned into camera space: {u, v, w}. */
    public double[] turn(double x, double y, double z) {
        double[] m = matrix();
        return new double[] {
            m[0] * x + m[1] * y + m[2] * z,
            m[3] * x + m[4] * y + m[5] * z,
            m[6] * x + m[7] * y + m[8] * z};
    }

    /** The perspective factor eye / (eye − w) for a camera depth w (w &lt; eye: in front of the eye). */
    public double perspective(double w) {
        return eye / Math.max(eye * 1e-3, eye - w);
    }

    /**
     * Projects many points at once (the view redraws thousands each frame, so no objects per point): for point i,
     * {@code xyz[3i..3i+2]} relative to the pivot, writes the projected plane coordinates {@code u[i]}, {@code v[i]}
     * (v up) and the camera depth {@code w[i]} (larger is nearer the eye: draw in increasing w).
     */
    public void projectAll(double[] xyz, int count, double[] u, double[] v, double[] w) {
        double[] m = matrix();
        for (int i = 0; i < count; i++) {
            double x = xyz[3 * i];
            double y = xyz[3 * i + 1];
            double z = xyz[3 * i + 2];
            double cu = m[0] * x + m[1] * y + m[2] * z;
            double cv = m[3] * x + m[4] * y + m[5] * z;
            double cw = m[6] * x + m[7] * y + m[8] * z;
            double f = perspective(cw);
            u[i] = cu * f;
            v[i] = cv * f;
            w[i] = cw;
        }
    }

    /**
     * The scale and offset that fit projected bounds into a frame with a margin: the content spans
     * [uMin, uMax] × [vMin, vMax] in plane units; the frame is width × height pixels with {@code margin} pixels kept
     * free on each side. The result maps a plane point to pixels as x = offsetX + scale·u, y = offsetY − scale·v
     * (pixel y grows downwards), centring the content.
     */
    public static Fit fit(double uMin, double uMax, double vMin, double vMax, double width, double height, double margin) {
        double spanU = Math.max(1e-9, uMax - uMin);
        double spanV = Math.max(1e-9, vMax - vMin);
        double freeW = Math.max(1, width - 2 * margin);
        double freeH = Math.max(1, height - 2 * margin);
        double scale = Math.min(freeW / spanU, freeH / spanV);
        double offsetX = width / 2 - scale * (uMin + uMax) / 2;
        double offsetY = height / 2 + scale * (vMin + vMax) / 2;
        return new Fit(scale, offsetX, offsetY);
    }

    /** Plane-to-pixel mapping: x = offsetX + scale·u, y = offsetY − scale·v. */
    public record Fit(double scale, double offsetX, double offsetY) {
    }
}
