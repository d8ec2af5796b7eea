package org.cohesa.core.blend;

/**
 * Receives progress of a long search. Called from worker threads, so an app must hand the values to its
 * UI thread itself; calls are frequent but cheap to ignore.
 */
@FunctionalInterface
public interface ProgressListener {

    ProgressListener NONE = (done, total) -> { };

    /**
     * @param done  subsets dealt with so far (solved or proven unable to enter the list)
     * @param total subsets in the whole search
     */
    void onProgress(long done, long total);
}
