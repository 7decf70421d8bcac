package org.tankwright.circuit;

import org.junit.jupiter.api.Test;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.Tuner;
import org.tankwright.tuning.TuningResult;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Facts of the trade about single tanks (common practice; any circuits textbook). */
class TankTest {
    private static final double L = 22e-6;
    private static final double C = 47e-9;
    private static final double F0 = 1 / (2 * Math.PI * Math.sqrt(L * C));

    private static PhasorSolver tank(Topology t, double r, Source s) {
        return new PhasorSolver(Topologies.tank(t, L, r, CapacitorSpec.ideal(C), s));
    }

    private static double zAbs(PhasorSolver s, double f) {
        double[] z = new double[2];
        s.solve(f);
        s.inputImpedance(s.network().sourceIndex(), z);
        return Math.hypot(z[0], z[1]);
    }

    /** Golden-section search of the extremum of |Z| (sign = +1 for a maximum, −1 for a minimum). */
    private static double extremum(PhasorSolver s, double sign) {
        double lo = F0 * 0.8;
        double hi = F0 * 1.25;
        double g = (Math.sqrt(5) - 1) / 2;
        for (int i = 0; i < 200; i++) {
            double x1 = hi - g * (hi - lo);
            double x2 = lo + g * (hi - lo);
            if (sign * zAbs(s, x1) > sign * zAbs(s, x2)) {
                hi = x2;
            } else {
                lo = x1;
            }
        }
        return (lo + hi) / 2;
    }

    @Test
    void seriesTankImpedanceIsMinimalAtF0() {
        PhasorSolver s = tank(Topology.SERIES_TANK, 0.2, Source.sine(10));
        assertEquals(F0, extremum(s, -1), 1e-6 * F0, "common practice: series |Z| minimum at f0 = 1/(2π√(LC))");
        assertEquals(0.2, zAbs(s, F0), 1e-12, "common practice: series tank at f0 is R alone");
    }

    @Test
    void parallelTankImpedanceIsMaximalAtF0ForHighQ() {
        // With R in series with L the maximum moves by O(1/Q²); at Q ≈ 1000 it is within 1e-5 of f0 (common practice).
        double r = Math.sqrt(L / C) / 1000;
        PhasorSolver s = tank(Topology.PARALLEL_TANK, r, Source.current(1));
        assertEquals(F0, extremum(s, +1), 1e-5 * F0, "common practice: parallel |Z| maximum at f0");
        assertEquals(L / (C * r), zAbs(s, F0), 1e-3 * L / (C * r), "common practice: dynamic resistance L/(CR)");
    }

    @Test
    void qAndHalfPowerBandwidth() {
        double r = 0.5;
        TuningResult res = Tuner.tune(LinkDesign.of(Topology.SERIES_TANK, LinkValues.tank(L, r), F0, Source.sine(10), null)
                .withCapacitors(C, 0));
        double w0 = 2 * Math.PI * F0;
        assertEquals(w0 * L / r, res.tankQ(), 1e-9 * res.tankQ(), "common practice: Q = ω0L/R = (1/R)√(L/C)");
        PhasorSolver s = tank(Topology.SERIES_TANK, r, Source.sine(10));
        int l = s.indexOf(Topologies.L1);
        s.solve(F0);
        double pMax = s.loss(l);
        double f1 = halfPower(s, l, pMax, F0 * 0.5, F0);
        double f2 = halfPower(s, l, pMax, F0, F0 * 2);
        assertEquals(F0 / res.tankQ(), f2 - f1, 1e-9 * F0, "common practice: half-power bandwidth of a series RLC is f0/Q");
    }

    private static double halfPower(PhasorSolver s, int l, double pMax, double a, double b) {
        s.solve(a);
        double fa = s.loss(l) - pMax / 2;
        for (int i = 0; i < 200; i++) {
            double m = (a + b) / 2;
            s.solve(m);
            double fm = s.loss(l) - pMax / 2;
            if ((fm > 0) == (fa > 0)) {
                a = m;
                fa = fm;
            } else {
                b = m;
            }
        }
        return (a + b) / 2;
    }

    @Test
    void capacitorVoltageOfSeriesTankIsQTimesDrive() {
        double r = 0.5;
        OperatingPoint op = OperatingPoint.solve(Topologies.tank(Topology.SERIES_TANK, L, r, CapacitorSpec.ideal(C),
                Source.sine(10)), Topology.SERIES_TANK, Source.sine(10), null, F0, BridgeParts.NONE);
        double q = Math.sqrt(L / C) / r;
        assertEquals(q * 10, op.stress(Topologies.C1).vRms(), 1e-9 * q * 10, "common practice: V_C = Q·V_in at f0");
        assertTrue(op.keyValues().containsKey("v_c1_peak_V"));
    }
}
