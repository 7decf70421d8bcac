package org.tankwright.tuning;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tankwright.circuit.CapacitorSpec;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topologies;
import org.tankwright.circuit.Topology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The primary compensation formulas of Wang, Covic &amp; Stielau (IEEE TIE 51(1), 2004) as the lossless limit of the solver. */
class TextbookCompensationTest {
    private static final double F = 85e3;
    private static final double W = 2 * Math.PI * F;
    private static final double L1 = 120e-6;
    private static final double L2 = 80e-6;
    private static final double K = 0.25;
    private static final double RL = 12;

    private static double phaseAt(Topology t, double r, double c1) {
        LinkValues v = LinkValues.fromCoupling(L1, L2, K, r, r);
        double c2 = TextbookCompensation.c2(L2, W);
        PhasorSolver s = new PhasorSolver(Topologies.link(t, v, CapacitorSpec.ideal(c1), CapacitorSpec.ideal(c2),
                Source.sine(100), RL));
        s.solve(F);
        return s.inputPhaseDeg(s.network().sourceIndex());
    }

    @ParameterizedTest
    @EnumSource(value = Topology.class, names = {"SS", "SP", "PS", "PP"})
    void losslessSolverHasZeroPhaseAtTextbookC1(Topology t) {
        LinkValues v = LinkValues.fromCoupling(L1, L2, K, 0, 0);
        double c1 = TextbookCompensation.c1(t, v, W, RL);
        assertEquals(0, phaseAt(t, 0, c1), 1e-7, "Wang, Covic & Stielau 2004: zero input phase at the textbook C1, " + t);
    }

    @ParameterizedTest
    @EnumSource(value = Topology.class, names = {"SS", "SP", "PS", "PP"})
    void phaseSolvedC1TendsToTextbookAsLossesVanish(Topology t) {
        LinkValues lossless = LinkValues.fromCoupling(L1, L2, K, 0, 0);
        double textbook = TextbookCompensation.c1(t, lossless, W, RL);
        double previous = Double.POSITIVE_INFINITY;
        for (double r : new double[]{0.3, 0.03, 0.003, 0.0003}) {
            LinkValues v = LinkValues.fromCoupling(L1, L2, K, r, r);
            PhasorSolver s = new PhasorSolver(Topologies.link(t, v, CapacitorSpec.ideal(textbook),
                    CapacitorSpec.ideal(TextbookCompensation.c2(L2, W)), Source.sine(100), RL));
            PhaseSolve ps = ZeroPhaseSolver.solve(s, F, 0, textbook);
            assertTrue(ps.reached(), "zero phase reachable for " + t);
            assertEquals(0, ps.phaseDeg(), 1e-8);
            double err = Math.abs(ps.c1() / textbook - 1);
            assertTrue(err <= previous * 1.0001 + 1e-12, t + ": deviation from the textbook C1 shrinks as R→0 ("
                    + err + " after " + previous + ")");
            previous = err;
        }
        assertTrue(previous < 1e-5, t + ": lossless limit of Wang, Covic & Stielau 2004 reached, deviation " + previous);
    }

    @Test
    void seriesSeriesStaysAtZeroPhaseWithLosses() {
        // With C2 tuned, the SS reflected impedance ω²M²/(R2+RL) is real, so the textbook C1 keeps zero phase
        // with coil losses (Wang, Covic & Stielau 2004; MODELS.md §3).
        double c1 = TextbookCompensation.c1(Topology.SS, LinkValues.fromCoupling(L1, L2, K, 0, 0), W, RL);
        assertEquals(0, phaseAt(Topology.SS, 0.5, c1), 1e-9);
    }

    @Test
    void parallelSecondaryTextbookDiffersWithLosses() {
        // SP, PS, PP at their lossless values are not at zero phase once the coils have resistance (MODELS.md §3).
        LinkValues v = LinkValues.fromCoupling(L1, L2, K, 0, 0);
        double c1 = TextbookCompensation.c1(Topology.SP, v, W, RL);
        assertTrue(Math.abs(phaseAt(Topology.SP, 0.5, c1)) > 1e-3);
    }

    @ParameterizedTest
    @EnumSource(value = Topology.class, names = {"SS", "SP", "PS", "PP"})
    void highQTargetPhaseIsFoundFromAnyStartingValue(Topology t) {
        // A steep phase: crossings between scan points must still be found (a high-Q primary).
        LinkValues v = LinkValues.fromCoupling(L1, L2, K, 1e-3, 1e-3);
        double textbook = TextbookCompensation.c1(t, LinkValues.fromCoupling(L1, L2, K, 0, 0), W, RL);
        for (double start : new double[]{textbook * 1.013, textbook * 0.71, textbook * 3.3}) {
            PhasorSolver s = new PhasorSolver(Topologies.link(t, v, CapacitorSpec.ideal(start),
                    CapacitorSpec.ideal(TextbookCompensation.c2(L2, W)), Source.sine(100), RL));
            PhaseSolve ps = ZeroPhaseSolver.solve(s, F, 7, start);
            assertTrue(ps.reached(), t + " from " + start);
            assertEquals(7, ps.phaseDeg(), 1e-6);
            s.solve(F);
            assertEquals(7, s.inputPhaseDeg(s.network().sourceIndex()), 1e-6, "C1 left at the solution");
        }
    }
}
