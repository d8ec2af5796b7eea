package org.cohesa.cli.records;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.cohesa.cli.Output;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.Anchor;

/**
 * The anchor file {@code record anchor} writes for the quality file: a small JSON object with the head hash, the number
 * of events and records, the time, the register it came from, the key id and an HMAC over those values under the
 * register key (so an edited anchor is noticed by whoever holds the key).
 */
final class AnchorFile {

    /** The format name written into every anchor file. */
    static final String FORMAT = "cohesa-register-anchor/1";

    /** The file's content, serialised by Jackson. */
    record Content(String format, String register, String head_hash, long events, long records, String written_at,
                   String key_id, String mac, String note) {
    }

    private AnchorFile() {
    }

    /** A bare head hash, or the path of an anchor file. */
    static Anchor parse(String field, String text) {
        String t = text.strip();
        if (t.matches("[0-9a-fA-F]{64}")) {
            return Anchor.ofHash(t.toLowerCase(java.util.Locale.ROOT));
        }
        Path file = Path.of(t);
        if (!Files.exists(file)) {
            throw new InvalidInputException(field, text, "neither a head hash (64 hex digits) nor an existing anchor file");
        }
        if (!Files.isRegularFile(file)) {
            throw new InvalidInputException(field, text, "is not a regular file");
        }
        try {
            String body = Files.readString(file, StandardCharsets.UTF_8);
            if (body.length() > 100_000) {
                throw new InvalidInputException(field, text, "is too large for an anchor file");
            }
            JsonNode n = Output.mapper().readTree(body);
            if (n == null || !FORMAT.equals(n.path("format").asText())) {
                throw new InvalidInputException(field, text, "is not an anchor file written by cohesa record anchor (format " + FORMAT + ")");
            }
            return new Anchor(n.path("head_hash").asText(null), n.has("events") ? n.get("events").asLong() : null,
                    n.has("records") ? n.get("records").asLong() : null, n.path("written_at").asText(null),
                    n.path("key_id").asText(null), n.path("mac").asText(null));
        } catch (IOException e) {
            throw new InvalidInputException(field, text, "cannot be read as an anchor file: " + e.getMessage());
        }
    }
}
