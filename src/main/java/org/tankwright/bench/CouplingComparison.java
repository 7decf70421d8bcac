package org.tankwright.bench;

import org.tankwright.coupling.FilamentSet;
import org.tankwright.coupling.PairSum;
import org.tankwright.magnetics.Filament;

import java.util.List;

/**
 * Mutual inductance of two equal 20-turn flat spirals (inner radius 50 mm, pitch 4 mm, wire radius
 * 0.8 mm) facing each other across a 21.6 mm centre distance with a 60 mm lateral offset: the
 * coupling kernels' ring-pair sum against Neumann's double integral evaluated directly, each at
 * 1e-6 relative accuracy against a tight-tolerance reference.
 *
 * @param mutual           M from the kernels at their default tolerance, H
 * @param kernelError      its relative error against the reference
 * @param kernel           time of one M by the kernels
 * @param neumannNodes     nodes per ring in the direct integration (n × n per ring pair) that reach the accuracy
 * @param neumannError     the direct integration's relative error at that node count
 * @param neumann          time of one M by the direct integration
 * @param referenceCheck   relative difference between the reference and a 1024-node direct integration
 */
public record CouplingComparison(double mutual, double kernelError, Timing kernel, int neumannNodes, double neumannError,
                                 Timing neumann, double referenceCheck, double linkMutual, double linkError, Timing link) {
    public static final double ACCURACY = 1e-6;
    static final double GAP_DISTANCE = 0.0216;
    static final double OFFSET = 0.06;

    /** Measures both ways; {@code quick} uses fewer runs. */
    public static CouplingComparison run(boolean quick) {
        List<Filament> spiral = BenchCoils.spiral(20, 0.05, 0.004, 0.0008);
        double[] radii = BenchCoils.radii(spiral);
        FilamentSet set = FilamentSet.of(spiral);
        PairSum sum = new PairSum(set, set);
        double ref = sum.mutual(OFFSET, 0, GAP_DISTANCE, 1e-15);
        double check = Math.abs(NeumannReference.ringCoils(radii, radii, GAP_DISTANCE, OFFSET, quick ? 256 : 1024) / ref - 1);
        double m = sum.mutual(OFFSET, 0, GAP_DISTANCE);
        Timing tk = Timing.measure(quick ? 20 : 400, quick ? 15 : 101, quick ? 1 : 10, () -> sum.mutual(OFFSET, 0, GAP_DISTANCE));
        int n = 16;
        double direct = NeumannReference.ringCoils(radii, radii, GAP_DISTANCE, OFFSET, n);
        while (Math.abs(direct / ref - 1) > ACCURACY && n < 4096) {
            n += 8;
            direct = NeumannReference.ringCoils(radii, radii, GAP_DISTANCE, OFFSET, n);
        }
        int nodes = n;
        Timing tn = Timing.measure(quick ? 2 : 10, quick ? 3 : 21, () -> NeumannReference.ringCoils(radii, radii, GAP_DISTANCE, OFFSET, nodes));
        // The route the pipeline takes: CoupledCoils, which for two round coils uses the spectral (Hankel) form.
        double self = org.tankwright.magnetics.FilamentSum.selfInductance(spiral);
        org.tankwright.coupling.CoupledCoils coupled = new org.tankwright.coupling.CoupledCoils(
                new org.tankwright.coupling.CoupledCoils.Coil("a", spiral, self, null),
                new org.tankwright.coupling.CoupledCoils.Coil("b", spiral, self, null));
        double ml = coupled.at(GAP_DISTANCE, OFFSET, 0).mutual();
        Timing tl = Timing.measure(quick ? 20 : 400, quick ? 15 : 101, quick ? 1 : 10, () -> coupled.at(GAP_DISTANCE, OFFSET, 0).mutual());
        return new CouplingComparison(m, Math.abs(m / ref - 1), tk, nodes, Math.abs(direct / ref - 1), tn, check, ml,
                Math.abs(ml / ref - 1), tl);
    }

    /** How many times faster the pipeline's route (spectral form for round coils) is than the direct integration. */
    public double linkSpeedUp() {
        return neumann.wallMillis() / Math.max(link.wallMillis(), 1e-9);
    }

    /** The same ratio in mean process CPU time. */
    public double cpuRatio() {
        return neumann.cpuMillis() / Math.max(kernel.cpuMillis(), 1e-9);
    }

    /** How many times faster the kernels are than the direct integration (median wall times). */
    public double speedUp() {
        return neumann.wallMillis() / Math.max(kernel.wallMillis(), 1e-9);
    }
}
