package org.cohesa.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Source keys of the bundled data resolved to their full citations, read from {@code solvent-db/SOURCES.md}
 * (a key is written in backticks at the start of a list item, a table row or a heading).
 */
public final class SourceCatalog {

    private static final Pattern ITEM = Pattern.compile("^\\s*(?:[-*]|\\|)\\s*\\**`([A-Za-z0-9][A-Za-z0-9._:+-]*)`\\**\\s*(?:\\||[—–:-])?\\s*(.*)$");
    private static final Pattern HEADING = Pattern.compile("^#{2,6}\\s*`?([A-Za-z0-9][A-Za-z0-9._:+-]*)`?\\s*$");

    private final Map<String, String> citations;

    public SourceCatalog(Map<String, String> citations) {
        this.citations = Map.copyOf(citations);
    }

    /** The catalogue shipped with the program. */
    public static SourceCatalog bundled() {
        try (InputStream in = SourceCatalog.class.getResourceAsStream(BundledData.RESOURCE_DIR + "SOURCES.md")) {
            if (in == null) {
                return new SourceCatalog(Map.of());
            }
            return parse(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static SourceCatalog parse(String markdown) {
        Map<String, String> out = new LinkedHashMap<>();
        String pendingHeading = null;
        for (String line : markdown.split("\\R")) {
            Matcher h = HEADING.matcher(line);
            if (h.matches()) {
                pendingHeading = h.group(1);
                continue;
            }
            Matcher m = ITEM.matcher(line);
            if (m.matches() && !m.group(2).isBlank()) {
                out.putIfAbsent(m.group(1), clean(m.group(2)));
                pendingHeading = null;
            } else if (pendingHeading != null && !line.isBlank()) {
                out.putIfAbsent(pendingHeading, clean(line));
                pendingHeading = null;
            }
        }
        return new SourceCatalog(out);
    }

    public Optional<String> citation(String key) {
        return Optional.ofNullable(citations.get(key));
    }

    public Map<String, String> all() {
        return citations;
    }

    private static String clean(String s) {
        return s.replaceAll("\\|\\s*$", "").replace("|", "—").replaceAll("\\s+", " ").strip();
    }
}
