package org.cohesa.core.blend;

import java.util.concurrent.atomic.AtomicBoolean;

/** Lets another thread stop a running search; the search then throws {@link java.util.concurrent.CancellationException}. */
public final class CancellationToken {

    private final AtomicBoolean cancelled = new AtomicBoolean();

    public void cancel() {
        cancelled.set(true);
    }

    public boolean isCancelled() {
        return cancelled.get();
    }
}
