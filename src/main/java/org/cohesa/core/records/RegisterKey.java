package org.cohesa.core.records;

import java.nio.charset.StandardCharsets;
import java.security.InvalidKeyException;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.HexFormat;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;

/**
 * The secret that seals the register: every event's hash and the chain head carry an HMAC-SHA-256 (RFC 2104; FIPS
 * 198-1) under this key. The key lives outside the database (the user's key file, or the site's key for a shared
 * register), so someone who edits the stored events and recomputes every SHA-256 still cannot produce MACs that
 * verify. The key id (a hash of the key) is stored in the head so a wrong key is told apart from a forgery.
 */
public final class RegisterKey implements ChainSeal {

    /** Key length in bytes (the HMAC-SHA-256 block-size recommendation of RFC 2104 is at least the 32-byte output). */
    public static final int BYTES = 32;

    private final byte[] secret;
    private final String id;

    private RegisterKey(byte[] secret) {
        if (secret.length < 16) {
            throw new IllegalArgumentException("a register key needs at least 16 bytes, has " + secret.length);
        }
        this.secret = secret.clone();
        this.id = EventHash.sha256Hex("cohesa register key id:" + HexFormat.of().formatHex(secret)).substring(0, 16);
    }

    public static RegisterKey of(byte[] secret) {
        return new RegisterKey(secret);
    }

    /** A key from its text form: 64 hex digits (what {@link #hexSecret()} writes). */
    public static RegisterKey fromHex(String hex) {
        try {
            return new RegisterKey(HexFormat.of().parseHex(hex.strip()));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("a register key file holds hex digits only", e);
        }
    }

    public String hexSecret() {
        return HexFormat.of().formatHex(secret);
    }

    /** A short public name of the key: the first 16 hex digits of a SHA-256 over it (reveals nothing of the key). */
    @Override
    public String id() {
        return id;
    }

    /** The MAC of one event: HMAC-SHA-256 over its hex hash (which covers its content and the hash before it). */
    public String mac(String eventHash) {
        return hmacHex("event:" + eventHash);
    }

    /** The MAC of the head note: its count, newest hash and highest record number. */
    public String headMac(long events, String lastHash, long maxRecordId) {
        return hmacHex("head:" + events + ":" + lastHash + ":" + maxRecordId);
    }

    @Override
    public boolean eventSealed(String hash, String mac) {
        return sameMac(mac, mac(hash));
    }

    @Override
    public boolean headSealed(long events, String lastHash, long maxRecordId, String mac) {
        return sameMac(mac, headMac(events, lastHash, maxRecordId));
    }

    @Override
    public boolean anchorSealed(String content, String mac) {
        return sameMac(mac, anchorMac(content));
    }

    /** The MAC of an anchor file's content line. */
    public String anchorMac(String content) {
        return hmacHex("anchor:" + content);
    }

    private String hmacHex(String text) {
        return hmacSha256Hex(secret, text);
    }

    /** HMAC-SHA-256 (RFC 2104) of the UTF-8 bytes of {@code text}, as hex. */
    static String hmacSha256Hex(byte[] key, String text) {
        try {
            Mac m = Mac.getInstance("HmacSHA256");
            m.init(new SecretKeySpec(key, "HmacSHA256"));
            return HexFormat.of().formatHex(m.doFinal(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException | InvalidKeyException e) {
            throw new IllegalStateException("every Java platform provides HmacSHA256", e);
        }
    }

    /** Compares two MACs in time independent of where they differ. */
    public static boolean sameMac(String a, String b) {
        return a != null && b != null && java.security.MessageDigest.isEqual(a.getBytes(StandardCharsets.US_ASCII),
                b.getBytes(StandardCharsets.US_ASCII));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RegisterKey k && Arrays.equals(secret, k.secret);
    }

    @Override
    public int hashCode() {
        return id.hashCode();
    }

    @Override
    public String toString() {
        return "RegisterKey[" + id + "]";
    }
}
