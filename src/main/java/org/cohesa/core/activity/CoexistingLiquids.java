package org.cohesa.core.activity;

import java.util.Optional;

/**
 * A binary activity model that knows its own miscibility gap: where the wrapped model predicts two liquid phases at
 * the overall composition, the activities returned are those of the coexisting layers, aᵢ = xᵢ′γᵢ(x′) = xᵢ″γᵢ(x″),
 * expressed as effective coefficients γᵢ,eff = aᵢ / xᵢ of the overall composition. The vapour above a two-phase
 * liquid in equilibrium is the vapour of either layer, so its flash point, bubble point and saturated-vapour
 * concentrations do not change with the overall composition inside the gap (Liaw, H.-J., Lu, W.-H., Gerbaud, V.,
 * Chen, C.-C., "Flash-point prediction for binary partially miscible mixtures of flammable solvents", <i>J. Hazard.
 * Mater.</i> 153 (2008) 1165; aqueous–organic pairs: Liaw, H.-J., Chen, C.-T., Gerbaud, V., <i>Chem. Eng. Sci.</i> 63
 * (2008) 4543; both citations from memory). Without this, the one-phase activities inside the gap run above the
 * coexisting ones and the estimates drift with composition where the real liquid does not.
 *
 * <p>The coexisting phases are those of the wrapped model itself ({@link BinaryLle} on the same γ), so the activities
 * stay continuous at the gap's edges. A coarse convexity test of the Gibbs energy of mixing comes first: a gap needs
 * a non-convex stretch, and most pairs have none, so they cost 80 extra evaluations per temperature.
 * Temperatures in K; mole fractions.
 */
public final class CoexistingLiquids implements ActivityModel {

    private static final int COARSE = 80;
    private static final double COARSE_RANGE = 14;

    private final ActivityModel inner;

    /** @param inner a two-component model */
    public CoexistingLiquids(ActivityModel inner) {
        if (inner.size() != 2) {
            throw new IllegalArgumentException("the coexisting-liquids correction is for binaries");
        }
        this.inner = inner;
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
        return 2;
    }

    @Override
    public double[] gamma(double[] x, double kelvin) {
        Optional<BinaryLle.Phases> gap = gap(kelvin);
        if (gap.isPresent() && inside(gap.get(), x[0])) {
            double x1 = gap.get().x1Lean();
            double[] g = inner.gamma(new double[] {x1, 1 - x1}, kelvin);
            return new double[] {x1 * g[0] / x[0], (1 - x1) * g[1] / x[1]};
        }
        return inner.gamma(x, kelvin);
    }

    /** The coexisting layers at {@code kelvin} when the overall composition {@code x} lies inside the model's gap. */
    public Optional<BinaryLle.Phases> splitAt(double[] x, double kelvin) {
        Optional<BinaryLle.Phases> gap = gap(kelvin);
        return gap.filter(p -> inside(p, x[0]));
    }

    private static boolean inside(BinaryLle.Phases p, double x1) {
        return x1 > p.x1Lean() && x1 < p.x1Rich();
    }

    private Optional<BinaryLle.Phases> gap(double kelvin) {
        return nonConvex(kelvin) ? BinaryLle.solve(inner, kelvin) : Optional.empty();
    }

    /** True when g/RT = Σ xᵢ ln(xᵢγᵢ) bends downward anywhere on a coarse grid (a gap needs such a stretch). */
    private boolean nonConvex(double kelvin) {
        double[] x = new double[COARSE];
        double[] g = new double[COARSE];
        for (int i = 0; i < COARSE; i++) {
            double s = -COARSE_RANGE + 2 * COARSE_RANGE * i / (COARSE - 1);
            x[i] = 1 / (1 + Math.exp(-s));
            double[] lg = inner.lnGamma(new double[] {x[i], 1 - x[i]}, kelvin);
            g[i] = x[i] * (Math.log(x[i]) + lg[0]) + (1 - x[i]) * (Math.log(1 - x[i]) + lg[1]);
        }
        for (int i = 1; i < COARSE - 1; i++) {
            double chord = g[i - 1] + (g[i + 1] - g[i - 1]) * (x[i] - x[i - 1]) / (x[i + 1] - x[i - 1]);
            if (g[i] > chord + 1e-12) {
                return true;
            }
        }
        return false;
    }
}
