package org.cohesa.core.activity;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.StringJoiner;
import org.cohesa.core.hsp.VolumeMixing;
import org.cohesa.core.solvent.Solvent;

/**
 * Liquid–liquid split test: does a blend of given volume fractions separate into two liquid phases at a
 * given temperature?
 *
 * <p>Method: the tangent-plane stability criterion (Michelsen, M. L., "The isothermal flash problem.
 * Part I. Stability", <i>Fluid Phase Equilibria</i> 9 (1982) 1–19). A liquid of mole fractions z is stable
 * when the tangent-plane distance
 * <pre>
 *   TPD(w) = Σᵢ wᵢ [ln wᵢ + ln γᵢ(w) − ln zᵢ − ln γᵢ(z)]     (dimensionless, per mole, divided by RT)
 * </pre>
 * is ≥ 0 for every trial composition w; a negative value anywhere means that splitting off a phase of
 * composition w lowers the Gibbs energy, i.e. the mixture separates. We search w globally on a simplex
 * grid (2–4 components) and then refine the best grid points and the "pure-component-rich" trial phases
 * by Michelsen's successive substitution, ln Wᵢ = ln zᵢ + ln γᵢ(z) − ln γᵢ(w), w = W/ΣW, whose
 * stationary points have TPD sign equal to that of tm = 1 − ΣWᵢ.
 *
 * <p>Activity model: UNIFAC with the liquid–liquid parameter set of Magnussen, Rasmussen, Fredenslund,
 * <i>Ind. Eng. Chem. Process Des. Dev.</i> 20 (1981) 331 (group assignments translated by {@link LleGroups});
 * when a component cannot be translated, the Hansen–Flory–Huggins model of Lindvig et al. (2002), and
 * the result says so. The 1981 parameters were fitted to data between about 10 and 40 °C.
 *
 * <p>Consensus rule (our own): a split found with that model is reported only when original UNIFAC (the
 * vapour–liquid set, Hansen et al. 1991), where it covers every component, finds a split at the same composition
 * too. The liquid–liquid set makes water mix too poorly with ethers, amides, sulfoxides and esters (false splits of
 * DMSO, NMP, DMAc, 1,2-dimethoxyethane, ethyl lactate and morpholine with water); the vapour–liquid set makes alkanes
 * mix too poorly with ethanol and propanols; each one's false splits are mostly absent from the other. Checked on
 * the 112 solvent–water pairs with published data (the same pairs it was chosen on, no held-out set; see
 * docs/methods.md): 88 hits with the liquid–liquid set alone, 89 with the vapour–liquid set alone, 94 with both.
 */
public final class Miscibility {

    /** TPD below this counts as a split; keeps round-off and trivial solutions out. */
    static final double TPD_TOLERANCE = 1e-7;
    /** A stationary point this close to the feed (max |wᵢ − zᵢ|) is the trivial solution. */
    static final double TRIVIAL_DISTANCE = 1e-4;
    private static final int MAX_ITERATIONS = 300;
    /** Successive substitution that comes this close to the feed is converging to the trivial solution. */
    private static final double TRIVIAL_APPROACH = 1e-3;
    /** A grid TPD this negative settles the question without refinement. */
    private static final double CLEAR_SPLIT = -1e-3;

    private Miscibility() {
    }

    /**
     * @param components      the blend's liquids
     * @param volumeFractions volume fraction of each, summing to 1
     * @param kelvin          temperature, K
     * @throws IllegalArgumentException on inconsistent input, or when a component has neither UNIFAC
     *                                  groups usable with the liquid–liquid set nor Hansen parameters
     */
    public static MiscibilityResult check(List<Solvent> components, double[] volumeFractions, double kelvin) {
        if (components == null || components.isEmpty() || volumeFractions == null || components.size() != volumeFractions.length) {
            throw new IllegalArgumentException("need one volume fraction per component");
        }
        VolumeMixing.requireFractions(volumeFractions);
        Activity.requireTemperature(kelvin);
        List<Solvent> present = new ArrayList<>();
        List<Double> phiPresent = new ArrayList<>();
        for (int i = 0; i < components.size(); i++) {
            if (volumeFractions[i] > 0) {
                present.add(components.get(i));
                phiPresent.add(volumeFractions[i]);
            }
        }
        ActivityModel model = liquidLiquidModel(present);
        String fallback = model.note().isEmpty() ? "" : " (" + model.note() + ")";
        if (present.size() == 1) {
            return new MiscibilityResult(false, model.name(), "a single liquid cannot split" + fallback);
        }
        double[] v = Composition.molarVolumes(present);
        double[] z = Composition.moleFractions(phiPresent.stream().mapToDouble(Double::doubleValue).toArray(), v);
        Stationary worst = mostNegativeTpd(model, z, kelvin);
        String temp = String.format(Locale.ROOT, "%.1f °C", kelvin - 273.15);
        if (worst != null && worst.tpd < -TPD_TOLERANCE) {
            double[] phi = Composition.volumeFractions(worst.w, v);
            Unifac second = vapourLiquidUnifac(present);
            if (second != null) {
                Stationary other = mostNegativeTpd(second, z, kelvin);
                if (other == null || other.tpd >= -TPD_TOLERANCE) {
                    return new MiscibilityResult(false, model.name() + " and " + second.name(), "one liquid phase at " + temp + ": "
                            + model.name() + " finds a phase of " + describe(present, phi) + " by volume splitting off (tangent-plane distance "
                            + String.format(Locale.ROOT, "%.3g", worst.tpd) + "), " + second.name()
                            + " finds none; a split is reported only when both parameter sets find one (consensus rule)" + fallback);
                }
            }
            return new MiscibilityResult(true, model.name(), "two liquid phases predicted at " + temp + ": a phase of "
                    + describe(present, phi) + " by volume splits off (tangent-plane distance "
                    + String.format(Locale.ROOT, "%.3g", worst.tpd) + ")" + (second == null ? "" : "; " + second.name() + " agrees") + fallback);
        }
        return new MiscibilityResult(false, model.name(), "one liquid phase at " + temp
                + ": no trial composition lowers the Gibbs energy (tangent-plane test)" + fallback);
    }

    /** Original UNIFAC (vapour–liquid set) when every component has groups and every pair has parameters, else null. */
    static Unifac vapourLiquidUnifac(List<Solvent> components) {
        List<Map<Integer, Integer>> counts = new ArrayList<>();
        for (Solvent s : components) {
            if (s.unifac().isEmpty()) {
                return null;
            }
            counts.add(s.unifac().counts());
        }
        UnifacParameters vle = UnifacParameters.original();
        return Unifac.missingParameter(vle, counts) != null ? null : new Unifac(vle, counts, vle.name(), "");
    }

    /** UNIFAC-LLE when every component translates and every pair has parameters, else Flory–Huggins. */
    static ActivityModel liquidLiquidModel(List<Solvent> components) {
        UnifacParameters lle = UnifacParameters.liquidLiquid();
        List<Map<Integer, Integer>> counts = new ArrayList<>();
        for (Solvent s : components) {
            LleGroups.Translation t = LleGroups.translate(s.unifac());
            if (!t.ok()) {
                return ActivityModels.floryHuggins(components, s.name() + ": " + t.problem() + ", Flory–Huggins from Hansen parameters used");
            }
            counts.add(t.counts());
        }
        String missing = Unifac.missingParameter(lle, counts);
        if (missing != null) {
            return ActivityModels.floryHuggins(components, missing + ", Flory–Huggins from Hansen parameters used");
        }
        return new Unifac(lle, counts, lle.name(), "");
    }

    record Stationary(double[] w, double tpd) {
    }

    /** The trial composition with the lowest TPD found (grid, then refinement); null if none below zero. */
    static Stationary mostNegativeTpd(ActivityModel model, double[] z, double kelvin) {
        int n = z.length;
        double[] d = model.lnGamma(z, kelvin);
        for (int i = 0; i < n; i++) {
            d[i] += Math.log(z[i]);
        }
        List<double[]> starts = new ArrayList<>();
        Stationary best = null;
        List<Stationary> gridBest = new ArrayList<>();
        for (double[] w : grid(n)) {
            double t = tpd(model, w, d, kelvin);
            gridBest.add(new Stationary(w, t));
        }
        gridBest.sort((p, q) -> Double.compare(p.tpd, q.tpd));
        for (int i = 0; i < Math.min(3, gridBest.size()); i++) {
            starts.add(gridBest.get(i).w);
            best = better(best, gridBest.get(i), z);
        }
        if (best != null && best.tpd < CLEAR_SPLIT) {
            // the grid already found a clearly lower-energy phase: refining it changes the wording, not the answer
            return best;
        }
        for (int i = 0; i < n; i++) {
            double[] w = new double[n];
            for (int j = 0; j < n; j++) {
                w[j] = i == j ? 0.98 : 0.02 / (n - 1);
            }
            starts.add(w);
        }
        for (double[] w0 : starts) {
            best = better(best, refine(model, w0, d, z, kelvin), z);
        }
        return best;
    }

    private static Stationary better(Stationary best, Stationary candidate, double[] z) {
        if (candidate == null || !Double.isFinite(candidate.tpd) || distance(candidate.w, z) < TRIVIAL_DISTANCE) {
            return best;
        }
        return best == null || candidate.tpd < best.tpd ? candidate : best;
    }

    /** Michelsen's successive substitution from {@code w0}; returns the end point with its TPD. */
    private static Stationary refine(ActivityModel model, double[] w0, double[] d, double[] z, double kelvin) {
        int n = w0.length;
        double[] w = w0.clone();
        double[] bigW = new double[n];
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            double[] lng = model.lnGamma(w, kelvin);
            double sum = 0;
            for (int i = 0; i < n; i++) {
                bigW[i] = Math.exp(d[i] - lng[i]);
                sum += bigW[i];
            }
            if (!Double.isFinite(sum) || sum <= 0) {
                return null;
            }
            double change = 0;
            for (int i = 0; i < n; i++) {
                double nw = bigW[i] / sum;
                change = Math.max(change, Math.abs(nw - w[i]));
                w[i] = nw;
            }
            normalise(w);
            if (change < 1e-9) {
                break;
            }
            if (distance(w, z) < TRIVIAL_APPROACH) {
                // heading for the trivial solution w = z, which says nothing about a split
                return null;
            }
        }
        return new Stationary(w, tpd(model, w, d, kelvin));
    }

    static double tpd(ActivityModel model, double[] w, double[] d, double kelvin) {
        double[] lng = model.lnGamma(w, kelvin);
        double t = 0;
        for (int i = 0; i < w.length; i++) {
            if (w[i] > 0) {
                t += w[i] * (Math.log(w[i]) + lng[i] - d[i]);
            }
        }
        return t;
    }

    /** Interior points of the composition simplex; finer for fewer components. */
    static List<double[]> grid(int n) {
        int steps = switch (n) {
            case 2 -> 200;
            case 3 -> 30;
            case 4 -> 16;
            default -> 8;
        };
        List<double[]> out = new ArrayList<>();
        int[] k = new int[n];
        fill(out, k, 0, steps, n, steps);
        return out;
    }

    private static void fill(List<double[]> out, int[] k, int pos, int remaining, int n, int steps) {
        if (pos == n - 1) {
            k[pos] = remaining;
            double[] w = new double[n];
            double eps = 1e-4;
            for (int i = 0; i < n; i++) {
                // keep off the exact vertices and edges, where ln wᵢ is −∞
                w[i] = (k[i] + eps) / (steps + n * eps);
            }
            out.add(w);
            return;
        }
        for (int c = 0; c <= remaining; c++) {
            k[pos] = c;
            fill(out, k, pos + 1, remaining - c, n, steps);
        }
    }

    private static void normalise(double[] w) {
        double s = 0;
        for (double v : w) {
            s += v;
        }
        for (int i = 0; i < w.length; i++) {
            w[i] /= s;
        }
    }

    private static double distance(double[] a, double[] b) {
        double m = 0;
        for (int i = 0; i < a.length; i++) {
            m = Math.max(m, Math.abs(a[i] - b[i]));
        }
        return m;
    }

    private static String describe(List<Solvent> solvents, double[] phi) {
        StringJoiner j = new StringJoiner(", ");
        for (int i = 0; i < phi.length; i++) {
            j.add(String.format(Locale.ROOT, "%s %.2f", solvents.get(i).name(), phi[i]));
        }
        return j.toString();
    }
}
