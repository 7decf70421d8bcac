package org.tankwright.tuning;

import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Topology;

/**
 * Lossless compensation capacitors (Wang, Covic &amp; Stielau, IEEE TIE 51(1), 2004): the secondary
 * tuned to the design frequency, C2 = 1/(ω²L2); the primary for zero input phase with the coil
 * resistances neglected: SS 1/(ω²L1); SP 1/(ω²(L1 − M²/L2)); PS L1/((ω²M²/RL)² + ω²L1²);
 * PP (L1 − M²/L2)/((M²RL/L2²)² + ω²(L1 − M²/L2)²). A single tank: 1/(ω²L).
 */
public final class TextbookCompensation {
    public static final String SOURCE = "Wang, Covic & Stielau, IEEE Trans. Industrial Electronics 51(1), 2004 (lossless)";

    private TextbookCompensation() {
    }

    /** Secondary capacitor tuned to ω (either secondary arrangement). */
    public static double c2(double l2, double omega) {
        return 1 / (omega * omega * l2);
    }

    /** Primary (or tank) capacitor for zero input phase, lossless; {@code rLoad} is the AC load resistance. */
    public static double c1(Topology t, LinkValues v, double omega, double rLoad) {
        double w2 = omega * omega;
        return switch (t) {
            case SERIES_TANK, PARALLEL_TANK, SS -> 1 / (w2 * v.l1());
            case SP -> 1 / (w2 * leakage(v));
            case PS -> {
                double zr = w2 * v.m() * v.m() / rLoad;
                yield v.l1() / (zr * zr + w2 * v.l1() * v.l1());
            }
            case PP -> {
                double le = leakage(v);
                double a = v.m() * v.m() * rLoad / (v.l2() * v.l2());
                yield le / (a * a + w2 * le * le);
            }
        };
    }

    private static double leakage(LinkValues v) {
        double le = v.l1() - v.m() * v.m() / v.l2();
        if (!(le > 0)) {
            throw new IllegalArgumentException("L1 − M²/L2 = " + le + " H must be positive (coupling factor below 1)");
        }
        return le;
    }
}
