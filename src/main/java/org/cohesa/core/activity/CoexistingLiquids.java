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
 * stay continuous at the gap's edges. A coarse tangent-plane test at the overall composition comes first (48 extra
 * evaluations); only a composition that fails it pays for the phase search.
 * Temperatures in K; mole fractions.
 */
public final class CoexistingLiquids implements ActivityModel {

    private static final int COARSE = 48;
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
        Optional<BinaryLle.Phases> layers = splitAt(x, kelvin);
        if (layers.isPresent()) {
            double x1 = layers.get().x1Lean();
            double[] g = inner.gamma(new double[] {x1, 1 - x1}, kelvin);
            return new double[] {x1 * g[0] / x[0], (1 - x1) * g[1] / x[1]};
        }
        return inner.gamma(x, kelvin);
    }

    /** The coexisting layers at {@code kelvin} when the overall composition {@code x} lies inside the model's gap. */
    public Optional<BinaryLle.Phases> splitAt(double[] x, double kelvin) {
        if (x[0] <= 0 || x[1] <= 0 || !belowTangent(x[0], kelvin)) {
            return Optional.empty();
        }
        return BinaryLle.solve(inner, kelvin).filter(p -> x[0] > p.x1Lean() && x[0] < p.x1Rich());
    }

    /**
     * Tangent-plane test on a coarse grid: true when g/RT = Σ xᵢ ln(xᵢγᵢ) falls below its tangent at x₁ somewhere,
     * i.e. x₁ is not a stable single liquid (Michelsen 1982). Most compositions pass it and cost no phase search.
     */
    private boolean belowTangent(double x1, double kelvin) {
        double[] lx = inner.lnGamma(new double[] {x1, 1 - x1}, kelvin);
        double mu1 = Math.log(x1) + lx[0];
        double mu2 = Math.log(1 - x1) + lx[1];
        for (int i = 0; i < COARSE; i++) {
            double s = -COARSE_RANGE + 2 * COARSE_RANGE * i / (COARSE - 1);
            double y = 1 / (1 + Math.exp(-s));
            double[] ly = inner.lnGamma(new double[] {y, 1 - y}, kelvin);
            // g(y) − tangent(y) = y(μ1(y) − μ1(x)) + (1 − y)(μ2(y) − μ2(x))
            double d = y * (Math.log(y) + ly[0] - mu1) + (1 - y) * (Math.log(1 - y) + ly[1] - mu2);
            if (d < -1e-9) {
                return true;
            }
        }
        return false;
    }
}
