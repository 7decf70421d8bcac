package org.tankwright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.OperatingSystemMXBean;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Locale;

/**
 * The machine a benchmark ran on, as the JVM sees it.
 *
 * @param cores         processors available to the JVM
 * @param memoryBytes   physical memory, or −1 when unknown
 * @param maxHeapBytes  the JVM's maximum heap
 * @param java          Java version and vendor
 * @param vm            the virtual machine's name
 * @param os            operating system, version and architecture
 * @param loadAverage   one-minute system load average, or negative when unknown
 * @param time          when the description was taken
 */
public record Machine(int cores, long memoryBytes, long maxHeapBytes, String java, String vm, String os, double loadAverage,
                      Instant time) {

    /** The machine now. */
    public static Machine describe() {
        OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        long mem = os instanceof com.sun.management.OperatingSystemMXBean sun ? sun.getTotalMemorySize() : -1;
        return new Machine(Runtime.getRuntime().availableProcessors(), mem, Runtime.getRuntime().maxMemory(),
                System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")",
                System.getProperty("java.vm.name"),
                System.getProperty("os.name") + " " + System.getProperty("os.version") + " " + System.getProperty("os.arch"),
                os.getSystemLoadAverage(), Instant.now().truncatedTo(ChronoUnit.SECONDS));
    }

    /** The description as a Markdown list. */
    public String markdown() {
        StringBuilder sb = new StringBuilder();
        sb.append("- when: ").append(time).append('\n');
        sb.append("- processors available to the JVM: ").append(cores).append('\n');
        sb.append("- memory: ").append(memoryBytes > 0 ? gib(memoryBytes) : "unknown").append(", maximum Java heap ").append(gib(maxHeapBytes)).append('\n');
        sb.append("- Java: ").append(java).append(", ").append(vm).append('\n');
        sb.append("- system: ").append(os).append('\n');
        sb.append("- load average (1 min) when the run started: ")
                .append(loadAverage >= 0 ? String.format(Locale.ROOT, "%.2f", loadAverage) : "unknown");
        if (loadAverage > cores) {
            sb.append(" — more runnable work than processors: the machine was shared and loaded, so wall times are "
                    + "longer and noisier than on an idle machine");
        } else if (loadAverage >= 1) {
            sb.append(" — other work was running: the machine was shared, so wall times are noisier than on an idle machine");
        }
        sb.append('\n');
        return sb.toString();
    }

    private static String gib(long bytes) {
        return String.format(Locale.ROOT, "%.1f GiB", bytes / (1024.0 * 1024 * 1024));
    }
}
