package org.tankwright.heating;

import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;

/**
 * Benchmark (run by hand, not a test): time per call of the heating models that the workbench
 * recomputes on every edit. {@code java -cp target/classes:target/test-classes:... org.tankwright.heating.WorkpieceBenchmark}
 */
public final class WorkpieceBenchmark {
    private WorkpieceBenchmark() {
    }

    public static void main(String[] args) {
        WorkpieceMaterial steel = WorkpieceMaterials.builtIn().require("carbon-steel");
        WorkCoil coil = WorkCoil.withNagaokaInductance(6, 0.048, 0.034, 0.008);
        BarGeometry bar = BarGeometry.solid(0.02, 0.06);
        WorkpieceMedium cold = new WorkpieceMedium.OfMaterial(steel, 20);
        double sink = 0;
        for (int round = 0; round < 8; round++) {
            long t0 = System.nanoTime();
            int n = 2000;
            for (int i = 0; i < n; i++) {
                sink += AxialFieldBar.solve(0.01, 0.004, 2e-7, 30, 1e4 + i, 3e4).powerPerLength();
            }
            long t1 = System.nanoTime();
            for (int i = 0; i < n; i++) {
                sink += WorkpieceLoad.inCoil(coil, bar, cold, 6e4 + i, 250).workPower();
            }
            long t2 = System.nanoTime();
            int m = 50;
            for (int i = 0; i < m; i++) {
                sink += HeaterOperatingPoints.solve(coil, bar, steel, 20, 850, 1e-5, 250 + i).frequencyShift();
            }
            long t3 = System.nanoTime();
            for (int i = 0; i < m; i++) {
                sink += HeaterStudy.run(coil, bar, steel, 20, 850, 1e-5, 250 + i, new LossAllowance.Fraction(0.25), 10)
                        .heatingTime().timeSeconds();
            }
            long t4 = System.nanoTime();
            System.out.printf("tube bar solution %.1f µs, bar in coil with µr iteration %.1f µs, cold+hot points %.2f ms,"
                            + " whole heater study %.2f ms%n",
                    (t1 - t0) / 1e3 / n, (t2 - t1) / 1e3 / n, (t3 - t2) / 1e6 / m, (t4 - t3) / 1e6 / m);
        }
        System.out.println("(checksum " + sink + ")");
    }
}
