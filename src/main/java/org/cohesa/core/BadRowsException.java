package org.cohesa.core;

import java.util.List;

/** An import refused as a whole because some rows are bad; lists every bad cell. */
public class BadRowsException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final String source;
    private final transient List<RowError> errors;

    public BadRowsException(String source, List<RowError> errors) {
        super(source + ": " + errors.size() + " bad " + (errors.size() == 1 ? "cell" : "cells") + ", nothing imported; first: "
                + (errors.isEmpty() ? "-" : errors.get(0).describe()));
        this.source = source;
        this.errors = List.copyOf(errors);
    }

    public String source() {
        return source;
    }

    public List<RowError> errors() {
        return errors;
    }
}
