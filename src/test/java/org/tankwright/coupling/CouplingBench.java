package org.tankwright.coupling;

import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Segment;

import java.util.ArrayList;
import java.util.List;

/**
 * Benchmark (run by hand, not a test): after {@code mvn -q test-compile},
 * {@code java -cp target/classes:target/test-classes:<commons-math3 jar> org.tankwright.coupling.CouplingBench}.
 * Reports the time of M for two 20-turn spirals with offset, the ratio to a direct Neumann
 * integration at equal accuracy (1e-6 relative), and the time of a 50 × 50 gap/offset map.
 */
public final class CouplingBench {
    private CouplingBench() {
    }

    public static void main(String[] args) {
        List<Filament> spiral = TestCoils.spiral(20, 0.05, 0.004, 0.0008);
        FilamentSet a = FilamentSet.of(spiral);
        PairSum sum = new PairSum(a, a);
        double gapDistance = 0.0216; // 20 mm gap + wire
        double offset = 0.06;

        // reference: our kernel at a very tight tolerance, cross-checked by Neumann at a large node count
        double ref = sum.mutual(offset, 0, gapDistance, 1e-15);
        double neumannFine = neumannTotal(spiral, gapDistance, offset, 1024);
        System.out.printf("M reference %.12e H; direct Neumann (1024²/pair) %.12e H; rel diff %.2e%n",
                ref, neumannFine, Math.abs(neumannFine / ref - 1));

        double ours = 0;
        long t0 = System.nanoTime();
        int reps = 0;
        while (System.nanoTime() - t0 < 2_000_000_000L) {
            ours = sum.mutual(offset, 0, gapDistance);
            reps++;
        }
        double tOurs = (System.nanoTime() - t0) / 1e9 / reps;
        System.out.printf("pair sum (%d ring groups of 400 pairs): %.3f ms per M, rel error %.2e%n",
                sum.ringGroups(), tOurs * 1e3, Math.abs(ours / ref - 1));

        // the spectral form of the same link (round coils): time per M and accuracy
        double la0 = TestCoils.selfInductance(spiral);
        CoupledCoils round = new CoupledCoils(new CoupledCoils.Coil("a", spiral, la0, null), new CoupledCoils.Coil("b", spiral, la0, null));
        double spec = 0;
        long ts = System.nanoTime();
        int repsS = 0;
        while (System.nanoTime() - ts < 2_000_000_000L) {
            spec = round.at(gapDistance, offset, 0).mutual();
            repsS++;
        }
        double tSpec = (System.nanoTime() - ts) / 1e9 / repsS;
        System.out.printf("spectral (Hankel) form: %.4f ms per M (with L_a, L_b, k), rel error %.2e%n",
                tSpec * 1e3, Math.abs(spec / ref - 1));

        // direct Neumann: the smallest uniform node count per ring that reaches 1e-6 relative
        int n = 16;
        while (Math.abs(neumannTotal(spiral, gapDistance, offset, n) / ref - 1) > 1e-6) {
            n += 8;
        }
        long t1 = System.nanoTime();
        int reps2 = 0;
        double direct = 0;
        while (System.nanoTime() - t1 < 2_000_000_000L) {
            direct = neumannTotal(spiral, gapDistance, offset, n);
            reps2++;
        }
        double tDirect = (System.nanoTime() - t1) / 1e9 / reps2;
        System.out.printf("direct Neumann, %d×%d nodes per ring pair (1e-6 reached, rel error %.2e): %.3f ms per M%n",
                n, n, Math.abs(direct / ref - 1), tDirect * 1e3);
        System.out.printf("speed-up at equal accuracy: pair sums %.0f×, spectral %.0f×%n", tDirect / tOurs, tDirect / tSpec);

        // 50 × 50 gap/offset map of two 20-turn coils, parallel on the common pool
        double la = TestCoils.selfInductance(spiral);
        CoupledCoils link = new CoupledCoils(new CoupledCoils.Coil("a", spiral, la, null), new CoupledCoils.Coil("b", spiral, la, null));
        double[] gaps = CouplingSweep.linspace(0.01, 0.2, 50);
        double[] offs = CouplingSweep.linspace(0, 0.25, 50);
        CouplingSweep.map(link, gaps, offs); // warm-up
        long t2 = System.nanoTime();
        CouplingSweep.map(link, gaps, offs);
        System.out.printf("50×50 map, two 20-turn spirals, %d threads: %.3f s%n",
                java.util.concurrent.ForkJoinPool.getCommonPoolParallelism() + 1, (System.nanoTime() - t2) / 1e9);

        BackingPlate ferrite = BackingPlate.ferrite(2000, 0.005, 0.002);
        CoupledCoils pads = new CoupledCoils(new CoupledCoils.Coil("a", spiral, la, ferrite), new CoupledCoils.Coil("b", spiral, la, ferrite));
        long t3 = System.nanoTime();
        CouplingResult r = pads.atGap(0.05, 0.06, 0);
        System.out.printf("with ferrite behind both coils: one placement %.1f ms (k = %.4f, L_a = %.3f µH)%n",
                (System.nanoTime() - t3) / 1e6, r.k(), r.inductanceA() * 1e6);
        CouplingSweep.map(pads, CouplingSweep.linspace(0.02, 0.2, 10), CouplingSweep.linspace(0, 0.25, 10));
        long t4 = System.nanoTime();
        CouplingSweep.map(pads, CouplingSweep.linspace(0.02, 0.2, 10), CouplingSweep.linspace(0, 0.25, 10));
        System.out.printf("10×10 map with ferrite on both sides: %.3f s%n", (System.nanoTime() - t4) / 1e9);

        List<Filament> square = squareSpiral(20, 0.1, 0.004, 0.0008);
        PairSum sq = new PairSum(FilamentSet.of(square), FilamentSet.of(square));
        sq.mutual(0.06, 0.02, gapDistance);
        long t5 = System.nanoTime();
        int reps3 = 0;
        while (System.nanoTime() - t5 < 1_000_000_000L) {
            sq.mutual(0.06, 0.02, gapDistance);
            reps3++;
        }
        System.out.printf("two 20-turn square spirals (80 segments each): %.3f ms per M%n",
                (System.nanoTime() - t5) / 1e6 / reps3);
    }

    private static double neumannTotal(List<Filament> rings, double dz, double dx, int n) {
        double[] r = org.tankwright.bench.BenchCoils.radii(rings);
        return org.tankwright.bench.NeumannReference.ringCoils(r, r, dz, dx, n);
    }

    private static List<Filament> squareSpiral(int turns, double outerSide, double pitch, double wire) {
        List<Filament> out = new ArrayList<>();
        for (int t = 0; t < turns; t++) {
            double h = outerSide / 2 - t * pitch;
            double[][] p = {{-h, -h}, {h, -h}, {h, h}, {-h, h}, {-h, -h}};
            for (int i = 0; i < 4; i++) {
                out.add(new Segment(p[i][0], p[i][1], 0, p[i + 1][0], p[i + 1][1], 0, wire));
            }
        }
        return out;
    }
}
