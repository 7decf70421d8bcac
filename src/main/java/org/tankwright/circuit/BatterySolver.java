package org.tankwright.circuit;

/**
 * Solves a battery load as a voltage sink: finds the AC resistance R at which the fundamental
 * voltage across the load element equals the battery's fundamental (2√2/π)·Vbat, by iteration on
 * the full network. |V_load(R)| rises monotonically with R for a passive linear network seen through
 * its Thevenin equivalent (|V| = |Vth|·R/|R + Zth| with Re Zth ≥ 0), so a bracketed root search on
 * log R converges. When the open-circuit fundamental does not exceed the battery's, the rectifier
 * never conducts and the load is open (+∞).
 */
public final class BatterySolver {
    private static final int MAX_ITERATIONS = 200;

    private BatterySolver() {
    }

    /**
     * Sets the load element's resistance to the battery's equivalent and leaves the solver solved
     * there; returns that resistance (+∞ when the rectifier does not conduct).
     */
    public static double solve(PhasorSolver s, int load, double f, double vFundamental) {
        s.setResistance(load, Double.POSITIVE_INFINITY);
        boolean unbounded = false;
        try {
            s.solve(f);
        } catch (IllegalStateException singular) {
            unbounded = true; // a lossless resonance with the load open: the open-circuit voltage has no bound
        }
        if (!unbounded && s.voltageRms(load) <= vFundamental) {
            return Double.POSITIVE_INFINITY;
        }
        double hi = 1;
        int guard = 0;
        while (residual(s, load, f, hi, vFundamental) <= 0) {
            hi *= 10;
            if (++guard > 40) {
                throw new IllegalStateException("battery solve: no load resistance up to " + hi + " Ω reaches the battery voltage");
            }
        }
        double lo = hi / 10;
        guard = 0;
        while (residual(s, load, f, lo, vFundamental) > 0) {
            hi = lo;
            lo /= 10;
            if (++guard > 40) {
                s.setResistance(load, 0);
                s.solve(f);
                return 0;
            }
        }
        // Illinois regula falsi on ln R.
        double a = Math.log(lo);
        double b = Math.log(hi);
        double fa = residual(s, load, f, lo, vFundamental);
        double fb = residual(s, load, f, hi, vFundamental);
        int side = 0;
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            double x = (a * fb - b * fa) / (fb - fa);
            double fx = residual(s, load, f, Math.exp(x), vFundamental);
            if (Math.abs(fx) <= 1e-13 * vFundamental || Math.abs(b - a) < 1e-15) {
                return Math.exp(x);
            }
            if (fx * fb > 0) {
                b = x;
                fb = fx;
                if (side == -1) {
                    fa /= 2;
                }
                side = -1;
            } else {
                a = x;
                fa = fx;
                if (side == 1) {
                    fb /= 2;
                }
                side = 1;
            }
        }
        throw new IllegalStateException("battery solve did not converge in " + MAX_ITERATIONS + " iterations");
    }

    private static double residual(PhasorSolver s, int load, double f, double r, double v) {
        s.setResistance(load, r);
        s.solve(f);
        return s.voltageRms(load) - v;
    }
}
