package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * Next tests for the likelihood fit, chosen by expected information: the batch of untested library liquids
 * whose results are expected to shrink the region most.
 *
 * <p>The region is represented by weighted samples θⱼ of the posterior (region samples re-weighted from the
 * tempered chain to the plain likelihood). Its spread S is the root of the summed variances of 2δD, δP, δH and
 * R0 (MPa^½; the centre in the Ra metric). For a candidate x, each outcome y ∈ {dissolves, does not} re-weights the
 * samples by P(y | θⱼ, x) (Bayes' rule); the expected spread after the test is Σ_y P(y)·S(y), and the candidate
 * that minimises it is taken (expected posterior variance as the design criterion: Chaloner, K., Verdinelli, I.,
 * "Bayesian experimental design: a review", <i>Stat. Sci.</i> 10 (1995) 273). Further picks are chosen the same
 * way over all joint outcomes of the liquids already picked, so a batch of five does not pile up in one spot.
 */
final class InformationAdvisor {

    /** Samples used for the design (evenly thinned from the region samples). */
    private static final int MAX_SAMPLES = 800;
    /** Joint outcomes less likely than this are dropped. */
    private static final double PRUNE = 1e-4;

    private InformationAdvisor() {
    }

    static List<NextTest> suggest(SolubilitySphere fitted, List<double[]> samples, double[] weights, List<NamedPoint> untested,
                                  DissolutionModel model, int count) {
        if (count == 0 || untested.isEmpty() || samples.isEmpty()) {
            return List.of();
        }
        int stride = Math.max(1, samples.size() / MAX_SAMPLES);
        List<double[]> th = new ArrayList<>();
        List<Double> wl = new ArrayList<>();
        for (int j = 0; j < samples.size(); j += stride) {
            th.add(samples.get(j));
            wl.add(weights[j]);
        }
        int m = th.size();
        double[] w = new double[m];
        double total = 0;
        for (int j = 0; j < m; j++) {
            w[j] = wl.get(j);
            total += w[j];
        }
        for (int j = 0; j < m; j++) {
            w[j] /= total;
        }
        int c = untested.size();
        double[][] p = new double[c][m];
        for (int i = 0; i < c; i++) {
            double[] x = untested.get(i).point().toArray();
            for (int j = 0; j < m; j++) {
                double[] t = th.get(j);
                p[i][j] = model.pDissolves(SphereFitter.Data.ra(x, t) / t[3]);
            }
        }
        double s0 = spread(th, w);
        List<double[]> combos = new ArrayList<>();
        double[] one = new double[m];
        java.util.Arrays.fill(one, 1.0);
        combos.add(one);
        boolean[] picked = new boolean[c];
        List<NextTest> out = new ArrayList<>();
        double[] buf = new double[m];
        for (int k = 0; k < Math.min(count, c); k++) {
            int best = -1;
            double bestE = Double.POSITIVE_INFINITY;
            for (int i = 0; i < c; i++) {
                if (picked[i]) {
                    continue;
                }
                double e = 0;
                for (double[] l : combos) {
                    for (int y = 0; y < 2; y++) {
                        double mass = 0;
                        for (int j = 0; j < m; j++) {
                            buf[j] = w[j] * l[j] * (y == 1 ? p[i][j] : 1 - p[i][j]);
                            mass += buf[j];
                        }
                        if (mass > PRUNE) {
                            e += mass * spread(th, buf, mass);
                        }
                    }
                }
                if (e < bestE - 1e-12) {
                    bestE = e;
                    best = i;
                }
            }
            picked[best] = true;
            List<double[]> next = new ArrayList<>();
            for (double[] l : combos) {
                for (int y = 0; y < 2; y++) {
                    double[] nl = new double[m];
                    double mass = 0;
                    for (int j = 0; j < m; j++) {
                        nl[j] = l[j] * (y == 1 ? p[best][j] : 1 - p[best][j]);
                        mass += w[j] * nl[j];
                    }
                    if (mass > PRUNE) {
                        next.add(nl);
                    }
                }
            }
            combos = next;
            NamedPoint cand = untested.get(best);
            double red = fitted.red(cand.point());
            double share = 0;
            for (int j = 0; j < m; j++) {
                double[] t = th.get(j);
                if (SphereFitter.Data.ra(cand.point().toArray(), t) < t[3]) {
                    share += w[j];
                }
            }
            double shrink = s0 > 0 ? Math.max(0, 1 - bestE / s0) : 0;
            out.add(new NextTest(cand.name(), red, share, reason(red, share, shrink, k), shrink));
        }
        return out;
    }

    private static String reason(double red, double share, double shrink, int k) {
        String where = red < 0.9 ? "inside the sphere" : red > 1.1 ? "outside the sphere" : "on the surface";
        return String.format(Locale.ROOT, "RED %.2f, %s; %.0f %% of the plausible spheres hold it; with %s the region is expected to "
                + "shrink by %.0f %%", red, where, 100 * share, k == 0 ? "this result" : "this and the results above", 100 * shrink);
    }

    static double spread(List<double[]> th, double[] w) {
        double mass = 0;
        for (double v : w) {
            mass += v;
        }
        return spread(th, w, mass);
    }

    /** √(Σ weighted variances of 2δD, δP, δH, R0), MPa^½. */
    static double spread(List<double[]> th, double[] w, double mass) {
        double[] mean = new double[4];
        int m = th.size();
        for (int j = 0; j < m; j++) {
            double[] t = th.get(j);
            mean[0] += w[j] * 2 * t[0];
            mean[1] += w[j] * t[1];
            mean[2] += w[j] * t[2];
            mean[3] += w[j] * t[3];
        }
        for (int k = 0; k < 4; k++) {
            mean[k] /= mass;
        }
        double var = 0;
        for (int j = 0; j < m; j++) {
            double[] t = th.get(j);
            double a = 2 * t[0] - mean[0];
            double b = t[1] - mean[1];
            double cc = t[2] - mean[2];
            double d = t[3] - mean[3];
            var += w[j] * (a * a + b * b + cc * cc + d * d);
        }
        return Math.sqrt(Math.max(0, var / mass));
    }
}
