package org.cohesa.core.structure;

/**
 * Hansen parameters from measured liquid properties (the "property route"), each formula with its source:
 * <ul>
 *   <li>δt = √((ΔHvap − RT)/V): Hildebrand and Scott, <i>The Solubility of Nonelectrolytes</i>, 3rd ed. (1950);
 *       Hansen, <i>Hansen Solubility Parameters: A User's Handbook</i>, 2nd ed., CRC Press (2007), ch. 1;</li>
 *   <li>δD from the refractive index: molar refraction R = V·(n²−1)/(n²+2) (Lorentz–Lorenz) put into the
 *       dispersion relation of Mathieu, ACS Omega 3 (2018) 17049, δD = √(93.8 + (2016 + 75044/V)(R/V)²);</li>
 *   <li>δP = 37.4·μ/√V (μ in debye, V in cm³/mol): Hansen and Beerbower, in <i>Kirk-Othmer Encyclopedia of
 *       Chemical Technology</i>, Suppl. Vol., 2nd ed. (1971) 889; Hansen handbook (2007), ch. 1;</li>
 *   <li>δH = √(δt² − δD² − δP²), the remainder (0 when the other two already exceed δt).</li>
 * </ul>
 * Units: ΔHvap J/mol at 298.15 K, V cm³/mol at 20–25 °C, δ MPa^½.
 */
public final class PropertyRoute {

    /** Molar gas constant, J/(mol·K) (CODATA 2018 exact value). */
    static final double R = 8.314462618;
    static final double T = 298.15;

    private PropertyRoute() {
    }

    /** δt, MPa^½, from ΔHvap at 25 °C (J/mol) and molar volume (cm³/mol). */
    public static double totalFromVaporisation(double hvapJPerMol, double molarVolume) {
        return Math.sqrt((hvapJPerMol - R * T) / molarVolume);
    }

    /** δD, MPa^½, from the sodium-D refractive index and molar volume (cm³/mol). */
    public static double dispersionFromRefractiveIndex(double refractiveIndex, double molarVolume) {
        double n2 = refractiveIndex * refractiveIndex;
        double refraction = molarVolume * (n2 - 1) / (n2 + 2);
        return MathieuIncrements.dispersion(molarVolume, refraction);
    }

    /** δP, MPa^½, by Hansen–Beerbower from the dipole moment (debye) and molar volume (cm³/mol). */
    public static double polarFromDipole(double dipoleDebye, double molarVolume) {
        return 37.4 * dipoleDebye / Math.sqrt(molarVolume);
    }

    /** δH, MPa^½, as the remainder of δt after δD and δP. */
    public static double hydrogenBondingRemainder(double total, double dD, double dP) {
        return Math.sqrt(Math.max(total * total - dD * dD - dP * dP, 0));
    }
}
