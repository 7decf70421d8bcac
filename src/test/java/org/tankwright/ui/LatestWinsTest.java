package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javax.swing.SwingUtilities;
import org.junit.jupiter.api.Test;

class LatestWinsTest {

    @Test
    void requestsSupersededWhileOneRunsAreSkippedAndOnlyTheLatestIsPublished() throws Exception {
        CountDownLatch firstStarted = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch published = new CountDownLatch(1);
        List<Integer> computed = new CopyOnWriteArrayList<>();
        List<Integer> shown = new CopyOnWriteArrayList<>();
        List<Boolean> onEdt = new CopyOnWriteArrayList<>();
        try (LatestWins<Integer, Integer> lw = new LatestWins<>(i -> {
            computed.add(i);
            if (i == 1) {
                firstStarted.countDown();
                await(release);
            }
            return i * i;
        }, () -> { }, o -> {
            shown.add(o.output());
            onEdt.add(SwingUtilities.isEventDispatchThread());
            if (o.input() == 10) {
                published.countDown();
            }
        })) {
            SwingUtilities.invokeAndWait(() -> lw.submit(1));
            assertTrue(firstStarted.await(5, TimeUnit.SECONDS));
            SwingUtilities.invokeAndWait(() -> {
                for (int i = 2; i <= 10; i++) {
                    lw.submit(i);
                }
            });
            release.countDown();
            assertTrue(published.await(5, TimeUnit.SECONDS));
            SwingUtilities.invokeAndWait(() -> { }); // flush
            assertEquals(List.of(1, 10), computed, "requests 2..9 were superseded before they started");
            assertEquals(List.of(100), shown, "the result of request 1 was stale when it finished");
            assertEquals(List.of(true), onEdt);
        }
    }

    @Test
    void aPreviewIsPublishedBeforeTheFullResult() throws Exception {
        CountDownLatch done = new CountDownLatch(1);
        List<Integer> shown = new CopyOnWriteArrayList<>();
        try (LatestWins<Integer, Integer> lw = new LatestWins<>(i -> -i, i -> i * i, () -> { }, o -> {
            shown.add(o.output());
            if (o.output() > 0) {
                done.countDown();
            }
        })) {
            SwingUtilities.invokeAndWait(() -> lw.submit(7));
            assertTrue(done.await(5, TimeUnit.SECONDS));
            SwingUtilities.invokeAndWait(() -> { }); // flush
            assertEquals(List.of(-7, 49), shown, "the quick preview first, then the full result");
        }
    }

    @Test
    void aFailureIsPublishedAsAnOutcome() throws Exception {
        CountDownLatch done = new CountDownLatch(1);
        Throwable[] seen = new Throwable[1];
        try (LatestWins<String, Integer> lw = new LatestWins<>(s -> {
            throw new IllegalArgumentException("bad " + s);
        }, () -> { }, o -> {
            seen[0] = o.failure();
            done.countDown();
        })) {
            SwingUtilities.invokeAndWait(() -> lw.submit("x"));
            assertTrue(done.await(5, TimeUnit.SECONDS));
            assertEquals("bad x", seen[0].getMessage());
        }
    }

    @Test
    void cancelDropsTheResultInFlightAndInterruptsTheComputation() throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch interrupted = new CountDownLatch(1);
        List<Integer> shown = new CopyOnWriteArrayList<>();
        try (LatestWins<Integer, Integer> lw = new LatestWins<>(i -> {
            started.countDown();
            try {
                Thread.sleep(10_000);
            } catch (InterruptedException e) {
                interrupted.countDown();
            }
            return i;
        }, () -> { }, o -> shown.add(o.output()))) {
            SwingUtilities.invokeAndWait(() -> lw.submit(1));
            assertTrue(started.await(5, TimeUnit.SECONDS));
            SwingUtilities.invokeAndWait(lw::cancel);
            assertTrue(interrupted.await(5, TimeUnit.SECONDS), "a computation that listens for interruption stops");
            Thread.sleep(100);
            SwingUtilities.invokeAndWait(() -> { });
            assertEquals(List.of(), shown, "the cancelled result is not published");
        }
    }

    /**
     * Waits for the latch like a computation that never looks at its interrupt flag: an interrupt
     * (from a newer request) does not end the wait; the flag is set again afterwards.
     */
    private static void await(CountDownLatch l) {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
        boolean interrupted = false;
        while (l.getCount() > 0 && System.nanoTime() < end) {
            try {
                l.await(end - System.nanoTime(), TimeUnit.NANOSECONDS);
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }

    @Test
    void aNewRequestInterruptsTheOneItSupersedes() throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch interrupted = new CountDownLatch(1);
        CountDownLatch published = new CountDownLatch(1);
        List<Integer> shown = new CopyOnWriteArrayList<>();
        try (LatestWins<Integer, Integer> lw = new LatestWins<>(i -> {
            if (i == 1) {
                started.countDown();
                try {
                    Thread.sleep(10_000);
                } catch (InterruptedException e) {
                    interrupted.countDown();
                    throw new java.util.concurrent.CancellationException("superseded");
                }
            }
            return i;
        }, () -> { }, o -> {
            shown.add(o.output());
            published.countDown();
        })) {
            SwingUtilities.invokeAndWait(() -> lw.submit(1));
            assertTrue(started.await(5, TimeUnit.SECONDS));
            SwingUtilities.invokeAndWait(() -> lw.submit(2));
            assertTrue(interrupted.await(5, TimeUnit.SECONDS), "the superseded computation was interrupted");
            assertTrue(published.await(5, TimeUnit.SECONDS));
            SwingUtilities.invokeAndWait(() -> { }); // flush
            assertEquals(List.of(2), shown, "only the latest request's result is shown, not the interrupted one's failure");
        }
    }
}
