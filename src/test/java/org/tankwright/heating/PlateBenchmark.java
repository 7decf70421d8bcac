package org.tankwright.heating;

import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;

/**
 * Benchmark (run by hand, not a test): the plate model for a 20-turn flat spiral, as the griddle preset has it.
 * {@code java -cp target/classes:target/test-classes:target/tankwright.jar org.tankwright.heating.PlateBenchmark}
 */
public final class PlateBenchmark {
    private PlateBenchmark() {
    }

    public static void main(String[] args) {
        WorkpieceMaterial steel = WorkpieceMaterials.builtIn().require("carbon-steel");
        double[] r = new double[20];
        double[] lift = new double[20];
        for (int i = 0; i < 20; i++) {
            r[i] = 0.0985 - i * 0.0037;
            lift[i] = 0.0015;
        }
        FlatWorkCoil coil = new FlatWorkCoil(r, lift, 0.1, 45e-6, 0.045);
        PlateGeometry plate = new PlateGeometry(0.3, 0.006, 0.012);
        WorkpieceMedium cold = new WorkpieceMedium.OfMaterial(steel, 20);
        WorkpieceMedium hot = new WorkpieceMedium.OfMaterial(steel, 250);
        double sink = 0;
        for (int round = 0; round < 8; round++) {
            int n = 200;
            long t0 = System.nanoTime();
            PlateLoad model = null;
            for (int i = 0; i < n; i++) {
                model = PlateLoad.of(coil, new PlateGeometry(0.3, 0.006, 0.012 + i * 1e-9));
            }
            long t1 = System.nanoTime();
            for (int i = 0; i < n; i++) {
                sink += model.impedanceChange(2 * Math.PI * (3e4 + i), 5e6, 100, 0.006).getReal();
            }
            long t2 = System.nanoTime();
            for (int i = 0; i < n; i++) {
                sink += model.load(coil, plate, cold, 3e4 + i, 40).workPower();
            }
            long t3 = System.nanoTime();
            for (int i = 0; i < n; i++) {
                sink += model.load(coil, plate, hot, 3e4 + i, 40).workPower();
            }
            long t4 = System.nanoTime();
            System.out.printf("%d nodes: table %.2f ms, one ΔZ %.3f ms, cold load with µr iteration %.2f ms, hot %.2f ms%n",
                    model.nodes(), (t1 - t0) / 1e6 / n, (t2 - t1) / 1e6 / n, (t3 - t2) / 1e6 / n, (t4 - t3) / 1e6 / n);
        }
        System.out.println("(checksum " + sink + ")");
    }
}
