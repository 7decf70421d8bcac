package org.tankwright.ui;

import java.nio.file.Path;
import java.util.Objects;
import java.util.concurrent.Callable;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Function;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Design;

/**
 * The window's head start: the design is read and solved on a worker thread that starts at the
 * very top of {@code main}, before any window class loads, so that the first analysis (run by the
 * not yet compiled engine) overlaps the building of the window. The window takes the result when
 * it asks for the same design (the same object); any other design, a second request, or a head
 * start that failed is computed as usual, so a failure here only costs the time it took (the
 * ordinary path then reports it). Touches no Swing class.
 */
public final class HeadStart {
    private final Path file;
    private final CompletableFuture<Design> design = new CompletableFuture<>();
    private final CompletableFuture<AnalysisResult> preview;
    private final CompletableFuture<AnalysisResult> full = new CompletableFuture<>();
    private final AtomicBoolean previewTaken = new AtomicBoolean();
    private final AtomicBoolean fullTaken = new AtomicBoolean();

    private HeadStart(Path file, boolean withPreview) {
        this.file = file;
        this.preview = withPreview ? new CompletableFuture<>() : null;
    }

    /**
     * Starts reading {@code file} (null: the demo) with {@code loader} and solving it: first its
     * operating point when {@code withPreview} (what the interactive window shows first), then the
     * full analysis.
     */
    public static HeadStart begin(Path file, Callable<Design> loader, boolean withPreview) {
        Objects.requireNonNull(loader);
        HeadStart h = new HeadStart(file, withPreview);
        Thread t = new Thread(() -> h.work(loader), "tankwright-head-start");
        t.setDaemon(true);
        t.start();
        return h;
    }

    private void work(Callable<Design> loader) {
        Design d;
        try {
            d = loader.call();
            design.complete(d);
            StartTrace.mark("design read");
        } catch (Exception | Error e) {
            design.completeExceptionally(e);
            if (preview != null) {
                preview.completeExceptionally(e);
            }
            full.completeExceptionally(e);
            return;
        }
        if (preview != null) {
            solve(preview, d, Analysis.Scope.OPERATING_POINT);
        }
        solve(full, d, Analysis.Scope.FULL);
    }

    private static void solve(CompletableFuture<AnalysisResult> into, Design d, Analysis.Scope scope) {
        try {
            into.complete(Analysis.run(d, scope));
            StartTrace.mark("head start solved (" + scope + ")");
        } catch (RuntimeException | Error e) {
            into.completeExceptionally(e);
        }
    }

    /**
     * The design read for {@code f} (the same file, or both null for the demo), waiting for the
     * read; null when the head start was for another file or could not read it (then read it the
     * ordinary way, which reports the problem).
     */
    public Design design(Path f) {
        if (!Objects.equals(file, f)) {
            return null;
        }
        return take(design);
    }

    /** {@code analysis} at {@code scope}, answered from the head start for its own design, once. */
    public Function<Design, AnalysisResult> serve(Analysis.Scope scope, Function<Design, AnalysisResult> analysis) {
        Objects.requireNonNull(analysis);
        CompletableFuture<AnalysisResult> source = scope == Analysis.Scope.FULL ? full : preview;
        AtomicBoolean taken = scope == Analysis.Scope.FULL ? fullTaken : previewTaken;
        return d -> {
            if (source != null && design.isDone() && !design.isCompletedExceptionally()
                    && design.getNow(null) == d && taken.compareAndSet(false, true)) {
                AnalysisResult r = take(source);
                if (r != null) {
                    return r;
                }
                if (Thread.currentThread().isInterrupted()) {
                    throw new java.util.concurrent.CancellationException("stopped while the head start was solving");
                }
            }
            return analysis.apply(d);
        };
    }

    /** The value, or null when it failed; keeps an interruption for the caller to see. */
    private static <T> T take(CompletableFuture<T> f) {
        try {
            return f.get();
        } catch (ExecutionException e) {
            return null;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return null;
        }
    }
}
