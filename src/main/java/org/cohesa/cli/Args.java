package org.cohesa.cli;

import org.cohesa.core.InvalidInputException;

/** Parsing of numeric option values shared by every command: one wording for every bad number. */
public final class Args {
    private Args() {
    }

    /** A finite decimal number; anything else is an {@link InvalidInputException} naming the option. */
    public static double number(String field, String text) {
        double d;
        try {
            d = Double.parseDouble(text.strip());
        } catch (NumberFormatException | NullPointerException e) {
            throw new InvalidInputException(field, String.valueOf(text), "not a number");
        }
        if (!Double.isFinite(d)) {
            throw new InvalidInputException(field, text, "not a finite number");
        }
        return d;
    }

    /** A number greater than zero. */
    public static double positive(String field, String text) {
        double d = number(field, text);
        if (d <= 0) {
            throw new InvalidInputException(field, text, "must be positive");
        }
        return d;
    }

    /** A whole number. */
    public static int integer(String field, String text) {
        try {
            return Integer.parseInt(text.strip());
        } catch (NumberFormatException | NullPointerException e) {
            throw new InvalidInputException(field, String.valueOf(text), "not a whole number");
        }
    }
}
