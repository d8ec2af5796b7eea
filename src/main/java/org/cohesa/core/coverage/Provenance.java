package org.cohesa.core.coverage;

import java.util.Locale;

/**
 * What a stored value rests on, read from its source key (the keys are cited in {@code solvent-db/SOURCES.md}):
 * the naming rules of that file are that keys starting with {@code memory-} mark values recalled from memory and
 * keys starting with {@code estimate-} mark estimates; {@code computed} and {@code unifac-manual} are derived by a
 * stated rule from other values; every other key names a publication (a handbook table, a paper, a standard, a
 * regulatory list) of measured or tabulated values.
 */
public enum Provenance {
    /** from a published table or paper: measured, evaluated or tabulated values */
    MEASURED("measured"),
    /** an estimate (a correlation or model, not a measurement); its error is stated in docs/methods.md */
    ESTIMATED("estimated"),
    /** recalled from memory by the curator, not yet checked against the publication */
    RECALLED("from memory"),
    /** computed from other stored values or assigned by a stated rule (molar mass from the formula, UNIFAC groups) */
    DERIVED("derived"),
    /** entered by the user */
    USER("your entry"),
    /** a bundled value without a source key (should not happen; the cross-check test forbids it) */
    UNSOURCED("no source");

    private final String label;

    Provenance(String label) {
        this.label = label;
    }

    /** Short word for tables: "measured", "estimated", "from memory", … */
    public String label() {
        return label;
    }

    /** The provenance of a value with source key {@code key} ({@code userEntry}: the value belongs to a user's solvent). */
    public static Provenance of(String key, boolean userEntry) {
        if (key == null || key.isBlank()) {
            return userEntry ? USER : UNSOURCED;
        }
        String k = key.strip().toLowerCase(Locale.ROOT);
        if (k.startsWith("memory-")) {
            return RECALLED;
        }
        if (k.startsWith("estimate-") || k.contains("-estimate")) {
            return ESTIMATED;
        }
        if (k.equals("computed") || k.equals("unifac-manual")) {
            return DERIVED;
        }
        if (k.equals("user") || k.equals("yours")) {
            return USER;
        }
        return MEASURED;
    }
}
