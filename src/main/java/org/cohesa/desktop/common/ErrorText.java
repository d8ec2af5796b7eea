package org.cohesa.desktop.common;

import java.util.concurrent.CancellationException;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.InvalidInputException;
import org.cohesa.store.StoreException;

/** Turns any failure into one readable line for the status bar or a message box: never a stack trace. */
public final class ErrorText {

    private ErrorText() {
    }

    public static String of(Throwable t) {
        Throwable e = unwrap(t);
        if (e instanceof CancellationException || e instanceof InterruptedException) {
            return "Cancelled.";
        }
        if (e instanceof InvalidInputException || e instanceof BadRowsException || e instanceof StoreException
                || e instanceof IllegalArgumentException || e instanceof java.io.IOException
                || e instanceof java.io.UncheckedIOException) {
            return sentence(e.getMessage());
        }
        String msg = e.getMessage();
        return "Unexpected problem (" + e.getClass().getSimpleName() + ")" + (msg == null || msg.isBlank() ? "." : ": " + msg);
    }

    private static Throwable unwrap(Throwable t) {
        Throwable e = t;
        while ((e instanceof java.util.concurrent.ExecutionException || e instanceof java.util.concurrent.CompletionException
                || (e instanceof RuntimeException && e.getClass() == RuntimeException.class)) && e.getCause() != null) {
            e = e.getCause();
        }
        return e;
    }

    private static String sentence(String msg) {
        if (msg == null || msg.isBlank()) {
            return "The operation failed.";
        }
        String s = msg.strip();
        char first = s.charAt(0);
        // only Latin letters: upper-casing δD would turn it into ΔD, which reads as a difference
        return first >= 'a' && first <= 'z' ? Character.toUpperCase(first) + s.substring(1) : s;
    }
}
