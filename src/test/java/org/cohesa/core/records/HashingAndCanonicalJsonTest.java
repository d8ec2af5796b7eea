package org.cohesa.core.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.Instant;
import org.junit.jupiter.api.Test;

class HashingAndCanonicalJsonTest {

    @Test
    void sha256MatchesTheStandardsTestVectors() {
        // NIST FIPS 180-2, Appendix B.1 (one-block message "abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", EventHash.sha256Hex("abc"));
        // NIST FIPS 180-2, Appendix B.2 (two-block message)
        assertEquals("248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
                EventHash.sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq"));
    }

    @Test
    void canonicalTextSortsKeysAndNormalisesNumbers() {
        // RFC 8785 (JSON Canonicalization Scheme) sorts keys by UTF-16 code units as we do; numbers differ by design (plain decimals)
        assertEquals("{\"a\":1.5,\"b\":[10,0.25],\"c\":{\"x\":null,\"y\":\"δD\"}}",
                CanonicalJson.write(CanonicalJson.parse("{ \"c\": {\"y\": \"δD\", \"x\": null}, \"b\": [1E+1, 0.250], \"a\": 1.50 }")));
    }

    @Test
    void canonicalTextIsStableThroughParseAndWrite() {
        ObjectNode o = CanonicalJson.object();
        o.put("two_thirds", CanonicalJson.number(2.0 / 3.0));
        o.put("third", CanonicalJson.number(1.0 / 3.0));
        String once = CanonicalJson.write(o);
        assertEquals(once, CanonicalJson.write(CanonicalJson.parse(once)));
        // 12 significant digits kept (common practice, no source: far beyond the 0.1 MPa^½ accuracy of the data)
        assertEquals("{\"third\":0.333333333333,\"two_thirds\":0.666666666667}", once);
    }

    @Test
    void duplicateKeysAndTrailingTextAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> CanonicalJson.parse("{\"a\":1,\"a\":2}"));
        assertThrows(IllegalArgumentException.class, () -> CanonicalJson.parse("{\"a\":1} x"));
    }

    @Test
    void theHashCoversEveryFieldAndThePreviousHash() {
        Instant t = Instant.parse("2026-12-01T22:00:00Z");
        RecordEvent e = RecordEvent.next(1, 1, EventKind.CREATED, "A. Chemist", "achem", t, CanonicalJson.parse("{\"process\":\"p\"}"), null, null);
        assertEquals(e.hash(), EventHash.recompute(e));
        assertEquals("2026-12-01T22:00:00.000Z", e.at());
        String base = e.hash();
        assertNotEquals(base, EventHash.of(2, 1, "created", "A. Chemist", "achem", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 2, "created", "A. Chemist", "achem", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "approved", "A. Chemist", "achem", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "B. Chemist", "achem", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", "achem", "2026-12-01T22:00:00.001Z", e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", "achem", e.at(), "{\"process\":\"q\"}", 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", "achem", e.at(), e.payload(), 0, 0, "1".repeat(64)));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", "achem", e.at(), e.payload(), 5, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", "other", e.at(), e.payload(), 0, 0, e.prevHash()));
        // the hash is SHA-256 of exactly the documented canonical content (docs/records.md)
        assertEquals(EventHash.sha256Hex("{\"account\":\"achem\",\"actor\":\"A. Chemist\",\"at\":\"2026-12-01T22:00:00.000Z\",\"kind\":\"created\","
                + "\"payload\":{\"process\":\"p\"},\"prev_hash\":\"" + EventHash.GENESIS + "\",\"prev_record_id\":0,\"prev_seq\":0,"
                + "\"record_id\":1,\"seq\":1}"), base);
    }

    @Test
    void anEventStoredBeforeAccountsWereRecordedKeepsItsHash() {
        // schema step 4 events have no account: their hash is over the content without the key, as it was written
        String at = "2026-12-01T22:00:00.000Z";
        String legacy = EventHash.of(1, 1, "created", "A. Chemist", null, at, "{\"process\":\"p\"}", 0, 0, EventHash.GENESIS);
        assertEquals(EventHash.sha256Hex("{\"actor\":\"A. Chemist\",\"at\":\"" + at + "\",\"kind\":\"created\","
                + "\"payload\":{\"process\":\"p\"},\"prev_hash\":\"" + EventHash.GENESIS + "\",\"prev_record_id\":0,\"prev_seq\":0,"
                + "\"record_id\":1,\"seq\":1}"), legacy);
    }

    @Test
    void theHmacNeedsTheKey() {
        // RFC 4231 (HMAC-SHA-256 test vectors), test case 2: key "Jefe", data "what do ya want for nothing?"
        assertEquals("5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843",
                RegisterKey.hmacSha256Hex("Jefe".getBytes(java.nio.charset.StandardCharsets.US_ASCII), "what do ya want for nothing?"));
        RegisterKey k1 = RegisterKey.of(new byte[32]);
        byte[] other = new byte[32];
        other[0] = 1;
        RegisterKey k2 = RegisterKey.of(other);
        String h = "a".repeat(64);
        assertEquals(k1.mac(h), k1.mac(h));
        assertNotEquals(k1.mac(h), k2.mac(h));
        assertNotEquals(k1.id(), k2.id());
        assertEquals(64, k1.mac(h).length());
    }
}
