package org.tankwright.ui;

import java.util.Objects;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Function;
import javax.swing.SwingUtilities;

/**
 * Runs a computation off the event thread, latest request wins: one worker thread; a request
 * that is superseded before it starts is skipped; one superseded while it runs is interrupted (an
 * analysis stops at its next stage) and its result, if it still comes, is dropped. Outcomes are
 * published on the event thread.
 *
 * @param <I> the input (an immutable document)
 * @param <O> the output (an immutable result)
 */
public final class LatestWins<I, O> implements AutoCloseable {

    /**
     * What one request came to: its input, output or failure, the time the computation took, and
     * whether it is the quick preview (the full result follows) or the final one.
     */
    public record Outcome<I, O>(I input, O output, Throwable failure, long nanos, boolean preview) {
        public boolean succeeded() {
            return failure == null;
        }
    }

    private final Function<I, O> preview;
    private final Function<I, O> computation;
    private final Consumer<Outcome<I, O>> publisher;
    private final Runnable onStart;
    private final ExecutorService worker;
    private final AtomicLong latest = new AtomicLong();
    private volatile Thread running;

    /**
     * @param computation the pure function to run (called on the worker thread)
     * @param onStart     run on the event thread when a request is accepted (e.g. show "computing")
     * @param publisher   receives each outcome that is still current, on the event thread
     */
    public LatestWins(Function<I, O> computation, Runnable onStart, Consumer<Outcome<I, O>> publisher) {
        this(null, computation, onStart, publisher);
    }

    /**
     * As {@link #LatestWins(Function, Runnable, Consumer)}, with a quick {@code preview} computed and
     * published first (when not null), so that an edit shows at once and the full result follows.
     */
    public LatestWins(Function<I, O> preview, Function<I, O> computation, Runnable onStart,
                      Consumer<Outcome<I, O>> publisher) {
        this.preview = preview;
        this.computation = Objects.requireNonNull(computation);
        this.onStart = Objects.requireNonNull(onStart);
        this.publisher = Objects.requireNonNull(publisher);
        this.worker = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "tankwright-recompute");
            t.setDaemon(true);
            t.setPriority(Thread.NORM_PRIORITY - 1);
            return t;
        });
    }

    /** Asks for {@code input} to be computed; supersedes every earlier request. Call on the event thread. */
    public void submit(I input) {
        long generation = latest.incrementAndGet();
        Thread t = running;
        if (t != null) {
            t.interrupt(); // the request in flight is superseded: an analysis stops at its next stage
        }
        onStart.run();
        worker.execute(() -> run(input, generation));
    }

    private boolean isCurrent(long generation) {
        return latest.get() == generation;
    }

    private void run(I input, long generation) {
        if (!isCurrent(generation)) {
            return; // superseded before it started
        }
        if (preview != null) {
            compute(preview, input, generation, true);
            awaitShown(PREVIEW_SHOWN_WAIT_MS);
            if (!isCurrent(generation)) {
                return; // superseded while the preview ran
            }
        }
        compute(computation, input, generation, false);
    }

    /**
     * Longest wait for the preview to be shown before the full computation starts. The full
     * computation uses every core (its sweeps run in parallel); started at once it would take the
     * processors from the event thread while that hands the preview to the panes and paints it.
     */
    static final long PREVIEW_SHOWN_WAIT_MS = 250;

    /** Waits (at most {@code ms}) until the event thread has handled what is queued now, and the paints that queues. */
    private static void awaitShown(long ms) {
        java.util.concurrent.CountDownLatch shown = new java.util.concurrent.CountDownLatch(1);
        SwingUtilities.invokeLater(() -> SwingUtilities.invokeLater(shown::countDown));
        try {
            shown.await(ms, java.util.concurrent.TimeUnit.MILLISECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private void compute(Function<I, O> f, I input, long generation, boolean isPreview) {
        long t0 = System.nanoTime();
        O output = null;
        Throwable failure = null;
        Thread.interrupted(); // start clean: an earlier cancel is not for this request
        running = Thread.currentThread();
        try {
            output = f.apply(input);
        } catch (RuntimeException | StackOverflowError e) {
            failure = e;
        } finally {
            running = null;
            Thread.interrupted(); // a cancel aimed at this request must not reach the next one
        }
        Outcome<I, O> outcome = new Outcome<>(input, output, failure, System.nanoTime() - t0, isPreview);
        SwingUtilities.invokeLater(() -> {
            if (isCurrent(generation)) {
                publisher.accept(outcome);
            }
        });
    }

    /**
     * Drops the request in flight: its result will not be published, and the worker thread is
     * interrupted so that a computation that checks for interruption can stop early.
     */
    public void cancel() {
        latest.incrementAndGet();
        Thread t = running;
        if (t != null) {
            t.interrupt();
        }
    }

    @Override
    public void close() {
        worker.shutdownNow();
    }
}
