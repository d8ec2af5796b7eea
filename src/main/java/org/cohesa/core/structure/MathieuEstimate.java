package org.cohesa.core.structure;

import java.util.List;

/**
 * What the Mathieu (2018) fragment method gives for one structure. A component is null when the structure holds a
 * fragment the method has no published value for ({@link #uncovered} names it).
 *
 * @param molarVolume     liquid molar volume from the method's volume increments, cm³/mol (25 °C)
 * @param molarRefraction molar refraction from the method's increments, cm³/mol
 * @param dD              dispersion component, MPa^½
 * @param dP              polar component, MPa^½
 * @param dH              hydrogen-bonding component, MPa^½
 * @param uncovered       atom codes or fragments without a published increment (empty when all are covered)
 */
public record MathieuEstimate(Double molarVolume, Double molarRefraction, Double dD, Double dP, Double dH, List<String> uncovered) {

    public MathieuEstimate {
        uncovered = List.copyOf(uncovered);
    }

    public boolean complete() {
        return dD != null && dP != null && dH != null;
    }
}
