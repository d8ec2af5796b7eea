package org.cohesa.core;

import java.util.regex.Pattern;

/**
 * Spreadsheet-safe CSV cells. A spreadsheet opening a CSV file runs any cell that starts with {@code =}, {@code +},
 * {@code -} or {@code @} (and, in some programs, a tab or carriage return) as a formula, so text from imports or
 * record fields could compute, fetch a web address or run a command on the reader's machine ("CSV injection",
 * OWASP). Such a cell is written with a leading apostrophe, which spreadsheets show as plain text; a plain number
 * (e.g. a melting point of {@code -95}) is left alone. Reading a file back removes the apostrophe again.
 */
public final class SpreadsheetCells {

    private static final Pattern PLAIN_NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");

    private SpreadsheetCells() {
    }

    /** The cell as written: unchanged, or with a leading apostrophe when a spreadsheet would run it. */
    public static String guard(String cell) {
        if (cell == null || cell.isEmpty() || !startsLive(cell, 0) || PLAIN_NUMBER.matcher(cell).matches()) {
            return cell;
        }
        return "'" + cell;
    }

    /** A cell as read back: a leading apostrophe written by {@link #guard} is removed. */
    public static String unguard(String cell) {
        if (cell != null && cell.length() > 1 && cell.charAt(0) == '\'' && startsLive(cell, 1)) {
            return cell.substring(1);
        }
        return cell;
    }

    /** Any value for a CSV printer: text and other objects guarded, numbers passed through. */
    public static Object guardValue(Object value) {
        return value instanceof CharSequence s ? guard(s.toString()) : value;
    }

    private static boolean startsLive(String s, int at) {
        char c = s.charAt(at);
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r';
    }
}
