package org.tankwright.bench;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Times the window start in a child JVM: {@code tankwright open --snapshot} on the demo design
 * under the current display, from launch to the snapshot of the solved window written and the
 * JVM gone. The child is started through the launcher script when this JVM was (the launcher
 * passes its own path as {@code tankwright.launcher}), so it runs with exactly the options and
 * start-up archive a user gets; otherwise with this JVM's class path, and the report says so.
 * No window code runs in this JVM.
 */
public final class WindowStart {
    private static final long TIMEOUT_S = 120;

    /**
     * @param median  median seconds, when measured
     * @param min     fastest launch, s
     * @param max     slowest launch, s
     * @param runs    launches timed
     * @param display the display used
     * @param jvmOnly median seconds of a child JVM that only prints the version (the start-up floor), when measured
     * @param how     how the child was started (through the launcher, or a plain class path)
     * @param skipped why it was not measured, or null
     */
    public record Outcome(double median, double min, double max, int runs, String display, double jvmOnly, String how,
                          String skipped) {
        static Outcome skip(String reason) {
            return new Outcome(Double.NaN, Double.NaN, Double.NaN, 0, null, Double.NaN, null, reason);
        }
    }

    /** The system property by which the launcher script gives its own path. */
    public static final String LAUNCHER_PROPERTY = "tankwright.launcher";

    private WindowStart() {
    }

    /** Launches the child {@code runs} times (or says why not). */
    public static Outcome measure(int runs) {
        String display = System.getenv("DISPLAY");
        if (display == null || display.isBlank()) {
            return Outcome.skip("there is no display (DISPLAY is not set). Run the bench under one, e.g. "
                    + "`xvfb-run -a ./tankwright bench`, to measure the window start.");
        }
        List<String> base;
        String how;
        String launcher = System.getProperty(LAUNCHER_PROPERTY);
        if (launcher != null && Files.isExecutable(Path.of(launcher))) {
            base = List.of(launcher);
            how = "through the launcher `tankwright`, exactly as a user starts it (with its start-up class-data archive)";
        } else {
            Path java = Path.of(System.getProperty("java.home"), "bin", "java");
            String cp = System.getProperty("java.class.path");
            if (!Files.isExecutable(java) || cp == null || cp.isBlank()) {
                return Outcome.skip("the running Java (" + java + ") or its class path cannot be reused to start a child JVM.");
            }
            base = List.of(java.toString(), "-cp", cp, "org.tankwright.cli.Main");
            how = "as `java -cp CLASSPATH org.tankwright.cli.Main`, not through the launcher (this bench was not started by it), "
                    + "so without the start-up archive: slower than what users get";
        }
        double[] t = new double[runs];
        double[] bare = new double[runs];
        try {
            Path dir = Files.createTempDirectory("tankwright-bench");
            for (int i = -1; i < runs; i++) { // launch −1 is not timed: it warms the disk cache (and lets the launcher make its archive)
                Path png = dir.resolve("window-" + (i + 1) + ".png");
                Path log = dir.resolve("child-" + (i + 1) + ".log");
                double s = launch(concat(base, "open", "--snapshot", png.toString(), "--theme", "light"), log);
                if (s < 0 || !Files.isRegularFile(png)) {
                    String text = Files.readString(log).strip();
                    return Outcome.skip("the child JVM failed or timed out after " + TIMEOUT_S + " s: "
                            + (text.length() > 300 ? text.substring(0, 300) + "…" : text));
                }
                if (i >= 0) {
                    t[i] = s;
                    bare[i] = launch(concat(base, "--version"), log);
                }
            }
            deleteAll(dir.toFile());
        } catch (IOException e) {
            return Outcome.skip("the child JVM could not be started: " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Outcome.skip("interrupted.");
        }
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (double v : t) {
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        return new Outcome(Timing.median(t), min, max, runs, display, Timing.median(bare), how, null);
    }

    private static List<String> concat(List<String> base, String... more) {
        List<String> out = new ArrayList<>(base);
        out.addAll(List.of(more));
        return out;
    }

    /** Runs a child process to its end; its elapsed seconds, or −1 when it failed or timed out. */
    private static double launch(List<String> cmd, Path log) throws IOException, InterruptedException {
        ProcessBuilder pb = new ProcessBuilder(new ArrayList<>(cmd)).redirectErrorStream(true)
                .redirectOutput(ProcessBuilder.Redirect.to(log.toFile()));
        long t0 = System.nanoTime();
        Process p = pb.start();
        if (!p.waitFor(TIMEOUT_S, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            return -1;
        }
        double s = (System.nanoTime() - t0) / 1e9;
        return p.exitValue() == 0 ? s : -1;
    }

    private static void deleteAll(File f) {
        File[] children = f.listFiles();
        if (children != null) {
            for (File c : children) {
                deleteAll(c);
            }
        }
        f.delete();
    }
}
