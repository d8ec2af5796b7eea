package org.cohesa.cli.structure;

import org.cohesa.cli.Args;
import org.cohesa.core.structure.MeasuredProperties;
import picocli.CommandLine.Option;

/** Measured liquid properties that move a component of a structure estimate to the property route. */
public final class MeasuredOptions {

    @Option(names = "--density", paramLabel = "G_PER_CM3", description = "Measured density at 20–25 °C, g/cm³ (molar volume = M/ρ).")
    String density;

    @Option(names = "--refractive-index", paramLabel = "N_D", description = "Measured refractive index n_D (δD from the molar refraction).")
    String refractiveIndex;

    @Option(names = "--dipole", paramLabel = "DEBYE", description = "Dipole moment, debye (δP by Hansen–Beerbower).")
    String dipole;

    @Option(names = "--hvap", paramLabel = "KJ_PER_MOL", description = "Enthalpy of vaporisation at 25 °C, kJ/mol: δt from it and the molar volume, "
            + "as a check on the three components, and (with --refractive-index and --dipole) δH as the remainder for comparison.")
    String hvap;

    /** The properties from option texts (null: not given), each checked as its option. */
    static MeasuredProperties of(String density, String refractiveIndex, String dipole) {
        return new MeasuredProperties(number("--density", density), number("--refractive-index", refractiveIndex), number("--dipole", dipole), null);
    }

    public MeasuredProperties properties() {
        return new MeasuredProperties(number("--density", density), number("--refractive-index", refractiveIndex), number("--dipole", dipole),
                number("--hvap", hvap));
    }

    public Double density() {
        return number("--density", density);
    }

    private static Double number(String field, String text) {
        if (text == null) {
            return null;
        }
        double v = Args.number(field, text);
        try {
            switch (field) {
                case "--density" -> new MeasuredProperties(v, null, null, null);
                case "--refractive-index" -> new MeasuredProperties(null, v, null, null);
                case "--hvap" -> new MeasuredProperties(null, null, null, v);
                default -> new MeasuredProperties(null, null, v, null);
            }
        } catch (org.cohesa.core.InvalidInputException e) {
            throw new org.cohesa.core.InvalidInputException(field, text, e.reason());
        }
        return v;
    }
}
