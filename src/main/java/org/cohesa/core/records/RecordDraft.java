package org.cohesa.core.records;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.cohesa.core.InvalidInputException;

/**
 * What a person files when a substitution is proposed: the content of the record's first event.
 *
 * @param process     the process or product, free text (required)
 * @param site        the site, free text, or null
 * @param replaced    the liquid replaced, in blend notation ("toluene:1" or "toluene:0.6,ethanol:0.4")
 * @param replacement the replacing liquid, same notation
 * @param target      what must stay dissolved: a material name or a sphere "dD,dP,dH,R0", or null
 * @param reason      why (regulatory, safety, cost, supply … free text, required)
 * @param evidence    the snapshot taken when the record is filed
 */
public record RecordDraft(String process, String site, String replaced, String replacement, String target,
                          String reason, Evidence evidence) {

    /** Longest free-text field accepted; a record is a summary, not a file store. */
    public static final int MAX_TEXT = 2000;

    public RecordDraft {
        process = required("--process", process);
        site = optional("--site", site);
        replaced = required("--replaced", replaced);
        replacement = required("--replacement", replacement);
        target = optional("--target", target);
        reason = required("--reason", reason);
        if (evidence == null) {
            throw new IllegalArgumentException("a record needs its evidence snapshot");
        }
    }

    /** The payload of the {@link EventKind#CREATED} event. */
    public ObjectNode toPayload() {
        ObjectNode o = CanonicalJson.object();
        o.put("process", process);
        o.put("site", site);
        o.put("replaced", replaced);
        o.put("replacement", replacement);
        o.put("target", target);
        o.put("reason", reason);
        o.set("evidence", evidence.tree());
        return o;
    }

    /** Reads the payload back (as stored). */
    public static RecordDraft fromPayload(JsonNode p) {
        JsonNode ev = p.get("evidence");
        return new RecordDraft(text(p, "process"), text(p, "site"), text(p, "replaced"), text(p, "replacement"),
                text(p, "target"), text(p, "reason"), Evidence.of(ev != null && ev.isObject() ? (ObjectNode) ev : CanonicalJson.object()));
    }

    static String required(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new InvalidInputException(field, String.valueOf(value), "must not be empty");
        }
        return checkLength(field, value.strip());
    }

    static String optional(String field, String value) {
        return value == null || value.isBlank() ? null : checkLength(field, value.strip());
    }

    private static String checkLength(String field, String value) {
        // the shared rule: length, no control characters, no right-to-left overrides or other format characters
        return org.cohesa.core.TextLimits.text(field, value);
    }

    private static String text(JsonNode p, String key) {
        JsonNode n = p.get(key);
        return n == null || n.isNull() ? null : n.asText();
    }
}
