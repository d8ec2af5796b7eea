package org.cohesa.core.records;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.junit.jupiter.api.Test;

/** The status machine of issue 8: draft → in_review → approved | rejected (our own workflow, no outside source). */
class RecordStatusTest {

    @Test
    void onlyTheDocumentedMovesAreLegal() {
        for (RecordStatus from : RecordStatus.values()) {
            for (RecordStatus to : RecordStatus.values()) {
                boolean legal = (from == RecordStatus.DRAFT && to == RecordStatus.IN_REVIEW)
                        || (from == RecordStatus.IN_REVIEW && (to == RecordStatus.APPROVED || to == RecordStatus.REJECTED));
                assertEquals(legal, from.canMoveTo(to), from + " -> " + to);
            }
        }
    }

    @Test
    void anIllegalMoveSaysWhatIsPossible() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> RecordStatus.DRAFT.requireMoveTo(RecordStatus.APPROVED, 4));
        assertTrue(e.getMessage().contains("record 4"), e.getMessage());
        assertTrue(e.getMessage().contains("sent for review"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> RecordStatus.REJECTED.requireMoveTo(RecordStatus.IN_REVIEW, 4));
        assertTrue(e.getMessage().contains("final"), e.getMessage());
    }

    @Test
    void foldingReplaysTheHistoryAndNamesAnIllegalMove() {
        Instant t = Instant.parse("2026-12-01T22:00:00Z");
        List<RecordEvent> es = new ArrayList<>();
        es.add(RecordEvent.next(7, 1, EventKind.CREATED, "A", "a-account", t, ChainVerifierTest.payload("p"), null, null));
        es.add(RecordEvent.next(7, 2, EventKind.SENT_TO_REVIEW, "B", "b-account", t, SubstitutionRecord.statusPayload(null), es.get(0), null));
        es.add(RecordEvent.next(7, 3, EventKind.REJECTED, "C", "c-account", t, SubstitutionRecord.statusPayload("too slow to dry"), es.get(1), null));
        SubstitutionRecord r = SubstitutionRecord.fold(es);
        assertEquals(RecordStatus.REJECTED, r.status());
        assertEquals(3, r.history().size());
        assertEquals("too slow to dry", r.history().get(2).comment());
        assertEquals("A", r.author());
        List<RecordEvent> skipReview = List.of(es.get(0),
                RecordEvent.next(7, 2, EventKind.APPROVED, "C", "c-account", t, SubstitutionRecord.statusPayload("ok"), es.get(0), null));
        // an illegal history is named, not thrown: one forged event must not make the register unreadable
        SubstitutionRecord damaged = SubstitutionRecord.fold(skipReview);
        assertTrue(damaged.damage().contains("draft to approved"), damaged.damage());
        assertEquals(null, r.damage());
        assertFalse(RecordStatus.APPROVED.canMoveTo(RecordStatus.REJECTED));
    }
}
