package org.cohesa.core.hsp;

import java.util.List;

/**
 * "How far inside, and which way out": the geometry the case's parameter panel draws.
 *
 * <p>In the scaled space (2δD, δP, δH) the Hansen distance Ra² = 4ΔδD² + ΔδP² + ΔδH² is the plain Euclidean distance
 * (Hansen, <i>Hansen Solubility Parameters: A User's Handbook</i>, 2nd ed., CRC Press 2007, ch. 1), so the sphere of
 * RED = r is round there, of radius r·R0 (MPa½). Its projection onto a coordinate plane is a circle of the same radius
 * (the silhouette: a point drawn outside it is outside in 3D too), and the plane through a liquid cuts the RED = 1
 * sphere in a circle of radius √(R0² − h²), h being the liquid's offset along the hidden axis. The shortest way out
 * of the sphere is radially away from the centre; each axis' share of Ra² says which parameter carries the liquid
 * towards the surface.
 */
public final class InsideOut {

    /** A coordinate plane of the scaled space: horizontal axis, vertical axis, and the hidden one. */
    public enum Plane {
        P_H("δP", "δH", 1, 2, 0),
        D_P("2δD", "δP", 0, 1, 2),
        D_H("2δD", "δH", 0, 2, 1);

        private final String x;
        private final String y;
        private final int xi;
        private final int yi;
        private final int hidden;

        Plane(String x, String y, int xi, int yi, int hidden) {
            this.x = x;
            this.y = y;
            this.xi = xi;
            this.yi = yi;
            this.hidden = hidden;
        }

        public String xTitle() {
            return x;
        }

        public String yTitle() {
            return y;
        }

        /** The point's horizontal coordinate in this plane, MPa½ (2δD for the δD axis). */
        public double x(HansenParameters p) {
            return scaled(p)[xi];
        }

        public double y(HansenParameters p) {
            return scaled(p)[yi];
        }

        /** The point's coordinate along the axis this plane hides, MPa½. */
        public double hidden(HansenParameters p) {
            return scaled(p)[hidden];
        }
    }

    /**
     * Where a liquid stands: RED, how far it is from the surface, and each axis' share of Ra².
     *
     * @param red     RED = Ra / R0
     * @param margin  R0 − Ra, MPa½: positive inside (distance to the surface), negative outside
     * @param shareD  4ΔδD² / Ra²
     * @param shareP  ΔδP² / Ra²
     * @param shareH  ΔδH² / Ra²
     */
    public record Standing(double red, double margin, double shareD, double shareP, double shareH) {

        /** The parameter that carries the liquid most towards the surface ("δD", "δP" or "δH"), or null at the centre. */
        public String mainAxis() {
            if (shareD + shareP + shareH == 0) {
                return null;
            }
            return shareD >= shareP && shareD >= shareH ? "δD" : shareP >= shareH ? "δP" : "δH";
        }
    }

    private InsideOut() {
    }

    /** (2δD, δP, δH), MPa½. */
    static double[] scaled(HansenParameters p) {
        return new double[] {2 * p.dD(), p.dP(), p.dH()};
    }

    public static Standing standing(SolubilitySphere target, HansenParameters p) {
        HansenParameters c = target.centre();
        double d = 4 * (p.dD() - c.dD()) * (p.dD() - c.dD());
        double pp = (p.dP() - c.dP()) * (p.dP() - c.dP());
        double h = (p.dH() - c.dH()) * (p.dH() - c.dH());
        double ra2 = d + pp + h;
        double ra = Math.sqrt(ra2);
        return ra2 == 0 ? new Standing(0, target.r0(), 0, 0, 0)
                : new Standing(ra / target.r0(), target.r0() - ra, d / ra2, pp / ra2, h / ra2);
    }

    /**
     * The plane that shows the points best: the one with the largest spread of their offsets from the centre in it
     * (the sum of squared in-plane offsets), so the hidden axis is the one along which they differ least. δP–δH when
     * there are no points (the plane practitioners read first, common practice, no source).
     */
    public static Plane bestPlane(SolubilitySphere target, List<HansenParameters> points) {
        Plane best = Plane.P_H;
        double bestSpread = -1;
        for (Plane pl : Plane.values()) {
            double s = 0;
            for (HansenParameters p : points) {
                double dx = pl.x(p) - pl.x(target.centre());
                double dy = pl.y(p) - pl.y(target.centre());
                s += dx * dx + dy * dy;
            }
            if (s > bestSpread + 1e-9) {
                bestSpread = s;
                best = pl;
            }
        }
        return best;
    }

    /**
     * Radius of the circle in which the plane through {@code p} (parallel to {@code plane}) cuts the sphere RED = 1,
     * MPa½; 0 when that plane misses the sphere.
     */
    public static double sliceRadius(SolubilitySphere target, Plane plane, HansenParameters p) {
        double h = plane.hidden(p) - plane.hidden(target.centre());
        double r2 = target.r0() * target.r0() - h * h;
        return r2 > 0 ? Math.sqrt(r2) : 0;
    }
}
