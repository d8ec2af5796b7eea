package org.cohesa.core.records;

import java.util.Locale;
import org.cohesa.core.InvalidInputException;

/**
 * Where a substitution record stands. The only moves are draft → in_review → approved | rejected;
 * approved and rejected are final, so a decision once filed is never silently reopened.
 */
public enum RecordStatus {
    DRAFT,
    IN_REVIEW,
    APPROVED,
    REJECTED;

    /** The lower-case name used in JSON, tables and the stored events, e.g. "in_review". */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True when {@code next} is a legal move from this status. */
    public boolean canMoveTo(RecordStatus next) {
        return switch (this) {
            case DRAFT -> next == IN_REVIEW;
            case IN_REVIEW -> next == APPROVED || next == REJECTED;
            case APPROVED, REJECTED -> false;
        };
    }

    /**
     * Refuses an illegal move with a message that says what is possible instead.
     *
     * @param recordId the record, for the message
     */
    public void requireMoveTo(RecordStatus next, long recordId) {
        if (canMoveTo(next)) {
            return;
        }
        String why = switch (this) {
            case DRAFT -> "a draft must be sent for review before it can be " + next.label();
            case IN_REVIEW -> "it is already in review; approve or reject it";
            case APPROVED, REJECTED -> "it is " + label() + ", a final decision; file a new record instead";
        };
        throw new InvalidInputException("record " + recordId, label(),
                "cannot move to " + next.label() + ": " + why + " (draft → in_review → approved | rejected)");
    }

    public static RecordStatus fromLabel(String label) {
        for (RecordStatus s : values()) {
            if (s.label().equals(label)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown record status '" + label + "'");
    }
}
