package org.tankwright.tuning;

import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Topologies;

import java.util.ArrayList;
import java.util.List;

/**
 * Zero-phase frequencies and bifurcation. A design is bifurcated when its input phase crosses zero
 * more than once in the band around the design frequency (Wang, Covic &amp; Stielau 2004): the
 * controller can then lock onto the wrong one. Crossings are found by the sign of the input
 * reactive power on a dense logarithmic grid and refined by bisection. The load or coupling at
 * which a design becomes bifurcated is found by counting crossings across the load or coupling
 * axis, with the capacitors as they are.
 */
public final class Bifurcation {
    /** Grid points across the band for the crossing search. */
    public static final int GRID = 1200;

    private Bifurcation() {
    }

    /** Every zero-phase frequency in [f/2, 2f] (Hz, ascending). */
    public static double[] zeroPhaseFrequencies(PhasorSolver s, double f) {
        return zeroPhaseFrequencies(s, f / 2, 2 * f);
    }

    /** Every zero-phase frequency in [fMin, fMax] (Hz, ascending). */
    public static double[] zeroPhaseFrequencies(PhasorSolver s, double fMin, double fMax) {
        int src = s.network().sourceIndex();
        List<Double> roots = new ArrayList<>();
        double prevF = fMin;
        double prevQ = reactive(s, src, fMin);
        if (prevQ == 0) {
            roots.add(fMin);
        }
        for (int i = 1; i < GRID; i++) {
            double f = fMin * Math.pow(fMax / fMin, (double) i / (GRID - 1));
            double q = reactive(s, src, f);
            if (q == 0) {
                roots.add(f);
            } else if (prevQ != 0 && (q > 0) != (prevQ > 0)) {
                roots.add(bisect(s, src, prevF, f, prevQ));
            }
            prevF = f;
            prevQ = q;
        }
        double[] out = new double[roots.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = roots.get(i);
        }
        return out;
    }

    /** Number of zero-phase frequencies in [f/2, 2f] (sign changes on the grid, without refining them). */
    public static int count(PhasorSolver s, double f) {
        int src = s.network().sourceIndex();
        double fMin = f / 2;
        double ratio = 4;
        double prevQ = reactive(s, src, fMin);
        int n = prevQ == 0 ? 1 : 0;
        for (int i = 1; i < GRID; i++) {
            double q = reactive(s, src, fMin * Math.pow(ratio, (double) i / (GRID - 1)));
            if (q == 0 || (prevQ != 0 && (q > 0) != (prevQ > 0))) {
                n++;
            }
            prevQ = q;
        }
        return n;
    }

    private static double reactive(PhasorSolver s, int src, double f) {
        s.solve(f);
        return s.inputReactivePower(src);
    }

    private static double bisect(PhasorSolver s, int src, double a, double b, double qa) {
        for (int it = 0; it < 100 && (b - a) > 1e-13 * b; it++) {
            double m = Math.sqrt(a * b);
            double qm = reactive(s, src, m);
            if (qm == 0) {
                return m;
            }
            if ((qm > 0) == (qa > 0)) {
                a = m;
                qa = qm;
            } else {
                b = m;
            }
        }
        return Math.sqrt(a * b);
    }

    /**
     * Load resistances (AC Ω) in [rMin, rMax] at which the number of zero-phase frequencies in
     * [f/2, 2f] changes, ascending; empty when it never changes. Restores the load afterwards.
     */
    public static double[] loadThresholds(PhasorSolver s, double f, double rMin, double rMax) {
        int ld = s.indexOf(Topologies.LOAD);
        double keep = s.resistance(ld);
        try {
            return thresholds(x -> {
                s.setResistance(ld, x);
                return count(s, f);
            }, rMin, rMax, true);
        } finally {
            s.setResistance(ld, keep);
        }
    }

    /**
     * Coupling factors in [kMin, kMax] (L1, L2 fixed) at which the number of zero-phase frequencies
     * changes, ascending. Restores the coupling afterwards.
     */
    public static double[] couplingThresholds(PhasorSolver s, double f, double kMin, double kMax) {
        double keep = s.mutual(0);
        double root = Math.sqrt(s.inductance(s.indexOf(Topologies.L1)) * s.inductance(s.indexOf(Topologies.L2)));
        try {
            return thresholds(k -> {
                s.setMutual(0, k * root);
                return count(s, f);
            }, kMin, kMax, false);
        } finally {
            s.setMutual(0, keep);
        }
    }

    private static double[] thresholds(java.util.function.DoubleToIntFunction counter, double a, double b, boolean log) {
        final int n = 41;
        List<Double> out = new ArrayList<>();
        double prevX = a;
        int prevC = counter.applyAsInt(a);
        for (int i = 1; i < n; i++) {
            double t = (double) i / (n - 1);
            double x = log ? a * Math.pow(b / a, t) : a + (b - a) * t;
            int c = counter.applyAsInt(x);
            if (c != prevC) {
                double lo = prevX;
                double hi = x;
                for (int it = 0; it < 34; it++) { // bracket ÷ 2³⁴: below 1e-10 relative
                    double m = log ? Math.sqrt(lo * hi) : (lo + hi) / 2;
                    if (counter.applyAsInt(m) == prevC) {
                        lo = m;
                    } else {
                        hi = m;
                    }
                }
                out.add(log ? Math.sqrt(lo * hi) : (lo + hi) / 2);
            }
            prevX = x;
            prevC = c;
        }
        double[] r = new double[out.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = out.get(i);
        }
        return r;
    }
}
