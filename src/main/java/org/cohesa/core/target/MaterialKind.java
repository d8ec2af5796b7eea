package org.cohesa.core.target;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/** What sort of material a sphere describes; used for filtering and display only. */
public enum MaterialKind {
    POLYMER, RESIN, DRUG, PIGMENT, OTHER;

    /** The lower-case key used in files and JSON ("polymer", "resin", …). */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Parses a key case-insensitively; fails naming the allowed keys. */
    public static MaterialKind parse(String text) {
        for (MaterialKind k : values()) {
            if (k.key().equalsIgnoreCase(text == null ? "" : text.strip())) {
                return k;
            }
        }
        throw new IllegalArgumentException("kind must be one of " + allowed() + ", got '" + text + "'");
    }

    /** "polymer, resin, drug, pigment, other". */
    public static String allowed() {
        return Arrays.stream(values()).map(MaterialKind::key).collect(Collectors.joining(", "));
    }
}
