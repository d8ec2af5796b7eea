package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * Which untested library liquids would tighten the fit most: those the bootstrap spheres disagree about.
 *
 * <p>For each candidate, p is the share of bootstrap spheres that hold it. A liquid every resample puts on the
 * same side (p near 0 or 1) will most likely confirm what is known; one near p = 0.5 splits the plausible spheres
 * in half whatever its result, the most a single yes/no test can do (query by committee: Seung, Opper,
 * Sompolinsky, Proc. 5th Workshop on Computational Learning Theory, 1992, 287). Ties (and fits without a
 * bootstrap) are broken by closeness to the fitted surface, |RED − 1|.
 */
final class NextTestAdvisor {

    private NextTestAdvisor() {
    }

    static List<NextTest> suggest(SolubilitySphere sphere, List<double[]> boots, List<NamedPoint> untested,
                                  ConfidenceRegion confidence, int count) {
        List<NextTest> all = new ArrayList<>();
        for (NamedPoint c : untested) {
            double red = sphere.red(c.point());
            double share = insideShare(boots, c, red);
            all.add(new NextTest(c.name(), red, share, reason(red, share, boots.isEmpty())));
        }
        all.sort(Comparator.comparingDouble((NextTest t) -> -Math.round(100 * t.insideShare() * (1 - t.insideShare())) / 100.0)
                .thenComparingDouble(t -> Math.abs(t.red() - 1)));
        return all.subList(0, Math.min(count, all.size()));
    }

    private static double insideShare(List<double[]> boots, NamedPoint c, double red) {
        if (boots.isEmpty()) {
            return red < 1 ? 1 : 0;
        }
        int inside = 0;
        double[] p = c.point().toArray();
        for (double[] b : boots) {
            if (SphereFitter.Data.ra(p, new double[] {b[0], b[1], b[2]}) < b[3]) {
                inside++;
            }
        }
        return inside / (double) boots.size();
    }

    private static String reason(double red, double share, boolean noBootstrap) {
        String where = red < 0.9 ? "inside the sphere" : red > 1.1 ? "outside the sphere" : "on the surface";
        if (noBootstrap) {
            return String.format(Locale.ROOT, "RED %.2f: %s", red, where);
        }
        return String.format(Locale.ROOT, "RED %.2f, %s; %.0f %% of the resampled fits hold it, so its result would settle where the surface runs",
                red, where, 100 * share);
    }
}
