package org.cohesa.core.records;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Walks the stored events in storage order and reports where the chain breaks:
 * <ul>
 *   <li><b>altered</b>: an event's content no longer gives its stored hash (SHA-256 recomputed), or an
 *       event was added that the store's head note does not count;</li>
 *   <li><b>reordered</b>: an event's {@code prev_hash} names an event that is stored somewhere else;</li>
 *   <li><b>deleted</b>: an event's {@code prev_hash} names an event that is gone (the event's own
 *       {@code prev_record_id}/{@code prev_seq} say which one), or the newest event recorded in the head
 *       note is gone.</li>
 * </ul>
 * Each event is checked against its stored neighbour, so one edit is reported once rather than
 * breaking every later link.
 */
public final class ChainVerifier {

    private ChainVerifier() {
    }

    /**
     * @param events every stored event in storage order
     * @param head   the store's head note (null to skip the tail check)
     */
    public static ChainReport verify(List<RecordEvent> events, ChainHead head) {
        List<ChainProblem> problems = new ArrayList<>();
        Map<String, Integer> indexByHash = new HashMap<>();
        Set<Long> records = new HashSet<>();
        for (int i = 0; i < events.size(); i++) {
            indexByHash.putIfAbsent(events.get(i).hash(), i);
            records.add(events.get(i).recordId());
        }
        String expectedPrev = EventHash.GENESIS;
        for (int i = 0; i < events.size(); i++) {
            RecordEvent e = events.get(i);
            boolean intact = hashMatches(e);
            if (!intact) {
                problems.add(new ChainProblem(ChainProblem.Kind.ALTERED, e.position(), e.recordId(), e.seq(),
                        "step " + e.seq() + " (" + e.kind() + ") at position " + e.position()
                                + " no longer matches its SHA-256; its content was changed outside Cohesa"));
            }
            if (!e.prevHash().equals(expectedPrev)) {
                Integer linked = indexByHash.get(e.prevHash());
                if (linked != null && linked != i - 1) {
                    RecordEvent other = events.get(linked);
                    problems.add(new ChainProblem(ChainProblem.Kind.REORDERED, e.position(), e.recordId(), e.seq(),
                            "step " + e.seq() + " at position " + e.position() + " was written after record "
                                    + other.recordId() + " step " + other.seq() + ", which is now stored at position " + other.position()));
                } else if (intact && e.prevRecordId() > 0) {
                    // the event's own (hash-protected) reference says which event stood before it
                    String where = "between position " + (i == 0 ? "(start)" : String.valueOf(events.get(i - 1).position()))
                            + " and position " + e.position();
                    problems.add(new ChainProblem(ChainProblem.Kind.DELETED, e.position(), e.prevRecordId(), e.prevSeq(),
                            (records.contains(e.prevRecordId()) ? "step " + e.prevSeq() + " was removed "
                                    : "the whole record is gone; its step " + e.prevSeq() + " was removed ") + where));
                } else {
                    problems.add(new ChainProblem(ChainProblem.Kind.DELETED, e.position(), e.recordId(), e.seq(),
                            "the event stored before its step " + e.seq() + " at position " + e.position() + " was removed"));
                }
            }
            expectedPrev = e.hash();
        }
        checkTail(events, head, problems);
        problems.sort(Comparator.comparingLong(ChainProblem::position));
        String headHash = events.isEmpty() ? EventHash.GENESIS : events.get(events.size() - 1).hash();
        return new ChainReport(events.size(), records.size(), headHash, problems);
    }

    private static boolean hashMatches(RecordEvent e) {
        try {
            return EventHash.recompute(e).equals(e.hash());
        } catch (RuntimeException damaged) {
            // the payload is no longer JSON: certainly changed
            return false;
        }
    }

    private static void checkTail(List<RecordEvent> events, ChainHead head, List<ChainProblem> problems) {
        if (head == null) {
            return;
        }
        long lastPosition = events.isEmpty() ? 0 : events.get(events.size() - 1).position();
        if (head.events() < events.size()) {
            RecordEvent extra = events.get((int) head.events());
            problems.add(new ChainProblem(ChainProblem.Kind.ALTERED, extra.position(), extra.recordId(), extra.seq(),
                    "step " + extra.seq() + " at position " + extra.position() + " was added outside Cohesa (the store's head note counts "
                            + head.events() + " events)"));
            return;
        }
        boolean newestStillThere = head.events() == 0 || events.stream().anyMatch(e -> e.hash().equals(head.lastHash()));
        if (!newestStillThere) {
            problems.add(new ChainProblem(ChainProblem.Kind.DELETED, lastPosition + 1, head.lastRecordId(), head.lastSeq(),
                    "step " + head.lastSeq() + " was the newest event (" + head.events() + " in the chain) and is gone; "
                            + events.size() + " remain"));
        } else if (head.events() > events.size() && problems.stream().noneMatch(p -> p.kind() == ChainProblem.Kind.DELETED)) {
            problems.add(new ChainProblem(ChainProblem.Kind.DELETED, lastPosition + 1, head.lastRecordId(), head.lastSeq(),
                    "the chain should hold " + head.events() + " events but holds " + events.size()));
        }
    }
}
