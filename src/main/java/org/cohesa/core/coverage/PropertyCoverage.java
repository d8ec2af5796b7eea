package org.cohesa.core.coverage;

/**
 * How many solvents of a library have one property, and what those values rest on.
 *
 * @param property  the source group as in the CSV files ({@code hsp}, {@code vapour_pressure}, …)
 * @param label     the property in words
 * @param solvents  number of solvents in the library
 * @param have      solvents with a value
 * @param measured  … of which from a publication ({@link Provenance#MEASURED})
 * @param estimated … of which estimated
 * @param memory    … of which recalled from memory
 * @param derived   … of which computed or assigned by rule
 * @param user      … of which entered by the user
 * @param unsourced … of which without a source key
 */
public record PropertyCoverage(String property, String label, int solvents, int have, int measured, int estimated, int memory, int derived,
        int user, int unsourced) {

    /** Share of the library with a value, 0–1. */
    public double fraction() {
        return solvents == 0 ? 0 : (double) have / solvents;
    }
}
