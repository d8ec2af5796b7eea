package org.cohesa.cli;

import org.cohesa.core.InvalidInputException;

/** Parsing of numeric option values shared by every command: one wording for every bad number. */
public final class Args {
    private Args() {
    }

    /** A finite decimal number; anything else is an {@link InvalidInputException} naming the option. */
    public static double number(String field, String text) {
        try {
            double d = Double.parseDouble(text.strip());
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException | NullPointerException e) {
            throw new InvalidInputException(field, String.valueOf(text), "not a number");
        }
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
