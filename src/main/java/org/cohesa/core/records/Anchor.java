package org.cohesa.core.records;

/**
 * A state of the register kept somewhere else (a file in the quality folder, a hash written in a lab book): the hash of
 * the newest event at that time and, from an anchor file, how many events the chain held and when.
 *
 * @param headHash the newest event's hash then
 * @param events   how many events the chain held then, or null when only a hash was given
 * @param records  how many records, or null
 * @param at       when the anchor was written (UTC text), or null
 * @param keyId    the register key's id at the time, or null
 * @param mac      HMAC of {@link #content()} under the register key, or null when written without a key
 */
public record Anchor(String headHash, Long events, Long records, String at, String keyId, String mac) {

    public Anchor {
        if (headHash == null || !headHash.matches("[0-9a-f]{64}")) {
            throw new org.cohesa.core.InvalidInputException("--anchor", String.valueOf(headHash),
                    "a head hash is 64 lower-case hex digits (as record verify prints it)");
        }
    }

    /** An anchor given as a bare hash. */
    public static Anchor ofHash(String hash) {
        return new Anchor(hash == null ? null : hash.strip().toLowerCase(java.util.Locale.ROOT), null, null, null, null, null);
    }

    /** The text the anchor's MAC covers. */
    public String content() {
        return "head_hash=" + headHash + ";events=" + events + ";records=" + records + ";at=" + at;
    }
}
