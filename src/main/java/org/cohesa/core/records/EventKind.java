package org.cohesa.core.records;

import java.util.Locale;

/** What an event of a record's history did; each kind leaves the record in one status. */
public enum EventKind {
    /** The record was filed with its evidence snapshot. */
    CREATED(RecordStatus.DRAFT),
    /** Someone took the draft into review. */
    SENT_TO_REVIEW(RecordStatus.IN_REVIEW),
    APPROVED(RecordStatus.APPROVED),
    REJECTED(RecordStatus.REJECTED),
    /** A register setting changed (filed under record 0, the register itself), e.g. the four-eyes rule switched off. */
    RULE_SET(null);

    private final RecordStatus resultingStatus;

    EventKind(RecordStatus resultingStatus) {
        this.resultingStatus = resultingStatus;
    }

    /** The status a record is left in (null for {@link #RULE_SET}, which is no step of a record). */
    public RecordStatus resultingStatus() {
        return resultingStatus;
    }

    /** Stored and hashed name, e.g. "sent_to_review". */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static EventKind fromLabel(String label) {
        for (EventKind k : values()) {
            if (k.label().equals(label)) {
                return k;
            }
        }
        throw new IllegalArgumentException("unknown record event kind '" + label + "'");
    }

    /** The event that moves a record into {@code status}. */
    public static EventKind movingTo(RecordStatus status) {
        for (EventKind k : values()) {
            if (k != CREATED && k != RULE_SET && k.resultingStatus == status) {
                return k;
            }
        }
        throw new IllegalArgumentException("no event moves a record to " + status.label());
    }
}
