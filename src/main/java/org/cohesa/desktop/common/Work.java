package org.cohesa.desktop.common;

/** A piece of work run off the FX thread; reports progress and checks for cancellation through {@link Progress}. */
@FunctionalInterface
public interface Work<T> {

    T run(Progress progress) throws Exception;

    /** What the running work may tell the user; safe to call from the worker thread. */
    interface Progress {
        /** @param fraction done, 0..1, or negative when unknown */
        void update(double fraction, String message);

        boolean isCancelled();
    }
}
