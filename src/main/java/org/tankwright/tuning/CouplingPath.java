package org.tankwright.tuning;

import java.util.List;

/**
 * The coupling range of an envelope: a state for every s in [0, 1] (e.g. s = 0 aligned at the
 * nominal gap, s = 1 the worst misalignment). A caller with a coupling model passes a function;
 * a builder with measurements passes a table via {@link #table}.
 */
@FunctionalInterface
public interface CouplingPath {
    CouplingPoint at(double s);

    /** A fixed state (no coupling range). */
    static CouplingPath fixed(CouplingPoint p) {
        return s -> p;
    }

    /**
     * Piecewise-linear interpolation through measured or computed points, in the order given
     * (the first at s = 0, the last at s = 1).
     */
    static CouplingPath table(List<CouplingPoint> points) {
        if (points.isEmpty()) {
            throw new IllegalArgumentException("a coupling table needs at least one point");
        }
        List<CouplingPoint> pts = List.copyOf(points);
        return s -> {
            if (pts.size() == 1) {
                return pts.get(0);
            }
            double x = Math.max(0, Math.min(1, s)) * (pts.size() - 1);
            int i = Math.min((int) Math.floor(x), pts.size() - 2);
            double t = x - i;
            CouplingPoint a = pts.get(i);
            CouplingPoint b = pts.get(i + 1);
            return new CouplingPoint(a.m() + t * (b.m() - a.m()), a.l1() + t * (b.l1() - a.l1()),
                    a.l2() + t * (b.l2() - a.l2()));
        };
    }
}
