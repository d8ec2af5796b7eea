package org.cohesa.core.activity;

import java.util.Arrays;
import java.util.Map;
import java.util.NavigableMap;
import java.util.TreeMap;
import java.util.Optional;

/**
 * The coexisting-layers correction of {@link CoexistingLiquids} for blends of three or more liquids: where the wrapped
 * model finds the overall composition z unstable (tangent-plane test, {@link Miscibility#mostNegativeTpd}), a
 * liquid–liquid flash splits it into two layers with equal activities, xᵢ′γᵢ(x′) = xᵢ″γᵢ(x″), and the activities of
 * those layers are returned as γᵢ,eff = aᵢ / zᵢ. The flash is successive substitution on Kᵢ = γᵢ′/γᵢ″ with the
 * Rachford–Rice balance Σ zᵢ(Kᵢ − 1)/(1 + β(Kᵢ − 1)) = 0 for the layer fraction β (Michelsen, M. L., Mollerup, J.,
 * <i>Thermodynamic Models: Fundamentals and Computational Aspects</i>, 2nd ed., 2007, ch. 10 and 12; from memory),
 * started from the stability test's trial phase. Temperatures in K; mole fractions.
 *
 * <p>Cost: the test runs at every call, so the profile uses this only for blends the test finds unstable at 25 °C or
 * 40 K below, {@link #splitsNear} (a blend one liquid at both is taken as one liquid throughout).
 */
public final class CoexistingLiquidsMulti implements ActivityModel {

    /** The two layers, mole fractions in component order, and the fraction β of the moles in the second. */
    public record Layers(double[] first, double[] second, double beta) {
    }

    private static final int MAX_ITERATIONS = 500;

    /** Answers already found for one composition, by temperature: a cache for repeated questions, not a result. */
    private static final int MAX_ANSWERS = 64;
    /** How far (K) the layers found at one temperature serve as the start at another. */
    private static final double WARM_START_KELVIN = 30;

    private final ActivityModel inner;
    private final NavigableMap<Double, Optional<Layers>> answers = new TreeMap<>();
    private double[] answersFor;

    public CoexistingLiquidsMulti(ActivityModel inner) {
        this.inner = inner;
    }

    /** True when the model finds {@code z} unstable at 25 °C or at 40 K below (the screen for using this class). */
    public static boolean splitsNear(ActivityModel model, double[] z) {
        for (double t : new double[] {298.15, 258.15}) {
            Miscibility.Stationary s = Miscibility.mostNegativeTpd(model, positive(z), t);
            if (s != null && s.tpd() < -Miscibility.TPD_TOLERANCE) {
                return true;
            }
        }
        return false;
    }

    @Override
    public String name() {
        return inner.name();
    }

    @Override
    public String note() {
        return inner.note();
    }

    @Override
    public int size() {
        return inner.size();
    }

    @Override
    public double[] gamma(double[] z, double kelvin) {
        Optional<Layers> layers = splitAt(z, kelvin);
        if (layers.isEmpty()) {
            return inner.gamma(z, kelvin);
        }
        double[] x = layers.get().first();
        double[] g = inner.gamma(x, kelvin);
        double[] out = new double[z.length];
        for (int i = 0; i < z.length; i++) {
            out[i] = z[i] > 0 ? x[i] * g[i] / z[i] : g[i];
        }
        return out;
    }

    /** The two layers at {@code kelvin}, or empty when {@code z} is one stable liquid (or the flash finds no split). */
    public Optional<Layers> splitAt(double[] z, double kelvin) {
        double[] zp = positive(z);
        synchronized (answers) {
            if (!Arrays.equals(answersFor, zp)) {
                answers.clear();
                answersFor = zp;
            }
            Optional<Layers> known = answers.get(kelvin);
            if (known != null) {
                return known;
            }
            Optional<Layers> layers = warmSplit(zp, kelvin).or(() -> coldSplit(zp, kelvin));
            if (answers.size() >= MAX_ANSWERS) {
                answers.pollFirstEntry();
            }
            answers.put(kelvin, layers);
            return layers;
        }
    }

    /**
     * A flash started from the layers found at the nearest temperature already asked (the flash point and boiling
     * searches ask the same blend at many nearby temperatures); a flash that ends in two distinct layers is an
     * equilibrium, so the stability test is skipped. Empty when no split is known or the flash collapses.
     */
    private Optional<Layers> warmSplit(double[] zp, double kelvin) {
        Layers nearest = null;
        double gap = WARM_START_KELVIN;
        for (Map.Entry<Double, Optional<Layers>> e : answers.entrySet()) {
            double d = Math.abs(e.getKey() - kelvin);
            if (e.getValue().isPresent() && d <= gap) {
                gap = d;
                nearest = e.getValue().get();
            }
        }
        return nearest == null ? Optional.empty() : flash(zp, nearest.second(), kelvin, nearest.first());
    }

    private Optional<Layers> coldSplit(double[] zp, double kelvin) {
        Miscibility.Stationary trial = Miscibility.mostNegativeTpd(inner, zp, kelvin);
        if (trial == null || trial.tpd() >= -Miscibility.TPD_TOLERANCE) {
            return Optional.empty();
        }
        return flash(zp, trial.w(), kelvin, zp);
    }

    private Optional<Layers> flash(double[] z, double[] w, double kelvin, double[] start) {
        int n = z.length;
        double[] x1 = start.clone();
        double[] x2 = w.clone();
        double[] k = new double[n];
        double beta = 0.5;
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            double[] l1 = inner.lnGamma(x1, kelvin);
            double[] l2 = inner.lnGamma(x2, kelvin);
            for (int i = 0; i < n; i++) {
                k[i] = Math.exp(l1[i] - l2[i]); // x2ᵢ = Kᵢ x1ᵢ
            }
            Double b = rachfordRice(z, k);
            if (b == null) {
                return Optional.empty();
            }
            beta = b;
            double change = 0;
            double s1 = 0;
            double s2 = 0;
            double[] n1 = new double[n];
            double[] n2 = new double[n];
            for (int i = 0; i < n; i++) {
                n1[i] = z[i] / (1 + beta * (k[i] - 1));
                n2[i] = k[i] * n1[i];
                s1 += n1[i];
                s2 += n2[i];
            }
            for (int i = 0; i < n; i++) {
                double a = n1[i] / s1;
                double c = n2[i] / s2;
                change = Math.max(change, Math.max(Math.abs(a - x1[i]), Math.abs(c - x2[i])));
                x1[i] = a;
                x2[i] = c;
            }
            if (change < 1e-10) {
                break;
            }
        }
        double spread = 0;
        for (int i = 0; i < n; i++) {
            spread = Math.max(spread, Math.abs(x1[i] - x2[i]));
        }
        if (spread < 1e-4 || beta <= 0 || beta >= 1) {
            return Optional.empty(); // collapsed to one liquid, or the feed lies outside the two-layer region
        }
        return Optional.of(new Layers(x1.clone(), x2.clone(), beta));
    }

    /**
     * β in (0, 1) with Σ zᵢ(Kᵢ − 1)/(1 + β(Kᵢ − 1)) = 0, or null outside. The sum falls strictly with β, so Newton steps
     * are kept inside a shrinking bracket and a step that leaves it is replaced by bisection (Michelsen and Mollerup,
     * ch. 10, from memory); the loop ends when the bracket or the step is below 1e-14.
     */
    private static Double rachfordRice(double[] z, double[] k) {
        double lo = 0;
        double hi = 1;
        if (rr(z, k, lo) <= 0 || rr(z, k, hi) >= 0) {
            return null;
        }
        double beta = 0.5;
        for (int it = 0; it < 100 && hi - lo > 1e-14; it++) {
            double f = 0;
            double slope = 0;
            for (int i = 0; i < z.length; i++) {
                double c = k[i] - 1;
                double d = 1 + beta * c;
                f += z[i] * c / d;
                slope -= z[i] * c * c / (d * d);
            }
            if (f > 0) {
                lo = beta;
            } else {
                hi = beta;
            }
            double next = slope < 0 ? beta - f / slope : Double.NaN;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - beta) < 1e-14) {
                return next;
            }
            beta = next;
        }
        return beta;
    }

    private static double rr(double[] z, double[] k, double beta) {
        double s = 0;
        for (int i = 0; i < z.length; i++) {
            s += z[i] * (k[i] - 1) / (1 + beta * (k[i] - 1));
        }
        return s;
    }

    private static double[] positive(double[] z) {
        double[] out = z.clone();
        double sum = 0;
        for (int i = 0; i < out.length; i++) {
            out[i] = Math.max(out[i], 1e-12);
            sum += out[i];
        }
        for (int i = 0; i < out.length; i++) {
            out[i] /= sum;
        }
        return out;
    }
}
