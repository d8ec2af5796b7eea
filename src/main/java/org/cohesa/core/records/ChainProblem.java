package org.cohesa.core.records;

import java.util.Locale;

/**
 * One break in the hash chain found by {@link ChainVerifier}.
 *
 * @param kind     what was done to the stored events
 * @param position row position where the break shows (1, 2, …)
 * @param recordId the record affected
 * @param seq      the step of that record (0 when the whole record is gone)
 * @param detail   one plain sentence for people
 */
public record ChainProblem(Kind kind, long position, long recordId, int seq, String detail) {

    public enum Kind {
        ALTERED, DELETED, REORDERED;

        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** "record 3 altered: …" */
    public String describe() {
        return "record " + recordId + " " + kind.label() + ": " + detail;
    }
}
