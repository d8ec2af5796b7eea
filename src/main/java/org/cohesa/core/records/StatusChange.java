package org.cohesa.core.records;

/**
 * One step of a record's history as people read it.
 *
 * @param seq     the event's number within the record (1 = filed)
 * @param status  the status the step left the record in
 * @param kind    the event kind label, e.g. "approved"
 * @param by      who, as typed
 * @param account the account that acted (operating-system user, or the database login on a shared register); null
 *                for events stored before accounts were recorded
 * @param at      when (UTC text, see {@link RecordEvent#formatAt})
 * @param comment the comment given, or null
 */
public record StatusChange(int seq, RecordStatus status, String kind, String by, String account, String at, String comment) {
}
