package org.tankwright.bench;

import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Presets;
import org.tankwright.analysis.ToleranceRun;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Load;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Sweeps;
import org.tankwright.circuit.Topology;
import org.tankwright.design.Coil;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.CoilShape;
import org.tankwright.tolerance.CancelToken;
import org.tankwright.tolerance.StudyResult;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.Tuner;
import org.tankwright.tuning.TuningResult;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Consumer;

/**
 * Runs the benchmarks and writes them as a Markdown report: the machine, then one section per
 * item. Targets are stated beside the measurements, never asserted.
 */
public final class BenchRun {
    /** The items of the report, in order. */
    public enum Item {
        SOLVE("solve"), SWEEP("sweep"), COUPLING("coupling"), TOLERANCE("tolerance"), BANKS("banks"), WINDOW("window"),
        EDIT("edit");

        private final String key;

        Item(String key) {
            this.key = key;
        }

        /** The name on the command line. */
        public String key() {
            return key;
        }

        /** The item of a command-line name. */
        public static Item of(String key) {
            for (Item i : values()) {
                if (i.key.equalsIgnoreCase(key.strip())) {
                    return i;
                }
            }
            throw new IllegalArgumentException("unknown bench item '" + key + "'; allowed: solve, sweep, coupling, tolerance, banks, window, edit");
        }
    }

    static final double OPERATING_POINT_TARGET_MS = 5;
    static final double ENVELOPE_TARGET_MS = 1000;
    static final double WINDOW_TARGET_S = 2.5;
    static final double EDIT_OPERATING_TARGET_MS = 50;
    static final double EDIT_FULL_TARGET_MS = 1000;
    /** The presets the edit item opens. */
    static final List<String> EDIT_PRESETS = List.of(Presets.DEMO, "warehouse-robot-pad");

    /**
     * Times geometry edits in a workbench window in this JVM (the window face provides it: this
     * package knows no window).
     */
    public interface WindowEdits {
        /**
         * Opens each preset in a window and times {@code runs} edits after {@code warmups}; throws
         * {@link IllegalStateException} with the reason when it cannot (no display).
         */
        List<EditTimes> measure(List<String> presets, int warmups, int runs) throws Exception;
    }

    /**
     * One preset's edit times.
     *
     * @param preset      the preset
     * @param edit        the edit made, in words
     * @param operatingMs per timed edit: edit to its operating point painted in every pane, ms
     * @param fullMs      per timed edit: edit to its full result (sweeps, envelope) painted, ms
     * @param warmups     untimed edits before
     */
    public record EditTimes(String preset, String edit, double[] operatingMs, double[] fullMs, int warmups) {
    }

    private WindowEdits windowEdits;
    static final int SWEEP_POINTS = 2000;
    static final int TOLERANCE_SAMPLES = 10_000;

    private final boolean quick;
    private final Set<Item> items;
    private final Consumer<String> progress;

    /**
     * @param quick    fewer repetitions (for a smoke run; the numbers are then rougher)
     * @param items    the items to run (empty: all)
     * @param progress receives one line as each item starts (e.g. to stderr)
     */
    public BenchRun(boolean quick, Set<Item> items, Consumer<String> progress) {
        this.quick = quick;
        this.items = items.isEmpty() ? EnumSet.allOf(Item.class) : EnumSet.copyOf(items);
        this.progress = progress;
    }

    /** Sets how the edit item opens a window (without it, the item says it was skipped). */
    public BenchRun withWindowEdits(WindowEdits w) {
        this.windowEdits = w;
        return this;
    }

    /** Runs the chosen items and returns the report. */
    public String run() {
        StringBuilder md = new StringBuilder();
        md.append("# Performance\n\n");
        md.append("Produced by `./tankwright bench --out docs/performance.md`").append(quick ? " (here with `--quick`: fewer repetitions, rougher numbers)" : "")
                .append(". Every time is a median over repeated runs after untimed warm-up runs (so the JIT has compiled the code), "
                        + "given as the median elapsed (wall) time of one run and as the mean CPU time of the whole process per run over "
                        + "the timed runs (all threads: parallel stages count in full, and JIT or garbage collection running at "
                        + "the time is included; the system counts it in 10 ms ticks, so short items need many runs). "
                        + "Targets are stated beside the numbers; no test asserts a time.\n\n");
        md.append("## Machine\n\n").append(Machine.describe().markdown()).append('\n');
        if (items.contains(Item.SOLVE)) {
            solve(md);
        }
        if (items.contains(Item.SWEEP)) {
            sweep(md);
        }
        if (items.contains(Item.COUPLING)) {
            coupling(md);
        }
        if (items.contains(Item.TOLERANCE)) {
            tolerance(md);
        }
        if (items.contains(Item.BANKS)) {
            banks(md);
        }
        if (items.contains(Item.WINDOW)) {
            window(md);
        }
        if (items.contains(Item.EDIT)) {
            edit(md);
        }
        double end = java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
        md.append("## Load during the run\n\n");
        md.append("Load average (1 min) when the run ended: ").append(end >= 0 ? String.format(Locale.ROOT, "%.2f", end) : "unknown")
                .append(" on ").append(Runtime.getRuntime().availableProcessors()).append(" processors. ")
                .append("Other programs running at the same time lengthen the wall times; compare medians from runs at a similar load.\n");
        return md.toString();
    }

    private void solve(StringBuilder md) {
        progress.accept("solving each preset (full and operating point)");
        md.append("## Solving the presets\n\n");
        md.append("`Analysis.run(design, Scope.FULL)` (coils, coupling over the envelope, tuning, sweeps, banks, stresses, checks) "
                + "and `Scope.OPERATING_POINT` (coils, coupling at the nominal place, tuning, stresses, checks: what an edit "
                + "recomputes first). The analysis keeps its last few coil models and compiled coil pairs (with the image series "
                + "they have summed), so the operating point is measured twice: the same design again (what an edit of the "
                + "capacitors, source or load costs) and after a geometry edit (each run's primary scaled by 1 + n·10⁻⁹, so "
                + "nothing is reused; a measured coil has no geometry to edit); the full solve too. Targets: operating point "
                + "of any preset under " + fmt(OPERATING_POINT_TARGET_MS) + " ms median after warm-up, the whole envelope "
                + "(the full solve) within " + fmt(ENVELOPE_TARGET_MS / 1000) + " s after a geometry edit.\n\n");
        md.append("| preset | full: wall | full: CPU | full after a geometry edit: wall | full after a geometry edit: CPU "
                + "| operating point: wall | operating point: CPU | operating point after a geometry edit: wall "
                + "| operating point after a geometry edit: CPU | targets met (wall medians) |\n");
        md.append("|---|---:|---:|---:|---:|---:|---:|---:|---:|---|\n");
        for (String name : Presets.names()) {
            Design d;
            try {
                d = Presets.load(name);
            } catch (Exception e) {
                md.append("| ").append(name).append(" | not loaded: ").append(e.getMessage()).append(" | | | | | | | | |\n");
                continue;
            }
            Design[] edits = new Design[EDITED_DESIGNS];
            for (int i = 0; i < edits.length; i++) {
                edits[i] = geometryEdit(d, i + 1);
            }
            int[] next = {0};
            Timing full = Timing.measure(quick ? 1 : 5, quick ? 1 : 9, () -> Analysis.run(d, Analysis.Scope.FULL).computeNanos());
            Timing fullEdited = Timing.measure(quick ? 1 : 5, quick ? 1 : 9,
                    () -> Analysis.run(edits[next[0]++ % edits.length], Analysis.Scope.FULL).computeNanos());
            Timing op = Timing.measure(quick ? 3 : 100, quick ? 3 : 31, quick ? 1 : 5,
                    () -> Analysis.run(d, Analysis.Scope.OPERATING_POINT).computeNanos());
            Timing edited = Timing.measure(quick ? 3 : 100, quick ? 3 : 31, quick ? 1 : 5,
                    () -> Analysis.run(edits[next[0]++ % edits.length], Analysis.Scope.OPERATING_POINT).computeNanos());
            boolean met = op.wallMillis() < OPERATING_POINT_TARGET_MS && edited.wallMillis() < OPERATING_POINT_TARGET_MS
                    && fullEdited.wallMillis() < ENVELOPE_TARGET_MS;
            md.append("| ").append(name);
            for (Timing t : new Timing[] {full, fullEdited, op, edited}) {
                md.append(" | ").append(ms(t.wallMillis())).append(" | ").append(ms(t.cpuMillis()));
            }
            md.append(" | ").append(met ? "yes" : "no").append(" |\n");
        }
        md.append("\nWall: ").append(runs(quick ? 1 : 9, quick ? 1 : 5)).append(" for each full column; ")
                .append(runs(quick ? 3 : 31, quick ? 3 : 100)).append(quick ? "" : ", 5 solves per sample,")
                .append(" for each operating-point column.\n\n");
    }

    /** More edited designs than one measurement runs, so that no run finds its geometry cached. */
    private static final int EDITED_DESIGNS = 400;

    /**
     * The design with its primary coil's dimensions scaled by 1 + n·10⁻⁹: a geometry edit that changes no
     * amount of work (the same turns and shape) but leaves nothing the analysis could reuse. A measured
     * coil has no dimensions and is returned as it is.
     */
    static Design geometryEdit(Design d, int n) {
        Coil c = d.primary();
        if (c == null || c.shape() == CoilShape.MEASURED) {
            return d;
        }
        double s = 1 + n * 1e-9;
        Coil e = new Coil(c.label(), c.shape(), c.turns(), scaled(c.diameter(), s), scaled(c.innerDiameter(), s),
                scaled(c.width(), s), scaled(c.height(), s), scaled(c.innerWidth(), s), scaled(c.innerHeight(), s),
                scaled(c.length(), s), scaled(c.pitch(), s), c.layers(), c.wire(), c.temperature(), c.backing(),
                c.inductance(), c.resistance());
        return new Design(d.name(), d.description(), d.kind(), d.frequency(), e, d.secondary(), d.placement(),
                d.compensation(), d.source(), d.load(), d.workpiece(), d.capacitors(), d.envelope(), d.tolerances(), d.safety());
    }

    private static Double scaled(Double v, double s) {
        return v == null ? null : v * s;
    }

    private void sweep(StringBuilder md) {
        progress.accept("frequency sweep");
        AnalysisResult base = Analysis.run(Presets.demo(), Analysis.Scope.OPERATING_POINT);
        double f = base.network().frequency();
        LinkValues v = new LinkValues(base.coupling().l1(), base.coupling().l2(), base.coupling().mutual(),
                base.coils().get(0).resistanceAc(), base.coils().get(1).resistanceAc());
        double rl = base.network().loadAc() > 0 && Double.isFinite(base.network().loadAc()) ? base.network().loadAc() : 10;
        TuningResult tuned = Tuner.tune(LinkDesign.of(Topology.SS, v, f, Source.sine(20), new Load.Resistor(rl)), false);
        PhasorSolver solver = tuned.newSolver();
        Timing t = Timing.measure(quick ? 5 : 100, quick ? 3 : 31, quick ? 1 : 10,
                () -> Sweeps.frequency(solver, f / 2, 2 * f, SWEEP_POINTS, true).x()[SWEEP_POINTS - 1]);
        md.append("## Frequency sweep\n\n");
        md.append("A ").append(String.format(Locale.ROOT, "%,d", SWEEP_POINTS)).append("-point logarithmic sweep from f/2 to 2f of the demo's coils "
                + "(its L1, L2, M and AC resistances at ").append(fmt(f / 1e3)).append(" kHz) as an SS link into a ")
                .append(fmt(rl)).append(" Ω resistor: input impedance, powers, efficiency, every current and capacitor voltage at each point.\n\n");
        md.append("| item | wall | CPU |\n|---|---:|---:|\n");
        md.append("| 2,000-point sweep | ").append(ms(t.wallMillis())).append(" | ").append(ms(t.cpuMillis())).append(" |\n");
        md.append("| per point | ").append(us(t.wallMillis() * 1e3 / SWEEP_POINTS)).append(" | ").append(us(t.cpuMillis() * 1e3 / SWEEP_POINTS)).append(" |\n\n");
        md.append("Wall: ").append(runs(t.runs(), t.warmups())).append(".\n\n");
    }

    private void coupling(StringBuilder md) {
        progress.accept("mutual inductance against direct Neumann integration");
        CouplingComparison c = CouplingComparison.run(quick);
        md.append("## Mutual inductance of two 20-turn coils with offset\n\n");
        md.append("Two equal flat spirals of 20 round turns (inner radius 50 mm, pitch 4 mm, wire radius 0.8 mm), 21.6 mm apart "
                + "centre to centre and 60 mm offset sideways. The coupling kernels (closed-form ring-pair kernels, summed) "
                + "against Neumann's double integral evaluated directly over every pair of turns, with the smallest uniform "
                + "node count that reaches the same accuracy (").append(sci(CouplingComparison.ACCURACY))
                .append(" relative to a tight-tolerance value of the kernels, which a ").append(quick ? "256" : "1024")
                .append("-node direct integration confirms to ").append(sci(c.referenceCheck())).append(").\n\n");
        md.append("| method | M | relative error | wall | CPU |\n|---|---:|---:|---:|---:|\n");
        md.append("| coupling kernels | ").append(String.format(Locale.ROOT, "%.6g µH", c.mutual() * 1e6)).append(" | ")
                .append(sci(c.kernelError())).append(" | ").append(ms(c.kernel().wallMillis())).append(" | ").append(ms(c.kernel().cpuMillis())).append(" |\n");
        md.append("| pipeline route (`CoupledCoils.at`: spectral form for round coils, also gives L_a, L_b, k) | ")
                .append(String.format(Locale.ROOT, "%.6g µH", c.linkMutual() * 1e6)).append(" | ").append(sci(c.linkError()))
                .append(" | ").append(ms(c.link().wallMillis())).append(" | ").append(ms(c.link().cpuMillis())).append(" |\n");
        md.append("| direct Neumann, ").append(c.neumannNodes()).append(" × ").append(c.neumannNodes()).append(" nodes per pair of turns | | ")
                .append(sci(c.neumannError())).append(" | ").append(ms(c.neumann().wallMillis())).append(" | ").append(ms(c.neumann().cpuMillis())).append(" |\n\n");
        md.append("Ratio at equal accuracy: the kernels are **").append(String.format(Locale.ROOT, "%.0f×", c.speedUp()))
                .append("** faster (median wall times; ").append(String.format(Locale.ROOT, "%.0f×", c.cpuRatio()))
                .append(" in mean CPU time). Wall: ").append(runs(c.kernel().runs(), c.kernel().warmups())).append(" for the kernels, ")
                .append(runs(c.neumann().runs(), c.neumann().warmups())).append(" for the direct integration. ")
                .append("The pipeline's route is **").append(String.format(Locale.ROOT, "%.0f×", c.linkSpeedUp()))
                .append("** faster than the direct integration (target ≥ 100× at 1e-6).\n\n");
    }

    private void tolerance(StringBuilder md) {
        progress.accept("tolerance study");
        AnalysisResult base = Analysis.run(Presets.demo(), Analysis.Scope.OPERATING_POINT);
        StudyResult[] last = new StudyResult[1];
        Timing t = Timing.measure(quick ? 1 : 3, quick ? 1 : 7, () -> {
            last[0] = ToleranceRun.run(base, TOLERANCE_SAMPLES, 1, new CancelToken(), (done, total) -> { });
            return last[0].completed();
        });
        md.append("## Tolerance study\n\n");
        md.append("A ").append(String.format(Locale.ROOT, "%,d", TOLERANCE_SAMPLES)).append("-sample Monte Carlo study of the demo design "
                + "(`ToleranceRun.run`: capacitor, inductance, coupling and load tolerances and capacitor temperature drift, "
                + "each sample a full operating point of the tuned network).\n\n");
        md.append("| item | wall | CPU | samples completed | yield |\n|---|---:|---:|---:|---:|\n");
        md.append("| 10,000 samples | ").append(ms(t.wallMillis())).append(" | ").append(ms(t.cpuMillis())).append(" | ")
                .append(last[0].completed()).append(" | ").append(String.format(Locale.ROOT, "%.1f %%", 100 * last[0].overallYield())).append(" |\n\n");
        md.append("Wall: ").append(runs(t.runs(), t.warmups())).append(".\n\n");
    }

    private void banks(StringBuilder md) {
        progress.accept("capacitor bank search against brute force");
        BankComparison b = BankComparison.run(quick);
        md.append("## Capacitor bank search\n\n");
        md.append("47 nF ± 2 % at 400 V, 5 A, 100 kHz from a ").append(b.parts()).append("-part catalogue (the bundled demo catalogue "
                + "filled up with C0G 1000 V parts of the E24 series), up to 4 in series × 8 in parallel plus one trim part, "
                + "five alternatives. The pruned search against the brute force that evaluates every layout within the same bounds.\n\n");
        md.append("| method | layouts evaluated | wall | CPU |\n|---|---:|---:|---:|\n");
        md.append("| pruned search | ").append(String.format(Locale.ROOT, "%,d", b.searched())).append(" | ").append(ms(b.search().wallMillis()))
                .append(" | ").append(ms(b.search().cpuMillis())).append(" |\n");
        md.append("| brute force | ").append(String.format(Locale.ROOT, "%,d", b.bruteLayouts())).append(" | ").append(ms(b.brute().wallMillis()))
                .append(" | ").append(ms(b.brute().cpuMillis())).append(" |\n\n");
        md.append("Ratio: the search is **").append(String.format(Locale.ROOT, "%.0f×", b.speedUp())).append("** faster (median wall times; ")
                .append(String.format(Locale.ROOT, "%.0f×", b.cpuRatio()))
                .append(" in mean CPU time); both return ").append(b.sameBanks() ? "the same banks in the same order" : "**different banks** (a defect)")
                .append("; best: ").append(b.best()).append(". Wall: ")
                .append(runs(b.search().runs(), b.search().warmups())).append(" for the search, ")
                .append(runs(b.brute().runs(), b.brute().warmups())).append(" for the brute force.\n\n");
    }

    private void window(StringBuilder md) {
        progress.accept("window start");
        md.append("## Window start\n\n");
        md.append("From launching a new JVM with `tankwright open --snapshot` on the demo design to the snapshot of the window "
                + "showing its solved result being written and the JVM exiting (so JVM start and exit are included). "
                + "Target: under ").append(fmt(WINDOW_TARGET_S)).append(" s.\n\n");
        WindowStart.Outcome w = WindowStart.measure(quick ? 1 : 5);
        if (w.skipped() != null) {
            md.append("Skipped: ").append(w.skipped()).append("\n\n");
            return;
        }
        md.append("| item | median | fastest | slowest | target met (median) |\n|---|---:|---:|---:|---|\n");
        md.append("| window start to first painted result | ").append(sec(w.median())).append(" | ").append(sec(w.min())).append(" | ")
                .append(sec(w.max())).append(" | ").append(w.median() < WINDOW_TARGET_S ? "yes" : "no").append(" |\n\n");
        md.append(w.runs()).append(" timed launches after one untimed launch that warms the disk cache. Started ").append(w.how())
                .append(". Display: `").append(w.display())
                .append("`. For scale, the same launch that only prints the version takes ").append(sec(w.jvmOnly()))
                .append(" (median): the rest is loading the window classes, building and painting the window, and the first, "
                        + "not yet compiled, analysis of the demo (started on its own thread at the top of `main`, so it overlaps the window's building).\n\n");
    }

    private void edit(StringBuilder md) {
        progress.accept("edits in the window");
        md.append("## Edit to result in the window\n\n");
        md.append("A workbench window opened in the bench's own JVM at the default size (").append(DEFAULT_WINDOW)
                .append(") on each preset, with the interactive pipeline (operating point first, then the full analysis, latest edit wins). "
                        + "The primary coil's turns are changed back and forth through the editor's own text field (select all, "
                        + "type the new number over it: the path a keystroke takes). Timed on the event thread from the change "
                        + "of the text to (a) its operating-point result handed to every pane and painted, and (b) its full "
                        + "result (sweeps, envelope) handed to the plots and painted. Targets: (a) under ")
                .append(fmt(EDIT_OPERATING_TARGET_MS)).append(" ms, (b) under ").append(fmt(EDIT_FULL_TARGET_MS)).append(" ms, never blocking the window.\n\n");
        int warm = quick ? 3 : 20;
        int runs = quick ? 3 : 15;
        List<EditTimes> times;
        try {
            if (windowEdits == null) {
                throw new IllegalStateException("this run has no window (the bench was not started from the command line)");
            }
            times = windowEdits.measure(EDIT_PRESETS, warm, runs);
        } catch (IllegalStateException e) {
            md.append("Skipped: ").append(e.getMessage())
                    .append(". Run the bench under a display, e.g. `xvfb-run -a ./tankwright bench --only edit`.\n\n");
            return;
        } catch (Exception e) {
            md.append("Skipped: the window could not be opened: ").append(e).append("\n\n");
            return;
        }
        md.append("| preset | edit | (a) operating point: median | fastest | slowest | (b) full result: median | fastest | slowest | targets met (medians) |\n");
        md.append("|---|---|---:|---:|---:|---:|---:|---:|---|\n");
        for (EditTimes t : times) {
            double a = Timing.median(t.operatingMs());
            double b = Timing.median(t.fullMs());
            md.append("| ").append(t.preset()).append(" | ").append(t.edit()).append(" | ").append(ms(a)).append(" | ")
                    .append(ms(min(t.operatingMs()))).append(" | ").append(ms(max(t.operatingMs()))).append(" | ")
                    .append(ms(b)).append(" | ").append(ms(min(t.fullMs()))).append(" | ").append(ms(max(t.fullMs()))).append(" | ")
                    .append(a < EDIT_OPERATING_TARGET_MS ? "yes" : "no").append(", ").append(b < EDIT_FULL_TARGET_MS ? "yes" : "no")
                    .append(" |\n");
        }
        md.append("\nEach preset: ").append(runs).append(" timed edits after ").append(warm).append(" untimed ones.\n\n");
    }

    private static final String DEFAULT_WINDOW = "1440 × 900";

    private static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            m = Math.min(m, x);
        }
        return m;
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }

    /** Writes the report to a file (creating folders). */
    public static void write(Path out, String markdown) throws IOException {
        Path parent = out.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Files.writeString(out, markdown);
    }

    /** Parses a comma-separated list of item names. */
    public static Set<Item> items(List<String> names) {
        List<Item> out = new ArrayList<>();
        for (String n : names) {
            for (String part : n.split(",")) {
                if (!part.isBlank()) {
                    out.add(Item.of(part));
                }
            }
        }
        return out.isEmpty() ? EnumSet.noneOf(Item.class) : EnumSet.copyOf(out);
    }

    private static String runs(int runs, int warmups) {
        return "median of " + runs + " timed run" + (runs == 1 ? "" : "s") + " after " + warmups + " warm-up run" + (warmups == 1 ? "" : "s");
    }

    static String ms(double v) {
        if (!Double.isFinite(v)) {
            return "n/a";
        }
        return v >= 100 ? String.format(Locale.ROOT, "%.0f ms", v) : v >= 1 ? String.format(Locale.ROOT, "%.2f ms", v)
                : String.format(Locale.ROOT, "%.3f ms", v);
    }

    private static String us(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.2f µs", v) : "n/a";
    }

    private static String sec(double v) {
        return String.format(Locale.ROOT, "%.2f s", v);
    }

    private static String sci(double v) {
        return String.format(Locale.ROOT, "%.1e", v);
    }

    private static String fmt(double v) {
        String s = String.format(Locale.ROOT, "%.4g", v);
        return s.contains(".") && !s.contains("e") ? s.replaceAll("\\.?0+$", "") : s;
    }
}
