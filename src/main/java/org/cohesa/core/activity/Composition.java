package org.cohesa.core.activity;

import java.util.List;
import org.cohesa.core.solvent.Solvent;

/**
 * Conversions between volume fractions and mole fractions through the pure-liquid molar volumes
 * (ideal volume of mixing): xᵢ = (φᵢ/Vᵢ) / Σⱼ (φⱼ/Vⱼ) and φᵢ = xᵢVᵢ / Σⱼ xⱼVⱼ, Vᵢ in cm³/mol.
 */
public final class Composition {

    private Composition() {
    }

    /** Mole fractions from volume fractions; molar volumes in cm³/mol. */
    public static double[] moleFractions(double[] volumeFractions, double[] molarVolumes) {
        return normalise(volumeFractions, molarVolumes, true);
    }

    /** Volume fractions from mole fractions; molar volumes in cm³/mol. */
    public static double[] volumeFractions(double[] moleFractions, double[] molarVolumes) {
        return normalise(moleFractions, molarVolumes, false);
    }

    /**
     * Molar volumes of the solvents, cm³/mol (stored value, or M/ρ).
     *
     * @throws IllegalArgumentException naming the first solvent that has neither
     */
    public static double[] molarVolumes(List<Solvent> solvents) {
        double[] v = new double[solvents.size()];
        for (int i = 0; i < v.length; i++) {
            Double mv = solvents.get(i).effectiveMolarVolume();
            if (mv == null) {
                throw new IllegalArgumentException(solvents.get(i).name()
                        + " has no molar volume (nor molar mass and density) in the library");
            }
            v[i] = mv;
        }
        return v;
    }

    private static double[] normalise(double[] f, double[] v, boolean divide) {
        if (f.length != v.length || f.length == 0) {
            throw new IllegalArgumentException("need one molar volume per fraction, got " + v.length + " for " + f.length);
        }
        double[] out = new double[f.length];
        double sum = 0;
        for (int i = 0; i < f.length; i++) {
            if (!Double.isFinite(f[i]) || f[i] < 0) {
                throw new IllegalArgumentException("fraction must be a number ≥ 0, got " + f[i]);
            }
            if (!(v[i] > 0) || !Double.isFinite(v[i])) {
                throw new IllegalArgumentException("molar volume must be a positive number, got " + v[i]);
            }
            out[i] = divide ? f[i] / v[i] : f[i] * v[i];
            sum += out[i];
        }
        if (!(sum > 0)) {
            throw new IllegalArgumentException("fractions are all zero");
        }
        for (int i = 0; i < out.length; i++) {
            out[i] /= sum;
        }
        return out;
    }
}
