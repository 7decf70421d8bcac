package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.Dockable;
import io.github.andrewauclair.moderndocking.DockableStyle;
import java.awt.BorderLayout;
import javax.swing.JPanel;

/** A dockable pane of the workbench: a fixed id (used in the saved arrangement) and a title. */
public abstract class Pane extends JPanel implements Dockable {

    private final String id;
    private final String title;
    private final String tooltip;
    private final DockableStyle style;

    protected Pane(String id, String title, String tooltip, DockableStyle style) {
        super(new BorderLayout());
        this.id = id;
        this.title = title;
        this.tooltip = tooltip;
        this.style = style;
        setName(id);
    }

    @Override
    public String getPersistentID() {
        return id;
    }

    @Override
    public String getTabText() {
        return title;
    }

    @Override
    public String getTabTooltip() {
        return tooltip;
    }

    @Override
    public DockableStyle getStyle() {
        return style;
    }

    /** A pane's size is set by the docking layout, never by its content: a change inside is laid out here, not across the window. */
    @Override
    public boolean isValidateRoot() {
        return true;
    }

    @Override
    public boolean isWrappableInScrollpane() {
        return false;
    }

    @Override
    public boolean isFloatingAllowed() {
        return true;
    }
}
