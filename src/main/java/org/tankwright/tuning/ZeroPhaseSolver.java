package org.tankwright.tuning;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Topologies;

/**
 * Moves C1 alone, with every loss in the network, until the input phase arg(V/I) at the source
 * equals a target (0° for the textbook zero-phase-angle case, or a small inductive angle so the
 * bridge switches at zero voltage). The phase is monotonic in C1 for a series primary (the
 * reactance rises with C1) and very nearly so for a parallel one, so a scan on log C1 over three
 * decades either side of the starting value brackets the root, and Brent's method refines it.
 */
public final class ZeroPhaseSolver {
    private static final int SCAN = 121;
    private static final double SPAN = 1e3;

    private ZeroPhaseSolver() {
    }

    /** Solves on the solver's network at frequency f, starting near {@code c1Guess}; leaves C1 set to the result. */
    public static PhaseSolve solve(PhasorSolver s, double f, double targetDeg, double c1Guess) {
        if (!(Math.abs(targetDeg) < 90)) {
            throw new IllegalArgumentException("target phase " + targetDeg + "° must be between −90° and 90°");
        }
        int c1 = s.indexOf(Topologies.C1);
        int src = s.network().sourceIndex();
        double lo = Math.log(c1Guess / SPAN);
        double hi = Math.log(c1Guess * SPAN);
        double bestX = Math.log(c1Guess);
        double bestErr = Double.POSITIVE_INFINITY;
        double prevX = Double.NaN;
        double prevF = Double.NaN;
        double rootA = Double.NaN;
        double rootB = Double.NaN;
        double center = Math.log(c1Guess);
        for (int i = 0; i < SCAN; i++) {
            double x = lo + (hi - lo) * i / (SCAN - 1);
            double fx = phaseError(s, f, c1, src, x, targetDeg);
            if (Math.abs(fx) < bestErr) {
                bestErr = Math.abs(fx);
                bestX = x;
            }
            if (i > 0 && prevF * fx <= 0 && Math.abs(prevF - fx) < 90) {
                boolean closer = Double.isNaN(rootA) || Math.abs(x - center) < Math.abs(rootB - center);
                if (closer) {
                    rootA = prevX;
                    rootB = x;
                }
            }
            prevX = x;
            prevF = fx;
        }
        if (Double.isNaN(rootA)) {
            double c = Math.exp(bestX);
            s.setCapacitance(c1, c);
            s.solve(f);
            return new PhaseSolve(c, s.inputPhaseDeg(src), targetDeg, false,
                    "no C1 within a factor 1000 of " + c1Guess + " F reaches the target phase; closest taken");
        }
        BrentSolver brent = new BrentSolver(1e-14, 1e-15);
        double x = brent.solve(200, v -> phaseError(s, f, c1, src, v, targetDeg), rootA, rootB);
        double c = Math.exp(x);
        s.setCapacitance(c1, c);
        s.solve(f);
        return new PhaseSolve(c, s.inputPhaseDeg(src), targetDeg, true, "solved with losses (Brent on ln C1)");
    }

    private static double phaseError(PhasorSolver s, double f, int c1, int src, double lnC, double target) {
        s.setCapacitance(c1, Math.exp(lnC));
        s.solve(f);
        return s.inputPhaseDeg(src) - target;
    }
}
