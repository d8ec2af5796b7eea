package org.cohesa.core.activity;

import java.util.Arrays;

/** The ideal solution (Raoult's law): γᵢ = 1 for every component at every composition and temperature. */
public final class IdealSolution implements ActivityModel {

    public static final String NAME = "ideal";

    private final int n;

    public IdealSolution(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("a mixture needs at least one component, got " + n);
        }
        this.n = n;
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public double[] gamma(double[] moleFractions, double kelvin) {
        Activity.requireComposition(moleFractions, n);
        Activity.requireTemperature(kelvin);
        double[] g = new double[n];
        Arrays.fill(g, 1.0);
        return g;
    }
}
