package org.cohesa.cli.records;

import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;

/** Parsing shared by the {@code record} commands. */
final class RecordSupport {

    private RecordSupport() {
    }

    /** A record number: a positive whole number. */
    static long parseId(String text) {
        try {
            long id = Long.parseLong(text.strip());
            if (id > 0) {
                return id;
            }
        } catch (NumberFormatException | NullPointerException e) {
            // reported below with the value
        }
        throw new InvalidInputException("ID", String.valueOf(text), "a record number is a positive whole number, e.g. 3");
    }

    /** A single solvent name (commas allowed, as in 1,4-dioxane) or a blend written NAME:FRACTION,… */
    static Blend liquid(SolventLibrary library, String field, String text) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(field, String.valueOf(text), "name a solvent or write a blend NAME:FRACTION,NAME:FRACTION");
        }
        return text.contains(":") ? library.resolveBlend(field, text) : Blend.pure(library.resolve(field, text));
    }
}
