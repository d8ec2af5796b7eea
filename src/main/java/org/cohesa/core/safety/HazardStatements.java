package org.cohesa.core.safety;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

/**
 * The texts of the GHS hazard statements (H-codes) and of the CLP supplemental statements (EUH-codes),
 * from our curated table {@code hazard-statements.csv}, with the predicates the safety profile needs.
 *
 * <p>Wording: UN GHS Rev. 10 (2023), Annex 3, Section 1, and Regulation (EC) No 1272/2008 (CLP) Annex III
 * for the EUH statements and the F/D variants of H360/H361 — recalled from memory (the table says so).
 */
public final class HazardStatements {

    private static final String RESOURCE = "hazard-statements.csv";
    private static final Map<String, String> TEXTS = load();

    private HazardStatements() {
    }

    /** The statement's text, or empty when our table does not hold the code. */
    public static Optional<String> text(String code) {
        if (code == null) {
            return Optional.empty();
        }
        String exact = TEXTS.get(code.strip());
        if (exact != null) {
            return Optional.of(exact);
        }
        // CLP writes the fertility/development letters in either case; match case-insensitively as a fallback
        return TEXTS.entrySet().stream().filter(e -> e.getKey().equalsIgnoreCase(code.strip())).map(Map.Entry::getValue).findFirst();
    }

    /** The text, or a plain note that our table lacks it (never an invented wording). */
    public static String textOrNote(String code) {
        return text(code).orElse("(text not in our table; see the SDS)");
    }

    /** All codes and texts in table order. */
    public static Map<String, String> all() {
        return TEXTS;
    }

    /** The three-digit family of a code: "H360FD" → "H360", "EUH019" → "EUH019". */
    public static String family(String code) {
        String c = code.strip().toUpperCase(java.util.Locale.ROOT);
        if (c.startsWith("EUH")) {
            return c.length() >= 6 ? c.substring(0, 6) : c;
        }
        return c.length() >= 4 ? c.substring(0, 4) : c;
    }

    /** H350/H350i (category 1) or H351 (category 2). */
    public static boolean isCarcinogen(String code) {
        String f = family(code);
        return f.equals("H350") || f.equals("H351");
    }

    /** H340 (category 1) or H341 (category 2). */
    public static boolean isMutagen(String code) {
        String f = family(code);
        return f.equals("H340") || f.equals("H341");
    }

    /** H360 (category 1) or H361 (category 2) families, and H362 (effects on or via lactation). */
    public static boolean isReproductiveToxicant(String code) {
        String f = family(code);
        return f.equals("H360") || f.equals("H361") || f.equals("H362");
    }

    /** GHS category of a CMR statement: "1" for H340/H350/H360, "2" for H341/H351/H361, "lactation" for H362. */
    public static String cmrCategory(String code) {
        String f = family(code);
        return switch (f) {
            case "H340", "H350", "H360" -> "1";
            case "H341", "H351", "H361" -> "2";
            case "H362" -> "lactation";
            default -> "";
        };
    }

    /** H304, aspiration hazard category 1. */
    public static boolean isAspirationHazard(String code) {
        return family(code).equals("H304");
    }

    private static Map<String, String> load() {
        Map<String, String> m = new LinkedHashMap<>();
        try (InputStream in = HazardStatements.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE);
            }
            Reader r = new InputStreamReader(in, StandardCharsets.UTF_8);
            CSVFormat fmt = CSVFormat.DEFAULT.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get();
            for (CSVRecord rec : fmt.parse(r)) {
                m.put(rec.get("code").strip(), rec.get("text").strip());
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE, e);
        }
        return Collections.unmodifiableMap(m);
    }
}
