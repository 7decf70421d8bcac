package org.tankwright.magnetics;

import java.util.Locale;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;

/**
 * Speed of the thin-skin surface-current solve (run by hand: a main, not a test). Prints thread CPU
 * milliseconds per solve (geometry to solution; the coil model solves once and reuses it at every frequency).
 * <pre>java -cp target/classes:target/test-classes org.tankwright.magnetics.SurfaceCurrentBenchmark</pre>
 */
public final class SurfaceCurrentBenchmark {
    private static final java.lang.management.ThreadMXBean THREADS =
            java.lang.management.ManagementFactory.getThreadMXBean();

    private SurfaceCurrentBenchmark() {
    }

    public static void main(String[] args) {
        Conductor tube6 = new Conductor.Tube(6e-3, 1e-3, ConductorMaterial.COPPER);
        Conductor tube8 = new Conductor.Tube(8e-3, 1e-3, ConductorMaterial.COPPER);
        Conductor wire = Conductor.RoundWire.bare(1e-3, ConductorMaterial.COPPER);
        Conductor enamel = new Conductor.RoundWire(1e-3, 1.05e-3, ConductorMaterial.COPPER);
        String[] names = {"bolt-heater coil, 6 turns", "small-forge coil, 16 turns", "10 turns, d/p 0.7",
            "40 turns, d/p 0.5", "40 turns, d/p 0.9", "40 turns close-wound enamel", "flat spiral, 12 turns",
            "multilayer 60 turns x 3"};
        CoilGeometry[] coils = {
            new SingleLayerSolenoid(40e-3, 6, 8e-3, tube6),
            new SingleLayerSolenoid(60e-3, 16, 10e-3, tube8),
            new SingleLayerSolenoid(20e-3, 10, 1e-3 / 0.7, wire),
            new SingleLayerSolenoid(40e-3, 40, 2e-3, wire),
            new SingleLayerSolenoid(40e-3, 40, 1e-3 / 0.9, wire),
            new SingleLayerSolenoid(40e-3, 40, 1.05e-3, enamel),
            new FlatSpiral(100e-3, 40e-3, 12, wire),
            MultilayerSolenoid.closeWound(20e-3, 60, 3, enamel),
        };
        double sink = 0;
        for (int c = 0; c < coils.length; c++) {
            long budget = 2_000_000_000L;
            double ms = 0;
            int arcs = 0;
            for (int round = 0; round < 3; round++) {
                long c0 = THREADS.getCurrentThreadCpuTime();
                long t0 = System.nanoTime();
                int count = 0;
                while (System.nanoTime() - t0 < budget / 3 || count == 0) {
                    SurfaceCurrentResistance.Solution s = SurfaceCurrentResistance.of(coils[c]);
                    sink += s.factor();
                    arcs = s.arcs();
                    count++;
                }
                ms = (THREADS.getCurrentThreadCpuTime() - c0) / 1e6 / count;
            }
            System.out.printf(Locale.ROOT, "%-30s %3d arcs  %8.2f ms per solve (thread CPU)%n", names[c], arcs, ms);
        }
        System.out.println(sink > 0 ? "" : "?");
    }
}
