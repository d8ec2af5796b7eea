package org.cohesa.core.activity;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.cohesa.core.solvent.Solvent;

/**
 * The two coexisting liquid phases of a partly miscible binary predicted by the liquid–liquid model
 * ({@link Miscibility#liquidLiquidModel}): equal activities of both components in both phases,
 * x₁′γ₁(x′) = x₁″γ₁(x″) and x₂′γ₂(x′) = x₂″γ₂(x″) (e.g. Prausnitz, Lichtenthaler, de Azevedo 1999, ch. 6).
 *
 * <p>Starting point: the lower convex hull of the molar Gibbs energy of mixing g/RT = Σ xᵢ ln(xᵢγᵢ) on a grid
 * uniform in ln(x₁/x₂) (so solubilities down to 10⁻⁸ are resolved); the hull's longest bridge spans the
 * two-phase region. Refined by Newton's method on the two equations in ln x₁′, ln x₁″ (numerical Jacobian).
 */
public final class BinaryLle {

    /** Mole fraction of component 1 in each phase, x1Lean &lt; x1Rich. */
    public record Phases(double x1Lean, double x1Rich) {
    }

    private static final int GRID = 1200;
    private static final double LOGIT_RANGE = 19;

    private BinaryLle() {
    }

    /** The coexisting phases of {@code pair} at {@code kelvin}, or empty when the model finds one liquid at every composition. */
    public static Optional<Phases> solve(List<Solvent> pair, double kelvin) {
        if (pair.size() != 2) {
            throw new IllegalArgumentException("a binary needs two liquids");
        }
        return solve(Miscibility.liquidLiquidModel(pair), kelvin);
    }

    static Optional<Phases> solve(ActivityModel model, double kelvin) {
        double[] x = new double[GRID];
        double[] g = new double[GRID];
        for (int i = 0; i < GRID; i++) {
            double s = -LOGIT_RANGE + 2 * LOGIT_RANGE * i / (GRID - 1);
            x[i] = 1 / (1 + Math.exp(-s));
            g[i] = gibbs(model, x[i], kelvin);
        }
        // lower convex hull (monotone chain over increasing x)
        List<Integer> hull = new ArrayList<>();
        for (int i = 0; i < GRID; i++) {
            while (hull.size() >= 2) {
                int a = hull.get(hull.size() - 2);
                int b = hull.get(hull.size() - 1);
                double cross = (x[b] - x[a]) * (g[i] - g[a]) - (g[b] - g[a]) * (x[i] - x[a]);
                if (cross <= 0) {
                    hull.remove(hull.size() - 1);
                } else {
                    break;
                }
            }
            hull.add(i);
        }
        int bestA = -1;
        int bestGap = 1;
        for (int k = 1; k < hull.size(); k++) {
            int gap = hull.get(k) - hull.get(k - 1);
            if (gap > bestGap) {
                bestGap = gap;
                bestA = k - 1;
            }
        }
        if (bestA < 0 || bestGap < 3) {
            return Optional.empty();
        }
        double a = x[hull.get(bestA)];
        double b = x[hull.get(bestA + 1)];
        double[] refined = newton(model, a, b, kelvin);
        if (refined != null) {
            a = refined[0];
            b = refined[1];
        }
        return Optional.of(new Phases(Math.min(a, b), Math.max(a, b)));
    }

    private static double gibbs(ActivityModel model, double x1, double kelvin) {
        double[] lg = model.lnGamma(new double[] {x1, 1 - x1}, kelvin);
        return x1 * (Math.log(x1) + lg[0]) + (1 - x1) * (Math.log(1 - x1) + lg[1]);
    }

    /** Newton on u = ln(x′/(1−x′)), w = ln(x″/(1−x″)); null when it does not converge to a non-trivial pair. */
    private static double[] newton(ActivityModel model, double a, double b, double kelvin) {
        double u = Math.log(a / (1 - a));
        double w = Math.log(b / (1 - b));
        for (int it = 0; it < 60; it++) {
            double[] f = residual(model, u, w, kelvin);
            if (Math.abs(f[0]) + Math.abs(f[1]) < 1e-11) {
                break;
            }
            double h = 1e-6;
            double[] fu = residual(model, u + h, w, kelvin);
            double[] fw = residual(model, u, w + h, kelvin);
            double j00 = (fu[0] - f[0]) / h;
            double j10 = (fu[1] - f[1]) / h;
            double j01 = (fw[0] - f[0]) / h;
            double j11 = (fw[1] - f[1]) / h;
            double det = j00 * j11 - j01 * j10;
            if (!Double.isFinite(det) || det == 0) {
                return null;
            }
            double du = (f[0] * j11 - f[1] * j01) / det;
            double dw = (j00 * f[1] - j10 * f[0]) / det;
            double step = Math.max(Math.abs(du), Math.abs(dw));
            double scale = step > 2 ? 2 / step : 1;
            u -= scale * du;
            w -= scale * dw;
        }
        double x1 = 1 / (1 + Math.exp(-u));
        double x2 = 1 / (1 + Math.exp(-w));
        double[] f = residual(model, u, w, kelvin);
        if (Math.abs(f[0]) + Math.abs(f[1]) > 1e-8 || Math.abs(u - w) < 1e-3) {
            return null;
        }
        return new double[] {x1, x2};
    }

    private static double[] residual(ActivityModel model, double u, double w, double kelvin) {
        double a = 1 / (1 + Math.exp(-u));
        double b = 1 / (1 + Math.exp(-w));
        double[] la = model.lnGamma(new double[] {a, 1 - a}, kelvin);
        double[] lb = model.lnGamma(new double[] {b, 1 - b}, kelvin);
        return new double[] {Math.log(a) + la[0] - Math.log(b) - lb[0], Math.log(1 - a) + la[1] - Math.log(1 - b) - lb[1]};
    }
}
