package org.cohesa.core.structure;

import java.util.Map;

/**
 * The published increments of D. Mathieu, "Pencil and Paper Estimation of Hansen Solubility Parameters",
 * ACS Omega 3 (2018) 17049–17056, doi:10.1021/acsomega.8b02601 (open access), as tabulated in its Supporting
 * Information (the author's script, figshare 10.1021/acsomega.8b02601, article 7449257). Numbers unchanged.
 *
 * <p>Atom codes are element + number of neighbours (hydrogens included) + number of hydrogens, with {@code a}
 * for an aromatic atom: {@code C43} is a CH3 carbon, {@code C31a} an aromatic CH, {@code O10} a carbonyl oxygen.
 */
final class MathieuIncrements {

    private MathieuIncrements() {
    }

    /** Liquid molar volume increments, cm³/mol, per atom code and per ring (R5, R6, R<5, R>6, aromat). */
    static final Map<String, Double> VOLUME = Map.ofEntries(
            Map.entry("B30", 7.61), Map.entry("Br10", 27.52), Map.entry("C10", 14.68), Map.entry("C20", 9.89),
            Map.entry("C21", 22.77), Map.entry("C30", 0.0), Map.entry("C30a", 0.0), Map.entry("C31", 13.23),
            Map.entry("C31a", 13.23), Map.entry("C32", 27.17), Map.entry("C40", -8.40), Map.entry("C41", 4.46),
            Map.entry("C42", 16.57), Map.entry("C43", 29.58), Map.entry("Cl10", 24.74), Map.entry("F10", 17.63),
            Map.entry("I10", 35.64), Map.entry("N10", 14.09), Map.entry("N20", 7.42), Map.entry("N20a", 7.42),
            Map.entry("N21", 18.14), Map.entry("N30", -3.08), Map.entry("N30a", -3.08), Map.entry("N31", 7.74),
            Map.entry("N31a", 7.74), Map.entry("N32", 17.81), Map.entry("N43", 5.36), Map.entry("O10", 14.89),
            Map.entry("O20", 6.25), Map.entry("O20a", 6.25), Map.entry("O21", 11.78), Map.entry("P30", 10.42),
            Map.entry("P40", -1.94), Map.entry("P41", 10.06), Map.entry("S10", 25.92), Map.entry("S20", 14.90),
            Map.entry("S20a", 14.90), Map.entry("S21", 26.14), Map.entry("S30", 5.58), Map.entry("S40", -3.74),
            Map.entry("Si40", 9.28), Map.entry("Si41", 23.35),
            Map.entry("R5", 9.41), Map.entry("R6", 6.89), Map.entry("R<5", 10.89), Map.entry("R>6", 3.75),
            Map.entry("aromat", 1.82));

    /** Molar refraction increments, cm³/mol, per atom code. */
    static final Map<String, Double> REFRACTION = Map.ofEntries(
            Map.entry("B30", 2.91), Map.entry("Br10", 8.44), Map.entry("C10", 2.32), Map.entry("C20", 4.01),
            Map.entry("C21", 4.58), Map.entry("C30", 3.15), Map.entry("C30a", 3.48), Map.entry("C31", 4.65),
            Map.entry("C31a", 4.46), Map.entry("C32", 5.38), Map.entry("C40", 2.60), Map.entry("C41", 3.48),
            Map.entry("C42", 4.60), Map.entry("C43", 5.74), Map.entry("Cl10", 5.87), Map.entry("F10", 1.06),
            Map.entry("I10", 13.75), Map.entry("N10", 1.55), Map.entry("N20", 2.60), Map.entry("N20a", 2.44),
            Map.entry("N21", 3.55), Map.entry("N30", 2.89), Map.entry("N30a", 2.85), Map.entry("N31", 3.69),
            Map.entry("N31a", 3.72), Map.entry("N32", 4.60), Map.entry("N43", 8.02), Map.entry("O10", 1.84),
            Map.entry("O20", 1.55), Map.entry("O20a", 0.71), Map.entry("O21", 2.51), Map.entry("P30", 7.41),
            Map.entry("P40", 4.98), Map.entry("P41", 5.41), Map.entry("S10", 10.60), Map.entry("S20", 8.22),
            Map.entry("S20a", 7.05), Map.entry("S21", 8.71), Map.entry("S30", 7.28), Map.entry("S40", 5.12),
            Map.entry("Si40", 6.38), Map.entry("Si41", 7.85));

    /** Polar cohesive-energy fragments E_P, J/mol: δP = √(ΣE_P / V). */
    static final Map<String, Double> POLAR = Map.ofEntries(
            Map.entry("N(1)", 2783.0), Map.entry("N(2)", 8235.0), Map.entry("O(0)", 1603.0), Map.entry("O(1)", 4125.0),
            Map.entry("Cl(0)", 1637.0), Map.entry("C=O", 7492.0), Map.entry("COOH", -5494.0),
            Map.entry("COinAmide", 15972.0), Map.entry("Carbonate", 19019.0), Map.entry("Ester", 3653.0),
            Map.entry("C#N", 16056.0), Map.entry("NitroOnC", 13276.0), Map.entry("O=P", 20310.0));

    /** Hydrogen-bonding cohesive-energy fragments E_H, J/mol: δH = √(ΣE_H / V). */
    static final Map<String, Double> HYDROGEN_BONDING = Map.ofEntries(
            Map.entry("HC", 24.5), Map.entry("HN", -1576.0), Map.entry("HNamide", 5060.0), Map.entry("H2N", 5484.0),
            Map.entry("HO", 16945.0), Map.entry("HO_COOH", 7094.0), Map.entry("N", 3252.0), Map.entry("O", 1980.0),
            Map.entry("X", 412.0));

    /** δD = √(93.8 + (2016 + 75044/V)·(R/V)²), MPa^½, V and R in cm³/mol (Mathieu 2018, dispersion relation). */
    static double dispersion(double molarVolume, double molarRefraction) {
        double r = molarRefraction / molarVolume;
        return Math.sqrt(93.8 + (2016 + 75044.0 / molarVolume) * r * r);
    }
}
