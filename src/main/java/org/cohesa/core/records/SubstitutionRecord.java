package org.cohesa.core.records;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;

/**
 * A substitution record as it stands now: the content filed at creation plus every status step since,
 * folded from its events (which are never changed, only appended).
 *
 * @param id       record number
 * @param content  what was filed (process, liquids, target, reason, evidence)
 * @param author   who filed it
 * @param created  when it was filed (UTC text)
 * @param status   the current status
 * @param history  every step, oldest first, the filing included
 * @param headHash the hash of the record's newest event (what a filed copy of the record can be checked against)
 * @param damage   null for a legal history; otherwise what is wrong with it (an illegal move, a missing step), so the
 *                 register can still be listed and shown while {@code record verify} names the break
 */
public record SubstitutionRecord(long id, RecordDraft content, String author, String created, RecordStatus status,
                                 List<StatusChange> history, String headHash, String damage) {

    public SubstitutionRecord {
        history = List.copyOf(history);
    }

    public Evidence evidence() {
        return content.evidence();
    }

    /**
     * Folds one record's events (in seq order) into its current state.
     *
     * An illegal move or a missing step does not stop the fold (it is named in {@code damage}), so one forged event
     * cannot make the whole register unreadable.
     *
     * @throws IllegalArgumentException when the first event is not the filing
     */
    public static SubstitutionRecord fold(List<RecordEvent> events) {
        if (events.isEmpty()) {
            throw new IllegalArgumentException("a record has at least its filing event");
        }
        RecordEvent first = events.get(0);
        if (first.eventKind() != EventKind.CREATED || first.seq() != 1) {
            throw new IllegalArgumentException("record " + first.recordId() + " does not start with its filing event");
        }
        RecordDraft content = RecordDraft.fromPayload(first.payloadTree());
        List<StatusChange> history = new ArrayList<>();
        RecordStatus status = RecordStatus.DRAFT;
        String damage = null;
        history.add(new StatusChange(1, status, first.kind(), first.actor(), first.account(), first.at(), null));
        for (int i = 1; i < events.size(); i++) {
            RecordEvent e = events.get(i);
            EventKind kind = kindOrNull(e);
            RecordStatus next = kind == null ? null : kind.resultingStatus();
            if (damage == null && e.seq() != i + 1) {
                damage = "step " + (i + 1) + " is missing from its history";
            }
            if (next == null || kind == EventKind.CREATED) {
                damage = damage != null ? damage : "step " + e.seq() + " ('" + e.kind() + "') is not a status step";
                continue;
            }
            if (!status.canMoveTo(next) && damage == null) {
                damage = "step " + e.seq() + " moves it from " + status.label() + " to " + next.label() + ", which is not allowed";
            }
            status = next;
            JsonNode c = e.payloadTree().get("comment");
            history.add(new StatusChange(e.seq(), status, e.kind(), e.actor(), e.account(), e.at(),
                    c == null || c.isNull() ? null : c.asText()));
        }
        return new SubstitutionRecord(first.recordId(), content, first.actor(), first.at(), status, history,
                events.get(events.size() - 1).hash(), damage);
    }

    private static EventKind kindOrNull(RecordEvent e) {
        try {
            return e.eventKind();
        } catch (IllegalArgumentException unknown) {
            return null;
        }
    }

    /** The payload of a status event. */
    public static JsonNode statusPayload(String comment) {
        return CanonicalJson.object().put("comment", comment == null || comment.isBlank() ? null : comment.strip());
    }
}
