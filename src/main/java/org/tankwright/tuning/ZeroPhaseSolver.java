package org.tankwright.tuning;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Topologies;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

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
        double center = Math.log(c1Guess);
        double[] xs = new double[SCAN];
        double[] fs = new double[SCAN];
        int best = 0;
        for (int i = 0; i < SCAN; i++) {
            xs[i] = lo + (hi - lo) * i / (SCAN - 1);
            fs[i] = phaseError(s, f, c1, src, xs[i], targetDeg);
            if (Math.abs(fs[i]) < Math.abs(fs[best])) {
                best = i;
            }
        }
        // Every sign change brackets a crossing; try them nearest the starting value first. A bracket
        // around a lossless pole or zero (the phase jumps between ±90° there) refines to a point whose
        // phase misses the target, and is skipped.
        List<Integer> brackets = new ArrayList<>();
        for (int i = 1; i < SCAN; i++) {
            if (fs[i - 1] * fs[i] <= 0) {
                brackets.add(i);
            }
        }
        brackets.sort(Comparator.comparingDouble(i -> Math.abs((xs[i - 1] + xs[i]) / 2 - center)));
        BrentSolver brent = new BrentSolver(1e-14, 1e-15);
        for (int i : brackets) {
            double x = fs[i - 1] == 0 ? xs[i - 1] : fs[i] == 0 ? xs[i]
                    : brent.solve(200, v -> phaseError(s, f, c1, src, v, targetDeg), xs[i - 1], xs[i]);
            double err = phaseError(s, f, c1, src, x, targetDeg);
            if (Math.abs(err) < 1e-6) {
                return new PhaseSolve(Math.exp(x), s.inputPhaseDeg(src), targetDeg, true,
                        "solved with losses (Brent on ln C1)");
            }
        }
        double c = Math.exp(xs[best]);
        s.setCapacitance(c1, c);
        s.solve(f);
        return new PhaseSolve(c, s.inputPhaseDeg(src), targetDeg, false,
                "no C1 within a factor 1000 of " + c1Guess + " F reaches the target phase; closest taken");
    }

    private static double phaseError(PhasorSolver s, double f, int c1, int src, double lnC, double target) {
        s.setCapacitance(c1, Math.exp(lnC));
        s.solve(f);
        return s.inputPhaseDeg(src) - target;
    }
}
