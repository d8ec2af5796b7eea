package org.cohesa.core.activity;

import java.util.List;
import org.cohesa.core.hsp.CohesiveEnergy;
import org.cohesa.core.hsp.FloryHugginsChi;
import org.cohesa.core.hsp.HansenDistance;
import org.cohesa.core.hsp.HansenParameters;

/**
 * Multicomponent Flory–Huggins activity coefficients with interaction parameters from Hansen solubility
 * parameters (Lindvig, Th., Michelsen, M. L., Kontogeorgis, G. M., "A Flory–Huggins model based on the
 * Hansen solubility parameters", <i>Fluid Phase Equilibria</i> 203 (2002) 247–260).
 *
 * <p>Excess Gibbs energy with volume fractions φᵢ = xᵢVᵢ / Σⱼ xⱼVⱼ:
 * <pre>
 *   gᴱ/RT = Σᵢ xᵢ ln(φᵢ/xᵢ) + (Σᵢ xᵢVᵢ) Σᵢ&lt;ⱼ φᵢφⱼ Aᵢⱼ,    Aᵢⱼ = α Raᵢⱼ² / (4RT)  (mol/cm³)
 *   ln γₖ = ln(φₖ/xₖ) + 1 − φₖ/xₖ + Vₖ [Σⱼ φⱼAₖⱼ − ½ Σᵢ Σⱼ φᵢφⱼAᵢⱼ]
 * </pre>
 * so that for a binary the residual term is χ₁₂φ₂² with χ₁₂ = V₁A₁₂ = α V₁ Ra²/(4RT) as in
 * {@link FloryHugginsChi}; α = 0.6 (Lindvig et al. 2002). Vᵢ molar volumes in cm³/mol, Ra in MPa^½,
 * T in K; γ dimensionless. The second expression is the exact composition derivative of the first,
 * so the model obeys the Gibbs–Duhem relation.
 */
public final class FloryHuggins extends LogGammaModel {

    public static final String NAME = "Flory–Huggins (Hansen, Lindvig 2002)";

    private final int n;
    private final double[] v;
    /** Ra²ᵢⱼ α / 4, MPa; divided by RT at evaluation to give Aᵢⱼ. */
    private final double[][] b;
    private final String note;

    /**
     * @param hansen       Hansen parameters of each component, MPa^½
     * @param molarVolumes molar volume of each component, cm³/mol
     * @param note         why this model (may be empty)
     */
    public FloryHuggins(List<HansenParameters> hansen, double[] molarVolumes, String note) {
        if (hansen.isEmpty() || hansen.size() != molarVolumes.length) {
            throw new IllegalArgumentException("Flory–Huggins needs one molar volume per component");
        }
        this.n = hansen.size();
        this.v = molarVolumes.clone();
        this.b = new double[n][n];
        this.note = note == null ? "" : note;
        for (int i = 0; i < n; i++) {
            if (!(v[i] > 0) || !Double.isFinite(v[i])) {
                throw new IllegalArgumentException("molar volume must be a positive number, got " + v[i]);
            }
            for (int j = 0; j < n; j++) {
                b[i][j] = i == j ? 0 : FloryHugginsChi.LINDVIG_ALPHA * HansenDistance.ra(hansen.get(i), hansen.get(j))
                        * HansenDistance.ra(hansen.get(i), hansen.get(j)) / 4.0;
            }
        }
    }

    @Override
    public String name() {
        return NAME;
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
        double rt = CohesiveEnergy.GAS_CONSTANT * kelvin;
        double vm = 0;
        for (int i = 0; i < n; i++) {
            vm += x[i] * v[i];
        }
        double[] phi = new double[n];
        for (int i = 0; i < n; i++) {
            phi[i] = x[i] * v[i] / vm;
        }
        double[] s = new double[n];
        double total = 0;
        for (int k = 0; k < n; k++) {
            double t = 0;
            for (int j = 0; j < n; j++) {
                t += phi[j] * b[k][j];
            }
            s[k] = t / rt;
            total += phi[k] * s[k];
        }
        double[] out = new double[n];
        for (int k = 0; k < n; k++) {
            double ratio = v[k] / vm; // φₖ/xₖ, finite also at xₖ = 0
            out[k] = Math.log(ratio) + 1 - ratio + v[k] * (s[k] - 0.5 * total);
        }
        return out;
    }
}
