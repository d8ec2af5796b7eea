package org.cohesa.core.structure;

import java.util.Map;

/**
 * Errors measured for each route on the experimental Hansen table of Alshehri et al., AIChE J. 68 (2022) e17469,
 * joined to PubChem SMILES (462 compounds; HansenEstimateTest recomputes them and fails when they drift), MPa^½.
 * {@code GROUP_*} and {@code MUCH_WORSE_MATHIEU} are the Mathieu groups alone; {@code MEAN}, {@code MATHIEU_ALONE},
 * {@code SP_ALONE} and {@code MUCH_WORSE} the default combined route.
 * docs/methods.md lists them by family.
 */
final class EstimateErrors {

    private EstimateErrors() {
    }

    /** {MAE, P90} per route and component. */
    static final double[] GROUP_DD = {0.72, 1.62};
    static final double[] GROUP_DP = {2.19, 4.50};
    static final double[] GROUP_DH = {1.52, 3.51};
    /** The Mathieu figures per component (index 0 δD, 1 δP, 2 δH), the {@code MATHIEU} group route. */
    static final double[][] GROUP = {GROUP_DD, GROUP_DP, GROUP_DH};
    /**
     * The default (combined) group route, per component, measured as users get it: the mean of Mathieu 2018 and
     * Stefanis–Panayiotou where both give the component; Mathieu alone where the Stefanis–Panayiotou tables do not cover
     * the structure (mostly molecules under three carbons); Stefanis–Panayiotou alone where Mathieu has no increment.
     */
    static final double[][] MEAN = {{0.53, 1.25}, {1.55, 3.24}, {1.29, 2.57}};
    static final double[][] MATHIEU_ALONE = {{1.04, 2.08}, {3.62, 8.05}, {2.85, 6.50}};
    /**
     * Stefanis–Panayiotou alone: δP as measured where it was the only group value (29 compounds); no compound of the
     * table got δD or δH from it alone, so those carry the method's figures on all 364 compounds it covers.
     */
    static final double[][] SP_ALONE = {{0.56, 1.25}, {2.17, 5.02}, {1.56, 3.42}};
    /** The Stefanis–Panayiotou method on every compound it covers fully (364). */
    static final double[][] SP = {{0.56, 1.25}, {1.62, 3.69}, {1.56, 3.42}};
    /** The combined route over every compound it gives the component for (462, 436, 462). */
    static final double[][] COMBINED = {{0.64, 1.45}, {1.86, 4.39}, {1.56, 3.58}};
    /** The combined route on the 407 compounds the Mathieu groups cover in full, like for like with {@link #GROUP}. */
    static final double[][] COMBINED_ON_MATHIEU_SET = {{0.60, 1.37}, {1.84, 3.98}, {1.41, 2.99}};
    /** Relative error of the group molar volume (fraction). */
    static final double[] GROUP_VOLUME = {0.03, 0.06};
    static final double[] PROPERTY_DD = {0.65, 1.37};
    static final double[] PROPERTY_DP = {1.01, 2.19};
    /** δH as the remainder √(δt² − δD² − δP²) with all three from measured properties (ΔHvap, n_D, μ, ρ). */
    static final double[] PROPERTY_DH = {1.94, 5.10};
    /** δt from ΔHvap and the molar volume, against the published δt. */
    static final double[] PROPERTY_DT = {0.60, 1.60};

    /**
     * Families whose error on the combined group route is much worse (more than 1.5 times the overall mean absolute error
     * in some component, at least 5 compounds): family → {MAE δD, MAE δP, MAE δH} measured for it.
     */
    static final Map<String, double[]> MUCH_WORSE = Map.of(
            "amide", new double[] {1.03, 3.16, 2.43},
            "highly halogenated", new double[] {0.88, 3.57, 2.77},
            "nitrile", new double[] {0.68, 3.31, 1.46},
            "nitro", new double[] {0.74, 5.20, 2.73},
            "phosphorus", new double[] {1.58, 3.28, 2.66});

    /** The same rule for the Mathieu group route alone. */
    static final Map<String, double[]> MUCH_WORSE_MATHIEU = Map.of(
            "acid", new double[] {1.13, 1.45, 1.22},
            "aliphatic hydrocarbon", new double[] {1.24, 1.79, 2.65},
            "amide", new double[] {1.28, 3.26, 2.70},
            "amine", new double[] {0.78, 3.12, 2.28},
            "highly halogenated", new double[] {1.07, 3.84, 2.63},
            "nitro", new double[] {0.83, 5.59, 3.24},
            "phosphorus", new double[] {1.58, 3.28, 2.66});
}
