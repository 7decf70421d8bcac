package org.tankwright.ui.model;

import java.nio.file.Path;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Design;
import org.tankwright.ui.EditHistory;

/**
 * One design open in the window: its undo list, the file it came from (null until saved), and
 * the latest result shown for it. Changed only through the {@link Workspace}, on the event thread.
 */
public final class OpenDesign {

    private static final int UNDO_LIMIT = 500;
    private final String key;
    private final EditHistory<Design> history;
    private Path file;
    private AnalysisResult result;
    private String failure;
    private long computeNanos;
    private boolean computing;
    private boolean preview;

    OpenDesign(String key, Design design, Path file) {
        this.key = key;
        this.history = new EditHistory<>(design, UNDO_LIMIT);
        this.file = file;
    }

    /** A key that stays the same while the design is open (names its recovery copy). */
    public String key() {
        return key;
    }

    /** The current design. */
    public Design design() {
        return history.current();
    }

    public EditHistory<Design> history() {
        return history;
    }

    /** The file this design is saved in, or null. */
    public Path file() {
        return file;
    }

    void setFile(Path f) {
        file = f;
    }

    /** The latest result shown (may be for an earlier design while a recompute runs), or null. */
    public AnalysisResult result() {
        return result;
    }

    /** Why the latest computation failed, or null. */
    public String failure() {
        return failure;
    }

    public long computeNanos() {
        return computeNanos;
    }

    /** True while a computation runs: also after the quick preview of an edit is shown, until its full result is. */
    public boolean isComputing() {
        return computing;
    }

    /**
     * True when the latest result shown is the quick preview of an edit (its operating point: no
     * sweeps, no envelope) and the full result is still being computed.
     */
    public boolean isPreview() {
        return preview;
    }

    public boolean isDirty() {
        return history.isDirty();
    }

    /** The name shown on tabs and in the tree: the file name, else the design's name. */
    public String title() {
        return file != null ? file.getFileName().toString() : design().name();
    }

    void computing() {
        computing = true;
    }

    void shown(AnalysisResult r, String why, long nanos, boolean isPreview) {
        computing = isPreview && r != null;
        if (r != null) {
            result = r;
            preview = isPreview;
        }
        failure = why;
        computeNanos = nanos;
    }
}
