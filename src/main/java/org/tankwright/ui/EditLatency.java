package org.tankwright.ui;

import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import org.tankwright.analysis.Presets;
import org.tankwright.design.Design;
import org.tankwright.ui.fields.FieldEditor;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/**
 * Measures how long a geometry edit takes to show in the window (for {@code tankwright bench}):
 * a workbench window is opened in this JVM at the default size with the interactive pipeline
 * (operating point first, then the full analysis), a preset is opened, and the primary coil's
 * turns are changed back and forth through the editor's own text field (select all, type the new
 * number over it: the path a keystroke takes). Each edit is timed on the event thread from the
 * change of the text to (a) its operating-point result handed to every pane and painted, and (b)
 * its full result (sweeps, envelope) handed to the plots and painted. Untimed edits first let the
 * JIT compile the code. Needs a display.
 */
public final class EditLatency {

    /** The JSON path of the field edited. */
    public static final String FIELD = "$.primary.turns";

    /**
     * One preset's times.
     *
     * @param preset        the preset's name
     * @param edit          the edit made, in words
     * @param operatingMs   per timed edit: edit to operating point painted in every pane, ms
     * @param fullMs        per timed edit: edit to full result painted, ms
     * @param warmups       untimed edits before
     */
    public record Times(String preset, String edit, double[] operatingMs, double[] fullMs, int warmups) {
    }

    private EditLatency() {
    }

    /**
     * Opens each preset in turn and times {@code runs} edits after {@code warmups} untimed ones.
     * Blocks; call off the event thread. Throws {@link IllegalStateException} without a display.
     */
    public static List<Times> measure(List<String> presets, int warmups, int runs) throws Exception {
        if (GraphicsEnvironment.isHeadless()) {
            throw new IllegalStateException("there is no display");
        }
        AtomicReference<WorkbenchWindow> window = new AtomicReference<>();
        onEdt(() -> {
            Theme.LIGHT.install();
            UserSettings settings = new UserSettings(Files.createTempDirectory("tankwright-edit-bench"));
            WorkbenchWindow w = new WorkbenchWindow(settings, Workbench.PROGRESSIVE, WorkbenchWindow.Mode.SNAPSHOT);
            w.files().setPrompt(d -> org.tankwright.ui.files.FileActions.Decision.DISCARD);
            w.show(Workbench.DEFAULT_SIZE);
            window.set(w);
            return null;
        });
        WorkbenchWindow w = window.get();
        Probe probe = new Probe();
        w.workspace().addListener(probe);
        List<Times> out = new ArrayList<>();
        try {
            for (String name : presets) {
                out.add(measure(w, probe, name, warmups, runs));
            }
        } finally {
            onEdt(() -> {
                w.dispose();
                return null;
            });
        }
        return out;
    }

    private static Times measure(WorkbenchWindow w, Probe probe, String name, int warmups, int runs) throws Exception {
        Design design = Presets.load(name);
        int turns = (int) Math.round(design.primary().turns());
        probe.expect(design);
        OpenDesign d = onEdt(() -> {
            for (OpenDesign o : w.workspace().designs()) {
                w.files().close(o);
            }
            return w.workspace().open(design, null);
        });
        probe.awaitFull();
        JTextField field = onEdt(() -> {
            FieldEditor e = w.editor().tabOf(d).form().editorFor(FIELD);
            if (e == null || !(e.component() instanceof JTextField t)) {
                throw new IllegalStateException(name + ": the editor has no text field for " + FIELD);
            }
            return t;
        });
        double[] op = new double[runs];
        double[] full = new double[runs];
        for (int i = -warmups; i < runs; i++) {
            String next = Integer.toString(((i + warmups) & 1) == 0 ? turns + 1 : turns);
            probe.arm(d);
            onEdt(() -> {
                probe.start();
                field.selectAll();
                field.replaceSelection(next);
                return null;
            });
            double[] t = probe.awaitFull();
            if (i >= 0) {
                op[i] = t[0];
                full[i] = t[1];
            }
        }
        return new Times(name, "primary turns " + turns + " ↔ " + (turns + 1), op, full, warmups);
    }

    /** Stamps the times on the event thread once the panes have painted what they were handed. */
    private static final class Probe implements Workspace.Listener {
        private final AtomicLong t0 = new AtomicLong();
        private volatile OpenDesign target;
        private volatile Design before;
        private volatile double operating;
        private volatile CountDownLatch done = new CountDownLatch(1);
        private volatile double fullTime;

        void expect(Design d) {
            before = null;
            operating = Double.NaN;
            done = new CountDownLatch(1);
            t0.set(System.nanoTime());
        }

        void arm(OpenDesign d) throws Exception {
            target = d;
            before = onEdt(d::design);
            operating = Double.NaN;
            done = new CountDownLatch(1);
        }

        void start() {
            t0.set(System.nanoTime());
        }

        @Override
        public void resultShown(OpenDesign d) {
            if (d.result() == null || (before != null && d.result().design() == before)) {
                return;
            }
            boolean preview = d.isPreview();
            // the panes heard first (this listener was added last); their repaints are queued: stamp after them
            SwingUtilities.invokeLater(() -> SwingUtilities.invokeLater(() -> {
                double ms = (System.nanoTime() - t0.get()) / 1e6;
                if (preview) {
                    operating = ms;
                } else {
                    fullTime = ms;
                    if (Double.isNaN(operating)) {
                        operating = ms; // no separate preview was shown (its full result came first)
                    }
                    done.countDown();
                }
            }));
        }

        /** Waits for the full result of the current edit; its {operating point, full} times in ms. */
        double[] awaitFull() throws InterruptedException {
            if (!done.await(120, TimeUnit.SECONDS)) {
                throw new IllegalStateException("no full result within 120 s");
            }
            return new double[] {operating, fullTime};
        }
    }

    private static <T> T onEdt(java.util.concurrent.Callable<T> c) throws Exception {
        AtomicReference<T> out = new AtomicReference<>();
        AtomicReference<Exception> err = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                out.set(c.call());
            } catch (Exception e) {
                err.set(e);
            }
        });
        if (err.get() != null) {
            throw err.get();
        }
        return out.get();
    }
}
