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
        RecordEvent e = RecordEvent.next(1, 1, EventKind.CREATED, "A. Chemist", t, CanonicalJson.parse("{\"process\":\"p\"}"), null);
        assertEquals(e.hash(), EventHash.recompute(e));
        assertEquals("2026-12-01T22:00:00.000Z", e.at());
        String base = e.hash();
        assertNotEquals(base, EventHash.of(2, 1, "created", "A. Chemist", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 2, "created", "A. Chemist", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "approved", "A. Chemist", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "B. Chemist", e.at(), e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", "2026-12-01T22:00:00.001Z", e.payload(), 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", e.at(), "{\"process\":\"q\"}", 0, 0, e.prevHash()));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", e.at(), e.payload(), 0, 0, "1".repeat(64)));
        assertNotEquals(base, EventHash.of(1, 1, "created", "A. Chemist", e.at(), e.payload(), 5, 0, e.prevHash()));
        // the hash is SHA-256 of exactly the documented canonical content (docs/records.md)
        assertEquals(EventHash.sha256Hex("{\"actor\":\"A. Chemist\",\"at\":\"2026-12-01T22:00:00.000Z\",\"kind\":\"created\","
                + "\"payload\":{\"process\":\"p\"},\"prev_hash\":\"" + EventHash.GENESIS + "\",\"prev_record_id\":0,\"prev_seq\":0,"
                + "\"record_id\":1,\"seq\":1}"), base);
    }
}
