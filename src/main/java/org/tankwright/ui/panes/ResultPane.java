package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/** A pane that shows the selected design's latest result, redrawn when the selection or the result changes. */
abstract class ResultPane extends Pane implements Workspace.Listener {

    protected final Workspace workspace;

    protected ResultPane(String id, String title, String tooltip, DockableStyle style, Workspace workspace) {
        super(id, title, tooltip, style);
        this.workspace = workspace;
        workspace.addListener(this);
    }

    /** Shows {@code d}'s latest result (null: no design open). */
    protected abstract void show(OpenDesign d);

    @Override
    public void selected(OpenDesign d) {
        show(d);
    }

    @Override
    public void resultShown(OpenDesign d) {
        if (d == workspace.selected()) {
            show(d);
        }
    }
}
