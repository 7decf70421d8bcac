package org.tankwright.cli;

import org.tankwright.bench.BenchRun;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code tankwright bench}: measures the program's speed and writes the performance report (Markdown). */
@Command(name = "bench", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = "Measure how fast the program is, with warm-up and medians: full and operating-point solve of each "
                + "preset, a 2,000-point frequency sweep, the mutual inductance of two 20-turn coils against direct "
                + "Neumann integration, a 10,000-sample tolerance study, capacitor bank search against brute force, and "
                + "the window start (in a child JVM) and the time from an edit to its result in the window (both when a display "
                + "exists). Prints Markdown, or writes it with --out. "
                + "Takes a few minutes; --quick takes seconds.")
public final class BenchCommand implements Callable<Integer> {
    @Option(names = "--out", paramLabel = "FILE", description = "write the report to FILE (e.g. docs/performance.md) instead of printing it")
    Path out;

    @Option(names = "--quick", description = "fewer repetitions: a fast smoke run with rougher numbers")
    boolean quick;

    @Option(names = "--only", paramLabel = "ITEMS", split = ",",
            description = "run only these items, comma-separated: solve, sweep, coupling, tolerance, banks, window, edit (default: all)")
    List<String> only;

    @Override
    public Integer call() throws IOException {
        BenchRun run;
        try {
            run = new BenchRun(quick, BenchRun.items(only == null ? List.of() : only), line -> System.err.println("bench: " + line))
                    .withWindowEdits(BenchCommand::windowEdits);
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--only: " + e.getMessage());
        }
        String md = run.run();
        if (out == null) {
            System.out.print(md);
        } else {
            BenchRun.write(out, md);
            System.out.println("wrote " + out);
        }
        return ExitCodes.OK;
    }

    /** The edit item's window, in this JVM (the bench package knows no window). */
    private static List<BenchRun.EditTimes> windowEdits(List<String> presets, int warmups, int runs) throws Exception {
        if (java.awt.GraphicsEnvironment.isHeadless()) {
            throw new IllegalStateException("there is no display (DISPLAY is not set)");
        }
        return org.tankwright.ui.EditLatency.measure(presets, warmups, runs).stream()
                .map(t -> new BenchRun.EditTimes(t.preset(), t.edit(), t.operatingMs(), t.fullMs(), t.warmups())).toList();
    }
}
