package org.cohesa.core.records;

/**
 * The store's note of the newest event, written in the same transaction as each event. Without it a
 * removed newest event would leave a shorter chain that is still internally whole.
 *
 * @param events       how many events the chain holds
 * @param lastHash     the newest event's hash
 * @param lastRecordId the newest event's record
 * @param lastSeq      the newest event's step within its record
 * @param maxRecordId  the highest record number filed (so a removed newest record can be named)
 */
public record ChainHead(long events, String lastHash, long lastRecordId, int lastSeq, long maxRecordId) {

    public static final ChainHead EMPTY = new ChainHead(0, EventHash.GENESIS, 0, 0, 0);
}
