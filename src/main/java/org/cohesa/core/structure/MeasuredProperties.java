package org.cohesa.core.structure;

import org.cohesa.core.InvalidInputException;

/**
 * Measured liquid properties a user (or the bundled table) may know; each one that is present moves its component
 * to the property route. All optional.
 *
 * @param density         g/cm³ at 20–25 °C
 * @param refractiveIndex n_D at 20–25 °C
 * @param dipoleDebye     dipole moment, debye
 * @param hvapKjPerMol    enthalpy of vaporisation at 25 °C, kJ/mol
 */
public record MeasuredProperties(Double density, Double refractiveIndex, Double dipoleDebye, Double hvapKjPerMol) {

    public static final MeasuredProperties NONE = new MeasuredProperties(null, null, null, null);

    public MeasuredProperties {
        check("density", density, 0.3, 3.5);
        check("refractive_index", refractiveIndex, 1.2, 1.9);
        check("dipole", dipoleDebye, 0, 12);
        check("hvap", hvapKjPerMol, 5, 200);
    }

    private static void check(String field, Double v, double min, double max) {
        if (v != null && (!Double.isFinite(v) || v < min || v > max)) {
            throw new InvalidInputException(field, String.valueOf(v), "must be between " + min + " and " + max);
        }
    }
}
