package org.tankwright.tuning;

import org.junit.jupiter.api.Test;
import org.tankwright.circuit.CapacitorSpec;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topologies;
import org.tankwright.circuit.Topology;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Bifurcation of a lossless SS link with both sides tuned to ω0. With u = ω/ω0, q = RL/(ω0L2) = 1/Qs,
 * the input reactance vanishes at u = 1 and where (1−k²)u⁴ − (2−q²)u² + 1 = 0 (derived here from
 * Zin = jX1(u−1/u) + u²k²X1X2/(RL + jX2(u−1/u))). Extra real roots exist iff Qs exceeds
 * 1/√(2(1−√(1−k²))), which is the SS criterion of Wang, Covic &amp; Stielau (2004), bifurcation-free when
 * Qp &gt; 4Qs³/(4Qs²−1) with Qp = ω0L1/(ω0²M²/RL) (criterion recalled from memory; shown equivalent).
 */
class BifurcationTest {
    private static final double F0 = 100e3;
    private static final double W0 = 2 * Math.PI * F0;
    private static final double L1 = 50e-6;
    private static final double L2 = 30e-6;
    private static final double K = 0.3;

    private static PhasorSolver losslessSs(double rl) {
        LinkValues v = LinkValues.fromCoupling(L1, L2, K, 0, 0);
        return new PhasorSolver(Topologies.link(Topology.SS, v, CapacitorSpec.ideal(1 / (W0 * W0 * L1)),
                CapacitorSpec.ideal(1 / (W0 * W0 * L2)), Source.sine(10), rl));
    }

    private static double criticalLoad() {
        return W0 * L2 * Math.sqrt(2 * (1 - Math.sqrt(1 - K * K)));
    }

    @Test
    void zeroPhaseFrequenciesMatchTheQuarticRoots() {
        double rl = criticalLoad() * 0.5;
        double q = rl / (W0 * L2);
        double b = 2 - q * q;
        double disc = Math.sqrt(b * b - 4 * (1 - K * K));
        double uLow = Math.sqrt((b - disc) / (2 * (1 - K * K)));
        double uHigh = Math.sqrt((b + disc) / (2 * (1 - K * K)));
        double[] expected = {F0 * uLow, F0, F0 * uHigh};
        double[] found = Bifurcation.zeroPhaseFrequencies(losslessSs(rl), F0);
        assertEquals(3, found.length, "bifurcated: three zero-phase frequencies");
        assertArrayEquals(expected, found, 1e-8 * F0);
    }

    @Test
    void countChangesAtTheCriterion() {
        double rc = criticalLoad();
        assertEquals(3, Bifurcation.count(losslessSs(rc * 0.98), F0), "Qs above the criterion: bifurcated");
        assertEquals(1, Bifurcation.count(losslessSs(rc * 1.02), F0), "Qs below the criterion: one zero-phase frequency");
        // the same boundary written as Wang, Covic & Stielau's Qp = 4Qs³/(4Qs²−1) (from memory)
        double qs = W0 * L2 / rc;
        double qp = W0 * L1 * rc / (W0 * W0 * K * K * L1 * L2);
        assertEquals(4 * Math.pow(qs, 3) / (4 * qs * qs - 1), qp, 1e-9 * qp);
    }

    @Test
    void loadThresholdSearchFindsTheCriterion() {
        double rc = criticalLoad();
        double[] t = Bifurcation.loadThresholds(losslessSs(10), F0, W0 * L2 * 1e-3, W0 * L2 * 10);
        assertEquals(1, t.length);
        assertEquals(rc, t[0], 1e-6 * rc);
    }

    @Test
    void couplingThresholdSearchFindsTheCriterion() {
        // at fixed load, the critical k solves 1/Qs² = 2(1 − √(1 − k²)): k = √(1 − (1 − q²/2)²)
        double rl = 0.4 * W0 * L2;
        double q = rl / (W0 * L2);
        double kc = Math.sqrt(1 - Math.pow(1 - q * q / 2, 2));
        double[] t = Bifurcation.couplingThresholds(losslessSs(rl), F0, 0.01, 0.95);
        assertEquals(kc, t[0], 1e-5, "grid-limited: near the threshold the two extra roots nearly touch");
        // any later change is a root leaving the searched band [f/2, 2f]: the upper root reaches u = 2
        for (int i = 1; i < t.length; i++) {
            double k = t[i];
            double b = 2 - q * q;
            double uHigh = Math.sqrt((b + Math.sqrt(b * b - 4 * (1 - k * k))) / (2 * (1 - k * k)));
            assertEquals(2, uHigh, 1e-5, "threshold " + k + " is where a zero-phase frequency leaves the band");
        }
    }
}
