package org.cohesa.core.structure;

import java.util.Map;

/**
 * Errors measured for each route on the experimental Hansen table of Alshehri et al., AIChE J. 68 (2022) e17469,
 * joined to PubChem SMILES (462 compounds; HansenEstimateTest recomputes them and fails when they drift), MPa^½.
 * docs/methods.md lists them by family.
 */
final class EstimateErrors {

    private EstimateErrors() {
    }

    /** {MAE, P90} per route and component. */
    static final double[] GROUP_DD = {0.72, 1.62};
    static final double[] GROUP_DP = {2.19, 4.50};
    static final double[] GROUP_DH = {1.52, 3.51};
    /** Relative error of the group molar volume (fraction). */
    static final double[] GROUP_VOLUME = {0.03, 0.06};
    static final double[] PROPERTY_DD = {0.65, 1.37};
    static final double[] PROPERTY_DP = {1.01, 2.19};
    /** δH as the remainder √(δt² − δD² − δP²) with all three from measured properties (ΔHvap, n_D, μ, ρ). */
    static final double[] PROPERTY_DH = {1.94, 5.10};
    /** δt from ΔHvap and the molar volume, against the published δt. */
    static final double[] PROPERTY_DT = {0.60, 1.60};

    /**
     * Families whose group-contribution error is much worse (more than 1.5 times the overall mean absolute error
     * in some component, at least 5 compounds): family → {MAE δD, MAE δP, MAE δH} measured for it.
     */
    static final Map<String, double[]> MUCH_WORSE = Map.of(
            "acid", new double[] {1.13, 1.45, 1.22},
            "aliphatic hydrocarbon", new double[] {1.24, 1.79, 2.65},
            "amide", new double[] {1.28, 3.26, 2.70},
            "amine", new double[] {0.78, 3.12, 2.28},
            "highly halogenated", new double[] {1.07, 3.84, 2.63},
            "nitro", new double[] {0.83, 5.59, 3.24},
            "phosphorus", new double[] {1.58, 3.28, 2.66});
}
