package org.tankwright.magnetics;

import java.util.Locale;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;

/**
 * Speed of the coil model (run by hand: a main, not a test). Prints microseconds per full analysis
 * (model build + one operating point with its 41-point Q curve) after warm-up.
 * <pre>java -cp target/classes:target/test-classes:$(cat cp.txt) org.tankwright.magnetics.CoilBenchmark</pre>
 */
public final class CoilBenchmark {
    /** Thread CPU time separates our work from waiting for a core on a shared machine. */
    private static final java.lang.management.ThreadMXBean THREADS =
            java.lang.management.ManagementFactory.getThreadMXBean();

    private CoilBenchmark() {
    }

    public static void main(String[] args) {
        Conductor wire = new Conductor.RoundWire(1e-3, 1.1e-3, ConductorMaterial.COPPER);
        Conductor trace = Conductor.Trace.ofCopperWeight(1e-3, 1, ConductorMaterial.COPPER);
        Conductor litz = new Conductor.Litz(400, 0.071e-3, 1.9e-3, ConductorMaterial.COPPER);
        CoilGeometry[] coils = {
                new SingleLayerSolenoid(50e-3, 20, 2e-3, wire),
                new FlatSpiral(200e-3, 60e-3, 20, litz),
                MultilayerSolenoid.closeWound(20e-3, 100, 5, wire),
                new PolygonSpiral(4, 60e-3, 10e-3, 20, trace),
                new PolygonSpiral(8, 60e-3, 10e-3, 20, trace),
                new RectangularSpiral(300e-3, 200e-3, 200e-3, 100e-3, 20, litz),
        };
        OperatingPoint op = new OperatingPoint(100e3, 20, 1);
        double sink = 0;
        for (CoilGeometry g : coils) {
            int n = 20;
            long budget = 6_000_000_000L;
            for (int round = 0; round < 4; round++) {
                long c0 = THREADS.getCurrentThreadCpuTime();
                long t0 = System.nanoTime();
                int count = 0;
                while (System.nanoTime() - t0 < budget / 4) {
                    for (int i = 0; i < n; i++) {
                        sink += CoilModel.analyse(g, op).q();
                    }
                    count += n;
                }
                double us = (System.nanoTime() - t0) / 1e3 / count;
                double cpu = (THREADS.getCurrentThreadCpuTime() - c0) / 1e3 / count;
                if (round == 3) {
                    System.out.printf(Locale.ROOT, "%-16s %4d turns  %9.1f µs per analysis (thread CPU %.1f µs)%n",
                            g.kind(), g.turns(), us, cpu);
                }
            }
        }
        System.out.println(sink > 0 ? "" : "?");
    }
}
