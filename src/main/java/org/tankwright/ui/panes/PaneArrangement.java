package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockingRegion;
import io.github.andrewauclair.moderndocking.app.AppState;
import io.github.andrewauclair.moderndocking.app.Docking;
import io.github.andrewauclair.moderndocking.app.DockingState;
import io.github.andrewauclair.moderndocking.app.WindowLayoutBuilder;
import io.github.andrewauclair.moderndocking.exception.DockingLayoutException;
import io.github.andrewauclair.moderndocking.layouts.ApplicationLayout;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Where the panes sit: the default arrangement (designs left, editor centre, figures right,
 * stress / checks / plots stacked below), the saved one, and the reset.
 */
public final class PaneArrangement {

    public static final String DESIGNS = "designs";
    public static final String EDITOR = "editor";
    public static final String FIGURES = "figures";
    public static final String STRESS = "stress";
    public static final String CHECKS = "checks";
    public static final String PLOTS = "plots";

    private final ApplicationLayout defaultLayout;

    private PaneArrangement(ApplicationLayout defaultLayout) {
        this.defaultLayout = defaultLayout;
    }

    /** Builds the default arrangement; the panes must be registered with the docking framework. */
    public static PaneArrangement createDefault() {
        ApplicationLayout layout = new WindowLayoutBuilder(EDITOR)
                .dock(PLOTS, EDITOR, DockingRegion.SOUTH, 0.42)
                .dock(STRESS, PLOTS, DockingRegion.CENTER)
                .dock(CHECKS, PLOTS, DockingRegion.CENTER)
                .display(PLOTS)
                .dock(DESIGNS, EDITOR, DockingRegion.WEST, 0.16)
                .dock(FIGURES, EDITOR, DockingRegion.EAST, 0.26)
                .buildApplicationLayout();
        return new PaneArrangement(layout);
    }

    /**
     * Restores the arrangement saved in {@code file} and keeps saving changes there; falls back
     * to the default when the file is missing or cannot be read. Returns true when the saved one was used.
     */
    public boolean restoreAndRemember(Path file) {
        AppState.setDefaultApplicationLayout(defaultLayout);
        AppState.setPersistFile(file.toFile());
        boolean restored = false;
        if (Files.isRegularFile(file)) {
            try {
                restored = AppState.restore();
            } catch (DockingLayoutException | RuntimeException e) {
                System.err.println("tankwright: saved pane arrangement " + file + " cannot be read (" + (e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName()) + "); using the default");
                restored = false;
            }
        }
        if (!restored) {
            reset();
        }
        AppState.setAutoPersist(true);
        return restored;
    }

    /** Puts every pane back where it started (and shows closed ones again). */
    public void reset() {
        DockingState.restoreApplicationLayout(defaultLayout);
    }

    /** Shows {@code id} again if it was closed, and brings it to front. */
    public static void reopen(String id) {
        if (!Docking.isDocked(id)) {
            Docking.dock(id, EDITOR, dockingRegionFor(id));
        }
        Docking.display(id);
    }

    private static DockingRegion dockingRegionFor(String id) {
        return switch (id) {
            case DESIGNS -> DockingRegion.WEST;
            case FIGURES -> DockingRegion.EAST;
            default -> DockingRegion.SOUTH;
        };
    }
}
