package org.tankwright.bench;

import java.lang.management.ManagementFactory;
import java.util.Arrays;
import java.util.function.DoubleSupplier;

/**
 * Timing after warm-up: the median elapsed (wall) time of one run, and the mean CPU time of the
 * whole process per run over all timed runs (all threads, so parallel stages count in full; the
 * operating system counts process CPU time in coarse ticks, hence a mean over the whole timed
 * phase rather than a median of single runs). Fast work runs {@code batch} times per sample and
 * the sample is divided by the batch.
 *
 * @param wallMillis median elapsed time of one run, ms
 * @param cpuMillis  mean process CPU time of one run, ms (NaN when the JVM cannot measure it)
 * @param runs       number of timed runs
 * @param warmups    number of untimed runs before them
 */
public record Timing(double wallMillis, double cpuMillis, int runs, int warmups) {
    private static volatile double sink;

    /** Runs {@code work} {@code warmups} times untimed, then {@code runs} times timed; the result feeds a sink so the JIT keeps it. */
    public static Timing measure(int warmups, int runs, DoubleSupplier work) {
        return measure(warmups, runs, 1, work);
    }

    /** As {@link #measure(int, int, DoubleSupplier)}, each timed sample running the work {@code batch} times. */
    public static Timing measure(int warmups, int runs, int batch, DoubleSupplier work) {
        if (runs < 1 || warmups < 0 || batch < 1) {
            throw new IllegalArgumentException("runs and batch must be ≥ 1 and warm-ups ≥ 0, got "
                    + runs + ", " + batch + " and " + warmups);
        }
        for (int i = 0; i < warmups; i++) {
            sink += work.getAsDouble();
        }
        double[] wall = new double[runs];
        long c0 = processCpuNanos();
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            for (int b = 0; b < batch; b++) {
                sink += work.getAsDouble();
            }
            wall[i] = (System.nanoTime() - t0) / 1e6 / batch;
        }
        long c1 = processCpuNanos();
        double cpu = c0 < 0 || c1 < 0 ? Double.NaN : (c1 - c0) / 1e6 / ((double) runs * batch);
        return new Timing(median(wall), cpu, runs, warmups);
    }

    /** CPU time of the whole process in ns, or −1 when the platform does not report it. */
    static long processCpuNanos() {
        if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
            return os.getProcessCpuTime();
        }
        return -1;
    }

    /** The median of the values (the mean of the middle two for an even count); the array is sorted in place. */
    public static double median(double[] v) {
        Arrays.sort(v);
        int n = v.length;
        return n % 2 == 1 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
    }
}
