package org.tankwright.ui.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Design;
import org.tankwright.design.Problem;
import org.tankwright.ui.LatestWins;

/**
 * The designs open in the window and which one is selected. Every valid edit becomes a new
 * design on the undo list and is recomputed off the event thread (latest edit wins); panes
 * listen and redraw. Use on the event thread.
 */
public final class Workspace implements AutoCloseable {

    /** What panes hear. Every method has a do-nothing default. */
    public interface Listener {
        /** Designs were opened, closed, renamed or saved (titles, dirty markers). */
        default void designsChanged() { }

        /** Another design was selected (null: none open). */
        default void selected(OpenDesign d) { }

        /** {@code d}'s current design changed (edit, undo, redo). */
        default void designChanged(OpenDesign d) { }

        /** A computation for {@code d} started. */
        default void computing(OpenDesign d) { }

        /** A new result (or failure) for {@code d} is ready. */
        default void resultShown(OpenDesign d) { }
    }

    private final Function<Design, AnalysisResult> analysis;
    private final List<OpenDesign> open = new ArrayList<>();
    private final List<Listener> listeners = new ArrayList<>();
    private final java.util.Map<OpenDesign, LatestWins<Design, AnalysisResult>> engines = new java.util.HashMap<>();
    private OpenDesign selected;
    private int counter;

    /** @param analysis the pipeline ({@code Analysis::run}; tests may pass a slower or failing one) */
    public Workspace(Function<Design, AnalysisResult> analysis) {
        this.analysis = Objects.requireNonNull(analysis);
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public List<OpenDesign> designs() {
        return List.copyOf(open);
    }

    public OpenDesign selected() {
        return selected;
    }

    /** Opens {@code design} (from {@code file}, or null for a new one), selects it and computes it. */
    public OpenDesign open(Design design, Path file) {
        String stem = file != null ? file.getFileName().toString().replaceFirst("\\.json$", "") : design.name();
        OpenDesign d = new OpenDesign(stem + "-" + ProcessHandle.current().pid() + "-" + (++counter), design, file);
        open.add(d);
        Function<Design, AnalysisResult> preview = analysis instanceof Progressive p ? p::preview : null;
        LatestWins<Design, AnalysisResult> engine = new LatestWins<>(preview, analysis, () -> {
            d.computing();
            listeners.forEach(l -> l.computing(d));
        }, outcome -> {
            String why = outcome.succeeded() ? null : describe(outcome.failure());
            // the analysis's own time: a result taken from the head start was computed before it was asked for
            d.shown(outcome.output(), why, outcome.output() != null ? outcome.output().computeNanos() : outcome.nanos(),
                    outcome.preview());
            listeners.forEach(l -> l.resultShown(d));
        });
        engines.put(d, engine);
        listeners.forEach(Listener::designsChanged);
        select(d);
        engine.submit(design);
        return d;
    }

    /** Opens a design recovered after a crash: it has no file and counts as unsaved. */
    public OpenDesign openRecovered(Design design) {
        OpenDesign d = open(design, null);
        d.history().markUnsaved();
        listeners.forEach(Listener::designsChanged);
        return d;
    }

    /** Selects {@code d} (must be open). */
    public void select(OpenDesign d) {
        if (d == selected) {
            return;
        }
        selected = d;
        listeners.forEach(l -> l.selected(d));
    }

    /**
     * Applies an edit: when {@code next} is valid it becomes the current design (one undo step,
     * merged with the previous one when {@code merge} and the step name are the same) and is
     * recomputed; when not, nothing changes and the problems are returned.
     */
    public List<Problem> edit(OpenDesign d, Design next, String step, boolean merge) {
        List<Problem> problems = DesignCheck.problems(next);
        if (!problems.isEmpty()) {
            return problems;
        }
        boolean changed = merge ? d.history().pushOrMerge(next, step) : d.history().push(next, step);
        if (changed) {
            changedAndRecompute(d);
        }
        return List.of();
    }

    public void undo(OpenDesign d) {
        if (d.history().canUndo()) {
            d.history().undo();
            changedAndRecompute(d);
        }
    }

    public void redo(OpenDesign d) {
        if (d.history().canRedo()) {
            d.history().redo();
            changedAndRecompute(d);
        }
    }

    /** Stops the computation of {@code d} in flight; the last shown result stays. */
    public void cancel(OpenDesign d) {
        LatestWins<Design, AnalysisResult> engine = engines.get(d);
        if (engine != null && d.isComputing()) {
            engine.cancel();
            d.shown(null, "stopped by the user; showing the last result", 0, false);
            listeners.forEach(l -> l.resultShown(d));
        }
    }

    /** Records that {@code d} was saved in {@code file}. */
    public void saved(OpenDesign d, Path file) {
        d.setFile(file);
        d.history().markSaved();
        listeners.forEach(Listener::designsChanged);
    }

    /** Closes {@code d} (ask about unsaved edits first). */
    public void close(OpenDesign d) {
        int i = open.indexOf(d);
        if (i < 0) {
            return;
        }
        open.remove(i);
        LatestWins<Design, AnalysisResult> engine = engines.remove(d);
        if (engine != null) {
            engine.close();
        }
        listeners.forEach(Listener::designsChanged);
        if (selected == d) {
            selected = null;
            select(open.isEmpty() ? null : open.get(Math.min(i, open.size() - 1)));
        }
    }

    private void changedAndRecompute(OpenDesign d) {
        listeners.forEach(l -> l.designChanged(d));
        listeners.forEach(Listener::designsChanged);
        engines.get(d).submit(d.design());
    }

    private static String describe(Throwable t) {
        String m = t.getMessage();
        return m == null || m.isBlank() ? t.getClass().getSimpleName() : m;
    }

    @Override
    public void close() {
        engines.values().forEach(LatestWins::close);
        engines.clear();
    }
}
