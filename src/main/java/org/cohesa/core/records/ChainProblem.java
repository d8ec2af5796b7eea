package org.cohesa.core.records;

import java.util.Locale;

/**
 * One break in the register found by {@link ChainVerifier}.
 *
 * @param kind     what was done to the stored events
 * @param position row position where the break shows (1, 2, …)
 * @param recordId the record affected (0 for the register's own settings or the whole register)
 * @param seq      the step of that record (0 when the whole record is gone)
 * @param detail   one plain sentence for people
 */
public record ChainProblem(Kind kind, long position, long recordId, int seq, String detail) {

    public enum Kind {
        /** content changed, or an event added that the head note does not count */
        ALTERED,
        /** an event or a whole record is gone */
        DELETED,
        /** events swapped or renumbered */
        REORDERED,
        /** an HMAC is missing or does not match the register key: written or changed without the key */
        FORGED,
        /** the head or the events are sealed with a different key (another register, or the wrong key file) */
        OTHER_KEY,
        /** a status step the status machine does not allow (e.g. approved → rejected) */
        ILLEGAL_MOVE,
        /** the chain does not contain the state an anchor kept elsewhere names */
        ANCHOR_MISMATCH;

        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** "record 3 altered: …" */
    public String describe() {
        return (recordId == 0 ? "register" : "record " + recordId) + " " + kind.label() + ": " + detail;
    }
}
