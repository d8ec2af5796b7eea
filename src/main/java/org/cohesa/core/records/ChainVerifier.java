package org.cohesa.core.records;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Checks the stored events, fed one at a time in storage order (so a register of any size is checked in memory
 * proportional to its number of events, not to its evidence), and reports:
 * <ul>
 *   <li><b>altered</b>: an event's content no longer gives its stored SHA-256, or an event was added that the head
 *       note does not count;</li>
 *   <li><b>reordered</b>: an event's {@code prev_hash} names an event that is stored somewhere else;</li>
 *   <li><b>deleted</b>: an event's {@code prev_hash} names an event that is gone (its own {@code prev_record_id}/
 *       {@code prev_seq} say which one), or the newest event recorded in the head note is gone;</li>
 *   <li><b>illegal_move</b>: the status machine, replayed, does not allow a step (e.g. approved → rejected);</li>
 *   <li>with a {@link RegisterKey}: <b>forged</b> (an HMAC missing after keying or not matching) and <b>other_key</b>
 *       (the head sealed with another key: another register, or the wrong key file);</li>
 *   <li>with an {@link Anchor}: <b>anchor_mismatch</b> when the anchored event is not where the anchor says.</li>
 * </ul>
 * Each event is checked against its stored neighbour, so one edit is reported once.
 */
public final class ChainVerifier {

    /** What is kept of an event once it has been checked: enough to name it later, not its content. */
    private record Seen(long position, long recordId, int seq) {
    }

    /** A link that did not point at the event just before; resolved at the end, when every hash is known. */
    private record BrokenLink(RecordEvent event, int index, boolean intact, long previousPosition) {
    }

    private final ChainSeal key;
    private final Anchor anchor;
    private final List<ChainProblem> problems = new ArrayList<>();
    private final Map<String, Integer> indexByHash = new HashMap<>();
    private final List<Seen> seen = new ArrayList<>();
    private final Set<Long> records = new HashSet<>();
    private final Map<Long, RecordStatus> statusByRecord = new HashMap<>();
    private final Map<Long, Integer> lastSeqByRecord = new HashMap<>();
    private final List<BrokenLink> brokenLinks = new ArrayList<>();
    /** HMAC mismatches: reported unless the head shows the whole register is sealed with another key. */
    private final List<ChainProblem> macMismatches = new ArrayList<>();
    private String expectedPrev = EventHash.GENESIS;
    private String lastHash = EventHash.GENESIS;
    private long lastPosition;
    private long sealed;
    private boolean keyedFrom;
    private Long anchorFoundAt;

    /**
     * @param key    the register key, or null to check only the SHA-256 chain and the status moves
     * @param anchor a state of the chain kept elsewhere, or null
     */
    public ChainVerifier(ChainSeal key, Anchor anchor) {
        this.key = key;
        this.anchor = anchor;
    }

    /** Checks a whole chain held in memory (tests, small registers). */
    public static ChainReport verify(List<RecordEvent> events, ChainHead head) {
        return verify(events, head, null, null);
    }

    public static ChainReport verify(List<RecordEvent> events, ChainHead head, ChainSeal key, Anchor anchor) {
        ChainVerifier v = new ChainVerifier(key, anchor);
        events.forEach(v::accept);
        return v.finish(head);
    }

    /** The next stored event, in storage order. */
    public void accept(RecordEvent e) {
        int i = seen.size();
        seen.add(new Seen(e.position(), e.recordId(), e.seq()));
        indexByHash.putIfAbsent(e.hash(), i);
        if (e.recordId() > 0) {
            records.add(e.recordId());
        }
        boolean intact = hashMatches(e);
        if (!intact) {
            problems.add(new ChainProblem(ChainProblem.Kind.ALTERED, e.position(), e.recordId(), e.seq(),
                    "step " + e.seq() + " (" + e.kind() + ") at position " + e.position()
                            + " no longer matches its SHA-256; its content was changed outside Cohesa"));
        }
        if (!e.prevHash().equals(expectedPrev)) {
            brokenLinks.add(new BrokenLink(e, i, intact, lastPosition));
        }
        checkMac(e);
        replay(e);
        if (anchor != null && anchorFoundAt == null && e.hash().equals(anchor.headHash())) {
            anchorFoundAt = (long) i + 1;
        }
        expectedPrev = e.hash();
        lastHash = e.hash();
        lastPosition = e.position();
    }

    /** The verdict, given the store's head note (null to skip the tail check). */
    public ChainReport finish(ChainHead head) {
        for (BrokenLink b : brokenLinks) {
            explainLink(b);
        }
        checkTail(head);
        if (!checkHeadSeal(head)) {
            // the wrong key: one verdict for the register instead of one per event
            problems.addAll(macMismatches);
        }
        List<String> limits = new ArrayList<>();
        long sinceAnchor = checkAnchor(limits);
        if (key == null) {
            limits.add("no register key given: someone who edits events and recomputes every SHA-256 and the head note, or appends a"
                    + " correctly hashed event, is not detected (give the key file)");
        } else if (sealed < seen.size()) {
            limits.add((seen.size() - sealed) + " events written before the register was keyed carry no HMAC; only their SHA-256"
                    + " chain protects them");
        }
        if (anchor == null) {
            limits.add("no anchor given: a whole register replaced by an older copy of itself (a rollback), or cut back together with"
                    + " its head note by someone holding the key, is not detected (give --anchor)");
        }
        problems.sort(Comparator.comparingLong(ChainProblem::position));
        return new ChainReport(seen.size(), records.size(), lastHash, problems, key != null, sealed, seen.size() - sealed,
                anchor != null, sinceAnchor, limits);
    }

    private static boolean hashMatches(RecordEvent e) {
        try {
            return EventHash.recompute(e).equals(e.hash());
        } catch (RuntimeException damaged) {
            // the payload is no longer JSON: certainly changed
            return false;
        }
    }

    private void checkMac(RecordEvent e) {
        if (e.mac() != null) {
            sealed++;
            keyedFrom = true;
        }
        if (key == null) {
            return;
        }
        if (e.mac() == null) {
            if (keyedFrom) {
                problems.add(new ChainProblem(ChainProblem.Kind.FORGED, e.position(), e.recordId(), e.seq(),
                        "step " + e.seq() + " at position " + e.position() + " carries no HMAC although the events before it are sealed:"
                                + " it was written by someone without the register key"));
            }
        } else if (!key.eventSealed(e.hash(), e.mac())) {
            macMismatches.add(new ChainProblem(ChainProblem.Kind.FORGED, e.position(), e.recordId(), e.seq(),
                    "step " + e.seq() + " at position " + e.position() + " has an HMAC that does not match the register key:"
                            + " it was written or rewritten without the key (or the key file is not this register's)"));
        }
    }

    /** Replays the status machine: created first, then only legal moves, each record's steps numbered 1, 2, 3 … */
    private void replay(RecordEvent e) {
        EventKind kind;
        try {
            kind = e.eventKind();
        } catch (IllegalArgumentException unknown) {
            problems.add(new ChainProblem(ChainProblem.Kind.ILLEGAL_MOVE, e.position(), e.recordId(), e.seq(),
                    "step " + e.seq() + " has an unknown kind '" + e.kind() + "'"));
            return;
        }
        if (e.recordId() == 0) {
            if (kind != EventKind.RULE_SET) {
                problems.add(new ChainProblem(ChainProblem.Kind.ILLEGAL_MOVE, e.position(), 0, e.seq(),
                        "a " + kind.label() + " step is filed under the register's settings (record 0)"));
            }
            return;
        }
        // a gap in the steps is a removed event, reported by the chain check; the move across it is not reported again
        boolean consecutive = e.seq() == lastSeqByRecord.getOrDefault(e.recordId(), 0) + 1;
        lastSeqByRecord.put(e.recordId(), e.seq());
        RecordStatus now = statusByRecord.get(e.recordId());
        if (kind == EventKind.RULE_SET) {
            problems.add(new ChainProblem(ChainProblem.Kind.ILLEGAL_MOVE, e.position(), e.recordId(), e.seq(),
                    "a register setting is filed inside record " + e.recordId()));
            return;
        }
        if (now == null) {
            if (kind != EventKind.CREATED) {
                problems.add(new ChainProblem(ChainProblem.Kind.ILLEGAL_MOVE, e.position(), e.recordId(), e.seq(),
                        "the record's first stored step is '" + kind.label() + "', not its filing"));
            }
            statusByRecord.put(e.recordId(), kind.resultingStatus());
            return;
        }
        RecordStatus next = kind.resultingStatus();
        if (consecutive && (kind == EventKind.CREATED || !now.canMoveTo(next))) {
            problems.add(new ChainProblem(ChainProblem.Kind.ILLEGAL_MOVE, e.position(), e.recordId(), e.seq(),
                    "step " + e.seq() + " moves the record from " + now.label() + " to " + (kind == EventKind.CREATED ? "a second filing"
                            : next.label()) + ", which the status machine does not allow (draft → in_review → approved | rejected)"));
        }
        statusByRecord.put(e.recordId(), next);
    }

    private void explainLink(BrokenLink b) {
        RecordEvent e = b.event();
        Integer linked = indexByHash.get(e.prevHash());
        if (linked != null && linked != b.index() - 1) {
            Seen other = seen.get(linked);
            problems.add(new ChainProblem(ChainProblem.Kind.REORDERED, e.position(), e.recordId(), e.seq(),
                    "step " + e.seq() + " at position " + e.position() + " was written after record "
                            + other.recordId() + " step " + other.seq() + ", which is now stored at position " + other.position()));
        } else if (b.intact() && e.prevRecordId() > 0) {
            // the event's own (hash-protected) reference says which event stood before it
            String where = "between position " + (b.index() == 0 ? "(start)" : String.valueOf(b.previousPosition()))
                    + " and position " + e.position();
            problems.add(new ChainProblem(ChainProblem.Kind.DELETED, e.position(), e.prevRecordId(), e.prevSeq(),
                    (records.contains(e.prevRecordId()) ? "step " + e.prevSeq() + " was removed "
                            : "the whole record is gone; its step " + e.prevSeq() + " was removed ") + where));
        } else {
            problems.add(new ChainProblem(ChainProblem.Kind.DELETED, e.position(), e.recordId(), e.seq(),
                    "the event stored before its step " + e.seq() + " at position " + e.position() + " was removed"));
        }
    }

    private void checkTail(ChainHead head) {
        if (head == null) {
            return;
        }
        int n = seen.size();
        if (head.events() < n) {
            Seen extra = seen.get((int) head.events());
            problems.add(new ChainProblem(ChainProblem.Kind.ALTERED, extra.position(), extra.recordId(), extra.seq(),
                    "step " + extra.seq() + " at position " + extra.position() + " was added outside Cohesa (the store's head note counts "
                            + head.events() + " events)"));
            return;
        }
        boolean newestStillThere = head.events() == 0 || indexByHash.containsKey(head.lastHash());
        if (!newestStillThere) {
            problems.add(new ChainProblem(ChainProblem.Kind.DELETED, lastPosition + 1, head.lastRecordId(), head.lastSeq(),
                    "step " + head.lastSeq() + " was the newest event (" + head.events() + " in the chain) and is gone; "
                            + n + " remain"));
        } else if (head.events() > n && problems.stream().noneMatch(p -> p.kind() == ChainProblem.Kind.DELETED)) {
            problems.add(new ChainProblem(ChainProblem.Kind.DELETED, lastPosition + 1, head.lastRecordId(), head.lastSeq(),
                    "the chain should hold " + head.events() + " events but holds " + n));
        } else if (n > 0 && !head.lastHash().equals(lastHash)) {
            problems.add(new ChainProblem(ChainProblem.Kind.ALTERED, lastPosition, head.lastRecordId(), head.lastSeq(),
                    "the head note names a newest event that is not the last one stored"));
        }
    }

    /** @return true when the head is sealed with another key (so every event's MAC mismatch is that, not a forgery) */
    private boolean checkHeadSeal(ChainHead head) {
        if (key == null || head == null || seen.isEmpty()) {
            return false;
        }
        if (head.mac() == null) {
            problems.add(new ChainProblem(ChainProblem.Kind.FORGED, lastPosition + 1, 0, 0,
                    "the head note carries no HMAC: it was never sealed (a register last written by an older Cohesa; the next write seals it)"
                            + " or its seal was stripped"));
        } else if (head.keyId() != null && !head.keyId().equals(key.id())) {
            problems.add(new ChainProblem(ChainProblem.Kind.OTHER_KEY, lastPosition + 1, 0, 0,
                    "the register is sealed with key " + head.keyId() + ", not with the given key " + key.id()
                            + ": another register, or the wrong key file"));
            return true;
        } else if (!key.headSealed(head.events(), head.lastHash(), head.maxRecordId(), head.mac())) {
            problems.add(new ChainProblem(ChainProblem.Kind.FORGED, lastPosition + 1, 0, 0,
                    "the head note's HMAC does not match (" + head.events() + " events, newest " + shortHash(head.lastHash())
                            + "): it was moved by someone without the key, e.g. to hide removed events"));
        }
        return false;
    }

    private long checkAnchor(List<String> limits) {
        if (anchor == null) {
            return 0;
        }
        if (anchor.mac() != null && key != null && !key.anchorSealed(anchor.content(), anchor.mac())) {
            problems.add(new ChainProblem(ChainProblem.Kind.ANCHOR_MISMATCH, 0, 0, 0,
                    "the anchor file's own HMAC does not match the key: the anchor was edited, or belongs to another register"));
        }
        if (anchorFoundAt == null) {
            String count = anchor.events() == null ? "" : " (event " + anchor.events() + " of the chain then)";
            problems.add(new ChainProblem(ChainProblem.Kind.ANCHOR_MISMATCH, lastPosition + 1, 0, 0,
                    "the anchored head " + shortHash(anchor.headHash()) + count + " is not in the register: events up to it were changed,"
                            + " removed or recomputed, or the register was replaced"));
            return 0;
        }
        if (anchor.events() != null && anchor.events() != anchorFoundAt.longValue()) {
            problems.add(new ChainProblem(ChainProblem.Kind.ANCHOR_MISMATCH, seen.get((int) (anchorFoundAt - 1)).position(), 0, 0,
                    "the anchored head is event " + anchorFoundAt + " of the chain, but the anchor says it was event " + anchor.events()
                            + ": events before it were removed or added"));
        }
        long since = seen.size() - anchorFoundAt;
        if (since > 0) {
            limits.add(since + " events were appended after the anchor; the anchor cannot vouch for them (the key can)");
        }
        return since;
    }

    private static String shortHash(String h) {
        return h == null ? "-" : h.length() > 12 ? h.substring(0, 12) + "…" : h;
    }
}
