package org.cohesa.core.records;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The hash of one event: SHA-256 (NIST FIPS 180-4, Secure Hash Standard, 2015) over the UTF-8 bytes of the
 * canonical JSON object
 * {@code {"account","actor","at","kind","payload","prev_hash","prev_record_id","prev_seq","record_id","seq"}} (keys sorted, see
 * {@link CanonicalJson}; {@code account} is left out for events stored before accounts were recorded, so their hashes stay valid),
 * written as 64 lower-case hex digits. Including {@code prev_hash} chains every event to the one before it,
 * so changing, removing or moving any stored event breaks the chain from that point on (the construction of
 * Haber and Stornetta, "How to time-stamp a digital document", J. Cryptology 3 (1991) 99).
 */
public final class EventHash {

    /** The {@code prev_hash} of the very first event: 64 zeros. */
    public static final String GENESIS = "0".repeat(64);

    private EventHash() {
    }

    /** The canonical text the hash is computed over. */
    public static String content(long recordId, int seq, String kind, String actor, String account, String at, String payload,
                                 long prevRecordId, int prevSeq, String prevHash) {
        ObjectNode o = CanonicalJson.object();
        if (account != null) {
            o.put("account", account);
        }
        o.put("record_id", recordId);
        o.put("seq", seq);
        o.put("kind", kind);
        o.put("actor", actor);
        o.put("at", at);
        o.set("payload", CanonicalJson.parse(payload));
        o.put("prev_record_id", prevRecordId);
        o.put("prev_seq", prevSeq);
        o.put("prev_hash", prevHash);
        return CanonicalJson.write(o);
    }

    public static String of(long recordId, int seq, String kind, String actor, String account, String at, String payload,
                            long prevRecordId, int prevSeq, String prevHash) {
        return sha256Hex(content(recordId, seq, kind, actor, account, at, payload, prevRecordId, prevSeq, prevHash));
    }

    /** The hash a stored event should carry, recomputed from its fields. */
    public static String recompute(RecordEvent e) {
        return of(e.recordId(), e.seq(), e.kind(), e.actor(), e.account(), e.at(), e.payload(), e.prevRecordId(), e.prevSeq(), e.prevHash());
    }

    public static String sha256Hex(String text) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            return HexFormat.of().formatHex(md.digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform provides SHA-256", e);
        }
    }
}
