package org.tankwright.ui;

import java.time.Duration;
import java.time.Instant;

/**
 * Milestones of the window start, printed to the error stream with the time since the process
 * started and the CPU time the process has used so far when the system property {@code tankwright.trace.start} is set (for finding where the
 * start time goes; {@code TANKWRIGHT_JAVA_OPTS=-Dtankwright.trace.start ./tankwright open}).
 * Costs nothing when the property is not set. Touches no Swing class.
 */
public final class StartTrace {
    private static final boolean ON = System.getProperty("tankwright.trace.start") != null;
    private static final Instant STARTED = ON ? ProcessHandle.current().info().startInstant().orElse(Instant.now()) : null;

    private StartTrace() {
    }

    /** Prints {@code what} with the milestone's time, when tracing. */
    public static void mark(String what) {
        if (ON) {
            long ms = Duration.between(STARTED, Instant.now()).toMillis();
            long cpu = ProcessHandle.current().info().totalCpuDuration().map(Duration::toMillis).orElse(-1L);
            System.err.printf("start %6d ms  process CPU %6d ms  [%s] %s%n", ms, cpu, Thread.currentThread().getName(), what);
        }
    }
}
