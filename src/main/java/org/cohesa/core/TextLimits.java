package org.cohesa.core;

/**
 * Limits on free text people type (names, notes), so a pasted page or control characters never end up in the
 * library, in a table column or in a PDF. Records use the same rule for their fields ({@code RecordDraft.MAX_TEXT}).
 */
public final class TextLimits {

    /** Longest name of a solvent or material, characters (the longest bundled name is under 60). */
    public static final int MAX_NAME = 120;

    /** Longest note or other free-text field, characters. */
    public static final int MAX_TEXT = 2000;

    private TextLimits() {
    }

    /** A name: not blank, at most {@link #MAX_NAME} characters, no control or direction-override characters; stripped. */
    public static String name(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new InvalidInputException(field, value == null ? "" : value, "must not be empty");
        }
        return check(field, value.strip(), MAX_NAME);
    }

    /** Free text (may be null): at most {@link #MAX_TEXT} characters, no control characters except line breaks and tabs. */
    public static String text(String field, String value) {
        return value == null ? null : check(field, value, MAX_TEXT);
    }

    /**
     * Text as it may be shown in a terminal table: control characters (other than tab and line breaks) and format
     * characters such as right-to-left overrides are written as {@code \\uXXXX}, so stored text can never reorder or
     * hide what is printed around it.
     */
    public static String visible(String value) {
        if (value == null) {
            return null;
        }
        StringBuilder b = null;
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            boolean hidden = c != '\t' && c != '\n' && (Character.isISOControl(c) || Character.getType(c) == Character.FORMAT);
            if (hidden && b == null) {
                b = new StringBuilder(value.length() + 8).append(value, 0, i);
            }
            if (b != null) {
                if (hidden) {
                    b.append(String.format(java.util.Locale.ROOT, "\\u%04X", (int) c));
                } else {
                    b.append(c);
                }
            }
        }
        return b == null ? value : b.toString();
    }

    private static String check(String field, String value, int max) {
        if (value.length() > max) {
            throw new InvalidInputException(field, value.substring(0, 40) + "…", "is longer than " + max + " characters");
        }
        boolean multiline = max == MAX_TEXT;
        for (int i = 0; i < value.length(); i++) {
            char c = value.charAt(i);
            boolean allowed = multiline && (c == '\n' || c == '\r' || c == '\t');
            if (!allowed && (Character.isISOControl(c) || Character.getType(c) == Character.FORMAT)) {
                throw new InvalidInputException(field, value.replaceAll("\\p{Cc}|\\p{Cf}", "?"),
                        "contains control or text-direction characters");
            }
        }
        return value;
    }
}
