package org.cohesa.core;

/**
 * One bad cell of an imported table: where it is, what it holds and why it was refused.
 *
 * @param line   1-based line number in the file (the header is line 1)
 * @param column column name
 * @param value  the cell's text
 * @param reason why it was refused
 */
public record RowError(long line, String column, String value, String reason) {

    /** "line 4, column dD, value 'abc': not a number". */
    public String describe() {
        return "line " + line + ", column " + column + ", value '" + value + "': " + reason;
    }
}
