package org.cohesa.store;

/** A database failure the user can act on (file not writable, newer schema, locked too long). */
public class StoreException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }

    public StoreException(String message) {
        super(message);
    }
}
