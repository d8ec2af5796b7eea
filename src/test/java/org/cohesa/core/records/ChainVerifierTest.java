package org.cohesa.core.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The chain verifier on in-memory chains; the store tests repeat this with real SQL edits. */
class ChainVerifierTest {

    static JsonNode payload(String process) {
        return CanonicalJson.object().put("process", process).put("replaced", "toluene:1").put("replacement", "ethanol:1")
                .put("reason", "test").set("evidence", CanonicalJson.object().put("app_version", "test"));
    }

    /** Records 1..3: 1 created, 2 created, 1 review, 3 created, 2 review, 1 approved: six events. */
    private static List<RecordEvent> chain() {
        long[][] plan = {{1, 1}, {2, 1}, {1, 2}, {3, 1}, {2, 2}, {1, 3}};
        EventKind[] kinds = {EventKind.CREATED, EventKind.SENT_TO_REVIEW, EventKind.APPROVED};
        List<RecordEvent> out = new ArrayList<>();
        RecordEvent prev = null;
        Instant t = Instant.parse("2026-12-01T22:00:00Z");
        for (int i = 0; i < plan.length; i++) {
            int seq = (int) plan[i][1];
            JsonNode p = seq == 1 ? payload("process " + plan[i][0]) : SubstitutionRecord.statusPayload("step " + seq);
            RecordEvent e = RecordEvent.next(plan[i][0], seq, kinds[seq - 1], "person " + i, "account" + i, t.plusSeconds(i), p, prev, null);
            out.add(at(e, i + 1));
            prev = e;
        }
        return out;
    }

    private static RecordEvent at(RecordEvent e, long position) {
        return e.atPosition(position);
    }

    private static ChainHead headOf(List<RecordEvent> es) {
        RecordEvent last = es.get(es.size() - 1);
        return new ChainHead(es.size(), last.hash(), last.recordId(), last.seq(),
                es.stream().mapToLong(RecordEvent::recordId).max().orElse(0));
    }

    @Test
    void anUntouchedChainIsIntact() {
        List<RecordEvent> es = chain();
        ChainReport r = ChainVerifier.verify(es, headOf(es));
        assertTrue(r.intact(), r.problems().toString());
        assertEquals(6, r.events());
        assertEquals(3, r.records());
        assertEquals(es.get(5).hash(), r.headHash());
    }

    @Test
    void anEditedPayloadNamesItsRecord() {
        List<RecordEvent> es = chain();
        ChainHead head = headOf(es);
        RecordEvent e = es.get(3);
        es.set(3, new RecordEvent(e.position(), e.recordId(), e.seq(), e.kind(), e.actor(), e.account(), e.at(),
                e.payload().replace("process 3", "process 3b"), e.prevRecordId(), e.prevSeq(), e.prevHash(), e.hash(), e.mac()));
        ChainProblem p = ChainVerifier.verify(es, head).firstProblem().orElseThrow();
        assertEquals(ChainProblem.Kind.ALTERED, p.kind());
        assertEquals(3, p.recordId());
        assertEquals(1, ChainVerifier.verify(es, head).problems().size(), "one edit is reported once");
    }

    @Test
    void aDeletedMiddleEventNamesTheRecordThatLostIt() {
        List<RecordEvent> es = chain();
        ChainHead head = headOf(es);
        es.remove(2); // record 1, step 2
        ChainProblem p = ChainVerifier.verify(es, head).firstProblem().orElseThrow();
        assertEquals(ChainProblem.Kind.DELETED, p.kind());
        assertEquals(1, p.recordId());
        assertEquals(2, p.seq());
    }

    @Test
    void aWholeDeletedRecordIsNamed() {
        List<RecordEvent> es = chain();
        ChainHead head = headOf(es);
        es.remove(3); // record 3's only event
        ChainProblem p = ChainVerifier.verify(es, head).firstProblem().orElseThrow();
        assertEquals(ChainProblem.Kind.DELETED, p.kind());
        assertEquals(3, p.recordId());
    }

    @Test
    void aDeletedNewestEventIsCaughtByTheHeadNote() {
        List<RecordEvent> es = chain();
        ChainHead head = headOf(es);
        es.remove(5); // record 1's approval, the newest event
        ChainProblem p = ChainVerifier.verify(es, head).firstProblem().orElseThrow();
        assertEquals(ChainProblem.Kind.DELETED, p.kind());
        assertEquals(1, p.recordId());
        assertEquals(3, p.seq());
    }

    @Test
    void twoSwappedEventsAreReportedAsReordered() {
        List<RecordEvent> es = chain();
        ChainHead head = headOf(es);
        RecordEvent a = es.get(1);
        RecordEvent b = es.get(2);
        es.set(1, at(b, 2));
        es.set(2, at(a, 3));
        ChainProblem p = ChainVerifier.verify(es, head).firstProblem().orElseThrow();
        assertEquals(ChainProblem.Kind.REORDERED, p.kind());
        assertEquals(1, p.recordId(), "record 1's step 2 now sits where record 2's filing was");
        assertEquals(2, p.position());
    }
}
