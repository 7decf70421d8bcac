package org.tankwright.coupling;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The mutual inductance between two filament sets a and b, compiled once so that it can be
 * evaluated quickly for any translation of b (gap and offset sweeps, images).
 *
 * <p>Ring pairs are grouped by (smaller radius, larger radius, relative position): two coils of the
 * same radii (two equal spirals) share every pair twice, and repeated geometry collapses further.
 * Each group is one call of {@link RingKernel#mutual}. Segment pairs go through
 * {@link SegmentKernel}; ring–segment pairs integrate the ring's closed-form vector potential
 * along the segment by adaptive Gauss–Legendre quadrature.
 *
 * <p>Immutable and thread-safe; each evaluation makes its own small workspace.
 */
public final class PairSum {
    private final FilamentSet a;
    private final FilamentSet b;
    private final double[] gR1;
    private final double[] gR2;
    private final double[] gDx;
    private final double[] gDy;
    private final double[] gDz;
    private final double[] gW;
    // the segment pairs compiled on first use: for any translation, and for translations along z only
    private volatile SegmentPairs segmentsGeneral;
    private volatile SegmentPairs segmentsAxial;
    private volatile boolean axialChecked;

    /** Compiles the pair sum of a and b (b in the frame it will be translated from). */
    public PairSum(FilamentSet a, FilamentSet b) {
        this.a = a;
        this.b = b;
        Map<Key, double[]> groups = new LinkedHashMap<>();
        for (int i = 0; i < a.rr.length; i++) {
            for (int j = 0; j < b.rr.length; j++) {
                double r1 = Math.min(a.rr[i], b.rr[j]);
                double r2 = Math.max(a.rr[i], b.rr[j]);
                double dx = b.rx[j] - a.rx[i];
                double dy = b.ry[j] - a.ry[i];
                double dz = b.rz[j] - a.rz[i];
                Key key = new Key(q(r1), q(r2), q(dx), q(dy), q(dz));
                double[] g = groups.computeIfAbsent(key, k -> new double[] {r1, r2, dx, dy, dz, 0});
                g[5] += a.rw[i] * b.rw[j];
            }
        }
        int n = groups.size();
        gR1 = new double[n];
        gR2 = new double[n];
        gDx = new double[n];
        gDy = new double[n];
        gDz = new double[n];
        gW = new double[n];
        int k = 0;
        for (double[] g : groups.values()) {
            gR1[k] = g[0];
            gR2[k] = g[1];
            gDx[k] = g[2];
            gDy[k] = g[3];
            gDz[k] = g[4];
            gW[k] = g[5];
            k++;
        }
    }

    private record Key(long r1, long r2, long dx, long dy, long dz) {
    }

    private static long q(double v) {
        return Math.round(v * 1e12);
    }

    /**
     * The compiled segment pairs: the axial form (fewer pairs, merged by symmetry) when b moves along z
     * only and a's filaments allow it, else the general form. Built once; a race builds the same value twice.
     */
    private SegmentPairs segmentPairs(boolean alongZ) {
        if (alongZ) {
            if (!axialChecked) {
                segmentsAxial = SegmentPairs.axial(a, b);
                axialChecked = true;
            }
            SegmentPairs s = segmentsAxial;
            if (s != null) {
                return s;
            }
        }
        SegmentPairs s = segmentsGeneral;
        if (s == null) {
            s = SegmentPairs.general(a, b);
            segmentsGeneral = s;
        }
        return s;
    }

    /** Number of distinct ring-pair groups (for the benchmark's account of the work). */
    public int ringGroups() {
        return gW.length;
    }

    /** Mutual inductance in henries of a with b translated by (dx, dy, dz), default tolerance. */
    public double mutual(double dx, double dy, double dz) {
        return mutual(dx, dy, dz, RingKernel.DEFAULT_TOLERANCE);
    }

    /** Mutual inductance in henries of a with b translated by (dx, dy, dz). */
    public double mutual(double dx, double dy, double dz, double tolerance) {
        double sum = 0;
        for (int k = 0; k < gW.length; k++) {
            double lx = gDx[k] + dx;
            double ly = gDy[k] + dy;
            sum += gW[k] * RingKernel.mutual(gR1[k], gR2[k], gDz[k] + dz, Math.sqrt(lx * lx + ly * ly), tolerance);
        }
        if (a.sw.length == 0 && b.sw.length == 0) {
            return sum;
        }
        RingOnSegment ringSeg = new RingOnSegment();
        // rings of a, segments of b (moved)
        for (int i = 0; i < a.rr.length; i++) {
            for (int j = 0; j < b.sw.length; j++) {
                int o = 6 * j;
                sum += a.rw[i] * b.sw[j] * ringSeg.mutual(a.rr[i], a.rx[i], a.ry[i], a.rz[i],
                        b.s[o] + dx, b.s[o + 1] + dy, b.s[o + 2] + dz, b.s[o + 3] + dx, b.s[o + 4] + dy, b.s[o + 5] + dz);
            }
        }
        // segments of a, rings of b (moved)
        for (int j = 0; j < b.rr.length; j++) {
            for (int i = 0; i < a.sw.length; i++) {
                int o = 6 * i;
                sum += a.sw[i] * b.rw[j] * ringSeg.mutual(b.rr[j], b.rx[j] + dx, b.ry[j] + dy, b.rz[j] + dz,
                        a.s[o], a.s[o + 1], a.s[o + 2], a.s[o + 3], a.s[o + 4], a.s[o + 5]);
            }
        }
        if (a.sw.length > 0 && b.sw.length > 0) {
            sum += segmentPairs(dx == 0 && dy == 0).mutual(dx, dy, dz, new SegmentKernel());
        }
        return sum;
    }

    /**
     * Ring with straight filament: M = ∫ A_ring(P(s))·ê ds with the ring's closed-form vector
     * potential A = g(P)·(−y', x', 0) ({@link RingKernel#potentialFactor}), by adaptive quadrature.
     */
    static final class RingOnSegment extends AdaptiveGauss.Integrand {
        private double r;
        private double cx;
        private double cy;
        private double cz;
        private double px;
        private double py;
        private double pz;
        private double ex;
        private double ey;
        private double ez;

        double mutual(double radius, double rcx, double rcy, double rcz,
                      double x0, double y0, double z0, double x1, double y1, double z1) {
            double lx = x1 - x0;
            double ly = y1 - y0;
            double lz = z1 - z0;
            double len = Math.sqrt(lx * lx + ly * ly + lz * lz);
            if (len == 0 || (lx == 0 && ly == 0)) {
                return 0; // vertical segment: A has no z component
            }
            r = radius;
            cx = rcx;
            cy = rcy;
            cz = rcz;
            px = x0;
            py = y0;
            pz = z0;
            ex = lx / len;
            ey = ly / len;
            ez = lz / len;
            return AdaptiveGauss.integrate(this, 0, len, SegmentKernel.TOLERANCE);
        }

        @Override
        double value(double s) {
            double x = px + s * ex - cx;
            double y = py + s * ey - cy;
            double z = pz + s * ez - cz;
            return RingKernel.potentialFactor(r, x, y, z) * (-y * ex + x * ey);
        }
    }
}
