package org.cohesa.core.hsp;

/**
 * Cohesive energy density and the Hildebrand solubility parameter from the enthalpy of vaporisation.
 *
 * <p>CED = (ΔHvap − RT) / Vm and δ = √CED (Hildebrand, J. H., Scott, R. L., <i>The Solubility of
 * Nonelectrolytes</i>, 3rd ed., Reinhold, 1950; Hansen 2007, ch. 1). With ΔHvap in J/mol and
 * Vm in cm³/mol, CED is in J/cm³ = MPa and δ in MPa^½. Vm = M/ρ with M in g/mol and ρ in g/cm³.
 */
public final class CohesiveEnergy {

    /** Molar gas constant, J/(mol·K) (CODATA 2018, exact). */
    public static final double GAS_CONSTANT = 8.314462618;

    private CohesiveEnergy() {
    }

    /** Result: cohesive energy density (MPa) and Hildebrand δ (MPa^½). */
    public record Result(double cohesiveEnergyDensity, double delta) {
    }

    /**
     * @param hvapKjPerMol       enthalpy of vaporisation at {@code kelvin}, kJ/mol, &gt; 0
     * @param molarMassGPerMol   molar mass, g/mol, &gt; 0
     * @param densityGPerCm3     liquid density, g/cm³, &gt; 0
     * @param kelvin             temperature, K, &gt; 0
     */
    public static Result fromVaporisation(double hvapKjPerMol, double molarMassGPerMol, double densityGPerCm3, double kelvin) {
        requirePositive("hvap", hvapKjPerMol);
        requirePositive("molar mass", molarMassGPerMol);
        requirePositive("density", densityGPerCm3);
        requirePositive("temperature", kelvin);
        double molarVolume = molarMassGPerMol / densityGPerCm3;
        double energy = hvapKjPerMol * 1000.0 - GAS_CONSTANT * kelvin;
        if (energy <= 0) {
            throw new IllegalArgumentException("hvap " + hvapKjPerMol + " kJ/mol is below RT at " + kelvin + " K: no cohesive energy left");
        }
        double ced = energy / molarVolume;
        return new Result(ced, Math.sqrt(ced));
    }

    private static void requirePositive(String field, double value) {
        if (!Double.isFinite(value) || value <= 0) {
            throw new IllegalArgumentException(field + " must be a positive number, got " + value);
        }
    }
}
