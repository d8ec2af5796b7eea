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
 */
public record SubstitutionRecord(long id, RecordDraft content, String author, String created, RecordStatus status,
                                 List<StatusChange> history) {

    public SubstitutionRecord {
        history = List.copyOf(history);
    }

    public Evidence evidence() {
        return content.evidence();
    }

    /**
     * Folds one record's events (in seq order) into its current state.
     *
     * @throws IllegalArgumentException when the events do not form a legal history (first is not the
     *         filing, a number is skipped, or a status move is illegal)
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
        history.add(new StatusChange(1, status, first.kind(), first.actor(), first.at(), null));
        for (int i = 1; i < events.size(); i++) {
            RecordEvent e = events.get(i);
            if (e.seq() != i + 1 || e.recordId() != first.recordId()) {
                throw new IllegalArgumentException("record " + first.recordId() + " has a gap in its history at step " + (i + 1));
            }
            RecordStatus next = e.eventKind().resultingStatus();
            status.requireMoveTo(next, first.recordId());
            status = next;
            JsonNode c = e.payloadTree().get("comment");
            history.add(new StatusChange(e.seq(), status, e.kind(), e.actor(), e.at(), c == null || c.isNull() ? null : c.asText()));
        }
        return new SubstitutionRecord(first.recordId(), content, first.actor(), first.at(), status, history);
    }

    /** The payload of a status event. */
    public static JsonNode statusPayload(String comment) {
        return CanonicalJson.object().put("comment", comment == null || comment.isBlank() ? null : comment.strip());
    }
}
