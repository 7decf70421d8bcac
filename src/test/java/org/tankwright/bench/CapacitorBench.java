package org.tankwright.bench;

import org.tankwright.capacitors.BankRequest;
import org.tankwright.capacitors.BankSearchResult;
import org.tankwright.capacitors.BankStress;
import org.tankwright.capacitors.BankSynthesis;
import org.tankwright.capacitors.CapacitorBank;
import org.tankwright.capacitors.CapacitorPart;
import org.tankwright.tolerance.Limit;
import org.tankwright.tolerance.Parameter;
import org.tankwright.tolerance.StudyResult;
import org.tankwright.tolerance.TemperatureRange;
import org.tankwright.tolerance.ToleranceStudy;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Benchmark (not a test): bank search over a 300-part catalogue against the brute force, and a
 * 10,000-sample tolerance study. Times are thread CPU time (the build machine is shared). Run:
 * {@code mvn -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt && java -cp
 * target/classes:target/test-classes:$(cat target/cp.txt) org.tankwright.bench.CapacitorBench}.
 */
public final class CapacitorBench {
    public static void main(String[] args) {
        List<CapacitorPart> parts = BankComparison.catalogue();
        System.out.println("catalogue: " + parts.size() + " parts");
        double[][] cases = {{47e-9, 400, 5, 100e3}, {220e-9, 800, 0, 30e3}, {10e-9, 1500, 0, 200e3}, {1e-6, 300, 0, 20e3}};
        for (int w = 0; w < 40; w++) { // warm the JIT on every case before timing any
            for (double[] c : cases) {
                BankSynthesis.search(BankRequest.of(c[0], 0.02, BankStress.sinusoidal(c[1], c[2], 0, c[3])), parts);
            }
        }
        for (double[] c : cases) {
            BankRequest req = BankRequest.of(c[0], 0.02, BankStress.sinusoidal(c[1], c[2], 0, c[3]));
            double ms = median(() -> BankSynthesis.search(req, parts), 31);
            BankSearchResult r = BankSynthesis.search(req, parts);
            System.out.printf(Locale.ROOT, "search %.3g F, %.0f V, %.0f A, %.0f Hz: %.2f ms CPU median, %d layouts, best: %s%n",
                    c[0], c[1], c[2], c[3], ms, r.evaluated(), r.best() == null ? "none" : r.best().layout().describe());
        }
        // pruned vs brute force with smaller bounds (the brute force evaluates every layout)
        BankRequest small = BankComparison.request();
        double pruned = median(() -> BankSynthesis.search(small, parts), 9);
        long[] count = new long[1];
        long t0 = java.lang.management.ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
        List<CapacitorBank> brute = BankComparison.bruteForce(small, parts, count);
        double bruteMs = (java.lang.management.ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime() - t0) / 1e6;
        BankSearchResult r = BankSynthesis.search(small, parts);
        boolean same = brute.stream().map(b -> b.layout().describe()).toList()
                .equals(r.banks().stream().map(b -> b.layout().describe()).toList());
        System.out.printf(Locale.ROOT, "bounds 4 × 8 + trim: pruned %.2f ms (%d layouts), brute force %.0f ms (%d layouts):"
                + " ratio %.0f×, same banks: %s%n", pruned, r.evaluated(), bruteMs, count[0], bruteMs / pruned, same);

        // tolerance study: resonant frequency and a cheap load model, 4 parameters, temperature drift
        ToleranceStudy study = ToleranceStudy.of(List.of(
                        Parameter.uniform("L", 24e-6, 0.03),
                        Parameter.uniform("C", 105e-9, 0.05).withTempcoPpm(-200, 50),
                        Parameter.uniform("k", 0.3, 0.05),
                        Parameter.normal("R", 10, 0.1)),
                List.of("f0_Hz", "power_W"), (p, o) -> {
                    o[0] = 1 / (2 * Math.PI * Math.sqrt(p[0] * p[1]));
                    double w = 2 * Math.PI * 100e3;
                    double x = w * p[2] * p[0];
                    o[1] = 100 * x * x / (p[3] * (1 + x * x / (p[3] * p[3])));
                })
                .withTemperature(new TemperatureRange(-10, 70, 25))
                .withLimits(List.of(new Limit("f0_Hz", 97e3, 103e3)))
                .withSamples(10_000);
        double tms = median(study::run, 21);
        StudyResult sr = study.run();
        System.out.printf(Locale.ROOT, "tolerance study 10,000 samples: %.2f ms CPU median; f0 mean %.1f Hz, std %.1f Hz, yield %.3f%n",
                tms, sr.outcome("f0_Hz").mean(), sr.outcome("f0_Hz").std(), sr.overallYield());
    }

    /** Median thread CPU time (ms) over runs after 40 warm-up runs (JIT): CPU time, since the machine is shared. */
    private static double median(Runnable r, int runs) {
        for (int i = 0; i < 40; i++) {
            r.run();
        }
        java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
        double[] t = new double[runs];
        for (int i = 0; i < runs; i++) {
            long t0 = mx.getCurrentThreadCpuTime();
            r.run();
            t[i] = (mx.getCurrentThreadCpuTime() - t0) / 1e6;
        }
        Arrays.sort(t);
        return t[runs / 2];
    }
}
