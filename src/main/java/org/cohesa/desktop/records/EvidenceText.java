package org.cohesa.desktop.records;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Iterator;
import java.util.Locale;
import java.util.Map;
import org.cohesa.core.records.Evidence;

/**
 * A record's evidence snapshot as people read it: each section by name with its content, nested values
 * indented, lists as bullets, field names with their underscores turned into spaces.
 */
final class EvidenceText {

    private EvidenceText() {
    }

    static String of(Evidence evidence) {
        StringBuilder b = new StringBuilder();
        Iterator<Map.Entry<String, JsonNode>> it = evidence.tree().fields();
        while (it.hasNext()) {
            Map.Entry<String, JsonNode> e = it.next();
            b.append('\n').append(title(e.getKey())).append('\n');
            write(b, e.getValue(), 1);
        }
        return b.toString();
    }

    private static void write(StringBuilder b, JsonNode n, int depth) {
        String pad = "  ".repeat(depth);
        if (n.isObject()) {
            Iterator<Map.Entry<String, JsonNode>> it = n.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                if (e.getValue().isValueNode()) {
                    b.append(pad).append(label(e.getKey())).append(": ").append(value(e.getValue())).append('\n');
                } else if (!e.getValue().isEmpty()) {
                    b.append(pad).append(label(e.getKey())).append(":\n");
                    write(b, e.getValue(), depth + 1);
                }
            }
        } else if (n.isArray()) {
            for (JsonNode item : n) {
                if (item.isValueNode()) {
                    b.append(pad).append("• ").append(value(item)).append('\n');
                } else {
                    b.append(pad).append("•\n");
                    write(b, item, depth + 1);
                }
            }
        } else {
            b.append(pad).append(value(n)).append('\n');
        }
    }

    private static String value(JsonNode v) {
        if (v.isNull()) {
            return "unknown";
        }
        if (v.isFloatingPointNumber()) {
            double d = v.doubleValue();
            return Math.abs(d) >= 100 || d == Math.rint(d) ? String.format(Locale.ROOT, "%.0f", d) : String.format(Locale.ROOT, "%.3g", d);
        }
        return v.asText();
    }

    private static String label(String key) {
        return key.replace('_', ' ');
    }

    private static String title(String key) {
        String l = label(key);
        return l.isEmpty() ? l : Character.toUpperCase(l.charAt(0)) + l.substring(1);
    }
}
