package org.tankwright.coupling;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The straight-filament pairs of a {@link PairSum}, compiled once for evaluation under many
 * translations of the second set. Perpendicular pairs are dropped (their M is exactly 0 in every
 * translation, Neumann's dl1·dl2 = 0); a parallel pair keeps only what Grover's closed form needs
 * (axis, length, the second filament's ends along the axis, its perpendicular offset); any other
 * pair keeps its ends for {@link SegmentKernel}'s quadrature.
 *
 * <p>Two forms:
 * <ul>
 * <li>{@link #general}: the second set translated by any (dx, dy, dz);</li>
 * <li>{@link #axial}: translations along z only (a coil with its own images, or a coaxial pair),
 * when every filament of the first set is horizontal. Each pair is expressed in a frame attached
 * to its first filament; a rotation about z, a reflection in the vertical plane through that
 * filament and a translation along z leave M unchanged, so pairs equal in that frame are merged
 * (their weights summed). Parallel pairs are merged further under the closed form's own
 * symmetries, reversal along the axis and exchange of the two filaments. A centred rectangular
 * spiral with itself then needs about a seventh of the kernel calls: the four sides come in
 * mirror pairs and each pair of turns appears once instead of twice.</li>
 * </ul>
 * Immutable; evaluation takes the caller's {@link SegmentKernel} workspace.
 */
final class SegmentPairs {
    // parallel pairs: unit axis (3 per pair), first filament's length, second's ends along the axis, perpendicular offset (3 per pair)
    private final double[] pu;
    private final double[] pl;
    private final double[] pt0;
    private final double[] pt1;
    private final double[] pe;
    private final double[] pTouch;
    private final double[] pW;
    // other pairs: both filaments' ends (6 per pair each)
    private final double[] oa;
    private final double[] ob;
    private final double[] oTouch;
    private final double[] oW;

    private SegmentPairs(Builder b) {
        int np = b.parallel.size();
        pu = new double[3 * np];
        pl = new double[np];
        pt0 = new double[np];
        pt1 = new double[np];
        pe = new double[3 * np];
        pTouch = new double[np];
        pW = new double[np];
        int k = 0;
        for (double[] p : b.parallel) {
            System.arraycopy(p, 0, pu, 3 * k, 3);
            pl[k] = p[3];
            pt0[k] = p[4];
            pt1[k] = p[5];
            System.arraycopy(p, 6, pe, 3 * k, 3);
            pTouch[k] = p[9];
            pW[k] = p[10];
            k++;
        }
        int no = b.other.size();
        oa = new double[6 * no];
        ob = new double[6 * no];
        oTouch = new double[no];
        oW = new double[no];
        k = 0;
        for (double[] o : b.other) {
            System.arraycopy(o, 0, oa, 6 * k, 6);
            System.arraycopy(o, 6, ob, 6 * k, 6);
            oTouch[k] = o[12];
            oW[k] = o[13];
            k++;
        }
    }

    /** Every pair of a with b, for any translation of b. */
    static SegmentPairs general(FilamentSet a, FilamentSet b) {
        return build(a, b, false);
    }

    /** Every pair of a with b for translations of b along z only; null when a has a filament that is not horizontal. */
    static SegmentPairs axial(FilamentSet a, FilamentSet b) {
        for (int i = 0; i < a.sw.length; i++) {
            double lz = a.s[6 * i + 5] - a.s[6 * i + 2];
            double lx = a.s[6 * i + 3] - a.s[6 * i];
            double ly = a.s[6 * i + 4] - a.s[6 * i + 1];
            if (lz != 0 || (lx == 0 && ly == 0)) {
                return null;
            }
        }
        return build(a, b, true);
    }

    /** Number of compiled pairs (kernel calls per evaluation). */
    int size() {
        return pW.length + oW.length;
    }

    /** Σ w·M over the pairs with b translated by (dx, dy, dz) (the axial form: by (0, 0, dz) only). */
    double mutual(double dx, double dy, double dz, SegmentKernel workspace) {
        double sum = 0;
        for (int k = 0; k < pW.length; k++) {
            int j = 3 * k;
            double ux = pu[j];
            double uy = pu[j + 1];
            double uz = pu[j + 2];
            double sigma = dx * ux + dy * uy + dz * uz;
            double ex = pe[j] + dx - sigma * ux;
            double ey = pe[j + 1] + dy - sigma * uy;
            double ez = pe[j + 2] + dz - sigma * uz;
            sum += pW[k] * SegmentKernel.parallel(pl[k], pt0[k] + sigma, pt1[k] + sigma,
                    Math.sqrt(ex * ex + ey * ey + ez * ez), pTouch[k]);
        }
        for (int k = 0; k < oW.length; k++) {
            int o = 6 * k;
            sum += oW[k] * workspace.mutual(oa[o], oa[o + 1], oa[o + 2], oa[o + 3], oa[o + 4], oa[o + 5],
                    ob[o] + dx, ob[o + 1] + dy, ob[o + 2] + dz, ob[o + 3] + dx, ob[o + 4] + dy, ob[o + 5] + dz, oTouch[k]);
        }
        return sum;
    }

    private static SegmentPairs build(FilamentSet a, FilamentSet b, boolean axial) {
        Builder out = new Builder(axial);
        for (int i = 0; i < a.sw.length; i++) {
            int o = 6 * i;
            for (int j = 0; j < b.sw.length; j++) {
                int p = 6 * j;
                out.add(a.s[o], a.s[o + 1], a.s[o + 2], a.s[o + 3], a.s[o + 4], a.s[o + 5],
                        b.s[p], b.s[p + 1], b.s[p + 2], b.s[p + 3], b.s[p + 4], b.s[p + 5],
                        a.sWire[i] + b.sWire[j], a.sw[i] * b.sw[j]);
            }
        }
        return new SegmentPairs(out);
    }

    /** Collects pairs; in the axial form, pairs with the same key share one entry. */
    private static final class Builder {
        private final boolean axial;
        private final List<double[]> parallel = new ArrayList<>();
        private final List<double[]> other = new ArrayList<>();
        private final Map<Key, double[]> merged = new HashMap<>();

        Builder(boolean axial) {
            this.axial = axial;
        }

        void add(double ax0, double ay0, double az0, double ax1, double ay1, double az1,
                 double bx0, double by0, double bz0, double bx1, double by1, double bz1, double touching, double w) {
            double[] u = direction(ax0, ay0, az0, ax1, ay1, az1);
            double[] v = direction(bx0, by0, bz0, bx1, by1, bz1);
            double l1 = u[3];
            if (l1 == 0 || v[3] == 0 || w == 0) {
                return;
            }
            double ux = u[0];
            double uy = u[1];
            double uz = u[2];
            int relation = SegmentKernel.relation(ux, uy, uz, v[0], v[1], v[2]);
            if (relation == SegmentKernel.PERPENDICULAR) {
                return;
            }
            boolean isParallel = relation == SegmentKernel.PARALLEL;
            double px = bx0 - ax0;
            double py = by0 - ay0;
            double pz = bz0 - az0;
            double qx = bx1 - ax0;
            double qy = by1 - ay0;
            double qz = bz1 - az0;
            if (!axial) {
                if (isParallel) {
                    double t0 = px * ux + py * uy + pz * uz;
                    double t1 = qx * ux + qy * uy + qz * uz;
                    parallel.add(new double[] {ux, uy, uz, l1, t0, t1, px - t0 * ux, py - t0 * uy, pz - t0 * uz, touching, w});
                } else {
                    other.add(new double[] {ax0, ay0, az0, ax1, ay1, az1, bx0, by0, bz0, bx1, by1, bz1, touching, w});
                }
                return;
            }
            // the first filament's frame: x' along it (horizontal), y' = z × x', z' = z
            double p0x = px * ux + py * uy;
            double p0y = -px * uy + py * ux;
            double p1x = qx * ux + qy * uy;
            double p1y = -qx * uy + qy * ux;
            if (p0y + p1y < 0) { // reflection in the vertical plane through the first filament
                p0y = -p0y;
                p1y = -p1y;
            }
            if (isParallel) {
                addParallel(l1, p0x, p1x, p0y, pz, touching, w);
            } else {
                Key key = new Key(0, q(l1), q(p0x), q(p0y), q(pz), q(p1x), q(p1y), q(qz), q(touching));
                entry(other, key, new double[] {0, 0, 0, l1, 0, 0, p0x, p0y, pz, p1x, p1y, qz, touching, 0})[13] += w;
            }
        }

        /** Unit direction and length {ux, uy, uz, l} of the filament from P0 to P1 (zeros for a point). */
        private static double[] direction(double x0, double y0, double z0, double x1, double y1, double z1) {
            double[] d = {x1 - x0, y1 - y0, z1 - z0, 0};
            d[3] = Math.sqrt(d[0] * d[0] + d[1] * d[1] + d[2] * d[2]);
            if (d[3] > 0) {
                for (int i = 0; i < 3; i++) {
                    d[i] /= d[3];
                }
            }
            return d;
        }

        /**
         * A parallel pair in the first filament's frame: it runs from 0 to l1, the second from t0 to t1
         * at height ez and sideways offset ey. As a pair of co-directed filaments [0, l1] and [β, β + l2]
         * (the sign carrying a reversal), its M is unchanged by the reversal of both along the axis
         * (β → l1 − l2 − β) and by exchanging them (l1 ↔ l2, β → −β): the smallest of the four keys is kept.
         */
        private void addParallel(double l1, double t0, double t1, double ey, double ez, double touching, double w) {
            double sign = t1 >= t0 ? 1 : -1;
            double l2 = Math.abs(t1 - t0);
            double beta = Math.min(t0, t1);
            double[][] variants = {
                    {l1, l2, beta}, {l1, l2, l1 - l2 - beta}, {l2, l1, -beta}, {l2, l1, l2 - l1 + beta}};
            double[] best = variants[0];
            Key bestKey = null;
            for (double[] v : variants) {
                Key key = new Key(1, q(v[0]), q(v[1]), q(v[2]), q(ey), q(ez), q(touching), 0, 0);
                if (bestKey == null || key.compareTo(bestKey) < 0) {
                    bestKey = key;
                    best = v;
                }
            }
            entry(parallel, bestKey, new double[] {1, 0, 0, best[0], best[2], best[2] + best[1], 0, ey, ez, touching, 0})[10] += sign * w;
        }

        /** The entry of that key, the given one (added to the list) when it is the first. */
        private double[] entry(List<double[]> list, Key key, double[] fresh) {
            double[] e = merged.get(key);
            if (e == null) {
                merged.put(key, fresh);
                list.add(fresh);
                e = fresh;
            }
            return e;
        }
    }

    private record Key(int kind, long k1, long k2, long k3, long k4, long k5, long k6, long k7, long k8)
            implements Comparable<Key> {
        @Override
        public int compareTo(Key o) {
            long[] x = {k1, k2, k3, k4, k5, k6, k7, k8};
            long[] y = {o.k1, o.k2, o.k3, o.k4, o.k5, o.k6, o.k7, o.k8};
            for (int i = 0; i < x.length; i++) {
                if (x[i] != y[i]) {
                    return Long.compare(x[i], y[i]);
                }
            }
            return Integer.compare(kind, o.kind);
        }
    }

    /** Positions to 1 pm: pairs closer than that in every coordinate are taken as equal. */
    private static long q(double v) {
        return Math.round(v * 1e12);
    }
}
