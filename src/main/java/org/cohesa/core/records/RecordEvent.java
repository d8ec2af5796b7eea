package org.cohesa.core.records;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;

/**
 * One entry of the append-only history: a record was created or changed status. Events are chained:
 * {@code prevHash} is the hash of the event stored just before it (across all records), {@code hash} is
 * SHA-256 over this event's canonical content including {@code prevHash} (see {@link EventHash}).
 *
 * @param position row position in the store (1, 2, …), for messages; 0 before it is stored
 * @param recordId the record this event belongs to
 * @param seq      1 for the creation, then 2, 3, … within the record
 * @param kind     what happened, the {@link EventKind#label()} as stored (kept as text so a damaged row can still be read and reported)
 * @param actor    who did it, as typed
 * @param account  the account that acted (operating-system user, or the database login on a shared register), or
 *                 null for an event stored before accounts were recorded (its hash then leaves the field out)
 * @param at       when, UTC, millisecond text {@code 2026-12-01T22:00:00.000Z}
 * @param payload  canonical JSON text: the record's content for {@link EventKind#CREATED}, else {@code {"comment": …}}
 * @param prevRecordId the record of the previous event (0 for the first): lets the verifier name a removed event
 * @param prevSeq  the step of the previous event (0 for the first)
 * @param prevHash hex SHA-256 of the previous event, or {@link EventHash#GENESIS} for the first
 * @param hash     hex SHA-256 of this event
 * @param mac      hex HMAC-SHA-256 of {@code hash} under the register's key (see {@link RegisterKey}), or null when the
 *                 event was written without a key
 */
public record RecordEvent(long position, long recordId, int seq, String kind, String actor, String account, String at,
                          String payload, long prevRecordId, int prevSeq, String prevHash, String hash, String mac) {

    private static final DateTimeFormatter AT = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss.SSS'Z'").withZone(ZoneOffset.UTC);

    /** The stored text of an instant: UTC, milliseconds, fixed width (so it hashes the same everywhere). */
    public static String formatAt(Instant instant) {
        return AT.format(instant.truncatedTo(ChronoUnit.MILLIS));
    }

    public Instant instant() {
        return Instant.parse(at);
    }

    /** The kind as an enum; fails on a damaged row. */
    public EventKind eventKind() {
        return EventKind.fromLabel(kind);
    }

    /** The same event at storage position {@code position}. */
    public RecordEvent atPosition(long storedPosition) {
        return new RecordEvent(storedPosition, recordId, seq, kind, actor, account, at, payload, prevRecordId, prevSeq, prevHash, hash, mac);
    }

    public JsonNode payloadTree() {
        return CanonicalJson.parse(payload);
    }

    /**
     * Builds the next event of the chain with its hash.
     *
     * @param account  the acting account (null only for tests of stored legacy events)
     * @param payload  any JSON object; stored in canonical form
     * @param previous the newest stored event, or null for the very first
     * @param key      the register's key, or null to write an unkeyed event
     */
    public static RecordEvent next(long recordId, int seq, EventKind kind, String actor, String account, Instant at, JsonNode payload,
                                   RecordEvent previous, RegisterKey key) {
        long prevRecordId = previous == null ? 0 : previous.recordId();
        int prevSeq = previous == null ? 0 : previous.seq();
        String prevHash = previous == null ? EventHash.GENESIS : previous.hash();
        if (actor == null || actor.isBlank()) {
            throw new IllegalArgumentException("an event needs the name of who made it");
        }
        String canonicalPayload = CanonicalJson.write(payload);
        String atText = formatAt(at);
        String hash = EventHash.of(recordId, seq, kind.label(), actor.strip(), account, atText, canonicalPayload, prevRecordId, prevSeq, prevHash);
        return new RecordEvent(0, recordId, seq, kind.label(), actor.strip(), account, atText, canonicalPayload, prevRecordId, prevSeq,
                prevHash, hash, key == null ? null : key.mac(hash));
    }
}
