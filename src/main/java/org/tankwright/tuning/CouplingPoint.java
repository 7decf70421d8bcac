package org.tankwright.tuning;

/**
 * One state of a link as the gap or alignment changes: mutual inductance and both self
 * inductances (they move with the gap near ferrite or metal), in henries.
 */
public record CouplingPoint(double m, double l1, double l2) {
    public CouplingPoint {
        if (!(l1 > 0) || !(l2 > 0) || !Double.isFinite(l1) || !Double.isFinite(l2)) {
            throw new IllegalArgumentException("coupling point: L1 = " + l1 + " H and L2 = " + l2 + " H must be positive");
        }
        if (!Double.isFinite(m) || Math.abs(m) >= Math.sqrt(l1 * l2)) {
            throw new IllegalArgumentException("coupling point: |M| = " + Math.abs(m) + " H must be below √(L1·L2) = "
                    + Math.sqrt(l1 * l2) + " H");
        }
    }

    /** From a coupling factor k. */
    public static CouplingPoint ofK(double k, double l1, double l2) {
        return new CouplingPoint(k * Math.sqrt(l1 * l2), l1, l2);
    }

    public double k() {
        return m / Math.sqrt(l1 * l2);
    }
}
