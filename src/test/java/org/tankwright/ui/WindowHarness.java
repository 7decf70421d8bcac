package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import java.util.function.Function;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Assumptions;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Design;
import org.tankwright.ui.files.FileActions;
import org.tankwright.ui.model.OpenDesign;

/**
 * One real workbench window for the GUI tests (under Xvfb in CI). The docking framework is a
 * single instance per JVM whose static parts cannot be re-initialised, so every GUI test shares
 * this window: each starts by closing what the last one left open. Without a display the tests
 * are skipped with a message saying so, never silently.
 */
final class WindowHarness {

    private static final AtomicReference<Function<Design, AnalysisResult>> ANALYSIS = new AtomicReference<>(Analysis::run);
    private static WorkbenchWindow window;

    private WindowHarness() {
    }

    /** Skips the calling test, visibly, when there is no display. */
    static void assumeDisplay() {
        Assumptions.assumeFalse(GraphicsEnvironment.isHeadless(),
                "SKIPPED: no display for the workbench GUI tests; run them under a virtual one: xvfb-run -a mvn test");
    }

    /**
     * The shared window with only {@code design} open, computed by {@code analysis}, its first
     * result shown.
     */
    static WorkbenchWindow open(Design design, Function<Design, AnalysisResult> analysis) throws Exception {
        assumeDisplay();
        ANALYSIS.set(analysis);
        WorkbenchWindow w = onEdt(() -> {
            if (window == null) {
                // fails a test when any Swing component is repainted off the event thread
                org.assertj.swing.edt.FailOnThreadViolationRepaintManager.install();
                Theme.LIGHT.install();
                Path config = Files.createTempDirectory("tankwright-gui-test");
                window = new WorkbenchWindow(new UserSettings(config), d -> ANALYSIS.get().apply(d), WorkbenchWindow.Mode.SNAPSHOT);
                window.files().setPrompt(d -> FileActions.Decision.DISCARD);
                window.show(new Dimension(1280, 820));
            }
            for (OpenDesign d : window.workspace().designs()) {
                window.files().close(d);
            }
            window.workspace().open(design, null);
            return window;
        });
        await("the first result is shown", () -> w.workspace().selected().result() != null);
        return w;
    }

    /** Waits (polling on the event thread) until {@code condition} holds, failing after 10 s. */
    static void await(String what, BooleanSupplier condition) throws Exception {
        long deadline = System.nanoTime() + 10_000_000_000L;
        while (System.nanoTime() < deadline) {
            if (onEdt(condition::getAsBoolean)) {
                return;
            }
            Thread.sleep(20);
        }
        fail("timed out waiting until " + what);
    }

    /**
     * Types {@code text} into {@code c} as key events through its own key handling (no focus
     * needed, so it is deterministic without a window manager). Call on the event thread.
     */
    static void type(javax.swing.text.JTextComponent c, String text) {
        long t = System.currentTimeMillis();
        for (char ch : text.toCharArray()) {
            int code = java.awt.event.KeyEvent.getExtendedKeyCodeForChar(ch);
            c.dispatchEvent(new java.awt.event.KeyEvent(c, java.awt.event.KeyEvent.KEY_PRESSED, t, 0, code, ch));
            c.dispatchEvent(new java.awt.event.KeyEvent(c, java.awt.event.KeyEvent.KEY_TYPED, t, 0,
                    java.awt.event.KeyEvent.VK_UNDEFINED, ch));
            c.dispatchEvent(new java.awt.event.KeyEvent(c, java.awt.event.KeyEvent.KEY_RELEASED, t, 0, code, ch));
        }
    }

    /** Runs {@code c} on the event thread and returns its value. */
    static <T> T onEdt(Callable<T> c) throws Exception {
        Object[] out = new Object[1];
        Exception[] err = new Exception[1];
        SwingUtilities.invokeAndWait(() -> {
            try {
                out[0] = c.call();
            } catch (Exception e) {
                err[0] = e;
            }
        });
        if (err[0] != null) {
            throw err[0];
        }
        @SuppressWarnings("unchecked")
        T t = (T) out[0];
        return t;
    }
}
