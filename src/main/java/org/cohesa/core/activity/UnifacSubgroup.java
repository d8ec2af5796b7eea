package org.cohesa.core.activity;

/**
 * One UNIFAC subgroup of a parameter set.
 *
 * @param id            subgroup number in its parameter set
 * @param name          subgroup name as tabulated, e.g. "CH3", "CH3COO"
 * @param mainGroup     main-group number (interaction parameters are per main group)
 * @param mainGroupName main-group name, e.g. "CCOO"
 * @param r             van der Waals group volume R_k (dimensionless, Bondi volume / 15.17 cm³/mol)
 * @param q             van der Waals group surface area Q_k (dimensionless, Bondi area / 2.5·10⁹ cm²/mol)
 */
public record UnifacSubgroup(int id, String name, int mainGroup, String mainGroupName, double r, double q) {

    public UnifacSubgroup {
        if (id <= 0 || mainGroup <= 0) {
            throw new IllegalArgumentException("UNIFAC subgroup and main-group numbers must be positive, got " + id + "/" + mainGroup);
        }
        if (!(r > 0) || !(q >= 0) || !Double.isFinite(r) || !Double.isFinite(q)) {
            throw new IllegalArgumentException("UNIFAC subgroup " + id + " needs R > 0 and Q ≥ 0, got R=" + r + " Q=" + q);
        }
    }
}
