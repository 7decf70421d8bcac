package org.tankwright.circuit;

import java.util.List;

/**
 * Solves a {@link Network} at one frequency by modified nodal analysis: the unknowns are the
 * node voltages (node 0 is the reference) and the currents of the elements that need one (voltage
 * sources, coupled coils, zero impedances); the other impedances enter as admittances, current
 * sources on the right-hand side and opens not at all, so every network fits one matrix. Complex arithmetic on primitive arrays; the
 * workspace is allocated once, so repeated solves (sweeps, root finding) allocate nothing.
 *
 * <p>Element values can be changed in place with the setters (a sweep over load, capacitance or
 * coupling needs no new network). Not thread-safe: use one solver per thread.
 */
public final class PhasorSolver {
    /** Squared ratio of the smallest to the largest pivot below which the system counts as singular (1e-14). */
    private static final double SINGULAR_RATIO_SQUARED = 1e-28;
    private final Network network;
    private final int nodes;
    private final int count;
    private int size;
    private final boolean[] coupled;
    private final int[] unknown;
    private final double[] zr;
    private final double[] zx;
    private final Element.Kind[] kind;
    private final int[] na;
    private final int[] nb;
    private final double[] r;
    private final double[] l;
    private final double[] c;
    private final double[] value;
    private final int[] kFirst;
    private final int[] kSecond;
    private final double[] kM;
    private final double[] are;
    private final double[] aim;
    private final double[] xre;
    private final double[] xim;
    private final double[] vRe;
    private final double[] vIm;
    private final double[] iRe;
    private final double[] iIm;
    private double frequency = Double.NaN;

    public PhasorSolver(Network network) {
        this.network = network;
        List<Element> els = network.elements();
        nodes = network.nodeCount();
        count = els.size();
        int maxSize = nodes - 1 + count;
        coupled = new boolean[count];
        unknown = new int[count];
        zr = new double[count];
        zx = new double[count];
        kind = new Element.Kind[count];
        na = new int[count];
        nb = new int[count];
        r = new double[count];
        l = new double[count];
        c = new double[count];
        value = new double[count];
        for (int j = 0; j < count; j++) {
            Element e = els.get(j);
            kind[j] = e.kind();
            na[j] = e.a();
            nb[j] = e.b();
            r[j] = e.r();
            l[j] = e.l();
            c[j] = e.c();
            value[j] = e.value();
        }
        int nk = network.couplings().size();
        kFirst = new int[nk];
        kSecond = new int[nk];
        kM = new double[nk];
        for (int k = 0; k < nk; k++) {
            Coupling cp = network.couplings().get(k);
            kFirst[k] = cp.first();
            kSecond[k] = cp.second();
            kM[k] = cp.m();
            coupled[cp.first()] = true;
            coupled[cp.second()] = true;
        }
        are = new double[maxSize * maxSize];
        aim = new double[maxSize * maxSize];
        xre = new double[maxSize];
        xim = new double[maxSize];
        vRe = new double[count];
        vIm = new double[count];
        iRe = new double[count];
        iIm = new double[count];
    }

    public Network network() {
        return network;
    }

    public int elementCount() {
        return count;
    }

    /** Index of the named element. */
    public int indexOf(String name) {
        return network.indexOf(name);
    }

    /** Sets an element's series resistance; for an impedance element, +∞ makes it an open circuit. */
    public void setResistance(int element, double ohms) {
        if (!(ohms >= 0)) {
            throw new IllegalArgumentException("resistance of " + name(element) + " must be ≥ 0, got " + ohms);
        }
        r[element] = ohms;
    }

    public double resistance(int element) {
        return r[element];
    }

    public void setCapacitance(int element, double farads) {
        if (!(farads > 0)) {
            throw new IllegalArgumentException("capacitance of " + name(element) + " must be > 0, got " + farads);
        }
        c[element] = farads;
    }

    public double capacitance(int element) {
        return c[element];
    }

    public void setInductance(int element, double henries) {
        if (!(henries >= 0) || Double.isInfinite(henries)) {
            throw new IllegalArgumentException("inductance of " + name(element) + " must be finite and ≥ 0, got " + henries);
        }
        l[element] = henries;
    }

    public double inductance(int element) {
        return l[element];
    }

    /** Sets a source's rms EMF (voltage source) or rms current (current source). */
    public void setSourceValue(int element, double v) {
        value[element] = v;
    }

    public double sourceValue(int element) {
        return value[element];
    }

    /** Sets the mutual inductance of coupling number {@code k}. */
    public void setMutual(int k, double m) {
        kM[k] = m;
    }

    public double mutual(int k) {
        return kM[k];
    }

    public int couplingCount() {
        return kM.length;
    }

    private String name(int element) {
        return network.elements().get(element).name();
    }

    /** Solves at frequency {@code f} (Hz); results are read with the accessors until the next solve. */
    public void solve(double f) {
        if (!(f > 0) || Double.isInfinite(f)) {
            throw new IllegalArgumentException("frequency " + f + " Hz must be positive and finite");
        }
        frequency = f;
        final double w = 2 * Math.PI * f;
        final int off = nodes - 1;
        // Unknowns: node voltages, then a current for each element that needs one (sources, coupled
        // coils, zero impedances). Other impedances are stamped as admittances: a smaller system.
        int n = off;
        for (int j = 0; j < count; j++) {
            Element.Kind k = kind[j];
            double x = w * l[j] - (Double.isInfinite(c[j]) ? 0 : 1 / (w * c[j]));
            zr[j] = r[j];
            zx[j] = x;
            if (k == Element.Kind.OPEN || k == Element.Kind.CURRENT_SOURCE
                    || (k == Element.Kind.IMPEDANCE && Double.isInfinite(r[j]))) {
                unknown[j] = -1;
            } else if (k == Element.Kind.VOLTAGE_SOURCE || coupled[j] || (r[j] == 0 && x == 0)) {
                unknown[j] = n++;
            } else {
                unknown[j] = -2;
            }
        }
        size = n;
        java.util.Arrays.fill(are, 0, n * n, 0.0);
        java.util.Arrays.fill(aim, 0, n * n, 0.0);
        java.util.Arrays.fill(xre, 0, n, 0.0);
        java.util.Arrays.fill(xim, 0, n, 0.0);
        for (int j = 0; j < count; j++) {
            int a = na[j] - 1;
            int b = nb[j] - 1;
            int u = unknown[j];
            if (u == -2) {
                double d = zr[j] * zr[j] + zx[j] * zx[j];
                double yr = zr[j] / d;
                double yi = -zx[j] / d;
                if (a >= 0) {
                    are[a * n + a] += yr;
                    aim[a * n + a] += yi;
                }
                if (b >= 0) {
                    are[b * n + b] += yr;
                    aim[b * n + b] += yi;
                }
                if (a >= 0 && b >= 0) {
                    are[a * n + b] -= yr;
                    aim[a * n + b] -= yi;
                    are[b * n + a] -= yr;
                    aim[b * n + a] -= yi;
                }
            } else if (u == -1) {
                if (kind[j] == Element.Kind.CURRENT_SOURCE) {
                    // the element current (a to b) is −J: it delivers J out of terminal a
                    if (a >= 0) {
                        xre[a] += value[j];
                    }
                    if (b >= 0) {
                        xre[b] -= value[j];
                    }
                }
            } else {
                // KCL: the element's current leaves node a and enters node b
                if (a >= 0) {
                    are[a * n + u] += 1;
                    are[u * n + a] += 1;
                }
                if (b >= 0) {
                    are[b * n + u] -= 1;
                    are[u * n + b] -= 1;
                }
                // V(a) − V(b) − Z·I − Σ jωM·I_k = E
                are[u * n + u] -= zr[j];
                aim[u * n + u] -= zx[j];
                if (kind[j] == Element.Kind.VOLTAGE_SOURCE) {
                    xre[u] = value[j];
                }
            }
        }
        for (int k = 0; k < kM.length; k++) {
            int p = unknown[kFirst[k]];
            int q = unknown[kSecond[k]];
            double xm = w * kM[k];
            aim[p * n + q] -= xm;
            aim[q * n + p] -= xm;
        }
        eliminate();
        for (int j = 0; j < count; j++) {
            int a = na[j] - 1;
            int b = nb[j] - 1;
            double vr = 0;
            double vi = 0;
            if (a >= 0) {
                vr += xre[a];
                vi += xim[a];
            }
            if (b >= 0) {
                vr -= xre[b];
                vi -= xim[b];
            }
            vRe[j] = vr;
            vIm[j] = vi;
            int u = unknown[j];
            if (u >= 0) {
                iRe[j] = xre[u];
                iIm[j] = xim[u];
            } else if (u == -2) {
                double d = zr[j] * zr[j] + zx[j] * zx[j];
                iRe[j] = (vr * zr[j] + vi * zx[j]) / d;
                iIm[j] = (vi * zr[j] - vr * zx[j]) / d;
            } else {
                iRe[j] = kind[j] == Element.Kind.CURRENT_SOURCE ? -value[j] : 0;
                iIm[j] = 0;
            }
        }
    }

    /** Gaussian elimination with partial pivoting, in place; the solution replaces the right-hand side. */
    private void eliminate() {
        final int n = size;
        double maxPivot = 0;
        double minPivot = Double.POSITIVE_INFINITY;
        for (int col = 0; col < n; col++) {
            int piv = col;
            double best = are[col * n + col] * are[col * n + col] + aim[col * n + col] * aim[col * n + col];
            for (int row = col + 1; row < n; row++) {
                double m2 = are[row * n + col] * are[row * n + col] + aim[row * n + col] * aim[row * n + col];
                if (m2 > best) {
                    best = m2;
                    piv = row;
                }
            }
            if (!(best > 0)) {
                throw new IllegalStateException("the network is singular at " + frequency
                        + " Hz (a loop of ideal sources, a floating node or a cut of current sources)");
            }
            if (piv != col) {
                swapRows(piv, col);
            }
            maxPivot = Math.max(maxPivot, best);
            minPivot = Math.min(minPivot, best);
            double pr = are[col * n + col];
            double pi = aim[col * n + col];
            double inv = 1 / (pr * pr + pi * pi);
            double qr = pr * inv;
            double qi = -pi * inv;
            for (int row = col + 1; row < n; row++) {
                double er = are[row * n + col];
                double ei = aim[row * n + col];
                if (er == 0 && ei == 0) {
                    continue;
                }
                double fr = er * qr - ei * qi;
                double fi = er * qi + ei * qr;
                for (int k = col; k < n; k++) {
                    double ar = are[col * n + k];
                    double ai = aim[col * n + k];
                    are[row * n + k] -= fr * ar - fi * ai;
                    aim[row * n + k] -= fr * ai + fi * ar;
                }
                xre[row] -= fr * xre[col] - fi * xim[col];
                xim[row] -= fr * xim[col] + fi * xre[col];
            }
        }
        if (minPivot < SINGULAR_RATIO_SQUARED * maxPivot) {
            throw new IllegalStateException("the network is singular at " + frequency + " Hz: a lossless resonance "
                    + "(enter the coil and capacitor resistances) or a floating node");
        }
        for (int row = n - 1; row >= 0; row--) {
            double sr = xre[row];
            double si = xim[row];
            for (int k = row + 1; k < n; k++) {
                double ar = are[row * n + k];
                double ai = aim[row * n + k];
                sr -= ar * xre[k] - ai * xim[k];
                si -= ar * xim[k] + ai * xre[k];
            }
            double pr = are[row * n + row];
            double pi = aim[row * n + row];
            double inv = 1 / (pr * pr + pi * pi);
            xre[row] = (sr * pr + si * pi) * inv;
            xim[row] = (si * pr - sr * pi) * inv;
        }
    }

    private void swapRows(int p, int q) {
        final int n = size;
        for (int k = 0; k < n; k++) {
            double t = are[p * n + k];
            are[p * n + k] = are[q * n + k];
            are[q * n + k] = t;
            t = aim[p * n + k];
            aim[p * n + k] = aim[q * n + k];
            aim[q * n + k] = t;
        }
        double t = xre[p];
        xre[p] = xre[q];
        xre[q] = t;
        t = xim[p];
        xim[p] = xim[q];
        xim[q] = t;
    }

    /** The frequency of the last solve. */
    public double frequency() {
        return frequency;
    }

    public double voltageRe(int j) {
        return vRe[j];
    }

    public double voltageIm(int j) {
        return vIm[j];
    }

    public double currentRe(int j) {
        return iRe[j];
    }

    public double currentIm(int j) {
        return iIm[j];
    }

    /** rms voltage across element j (V(a) − V(b)). */
    public double voltageRms(int j) {
        return Math.hypot(vRe[j], vIm[j]);
    }

    /** rms current through element j. */
    public double currentRms(int j) {
        return Math.hypot(iRe[j], iIm[j]);
    }

    /** Power dissipated in the element's series resistance, |I|²·R (zero for an open element). */
    public double loss(int j) {
        if (kind[j] == Element.Kind.OPEN || kind[j] == Element.Kind.CURRENT_SOURCE || Double.isInfinite(r[j])) {
            return 0;
        }
        return (iRe[j] * iRe[j] + iIm[j] * iIm[j]) * r[j];
    }

    /** Power delivered by a source element at its terminals (after its own series resistance), W. */
    public double sourceTerminalPower(int j) {
        return -(vRe[j] * iRe[j] + vIm[j] * iIm[j]);
    }

    /**
     * Impedance seen by source element j at its terminals, V/I with I out of its positive terminal
     * (real and imaginary part written to {@code out[0]}, {@code out[1]}).
     */
    public void inputImpedance(int j, double[] out) {
        double vr = vRe[j];
        double vi = vIm[j];
        double ir = -iRe[j];
        double ii = -iIm[j];
        double d = ir * ir + ii * ii;
        out[0] = (vr * ir + vi * ii) / d;
        out[1] = (vi * ir - vr * ii) / d;
    }

    /** The reactance sign-carrying input phase arg(V/I) at source j in degrees, positive inductive. */
    public double inputPhaseDeg(int j) {
        double vr = vRe[j];
        double vi = vIm[j];
        double ir = -iRe[j];
        double ii = -iIm[j];
        return Math.toDegrees(Math.atan2(vi * ir - vr * ii, vr * ir + vi * ii));
    }

    /** Imaginary part of V·conj(I) at source j: positive when the load it sees is inductive. */
    public double inputReactivePower(int j) {
        return -(vIm[j] * iRe[j] - vRe[j] * iIm[j]);
    }

    /** An immutable copy of the last solve. */
    public Solution solution() {
        return new Solution(network, frequency, vRe.clone(), vIm.clone(), iRe.clone(), iIm.clone());
    }
}
