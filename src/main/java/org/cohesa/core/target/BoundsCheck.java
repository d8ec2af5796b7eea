package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Plain warnings when the test series does not pin the sphere down: too few results of one kind, a side of the
 * sphere with no non-dissolving liquid near it although the library has liquids there, or a wide confidence box.
 */
final class BoundsCheck {

    /** Cosine of the half-angle of the cone that counts as "on that side" (60°). */
    private static final double CONE = 0.5;
    /** A liquid beyond this RED says little about where the surface is. */
    private static final double NEAR_RED = 2.0;

    private static final String[] AXES = {"δD", "δP", "δH"};

    private BoundsCheck() {
    }

    static List<String> warnings(SphereFitter.Data data, double[] best, Interval[] box, List<TestResult> results,
                                 List<NamedPoint> untested) {
        List<String> out = new ArrayList<>();
        long good = results.stream().filter(TestResult::good).count();
        long bad = results.size() - good;
        if (bad == 0) {
            out.add("no liquid failed to dissolve the material: R0 is not bounded from outside; test liquids further from the centre");
        } else if (bad < 3) {
            out.add("only " + bad + " liquid(s) failed to dissolve the material: the surface is poorly bounded from outside");
        }
        if (good < 3) {
            out.add("only " + good + " liquid(s) dissolved the material: the centre is poorly defined");
        }
        double[] c = {best[0], best[1], best[2]};
        for (int axis = 0; axis < 3; axis++) {
            for (int sign = -1; sign <= 1; sign += 2) {
                if (!hasBadNear(data, c, best[3], axis, sign)) {
                    String example = reachable(untested, c, best[3], axis, sign);
                    if (example != null) {
                        out.add("no non-dissolving liquid was tested near the sphere on the " + (sign > 0 ? "high-" : "low-") + AXES[axis]
                                + " side, where the library has liquids (e.g. " + example + "): the sphere may reach further that way");
                    }
                }
            }
        }
        double r0 = best[3];
        if (box[0].width() > 0.25 * r0 || box[1].width() > 0.5 * r0 || box[2].width() > 0.5 * r0) {
            out.add(String.format(Locale.ROOT, "the centre is loosely fixed (box %.1f × %.1f × %.1f MPa^½ for R0 %.1f): "
                    + "more tests near the surface would tighten it", box[0].width(), box[1].width(), box[2].width(), r0));
        }
        double minT = results.stream().filter(r -> r.temperatureC() != null).mapToDouble(TestResult::temperatureC).min().orElse(Double.NaN);
        double maxT = results.stream().filter(r -> r.temperatureC() != null).mapToDouble(TestResult::temperatureC).max().orElse(Double.NaN);
        if (Double.isFinite(minT) && (maxT - minT > 15 || Math.abs(minT - 25) > 15 || Math.abs(maxT - 25) > 15)) {
            String range = minT == maxT ? String.format(Locale.ROOT, "%.0f °C", minT) : String.format(Locale.ROOT, "%.0f–%.0f °C", minT, maxT);
            out.add("tests ran at " + range + " but the liquids' parameters are 25 °C values; the parameters shift with "
                    + "temperature (Hansen and Beerbower 1971), so read the sphere as approximate for the test temperature");
        }
        return out;
    }

    private static boolean hasBadNear(SphereFitter.Data data, double[] c, double r0, int axis, int sign) {
        for (int i = 0; i < data.size(); i++) {
            if (data.scores[i] >= TestResult.GOOD_THRESHOLD) {
                continue;
            }
            if (inCone(data.points[i], c, r0, axis, sign)) {
                return true;
            }
        }
        return false;
    }

    private static String reachable(List<NamedPoint> untested, double[] c, double r0, int axis, int sign) {
        for (NamedPoint p : untested) {
            if (inCone(p.point().toArray(), c, r0, axis, sign)) {
                return p.name();
            }
        }
        return null;
    }

    /** True when {@code p} lies within RED {@value #NEAR_RED} and within 60° of the axis direction (in the Ra metric). */
    private static boolean inCone(double[] p, double[] c, double r0, int axis, int sign) {
        double[] v = {2 * (p[0] - c[0]), p[1] - c[1], p[2] - c[2]};
        double len = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        if (len == 0 || len / r0 > NEAR_RED || len / r0 < 0.8) {
            return false;
        }
        return sign * v[axis] / len >= CONE;
    }
}
