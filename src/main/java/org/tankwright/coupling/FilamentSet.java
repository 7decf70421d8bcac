package org.tankwright.coupling;

import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Ring;
import org.tankwright.magnetics.Segment;

import java.util.ArrayList;
import java.util.List;

/**
 * A coil's filaments packed into flat arrays, each with a current weight (1 for a real turn, the
 * image coefficient for an image), so that pair sums and field sums run without allocation.
 * Immutable once built.
 */
public final class FilamentSet {
    final double[] rx;
    final double[] ry;
    final double[] rz;
    final double[] rr;
    final double[] rw;
    final double[] rWire;
    final double[] s;   // 6 coordinates per segment
    final double[] sw;
    final double[] sWire;

    private FilamentSet(double[] rx, double[] ry, double[] rz, double[] rr, double[] rw, double[] rWire,
                        double[] s, double[] sw, double[] sWire) {
        this.rx = rx;
        this.ry = ry;
        this.rz = rz;
        this.rr = rr;
        this.rw = rw;
        this.rWire = rWire;
        this.s = s;
        this.sw = sw;
        this.sWire = sWire;
    }

    /** Packs the filaments of one coil, each carrying the coil current (weight 1). */
    public static FilamentSet of(List<? extends Filament> filaments) {
        if (filaments == null || filaments.isEmpty()) {
            throw new IllegalArgumentException("a coil needs at least one filament");
        }
        List<Ring> rings = new ArrayList<>();
        List<Segment> segments = new ArrayList<>();
        for (Filament f : filaments) {
            if (f instanceof Ring r) {
                if (!(r.radius() > 0) || !Double.isFinite(r.x() + r.y() + r.z() + r.radius())) {
                    throw new IllegalArgumentException("ring radius must be > 0 and finite, got " + r.radius());
                }
                rings.add(r);
            } else if (f instanceof Segment sg) {
                if (!Double.isFinite(sg.x0() + sg.y0() + sg.z0() + sg.x1() + sg.y1() + sg.z1())) {
                    throw new IllegalArgumentException("segment coordinates must be finite");
                }
                segments.add(sg);
            }
        }
        int nr = rings.size();
        int ns = segments.size();
        double[] rx = new double[nr];
        double[] ry = new double[nr];
        double[] rz = new double[nr];
        double[] rr = new double[nr];
        double[] rw = new double[nr];
        double[] rWire = new double[nr];
        for (int i = 0; i < nr; i++) {
            Ring r = rings.get(i);
            rx[i] = r.x();
            ry[i] = r.y();
            rz[i] = r.z();
            rr[i] = r.radius();
            rw[i] = 1;
            rWire[i] = r.wireRadius();
        }
        double[] s = new double[6 * ns];
        double[] sw = new double[ns];
        double[] sWire = new double[ns];
        for (int i = 0; i < ns; i++) {
            Segment g = segments.get(i);
            s[6 * i] = g.x0();
            s[6 * i + 1] = g.y0();
            s[6 * i + 2] = g.z0();
            s[6 * i + 3] = g.x1();
            s[6 * i + 4] = g.y1();
            s[6 * i + 5] = g.z1();
            sw[i] = 1;
            sWire[i] = g.wireRadius();
        }
        return new FilamentSet(rx, ry, rz, rr, rw, rWire, s, sw, sWire);
    }

    /** Number of rings. */
    public int rings() {
        return rr.length;
    }

    /** Number of straight segments. */
    public int segments() {
        return sw.length;
    }

    /**
     * This set moved by (dx, dy, dz), optionally mirrored first in the plane z = 0 (rings keep their
     * sense of rotation, a segment's vertical component reverses), with every weight times {@code factor}.
     */
    public FilamentSet transformed(boolean mirror, double dx, double dy, double dz, double factor) {
        double sign = mirror ? -1 : 1;
        int nr = rr.length;
        double[] x = new double[nr];
        double[] y = new double[nr];
        double[] z = new double[nr];
        double[] w = new double[nr];
        for (int i = 0; i < nr; i++) {
            x[i] = rx[i] + dx;
            y[i] = ry[i] + dy;
            z[i] = sign * rz[i] + dz;
            w[i] = rw[i] * factor;
        }
        double[] t = new double[s.length];
        for (int i = 0; i < s.length; i += 3) {
            t[i] = s[i] + dx;
            t[i + 1] = s[i + 1] + dy;
            t[i + 2] = sign * s[i + 2] + dz;
        }
        double[] tw = new double[sw.length];
        for (int i = 0; i < sw.length; i++) {
            tw[i] = sw[i] * factor;
        }
        return new FilamentSet(x, y, z, rr.clone(), w, rWire.clone(), t, tw, sWire.clone());
    }

    /** Both sets as one (their filaments side by side). */
    public FilamentSet plus(FilamentSet o) {
        return new FilamentSet(cat(rx, o.rx), cat(ry, o.ry), cat(rz, o.rz), cat(rr, o.rr), cat(rw, o.rw),
                cat(rWire, o.rWire), cat(s, o.s), cat(sw, o.sw), cat(sWire, o.sWire));
    }

    private static double[] cat(double[] a, double[] b) {
        double[] c = new double[a.length + b.length];
        System.arraycopy(a, 0, c, 0, a.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }

    /** Lowest conductor surface: min over filaments of z minus wire radius. */
    public double zMin() {
        double m = Double.POSITIVE_INFINITY;
        for (int i = 0; i < rr.length; i++) {
            m = Math.min(m, rz[i] - rWire[i]);
        }
        for (int i = 0; i < sw.length; i++) {
            m = Math.min(m, Math.min(s[6 * i + 2], s[6 * i + 5]) - sWire[i]);
        }
        return m;
    }

    /** Highest conductor surface: max over filaments of z plus wire radius. */
    public double zMax() {
        double m = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < rr.length; i++) {
            m = Math.max(m, rz[i] + rWire[i]);
        }
        for (int i = 0; i < sw.length; i++) {
            m = Math.max(m, Math.max(s[6 * i + 2], s[6 * i + 5]) + sWire[i]);
        }
        return m;
    }

    /** Length-weighted mean height of the filaments: the winding's mean plane. */
    public double zMean() {
        double sum = 0;
        double len = 0;
        for (int i = 0; i < rr.length; i++) {
            double l = 2 * Math.PI * rr[i];
            sum += l * rz[i];
            len += l;
        }
        for (int i = 0; i < sw.length; i++) {
            double l = segmentLength(i);
            sum += l * 0.5 * (s[6 * i + 2] + s[6 * i + 5]);
            len += l;
        }
        return len > 0 ? sum / len : 0;
    }

    /**
     * Length-weighted mean distance of the conductor from the z axis of the coil's frame: the
     * coil's characteristic radius.
     */
    public double meanRadius() {
        double sum = 0;
        double len = 0;
        for (int i = 0; i < rr.length; i++) {
            double l = 2 * Math.PI * rr[i];
            sum += l * Math.max(rr[i], Math.hypot(rx[i], ry[i]));
            len += l;
        }
        for (int i = 0; i < sw.length; i++) {
            double l = segmentLength(i);
            double mx = 0.5 * (s[6 * i] + s[6 * i + 3]);
            double my = 0.5 * (s[6 * i + 1] + s[6 * i + 4]);
            sum += l * Math.hypot(mx, my);
            len += l;
        }
        return len > 0 ? sum / len : 0;
    }

    /** Largest distance of any conductor point from the z axis of the coil's frame. */
    public double outerRadius() {
        double m = 0;
        for (int i = 0; i < rr.length; i++) {
            m = Math.max(m, Math.hypot(rx[i], ry[i]) + rr[i] + rWire[i]);
        }
        for (int i = 0; i < sw.length; i++) {
            m = Math.max(m, Math.hypot(s[6 * i], s[6 * i + 1]) + sWire[i]);
            m = Math.max(m, Math.hypot(s[6 * i + 3], s[6 * i + 4]) + sWire[i]);
        }
        return m;
    }

    /** True when every filament lies in the plane z = 0 (the set is then its own mirror image in that plane). */
    boolean flat() {
        for (double z : rz) {
            if (z != 0) {
                return false;
            }
        }
        for (int i = 0; i < sw.length; i++) {
            if (s[6 * i + 2] != 0 || s[6 * i + 5] != 0) {
                return false;
            }
        }
        return true;
    }

    /** This set mirrored in the plane z = 0 (itself when it lies in that plane). */
    FilamentSet mirrored() {
        return flat() ? this : transformed(true, 0, 0, 0, 1);
    }

    /** True when every filament is a ring centred on the z axis (the coil is axisymmetric). */
    public boolean axisymmetric() {
        if (sw.length > 0) {
            return false;
        }
        for (int i = 0; i < rr.length; i++) {
            if (Math.hypot(rx[i], ry[i]) > 1e-12 * rr[i]) {
                return false;
            }
        }
        return true;
    }

    private double segmentLength(int i) {
        double dx = s[6 * i + 3] - s[6 * i];
        double dy = s[6 * i + 4] - s[6 * i + 1];
        double dz = s[6 * i + 5] - s[6 * i + 2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    /**
     * Flux density per ampere of coil current at (px, py, pz), written into out[0..2]: the
     * weighted sum of every filament's Biot–Savart field.
     */
    public void fluxDensity(double px, double py, double pz, double[] out) {
        out[0] = 0;
        out[1] = 0;
        out[2] = 0;
        for (int i = 0; i < rr.length; i++) {
            RingKernel.addFluxDensity(rr[i], px - rx[i], py - ry[i], pz - rz[i], rw[i], out);
        }
        for (int i = 0; i < sw.length; i++) {
            int j = 6 * i;
            SegmentKernel.addFluxDensity(s[j], s[j + 1], s[j + 2], s[j + 3], s[j + 4], s[j + 5], px, py, pz, sw[i], out);
        }
    }
}
