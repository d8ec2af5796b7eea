package org.cohesa.core;

/**
 * Bad input from a person or a file: names the field and the value so the message can be shown as
 * one clear line ("field 'value': reason").
 */
public class InvalidInputException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final String field;
    private final String value;
    private final String reason;

    public InvalidInputException(String field, String value, String reason) {
        super(field + " '" + value + "': " + reason);
        this.field = field;
        this.value = value;
        this.reason = reason;
    }

    public String field() {
        return field;
    }

    public String value() {
        return value;
    }

    public String reason() {
        return reason;
    }
}
