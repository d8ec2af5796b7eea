package org.cohesa.core.records;

/**
 * The store's note of the newest event, written in the same transaction as each event. Without it a
 * removed newest event would leave a shorter chain that is still internally whole; without its MAC anyone could
 * move it back along with the events they removed.
 *
 * @param events       how many events the chain holds
 * @param lastHash     the newest event's hash
 * @param lastRecordId the newest event's record
 * @param lastSeq      the newest event's step within its record
 * @param maxRecordId  the highest record number filed (so a removed newest record can be named)
 * @param mac          HMAC-SHA-256 of (events, lastHash, maxRecordId) under the register key, or null when written without one
 * @param keyId        the {@link RegisterKey#id()} of that key, or null
 */
public record ChainHead(long events, String lastHash, long lastRecordId, int lastSeq, long maxRecordId, String mac, String keyId) {

    public static final ChainHead EMPTY = new ChainHead(0, EventHash.GENESIS, 0, 0, 0, null, null);

    public ChainHead(long events, String lastHash, long lastRecordId, int lastSeq, long maxRecordId) {
        this(events, lastHash, lastRecordId, lastSeq, maxRecordId, null, null);
    }

    /** The head after appending {@code e}, sealed with {@code key} when one is given. */
    public ChainHead after(RecordEvent e, RegisterKey key) {
        long count = events + 1;
        long max = Math.max(maxRecordId, e.recordId());
        return new ChainHead(count, e.hash(), e.recordId(), e.seq(), max,
                key == null ? null : key.headMac(count, e.hash(), max), key == null ? null : key.id());
    }
}
