package org.cohesa.core.activity;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * UNIFAC activity coefficients: a combinatorial (size and shape) part plus a residual (group
 * interaction) part, ln γᵢ = ln γᵢᶜ + ln γᵢᴿ (Fredenslund, A., Jones, R. L., Prausnitz, J. M.,
 * "Group-contribution estimation of activity coefficients in nonideal liquid mixtures",
 * <i>AIChE J.</i> 21 (1975) 1086–1099; equations as restated in Poling, Prausnitz, O'Connell,
 * <i>The Properties of Gases and Liquids</i>, 5th ed., McGraw-Hill 2000, §8.10).
 *
 * <pre>
 * combinatorial:  rᵢ = Σₖ νₖ⁽ⁱ⁾Rₖ,  qᵢ = Σₖ νₖ⁽ⁱ⁾Qₖ,  Vᵢ = rᵢ / Σⱼ xⱼrⱼ,  Fᵢ = qᵢ / Σⱼ xⱼqⱼ
 *                 ln γᵢᶜ = 1 − Vᵢ + ln Vᵢ − 5 qᵢ (1 − Vᵢ/Fᵢ + ln(Vᵢ/Fᵢ))         (z/2 = 5)
 * residual:       ln γᵢᴿ = Σₖ νₖ⁽ⁱ⁾ (ln Γₖ − ln Γₖ⁽ⁱ⁾)
 *                 ln Γₖ = Qₖ [1 − ln(Σₘ θₘΨₘₖ) − Σₘ θₘΨₖₘ / Σₙ θₙΨₙₘ]
 *                 θₘ = QₘXₘ / Σₙ QₙXₙ,  Xₘ = group mole fraction in the mixture
 *                 Ψₘₙ = exp(−aₘₙ / T),  aₘₙ in K between the main groups of m and n
 * </pre>
 * Γₖ⁽ⁱ⁾ is the same expression for pure component i. Temperature in K; γ dimensionless.
 *
 * <p>Everything that depends only on the components (group counts, R, Q, a) is precomputed at
 * construction; Ψ and the pure-component ln Γₖ⁽ⁱ⁾ are cached for the last temperature, because the
 * drying ODE and the stability test evaluate γ thousands of times at one temperature.
 */
public final class Unifac extends LogGammaModel {

    private final String name;
    private final String note;
    private final int n;
    private final int groups;
    /** ν[i][k]: occurrences of group k in component i. */
    private final double[][] nu;
    private final double[] groupQ;
    /** Main-group interaction parameter a between group k (row) and group m (column), K. */
    private final double[][] a;
    private final double[] r;
    private final double[] q;
    private volatile TemperatureCache cache;

    private record TemperatureCache(double kelvin, double[][] psi, double[][] lnGammaPure) {
    }

    /**
     * @param parameters  the parameter set whose subgroup numbering {@code assignments} use
     * @param assignments per component: subgroup id → count
     * @param name        model name for outputs
     * @param note        why this model (may be empty)
     * @throws IllegalArgumentException for an unknown subgroup or a main-group pair without a published parameter
     */
    public Unifac(UnifacParameters parameters, List<Map<Integer, Integer>> assignments, String name, String note) {
        if (assignments.isEmpty()) {
            throw new IllegalArgumentException("UNIFAC needs at least one component");
        }
        this.name = name;
        this.note = note == null ? "" : note;
        this.n = assignments.size();
        TreeSet<Integer> ids = new TreeSet<>();
        for (Map<Integer, Integer> as : assignments) {
            if (as.isEmpty()) {
                throw new IllegalArgumentException("a component without UNIFAC groups cannot be described by UNIFAC");
            }
            for (int id : as.keySet()) {
                if (parameters.subgroup(id).isEmpty()) {
                    throw new IllegalArgumentException(parameters.name() + " has no subgroup " + id);
                }
                ids.add(id);
            }
        }
        List<UnifacSubgroup> sg = new ArrayList<>();
        ids.forEach(id -> sg.add(parameters.subgroup(id).orElseThrow()));
        this.groups = sg.size();
        this.nu = new double[n][groups];
        this.groupQ = new double[groups];
        this.a = new double[groups][groups];
        this.r = new double[n];
        this.q = new double[n];
        for (int k = 0; k < groups; k++) {
            groupQ[k] = sg.get(k).q();
            for (int m = 0; m < groups; m++) {
                int mk = sg.get(k).mainGroup();
                int mm = sg.get(m).mainGroup();
                if (!parameters.hasInteraction(mk, mm)) {
                    throw new IllegalArgumentException(parameters.name() + " has no interaction parameter between main groups "
                            + sg.get(k).mainGroupName() + " and " + sg.get(m).mainGroupName());
                }
                a[k][m] = parameters.a(mk, mm);
            }
        }
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < groups; k++) {
                Integer c = assignments.get(i).get(sg.get(k).id());
                nu[i][k] = c == null ? 0 : c;
                r[i] += nu[i][k] * sg.get(k).r();
                q[i] += nu[i][k] * sg.get(k).q();
            }
        }
    }

    /**
     * Why UNIFAC cannot describe these assignments with {@code parameters} (an unknown subgroup or a
     * main-group pair without a published parameter), or {@code null} when the constructor would succeed.
     */
    public static String missingParameter(UnifacParameters parameters, List<Map<Integer, Integer>> assignments) {
        TreeSet<Integer> mains = new TreeSet<>();
        for (Map<Integer, Integer> as : assignments) {
            for (int id : as.keySet()) {
                UnifacSubgroup s = parameters.subgroup(id).orElse(null);
                if (s == null) {
                    return "subgroup " + id + " is not in " + parameters.name();
                }
                mains.add(s.mainGroup());
            }
        }
        for (int m : mains) {
            for (int k : mains) {
                if (!parameters.hasInteraction(m, k)) {
                    return "no published " + parameters.name() + " interaction parameter between main groups " + m + " and " + k;
                }
            }
        }
        return null;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String note() {
        return note;
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public double[] lnGamma(double[] x, double kelvin) {
        Activity.requireComposition(x, n);
        Activity.requireTemperature(kelvin);
        TemperatureCache tc = cacheFor(kelvin);
        double[] out = new double[n];
        combinatorial(x, out);
        double[] lnGammaMix = lnGroupGamma(groupFractionsOfMixture(x), tc.psi);
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int k = 0; k < groups; k++) {
                if (nu[i][k] != 0) {
                    s += nu[i][k] * (lnGammaMix[k] - tc.lnGammaPure[i][k]);
                }
            }
            out[i] += s;
        }
        return out;
    }

    private void combinatorial(double[] x, double[] out) {
        double sr = 0;
        double sq = 0;
        for (int j = 0; j < n; j++) {
            sr += x[j] * r[j];
            sq += x[j] * q[j];
        }
        for (int i = 0; i < n; i++) {
            double v = r[i] / sr;
            double f = q[i] / sq;
            out[i] = 1 - v + Math.log(v) - 5 * q[i] * (1 - v / f + Math.log(v / f));
        }
    }

    private double[] groupFractionsOfMixture(double[] x) {
        double[] xg = new double[groups];
        double total = 0;
        for (int i = 0; i < n; i++) {
            if (x[i] == 0) {
                continue;
            }
            for (int k = 0; k < groups; k++) {
                xg[k] += x[i] * nu[i][k];
            }
        }
        for (double v : xg) {
            total += v;
        }
        for (int k = 0; k < groups; k++) {
            xg[k] /= total;
        }
        return xg;
    }

    /** ln Γₖ for the group mole fractions {@code xg}. */
    private double[] lnGroupGamma(double[] xg, double[][] psi) {
        double[] theta = new double[groups];
        double sum = 0;
        for (int k = 0; k < groups; k++) {
            theta[k] = groupQ[k] * xg[k];
            sum += theta[k];
        }
        for (int k = 0; k < groups; k++) {
            theta[k] /= sum;
        }
        // s[m] = Σₙ θₙ Ψₙₘ
        double[] s = new double[groups];
        for (int m = 0; m < groups; m++) {
            double t = 0;
            for (int j = 0; j < groups; j++) {
                t += theta[j] * psi[j][m];
            }
            s[m] = t;
        }
        double[] lnG = new double[groups];
        for (int k = 0; k < groups; k++) {
            double t = 0;
            for (int m = 0; m < groups; m++) {
                t += theta[m] * psi[k][m] / s[m];
            }
            lnG[k] = groupQ[k] * (1 - Math.log(s[k]) - t);
        }
        return lnG;
    }

    private TemperatureCache cacheFor(double kelvin) {
        TemperatureCache c = cache;
        if (c != null && c.kelvin == kelvin) {
            return c;
        }
        double[][] psi = new double[groups][groups];
        for (int k = 0; k < groups; k++) {
            for (int m = 0; m < groups; m++) {
                psi[k][m] = Math.exp(-a[k][m] / kelvin);
            }
        }
        double[][] pure = new double[n][];
        for (int i = 0; i < n; i++) {
            double[] xg = new double[groups];
            double total = 0;
            for (int k = 0; k < groups; k++) {
                xg[k] = nu[i][k];
                total += nu[i][k];
            }
            for (int k = 0; k < groups; k++) {
                xg[k] /= total;
            }
            pure[i] = lnGroupGamma(xg, psi);
        }
        c = new TemperatureCache(kelvin, psi, pure);
        cache = c;
        return c;
    }
}
