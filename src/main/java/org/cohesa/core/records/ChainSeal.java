package org.cohesa.core.records;

/**
 * What checks the HMAC seals of a register: a {@link RegisterKey} from a key file, or (on a shared register that holds
 * its secret itself) the server, which answers whether a seal is genuine without ever handing out the secret. The
 * messages sealed are the same either way: {@code "event:" + hash}, {@code "head:" + events + ":" + newest hash + ":" +
 * highest record} and {@code "anchor:" + content}, each HMAC-SHA-256 (RFC 2104) as 64 hex digits.
 */
public interface ChainSeal {

    /** The public id of the secret (a hash of it, revealing nothing), as stored in the head note. */
    String id();

    /** True when {@code mac} is the genuine seal of the event with hash {@code hash}. */
    boolean eventSealed(String hash, String mac);

    /** True when {@code mac} is the genuine seal of a head note with these values. */
    boolean headSealed(long events, String lastHash, long maxRecordId, String mac);

    /** True when {@code mac} is the genuine seal of an anchor file's content line. */
    boolean anchorSealed(String content, String mac);
}
