package org.cohesa.core.safety;

import java.util.Arrays;
import org.cohesa.core.activity.ActivityModel;

/** Test-only ideal solution (γ = 1): Raoult's law, for checks whose expected values assume it. */
final class IdealStandIn implements ActivityModel {

    private final int n;

    IdealStandIn(int n) {
        this.n = n;
    }

    @Override
    public String name() {
        return "ideal (test stand-in)";
    }

    @Override
    public double[] gamma(double[] moleFractions, double kelvin) {
        double[] g = new double[n];
        Arrays.fill(g, 1.0);
        return g;
    }

    @Override
    public int size() {
        return n;
    }
}
