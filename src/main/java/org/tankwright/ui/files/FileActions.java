package org.tankwright.ui.files;

import java.awt.Component;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.Consumer;
import javax.swing.JFileChooser;
import javax.swing.JOptionPane;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.tankwright.design.Design;
import org.tankwright.design.DesignException;
import org.tankwright.design.DesignFiles;
import org.tankwright.ui.UserSettings;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/**
 * Opening and saving design files from the window: through the design package's loader (every
 * problem listed) and its atomic save; recent files; the prompt before unsaved edits are lost.
 */
public final class FileActions {

    /** What to do with unsaved edits. */
    public enum Decision { SAVE, DISCARD, CANCEL }

    /** Asks the user what to do with the unsaved edits of a design. */
    @FunctionalInterface
    public interface Prompt {
        Decision ask(OpenDesign d);
    }

    private final Component parent;
    private final Workspace workspace;
    private final UserSettings settings;
    private final RecoveryFolder recovery;
    private final Consumer<String> status;
    private Prompt prompt;

    public FileActions(Component parent, Workspace workspace, UserSettings settings, RecoveryFolder recovery, Consumer<String> status) {
        this.parent = parent;
        this.workspace = workspace;
        this.settings = settings;
        this.recovery = recovery;
        this.status = status;
        this.prompt = this::askWithDialog;
    }

    /** Replaces the unsaved-edits dialog (tests answer without a dialog). */
    public void setPrompt(Prompt p) {
        prompt = p;
    }

    /** Opens {@code file}; a file already open is selected instead. Returns the open design, or null after reporting why not. */
    public OpenDesign open(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        for (OpenDesign d : workspace.designs()) {
            if (d.file() != null && d.file().toAbsolutePath().normalize().equals(abs)) {
                workspace.select(d);
                return d;
            }
        }
        try {
            Design design = DesignFiles.load(abs);
            settings.addRecent(abs);
            status.accept("Opened " + abs.getFileName());
            return workspace.open(design, abs);
        } catch (DesignException e) {
            error("Cannot open " + abs.getFileName(), e.getMessage());
        } catch (IOException e) {
            error("Cannot open " + abs.getFileName(), abs + " cannot be read: " + e.getMessage());
        }
        return null;
    }

    /** Asks for a file and opens it. */
    public void openWithDialog() {
        JFileChooser chooser = chooser();
        if (chooser.showOpenDialog(parent) == JFileChooser.APPROVE_OPTION) {
            open(chooser.getSelectedFile().toPath());
        }
    }

    /** Saves {@code d} in its file, or asks where when it has none. True when saved. */
    public boolean save(OpenDesign d) {
        if (d == null) {
            return false;
        }
        return d.file() == null ? saveAsWithDialog(d) : saveTo(d, d.file());
    }

    /** Asks for a file and saves {@code d} there. */
    public boolean saveAsWithDialog(OpenDesign d) {
        if (d == null) {
            return false;
        }
        JFileChooser chooser = chooser();
        chooser.setSelectedFile(new java.io.File(d.file() != null ? d.file().getFileName().toString()
                : d.design().name().toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-") + ".json"));
        if (chooser.showSaveDialog(parent) != JFileChooser.APPROVE_OPTION) {
            return false;
        }
        Path file = chooser.getSelectedFile().toPath();
        if (!file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json")) {
            file = file.resolveSibling(file.getFileName() + ".json");
        }
        if (Files.exists(file) && !file.equals(d.file()) && JOptionPane.showConfirmDialog(parent,
                file.getFileName() + " exists. Replace it? (The old file is kept as " + file.getFileName() + ".bak)",
                "Save as", JOptionPane.OK_CANCEL_OPTION) != JOptionPane.OK_OPTION) {
            return false;
        }
        return saveTo(d, file);
    }

    /** Saves {@code d} to {@code file} atomically. True when saved. */
    public boolean saveTo(OpenDesign d, Path file) {
        try {
            DesignFiles.save(d.design(), file);
        } catch (IOException e) {
            error("Cannot save", file + " could not be written: " + e.getMessage() + ". Your design is still open and unchanged.");
            return false;
        }
        workspace.saved(d, file.toAbsolutePath().normalize());
        settings.addRecent(file);
        recovery.discard(d.key());
        status.accept("Saved " + file.getFileName());
        return true;
    }

    /** Closes {@code d}, asking first when it has unsaved edits. True when closed. */
    public boolean close(OpenDesign d) {
        if (d == null) {
            return true;
        }
        if (d.isDirty()) {
            switch (prompt.ask(d)) {
                case SAVE -> {
                    if (!save(d)) {
                        return false;
                    }
                }
                case CANCEL -> {
                    return false;
                }
                case DISCARD -> {
                    // closes below
                }
            }
        }
        recovery.discard(d.key());
        workspace.close(d);
        return true;
    }

    /** Closes every design (asking for each with unsaved edits); false when the user cancelled. */
    public boolean closeAll() {
        for (OpenDesign d : workspace.designs()) {
            if (!close(d)) {
                return false;
            }
        }
        return true;
    }

    private Decision askWithDialog(OpenDesign d) {
        Object[] options = {"Save", "Discard edits", "Cancel"};
        int a = JOptionPane.showOptionDialog(parent, "\"" + d.title() + "\" has unsaved edits. Save them first?",
                "Unsaved edits", JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE, null, options, options[0]);
        return a == 0 ? Decision.SAVE : a == 1 ? Decision.DISCARD : Decision.CANCEL;
    }

    private JFileChooser chooser() {
        JFileChooser c = new JFileChooser(settings.recentFiles().isEmpty() ? null : settings.recentFiles().get(0).getParent().toFile());
        c.setFileFilter(new FileNameExtensionFilter("Tankwright design (*.json)", "json"));
        return c;
    }

    private void error(String title, String message) {
        status.accept(title);
        if (parent != null && parent.isShowing()) {
            JOptionPane.showMessageDialog(parent, message, title, JOptionPane.ERROR_MESSAGE);
        } else {
            System.err.println("tankwright: " + title + ": " + message);
        }
    }
}
