package org.tankwright.tuning;

import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Topologies;

/**
 * The maximum link efficiency and the load that gives it. SS closed forms (with k²Q1Q2 the link's
 * figure of merit): ηmax = k²Q1Q2 / (1 + √(1 + k²Q1Q2))² at RL,opt = R2·√(1 + k²Q1Q2). The numerical
 * optimum over the AC load resistance, for any topology, with the capacitors as they are: a
 * logarithmic scan over ten decades around ωL2 and a golden-section refinement.
 *
 * @param efficiency the maximum efficiency (a fraction)
 * @param load       the AC load resistance that gives it (Ω)
 * @param model      where the numbers come from
 */
public record EfficiencyOptimum(double efficiency, double load, String model) {
    private static final int SCAN = 201;
    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    /** SS closed form; q1 = ωL1/R1, q2 = ωL2/R2. */
    public static EfficiencyOptimum seriesSeriesClosedForm(double k, double q1, double q2, double r2) {
        double fom = k * k * q1 * q2;
        double root = Math.sqrt(1 + fom);
        return new EfficiencyOptimum(fom / ((1 + root) * (1 + root)), r2 * root,
                "SS closed form ηmax = k²Q1Q2/(1+√(1+k²Q1Q2))², RL,opt = R2·√(1+k²Q1Q2)");
    }

    /** Numerical optimum over the load element's resistance at frequency f; restores the load afterwards. */
    public static EfficiencyOptimum numerical(PhasorSolver s, double f) {
        int ld = s.indexOf(Topologies.LOAD);
        int l2 = s.indexOf(Topologies.L2);
        double keep = s.resistance(ld);
        try {
            double x2 = 2 * Math.PI * f * s.inductance(l2);
            double a = Math.log(x2 * 1e-5);
            double b = Math.log(x2 * 1e5);
            int best = 0;
            double bestEta = -1;
            for (int i = 0; i < SCAN; i++) {
                double eta = eta(s, f, ld, a + (b - a) * i / (SCAN - 1));
                if (eta > bestEta) {
                    bestEta = eta;
                    best = i;
                }
            }
            double step = (b - a) / (SCAN - 1);
            double lo = a + step * Math.max(0, best - 1);
            double hi = a + step * Math.min(SCAN - 1, best + 1);
            double x1 = hi - GOLDEN * (hi - lo);
            double x3 = lo + GOLDEN * (hi - lo);
            double e1 = eta(s, f, ld, x1);
            double e3 = eta(s, f, ld, x3);
            for (int it = 0; it < 80 && hi - lo > 1e-10; it++) {
                if (e1 > e3) {
                    hi = x3;
                    x3 = x1;
                    e3 = e1;
                    x1 = hi - GOLDEN * (hi - lo);
                    e1 = eta(s, f, ld, x1);
                } else {
                    lo = x1;
                    x1 = x3;
                    e1 = e3;
                    x3 = lo + GOLDEN * (hi - lo);
                    e3 = eta(s, f, ld, x3);
                }
            }
            double x = (lo + hi) / 2;
            return new EfficiencyOptimum(eta(s, f, ld, x), Math.exp(x),
                    "numerical maximum of P_load/P_in over the AC load resistance (solver, capacitors as set)");
        } finally {
            s.setResistance(ld, keep);
        }
    }

    private static double eta(PhasorSolver s, double f, int ld, double lnR) {
        s.setResistance(ld, Math.exp(lnR));
        s.solve(f);
        double in = s.sourceTerminalPower(s.network().sourceIndex());
        return in > 0 ? s.loss(ld) / in : 0;
    }
}
