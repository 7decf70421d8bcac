package org.tankwright.circuit;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Sweeps of a solved network against frequency, load resistance or mutual inductance, as
 * {@link SweepSeries}. They use the solver's element values and source value as set; only
 * the swept quantity changes, and it is restored afterwards. Linear loads only (a battery's
 * equivalent resistance moves with the point: use {@link OperatingPoint} per point instead).
 * Per point the solver allocates nothing; the series arrays are allocated once.
 */
public final class Sweeps {
    /** Series names every sweep returns. */
    public static final String Z_ABS = "z_abs_ohm";
    public static final String PHASE = "phase_deg";
    public static final String P_IN = "p_in_W";
    public static final String P_OUT = "p_out_W";
    public static final String EFFICIENCY = "efficiency";
    public static final String I_L1 = "i_l1_A";
    public static final String I_L2 = "i_l2_A";
    public static final String V_C1 = "v_c1_V";
    public static final String V_C2 = "v_c2_V";

    private Sweeps() {
    }

    /** Evenly (log = geometric) spaced points from a to b inclusive. */
    public static double[] points(double a, double b, int n, boolean log) {
        if (n < 2) {
            throw new IllegalArgumentException("a sweep needs at least 2 points, got " + n);
        }
        if (log && !(a > 0 && b > 0)) {
            throw new IllegalArgumentException("a logarithmic sweep needs positive ends, got " + a + " and " + b);
        }
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double t = (double) i / (n - 1);
            x[i] = log ? a * Math.pow(b / a, t) : a + (b - a) * t;
        }
        return x;
    }

    /** Against frequency (Hz). */
    public static SweepSeries frequency(PhasorSolver s, double fMin, double fMax, int n, boolean log) {
        double[] f = points(fMin, fMax, n, log);
        Recorder rec = new Recorder(s, n);
        for (int i = 0; i < n; i++) {
            s.solve(f[i]);
            rec.record(i);
        }
        return rec.series("frequency_Hz", f);
    }

    /** Against the load element's AC resistance (Ω) at frequency f. */
    public static SweepSeries load(PhasorSolver s, double f, double rMin, double rMax, int n, boolean log) {
        int ld = s.indexOf(Topologies.LOAD);
        double keep = s.resistance(ld);
        double[] r = points(rMin, rMax, n, log);
        Recorder rec = new Recorder(s, n);
        try {
            for (int i = 0; i < n; i++) {
                s.setResistance(ld, r[i]);
                s.solve(f);
                rec.record(i);
            }
        } finally {
            s.setResistance(ld, keep);
        }
        return rec.series("load_ohm", r);
    }

    /**
     * Against the coupling factor k at frequency f, with L1 and L2 fixed (for coils whose
     * inductances move with the gap, use the operating envelope's coupling table).
     */
    public static SweepSeries coupling(PhasorSolver s, double f, double kMin, double kMax, int n) {
        if (s.couplingCount() == 0) {
            throw new IllegalArgumentException("the network has no coupled coils to sweep");
        }
        double keep = s.mutual(0);
        double root = Math.sqrt(s.inductance(s.indexOf(Topologies.L1)) * s.inductance(s.indexOf(Topologies.L2)));
        double[] k = points(kMin, kMax, n, false);
        Recorder rec = new Recorder(s, n);
        try {
            for (int i = 0; i < n; i++) {
                s.setMutual(0, k[i] * root);
                s.solve(f);
                rec.record(i);
            }
        } finally {
            s.setMutual(0, keep);
        }
        return rec.series("coupling_k", k);
    }

    /** Fills the standard series from the solver's state after each solve. */
    private static final class Recorder {
        private final PhasorSolver s;
        private final int src;
        private final int l1;
        private final int c1;
        private final int l2;
        private final int c2;
        private final int load;
        private final double[] z;
        private final double[] phase;
        private final double[] pIn;
        private final double[] pOut;
        private final double[] eff;
        private final double[] iL1;
        private final double[] vC1;
        private final double[] iL2;
        private final double[] vC2;
        private final double[] zz = new double[2];

        Recorder(PhasorSolver s, int n) {
            this.s = s;
            Network net = s.network();
            src = net.sourceIndex();
            l1 = net.indexOf(Topologies.L1);
            c1 = net.indexOf(Topologies.C1);
            l2 = net.has(Topologies.L2) ? net.indexOf(Topologies.L2) : -1;
            c2 = net.has(Topologies.C2) ? net.indexOf(Topologies.C2) : -1;
            load = net.has(Topologies.LOAD) ? net.indexOf(Topologies.LOAD) : -1;
            z = new double[n];
            phase = new double[n];
            pIn = new double[n];
            pOut = new double[n];
            eff = new double[n];
            iL1 = new double[n];
            vC1 = new double[n];
            iL2 = l2 >= 0 ? new double[n] : null;
            vC2 = c2 >= 0 ? new double[n] : null;
        }

        void record(int i) {
            s.inputImpedance(src, zz);
            z[i] = Math.hypot(zz[0], zz[1]);
            phase[i] = s.inputPhaseDeg(src);
            double in = s.sourceTerminalPower(src);
            double out = load >= 0 ? s.loss(load) : s.loss(l1);
            pIn[i] = in;
            pOut[i] = out;
            eff[i] = in > 0 ? out / in : 0;
            iL1[i] = s.currentRms(l1);
            vC1[i] = s.voltageRms(c1);
            if (iL2 != null) {
                iL2[i] = s.currentRms(l2);
            }
            if (vC2 != null) {
                vC2[i] = s.voltageRms(c2);
            }
        }

        SweepSeries series(String xName, double[] x) {
            Map<String, double[]> m = new LinkedHashMap<>();
            m.put(Z_ABS, z);
            m.put(PHASE, phase);
            m.put(P_IN, pIn);
            m.put(P_OUT, pOut);
            m.put(EFFICIENCY, eff);
            m.put(I_L1, iL1);
            m.put(V_C1, vC1);
            if (iL2 != null) {
                m.put(I_L2, iL2);
            }
            if (vC2 != null) {
                m.put(V_C2, vC2);
            }
            return new SweepSeries(xName, x, m);
        }
    }
}
