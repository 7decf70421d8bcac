package org.tankwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Undo and redo over immutable values: the history is a list of states and a cursor.
 * Each edit is a named step; a step after an undo drops the redo tail. Uses java.util only.
 *
 * @param <T> the immutable document type
 */
public final class EditHistory<T> {

    private record Step<T>(T state, String name) { }

    private final List<Step<T>> steps = new ArrayList<>();
    private final int limit;
    private boolean merging;
    private int cursor;
    private int savedAt;

    /** A history starting at {@code initial}, remembering at most {@code limit} steps. */
    public EditHistory(T initial, int limit) {
        if (limit < 2) {
            throw new IllegalArgumentException("history limit must be at least 2, was " + limit);
        }
        this.limit = limit;
        steps.add(new Step<>(Objects.requireNonNull(initial), "open"));
        cursor = 0;
        savedAt = 0;
    }

    /** The current state. */
    public T current() {
        return steps.get(cursor).state();
    }

    /** Records {@code next} as a new step named {@code name}; returns false when it equals the current state. */
    public boolean push(T next, String name) {
        Objects.requireNonNull(next);
        merging = false;
        if (next.equals(current())) {
            return false;
        }
        while (steps.size() > cursor + 1) {
            steps.remove(steps.size() - 1);
        }
        if (savedAt > cursor) {
            savedAt = -1; // the saved state was in the dropped redo tail
        }
        steps.add(new Step<>(next, name));
        cursor++;
        if (steps.size() > limit) {
            steps.remove(0);
            cursor--;
            savedAt = savedAt > 0 ? savedAt - 1 : -1;
        }
        return true;
    }

    /**
     * Like {@link #push}, but when the previous step has the same name and no other step,
     * undo or {@link #endMerge()} came between, replaces it: one field's keystrokes are one step.
     */
    public boolean pushOrMerge(T next, String name) {
        boolean mergeable = merging && cursor > 0 && cursor == steps.size() - 1
                && steps.get(cursor).name().equals(name) && savedAt != cursor;
        if (!mergeable) {
            boolean pushed = push(next, name);
            merging = pushed;
            return pushed;
        }
        if (next.equals(current())) {
            return false;
        }
        steps.set(cursor, new Step<>(next, name));
        return true;
    }

    /** Ends coalescing: the next edit is a step of its own (call when a field loses focus). */
    public void endMerge() {
        merging = false;
    }

    public boolean canUndo() {
        return cursor > 0;
    }

    public boolean canRedo() {
        return cursor < steps.size() - 1;
    }

    /** Name of the step an undo would revert, or null. */
    public String undoName() {
        return canUndo() ? steps.get(cursor).name() : null;
    }

    /** Name of the step a redo would repeat, or null. */
    public String redoName() {
        return canRedo() ? steps.get(cursor + 1).name() : null;
    }

    /** Steps back one edit and returns the state now current. */
    public T undo() {
        if (!canUndo()) {
            throw new IllegalStateException("nothing to undo");
        }
        merging = false;
        cursor--;
        return current();
    }

    /** Steps forward one edit and returns the state now current. */
    public T redo() {
        if (!canRedo()) {
            throw new IllegalStateException("nothing to redo");
        }
        merging = false;
        cursor++;
        return current();
    }

    /** Marks the current state as the one on disk. */
    public void markSaved() {
        merging = false;
        savedAt = cursor;
    }

    /** Marks the current state as not on disk (a design recovered after a crash). */
    public void markUnsaved() {
        merging = false;
        savedAt = -1;
    }

    /** True when the current state differs from the one last saved. */
    public boolean isDirty() {
        return savedAt != cursor;
    }
}
