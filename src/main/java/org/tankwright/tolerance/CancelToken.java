package org.tankwright.tolerance;

/** Cooperative cancellation: the study checks it before each sample. */
public final class CancelToken {
    private volatile boolean cancelled;

    public void cancel() {
        cancelled = true;
    }

    public boolean isCancelled() {
        return cancelled;
    }
}
