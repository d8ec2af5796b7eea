package org.cohesa.desktop.common;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.concurrent.Task;

/**
 * Runs the app's computations and database work off the FX thread, one job at a time, and exposes what the
 * status bar shows: the message, the progress, whether something is running (for the cancel button).
 * Failures become one-line messages ({@link ErrorText}); the views never see a stack trace.
 */
public final class Jobs {

    private ExecutorService worker = newWorker();
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("Ready.");
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(0);
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyBooleanWrapper failed = new ReadOnlyBooleanWrapper(false);
    private Task<?> current;
    private int active;

    /**
     * Starts {@code work}; {@code onDone} and {@code onError} run on the FX thread.
     *
     * @param title shown while it runs, e.g. "Importing solvents"
     */
    public <T> Task<T> run(String title, Work<T> work, Consumer<T> onDone, Consumer<String> onError) {
        Task<T> task = new Task<>() {
            @Override
            protected T call() throws Exception {
                updateMessage(title + "…");
                updateProgress(-1, 1);
                return work.run(new Work.Progress() {
                    @Override
                    public void update(double fraction, String msg) {
                        if (fraction >= 0) {
                            updateProgress(Math.min(1, fraction), 1);
                        }
                        if (msg != null) {
                            updateMessage(msg);
                        }
                    }

                    @Override
                    public boolean isCancelled() {
                        return cancelledNow();
                    }
                });
            }

            private boolean cancelledNow() {
                return isCancelled();
            }
        };
        task.messageProperty().addListener((o, a, m) -> {
            if (task == current && !task.isDone() && m != null && !m.isEmpty()) {
                message.set(m);
            }
        });
        task.progressProperty().addListener((o, a, p) -> {
            if (task == current && !task.isDone()) {
                progress.set(p.doubleValue());
            }
        });
        task.setOnSucceeded(e -> {
            finish(task);
            failed.set(false);
            message.set(title + ": done.");
            if (onDone != null) {
                onDone.accept(task.getValue());
            }
        });
        task.setOnFailed(e -> {
            finish(task);
            String text = ErrorText.of(task.getException());
            failed.set(true);
            message.set(text);
            if (onError != null) {
                onError.accept(text);
            }
        });
        task.setOnCancelled(e -> {
            finish(task);
            failed.set(false);
            message.set(title + ": cancelled.");
        });
        current = task;
        active++;
        running.set(true);
        failed.set(false); // a new job is not the last one's failure
        progress.set(-1);
        message.set(title + "…");
        worker.submit(task);
        return task;
    }

    /** Convenience overload: errors go to the status bar only. */
    public <T> Task<T> run(String title, Work<T> work, Consumer<T> onDone) {
        return run(title, work, onDone, null);
    }

    /**
     * Cancels the job the status bar shows. The status says so at once; a computation that takes a moment to notice
     * is left to finish on its own thread (its result is dropped), and the jobs queued behind it move to a fresh
     * worker, so the next job never waits for it.
     */
    public void cancel() {
        if (current != null && !current.isDone()) {
            current.cancel(true);
            ExecutorService abandoned = worker;
            worker = newWorker();
            for (Runnable queued : abandoned.shutdownNow()) {
                worker.submit(queued);
            }
        }
    }

    private static ExecutorService newWorker() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "cohesa-worker");
            t.setDaemon(true);
            return t;
        });
    }

    /** Shows a message in the status bar (FX thread or not). */
    public void say(String text) {
        if (Platform.isFxApplicationThread()) {
            failed.set(false);
            message.set(text);
        } else {
            Platform.runLater(() -> say(text));
        }
    }

    /** Shows a problem in the status bar, marked as such. */
    public void complain(String text) {
        if (Platform.isFxApplicationThread()) {
            failed.set(true);
            message.set(text);
        } else {
            Platform.runLater(() -> complain(text));
        }
    }

    private void finish(Task<?> task) {
        active = Math.max(0, active - 1);
        if (task == current) {
            progress.set(0);
        }
        running.set(active > 0);
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    public ReadOnlyDoubleProperty progressProperty() {
        return progress.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }

    /** True while the last message reports a failure (the status bar marks it). */
    public ReadOnlyBooleanProperty failedProperty() {
        return failed.getReadOnlyProperty();
    }
}
