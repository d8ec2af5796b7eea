package org.cohesa.core.activity;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Gibbs–Duhem check: at constant T and P, Σᵢ xᵢ d ln γᵢ = 0 for any change of composition
 * (e.g. Prausnitz, Lichtenthaler, de Azevedo, Molecular Thermodynamics of Fluid-Phase Equilibria, 3rd ed., 1999, §6.3).
 */
final class GibbsDuhem {

    private GibbsDuhem() {
    }

    static void assertConsistent(ActivityModel m, double[] x, double kelvin) {
        int n = x.length;
        double h = 1e-6;
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < n; b++) {
                if (a == b) {
                    continue;
                }
                double[] up = x.clone();
                double[] down = x.clone();
                up[a] += h;
                up[b] -= h;
                down[a] -= h;
                down[b] += h;
                double[] lu = m.lnGamma(up, kelvin);
                double[] ld = m.lnGamma(down, kelvin);
                double sum = 0;
                double scale = 0;
                for (int i = 0; i < n; i++) {
                    double d = (lu[i] - ld[i]) / (2 * h);
                    sum += x[i] * d;
                    scale += Math.abs(x[i] * d);
                }
                assertEquals(0.0, sum, 1e-6 * Math.max(1, scale), m.name() + ": Σ x dlnγ along " + a + "→" + b);
            }
        }
    }
}
