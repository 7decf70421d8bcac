package org.tankwright.ui;

import java.awt.Dimension;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.lang.reflect.InvocationTargetException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import javax.swing.JOptionPane;
import javax.swing.SwingUtilities;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Design;
import org.tankwright.ui.files.RecoveryFolder;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/** The workbench window's entry point, called by {@code tankwright open}. */
public final class Workbench {
    /** The interactive pipeline: the operating point first, then the full analysis. */
    static final org.tankwright.ui.model.Progressive PROGRESSIVE = progressive(
            d -> Analysis.run(d, Analysis.Scope.OPERATING_POINT), Analysis::run);

    /** A progressive pipeline of a {@code preview} and a {@code full} computation. */
    static org.tankwright.ui.model.Progressive progressive(Function<Design, AnalysisResult> preview,
                                                         Function<Design, AnalysisResult> full) {
        return new org.tankwright.ui.model.Progressive() {
            @Override
            public AnalysisResult apply(Design d) {
                return full.apply(d);
            }

            @Override
            public AnalysisResult preview(Design d) {
                return preview.apply(d);
            }
        };
    }


    /** Default window size. */
    public static final Dimension DEFAULT_SIZE = new Dimension(1440, 900);

    /**
     * How to open the window.
     *
     * @param theme    light or dark; null uses the remembered one
     * @param snapshot when set, lay the window out, wait for the analysis, write a PNG here and close
     * @param size     window size; null for {@link #DEFAULT_SIZE}
     * @param headStart the design's analysis already started at the top of {@code main}, or null
     */
    public record Options(Theme theme, Path snapshot, Dimension size, HeadStart headStart) {
        public static final Options DEFAULT = new Options(null, null, null);

        /** Options without a head start. */
        public Options(Theme theme, Path snapshot, Dimension size) {
            this(theme, snapshot, size, null);
        }

        /** These options with {@code h} as the head start. */
        public Options withHeadStart(HeadStart h) {
            return new Options(theme, snapshot, size, h);
        }

        /** The full analysis, answered from the head start for its design. */
        public Function<Design, AnalysisResult> fullAnalysis() {
            Function<Design, AnalysisResult> f = Analysis::run;
            return headStart == null ? f : headStart.serve(Analysis.Scope.FULL, f);
        }

        org.tankwright.ui.model.Progressive progressiveAnalysis() {
            if (headStart == null) {
                return PROGRESSIVE;
            }
            return progressive(headStart.serve(Analysis.Scope.OPERATING_POINT, PROGRESSIVE::preview), fullAnalysis());
        }

        Dimension sizeOrDefault() {
            return size != null ? size : DEFAULT_SIZE;
        }
    }

    private Workbench() {
    }

    /** Opens the window on {@code design} (read from {@code file}, or the demo when file is null) and returns when it is closed. */
    public static void launch(Path file, Design design) {
        try {
            launch(file, design, Options.DEFAULT);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e); // only a snapshot writes files here
        }
    }

    /**
     * Opens the window on {@code design} and blocks until it is closed, or, with
     * {@link Options#snapshot()}, until the picture is written. Returns an exit status (0 ok).
     *
     * @throws IOException when the snapshot cannot be written
     */
    public static int launch(Path file, Design design, Options opts) throws IOException {
        UserSettings settings = new UserSettings(UserSettings.defaultFolder());
        if (opts.snapshot() != null) {
            CountDownLatch disposed = new CountDownLatch(1);
            BufferedImage img = snapshot(design, file, opts.theme() != null ? opts.theme() : Theme.LIGHT,
                    opts.sizeOrDefault(), opts.fullAnalysis(), disposed);
            Snapshot.writePng(img, opts.snapshot()); // while the event thread closes the window
            StartTrace.mark("snapshot written");
            try {
                disposed.await(60, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return 0;
        }
        CountDownLatch closed = new CountDownLatch(1);
        onEdt(() -> {
            Theme theme = opts.theme() != null ? opts.theme() : settings.theme();
            theme.install();
            WorkbenchWindow w = new WorkbenchWindow(settings, opts.progressiveAnalysis(), WorkbenchWindow.Mode.INTERACTIVE);
            w.frame().addWindowListener(new java.awt.event.WindowAdapter() {
                @Override
                public void windowClosed(java.awt.event.WindowEvent e) {
                    closed.countDown();
                }
            });
            w.show(opts.sizeOrDefault());
            w.workspace().open(design, file == null ? null : file.toAbsolutePath().normalize());
            if (file != null) {
                settings.addRecent(file);
            }
            offerRecovery(w, new RecoveryFolder(settings.recoveryFolder()));
        });
        try {
            closed.await();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return 0;
    }

    /**
     * Lays a window out on {@code design} in {@code theme} at {@code size}, waits until its
     * analysis is shown, paints it into an image and closes it. Needs a display (e.g. Xvfb).
     */
    public static BufferedImage snapshot(Design design, Path file, Theme theme, Dimension size,
                                         Function<Design, AnalysisResult> analysis) throws IOException {
        return snapshot(design, file, theme, size, analysis, null);
    }

    /** As above; with {@code disposed} set, the window is closed later on the event thread, which counts it down when done. */
    private static BufferedImage snapshot(Design design, Path file, Theme theme, Dimension size,
                                          Function<Design, AnalysisResult> analysis, CountDownLatch disposed) throws IOException {
        CountDownLatch shown = new CountDownLatch(1);
        WorkbenchWindow[] window = new WorkbenchWindow[1];
        onEdt(() -> {
            StartTrace.mark("event thread running");
            theme.install();
            StartTrace.mark("look and feel installed");
            WorkbenchWindow w = new WorkbenchWindow(new UserSettings(UserSettings.defaultFolder()), analysis,
                    WorkbenchWindow.Mode.SNAPSHOT);
            StartTrace.mark("window built");
            window[0] = w;
            w.workspace().addListener(new Workspace.Listener() {
                @Override
                public void resultShown(OpenDesign d) {
                    StartTrace.mark("result handed to the panes");
                    shown.countDown();
                }
            });
            w.show(size);
            StartTrace.mark("window shown");
            w.workspace().open(design, file == null ? null : file.toAbsolutePath().normalize());
            StartTrace.mark("design opened");
        });
        try {
            if (!shown.await(60, TimeUnit.SECONDS)) {
                throw new IOException("the analysis did not finish within 60 s; no snapshot written");
            }
            BufferedImage[] img = new BufferedImage[1];
            onEdt(() -> { }); // let the panes take the result
            onEdt(() -> window[0].frame().validate());
            onEdt(() -> { }); // wrapped text settles its height on the second layout pass
            onEdt(() -> {
                window[0].frame().invalidate();
                window[0].frame().validate();
                img[0] = Snapshot.capture(window[0].frame());
                StartTrace.mark("window painted into the snapshot");
            });
            return img[0];
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while waiting for the analysis", e);
        } finally {
            Runnable close = () -> {
                if (window[0] != null) {
                    window[0].dispose();
                }
            };
            if (disposed == null) {
                onEdt(close);
            } else {
                SwingUtilities.invokeLater(() -> {
                    try {
                        close.run();
                    } finally {
                        disposed.countDown();
                    }
                });
            }
        }
    }

    private static void offerRecovery(WorkbenchWindow w, RecoveryFolder recovery) {
        List<Path> left = recovery.leftovers();
        if (left.isEmpty()) {
            return;
        }
        Object[] options = {"Recover", "Discard", "Ask next time"};
        int a = JOptionPane.showOptionDialog(w.frame(), left.size() + " design(s) with unsaved edits were left by an earlier "
                        + "session that did not close cleanly. Recover them?", "Recover unsaved designs",
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.QUESTION_MESSAGE, null, options, options[0]);
        if (a == 0) {
            for (Path p : left) {
                try {
                    w.workspace().openRecovered(org.tankwright.design.DesignFiles.load(p));
                    deleteQuietly(p);
                } catch (IOException | org.tankwright.design.DesignException e) {
                    JOptionPane.showMessageDialog(w.frame(), p + " cannot be recovered: " + e.getMessage(),
                            "Recover unsaved designs", JOptionPane.ERROR_MESSAGE);
                }
            }
        } else if (a == 1) {
            left.forEach(Workbench::deleteQuietly);
        }
    }

    private static void deleteQuietly(Path p) {
        try {
            java.nio.file.Files.deleteIfExists(p);
        } catch (IOException e) {
            System.err.println("tankwright: could not remove " + p + ": " + e.getMessage());
        }
    }

    private static void onEdt(Runnable r) {
        if (SwingUtilities.isEventDispatchThread()) {
            r.run();
            return;
        }
        try {
            SwingUtilities.invokeAndWait(r);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (InvocationTargetException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException re) {
                throw re;
            }
            if (c instanceof Error er) {
                throw er;
            }
            throw new IllegalStateException(c);
        }
    }
}
