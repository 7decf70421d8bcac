package org.tankwright.ui;

import io.github.andrewauclair.moderndocking.app.AppState;
import io.github.andrewauclair.moderndocking.app.Docking;
import io.github.andrewauclair.moderndocking.app.DockableMenuItem;
import io.github.andrewauclair.moderndocking.app.RootDockingPanel;
import io.github.andrewauclair.moderndocking.ext.ui.DockingUI;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.event.KeyEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;
import javax.swing.Action;
import javax.swing.JCheckBoxMenuItem;
import javax.swing.JFrame;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.WindowConstants;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Presets;
import org.tankwright.design.Design;
import org.tankwright.ui.files.Autosave;
import org.tankwright.ui.files.FileActions;
import org.tankwright.ui.files.RecoveryFolder;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;
import org.tankwright.ui.panes.ChecksPane;
import org.tankwright.ui.panes.DesignsPane;
import org.tankwright.ui.panes.EditorPane;
import org.tankwright.ui.panes.FiguresPane;
import org.tankwright.ui.panes.PaneArrangement;
import org.tankwright.ui.panes.Pane;
import org.tankwright.ui.panes.PlotsPane;
import org.tankwright.ui.panes.StressPane;

/**
 * The main window: menus, the docking panes around the editor area, and the status bar. One per
 * JVM (the docking framework is a single instance); {@link #dispose()} releases it for the next.
 */
public final class WorkbenchWindow {

    /** How the window runs: interactive (remembers layout and settings, autosaves), or remembering nothing (snapshots, tests). */
    public enum Mode { INTERACTIVE, SNAPSHOT }

    private final JFrame frame = new JFrame("Tankwright");
    private final Workspace workspace;
    private final UserSettings settings;
    private final Mode mode;
    private final StatusBar status = new StatusBar();
    private final EditorPane editor;
    private final FiguresPane figures;
    private final ChecksPane checks;
    private final PlotsPane plots;
    private final StressPane stress;
    private final DesignsPane designs;
    private final FileActions files;
    private final PaneArrangement arrangement;
    private final Autosave autosave;
    private final Action undo;
    private final Action redo;

    /** Builds the window (on the event thread; the look and feel must already be installed). */
    public WorkbenchWindow(UserSettings settings, Function<Design, AnalysisResult> analysis, Mode mode) {
        this.settings = settings;
        this.mode = mode;
        this.workspace = new Workspace(analysis);
        DockingUI.initialize();
        Docking.initialize(frame);
        frame.setName("workbench");
        frame.setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        RootDockingPanel root = new RootDockingPanel(frame);
        frame.add(root, BorderLayout.CENTER);
        frame.add(status, BorderLayout.SOUTH);

        editor = new EditorPane(workspace);
        designs = new DesignsPane(workspace, editor::reveal);
        figures = new FiguresPane(workspace);
        stress = new StressPane(workspace);
        checks = new ChecksPane(workspace, editor::reveal);
        plots = new PlotsPane(workspace);
        for (Pane p : List.of(editor, designs, figures, stress, checks, plots)) {
            Docking.registerDockable(p);
        }
        arrangement = PaneArrangement.createDefault();
        RecoveryFolder recovery = new RecoveryFolder(settings.recoveryFolder());
        files = new FileActions(frame, workspace, settings, recovery, status::message);
        autosave = new Autosave(workspace, recovery, 60_000);

        undo = Actions.of("Undo", KeyEvent.VK_Z, false, "Undo the last edit", () -> {
            if (workspace.selected() != null) {
                workspace.undo(workspace.selected());
            }
        });
        redo = Actions.of("Redo", KeyEvent.VK_Z, true, "Redo the edit undone last", () -> {
            if (workspace.selected() != null) {
                workspace.redo(workspace.selected());
            }
        });
        workspace.addListener(new Workspace.Listener() {
            @Override
            public void designsChanged() {
                refreshChrome();
            }

            @Override
            public void selected(OpenDesign d) {
                refreshChrome();
            }

            @Override
            public void computing(OpenDesign d) {
                if (d == workspace.selected()) {
                    status.computing();
                }
            }

            @Override
            public void resultShown(OpenDesign d) {
                if (d == workspace.selected()) {
                    if (d.failure() != null) {
                        status.failed(d.failure());
                    } else if (d.isPreview()) {
                        status.previewShown(d.computeNanos());
                    } else {
                        status.computed(d.computeNanos());
                    }
                    int[] c = checks.counts();
                    status.findings(c[0], c[1], c[2]);
                }
            }
        });
        status.onStop(() -> {
            if (workspace.selected() != null) {
                workspace.cancel(workspace.selected());
            }
        });
        frame.setJMenuBar(menus());
        frame.setTransferHandler(new DesignDropHandler(files::open));
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                quit();
            }
        });
        frame.setMinimumSize(new Dimension(900, 600));
        refreshChrome();
    }

    /** Shows the window at {@code size} and lays the panes out (saved arrangement when interactive). */
    public void show(Dimension size) {
        frame.setSize(size);
        frame.setLocationRelativeTo(null);
        frame.setVisible(true);
        if (mode == Mode.INTERACTIVE) {
            arrangement.restoreAndRemember(settings.layoutFile());
            autosave.start();
        } else {
            arrangement.reset();
        }
    }

    public JFrame frame() {
        return frame;
    }

    public Workspace workspace() {
        return workspace;
    }

    public StatusBar status() {
        return status;
    }

    public EditorPane editor() {
        return editor;
    }

    public FiguresPane figures() {
        return figures;
    }

    public PlotsPane plots() {
        return plots;
    }

    public ChecksPane checks() {
        return checks;
    }

    public FileActions files() {
        return files;
    }

    public PaneArrangement arrangement() {
        return arrangement;
    }

    /** Asks about unsaved edits, then closes the window. */
    public void quit() {
        if (!files.closeAll()) {
            return;
        }
        dispose();
    }

    /** Closes the window without asking and releases the docking framework. */
    public void dispose() {
        autosave.close();
        workspace.close();
        if (mode == Mode.INTERACTIVE) {
            AppState.persist();
        }
        AppState.setAutoPersist(false);
        frame.dispose();
        Docking.deregisterAllDockables();
        Docking.uninitialize();
    }

    private void refreshChrome() {
        OpenDesign d = workspace.selected();
        undo.setEnabled(d != null && d.history().canUndo());
        redo.setEnabled(d != null && d.history().canRedo());
        undo.putValue(Action.NAME, d != null && d.history().canUndo() ? "Undo " + d.history().undoName() : "Undo");
        redo.putValue(Action.NAME, d != null && d.history().canRedo() ? "Redo " + d.history().redoName() : "Redo");
        frame.setTitle(d == null ? "Tankwright" : (d.isDirty() ? "• " : "") + d.title() + " — Tankwright");
        if (d != null) {
            status.file(d.file() != null ? d.file().getFileName().toString() : d.design().name() + " (not saved yet)", d.isDirty());
            status.setToolTipText(d.file() != null ? d.file().toString() : null);
        }
    }

    /** The shown result of the selected design, or a message saying there is none yet. */
    private org.tankwright.analysis.AnalysisResult shownResult() {
        org.tankwright.analysis.AnalysisResult r = workspace.selected() == null ? null : workspace.selected().result();
        if (r == null) {
            JOptionPane.showMessageDialog(frame, "The selected design has no computed result yet.", "Export",
                    JOptionPane.INFORMATION_MESSAGE);
        }
        return r;
    }

    private void exportSheet() {
        org.tankwright.analysis.AnalysisResult r = shownResult();
        if (r == null) {
            return;
        }
        javax.swing.JFileChooser chooser = new javax.swing.JFileChooser();
        chooser.setSelectedFile(new java.io.File(r.design().name().replaceAll("[^A-Za-z0-9._-]+", "-") + "-sheet.pdf"));
        if (chooser.showSaveDialog(frame) != javax.swing.JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path target = chooser.getSelectedFile().toPath();
        String name = workspace.selected().file() != null ? workspace.selected().file().getFileName().toString() : r.design().name();
        exportInBackground("tuning sheet", target, () -> org.tankwright.report.TuningSheet.write(r, target,
                org.tankwright.report.Paper.A4, org.tankwright.report.SheetInfo.today(name, org.tankwright.report.Version.get())));
    }

    private void exportData() {
        org.tankwright.analysis.AnalysisResult r = shownResult();
        if (r == null) {
            return;
        }
        javax.swing.JFileChooser chooser = new javax.swing.JFileChooser();
        chooser.setFileSelectionMode(javax.swing.JFileChooser.DIRECTORIES_ONLY);
        if (chooser.showSaveDialog(frame) != javax.swing.JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path dir = chooser.getSelectedFile().toPath();
        exportInBackground("data", dir, () -> {
            org.tankwright.report.SeriesCsv.write(r, dir.resolve("sweeps"));
            org.tankwright.report.ResultJson.write(r, dir.resolve("result.json"));
            if (r.network() != null) {
                org.tankwright.report.SpiceNetlist.write(r, dir.resolve("network.cir"));
            }
        });
    }

    /** Files are written off the event thread; the outcome is shown on it. */
    private void exportInBackground(String what, Path target, ExportJob job) {
        Thread t = new Thread(() -> {
            String message;
            int kind;
            try {
                job.run();
                message = "Wrote the " + what + " to " + target;
                kind = JOptionPane.INFORMATION_MESSAGE;
            } catch (Exception ex) {
                message = "Could not write the " + what + " to " + target + ": " + ex.getMessage();
                kind = JOptionPane.ERROR_MESSAGE;
            }
            String m = message;
            int k = kind;
            javax.swing.SwingUtilities.invokeLater(() -> JOptionPane.showMessageDialog(frame, m, "Export", k));
        }, "tankwright-export");
        t.setDaemon(true);
        t.start();
    }

    /** A file-writing job that may fail. */
    @FunctionalInterface
    private interface ExportJob {
        void run() throws Exception;
    }

    private JMenuBar menus() {
        JMenuBar bar = new JMenuBar();
        JMenu file = new JMenu("File");
        file.setMnemonic(KeyEvent.VK_F);
        JMenu fromPreset = new JMenu("New from preset");
        for (String name : Presets.names()) {
            JMenuItem item = new JMenuItem(name);
            item.addActionListener(e -> {
                try {
                    workspace.open(Presets.load(name), null);
                } catch (Exception ex) {
                    JOptionPane.showMessageDialog(frame, ex.getMessage(), "Preset " + name, JOptionPane.ERROR_MESSAGE);
                }
            });
            fromPreset.add(item);
        }
        file.add(fromPreset);
        file.add(Actions.of("Open…", KeyEvent.VK_O, false, "Open a design file", files::openWithDialog));
        JMenu recent = new JMenu("Open recent");
        recent.addMenuListener(new javax.swing.event.MenuListener() {
            @Override
            public void menuSelected(javax.swing.event.MenuEvent e) {
                recent.removeAll();
                for (Path p : settings.recentFiles()) {
                    JMenuItem item = new JMenuItem(p.getFileName().toString());
                    item.setToolTipText(p.toString());
                    item.addActionListener(a -> files.open(p));
                    recent.add(item);
                }
                if (recent.getItemCount() == 0) {
                    JMenuItem none = new JMenuItem("(none yet)");
                    none.setEnabled(false);
                    recent.add(none);
                }
            }

            @Override
            public void menuDeselected(javax.swing.event.MenuEvent e) {
                // rebuilt each time it opens
            }

            @Override
            public void menuCanceled(javax.swing.event.MenuEvent e) {
                // rebuilt each time it opens
            }
        });
        file.add(recent);
        file.addSeparator();
        file.add(Actions.of("Save", KeyEvent.VK_S, false, "Save the selected design", () -> files.save(workspace.selected())));
        file.add(Actions.of("Save as…", KeyEvent.VK_S, true, "Save the selected design in a new file",
                () -> files.saveAsWithDialog(workspace.selected())));
        file.add(Actions.of("Close design", KeyEvent.VK_W, false, "Close the selected design", () -> files.close(workspace.selected())));
        file.addSeparator();
        file.add(Actions.of("Export tuning sheet (PDF)…", KeyEvent.VK_P, false,
                "Write the bench tuning sheet of the selected design's shown result", this::exportSheet));
        file.add(Actions.of("Export data (CSV, JSON, netlist)…", KeyEvent.VK_E, true,
                "Write every sweep as CSV, the result as JSON and the tuned network as a SPICE netlist into a folder",
                this::exportData));
        file.addSeparator();
        file.add(Actions.of("Quit", KeyEvent.VK_Q, false, "Close the window", this::quit));
        bar.add(file);

        JMenu edit = new JMenu("Edit");
        edit.setMnemonic(KeyEvent.VK_E);
        edit.add(undo);
        edit.add(redo);
        bar.add(edit);

        JMenu panes = new JMenu("Panes");
        panes.setMnemonic(KeyEvent.VK_P);
        for (Pane p : List.of(designs, figures, stress, checks, plots)) {
            panes.add(new DockableMenuItem(p.getPersistentID(), p.getTabText()));
        }
        panes.addSeparator();
        panes.add(Actions.of("Reset pane arrangement", 0, false, "Put every pane back where it started", arrangement::reset));
        panes.addSeparator();
        JCheckBoxMenuItem dark = new JCheckBoxMenuItem("Dark theme", settings.theme() == Theme.DARK);
        dark.addActionListener(e -> {
            Theme t = dark.isSelected() ? Theme.DARK : Theme.LIGHT;
            t.switchTo();
            if (mode == Mode.INTERACTIVE) {
                settings.setTheme(t);
            }
        });
        panes.add(dark);
        bar.add(panes);

        JMenu help = new JMenu("Help");
        help.add(Actions.of("Safety notes", 0, false, null, () -> JOptionPane.showMessageDialog(frame,
                "<html><body style='width:420px'>Resonant tanks build up voltages far above the supply, store energy in their "
                        + "capacitors after switch-off, radiate RF fields, and heaters make metal glowing hot. The numbers here "
                        + "are a design aid, not a safety approval: follow local codes and licensed practice, discharge "
                        + "capacitors before touching, and measure before trusting.</body></html>",
                "Safety notes", JOptionPane.WARNING_MESSAGE)));
        bar.add(help);
        return bar;
    }
}
