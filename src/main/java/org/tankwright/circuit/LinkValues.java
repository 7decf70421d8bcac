package org.tankwright.circuit;

/**
 * The coil values of a two-coil link (SI): self inductances, mutual inductance and the coils'
 * series AC resistances. For a single tank, l2 = m = r2 = 0.
 */
public record LinkValues(double l1, double l2, double m, double r1, double r2) {
    public LinkValues {
        check("L1", l1, true);
        check("L2", l2, false);
        check("R1", r1, false);
        check("R2", r2, false);
        if (!Double.isFinite(m) || Math.abs(m) > Math.sqrt(l1 * l2) * (1 + 1e-12)) {
            throw new IllegalArgumentException("mutual inductance M = " + m + " H must satisfy |M| ≤ √(L1·L2) = "
                    + Math.sqrt(l1 * l2) + " H");
        }
    }

    private static void check(String name, double v, boolean positive) {
        if (!Double.isFinite(v) || v < 0 || (positive && v == 0)) {
            throw new IllegalArgumentException(name + " = " + v + " must be finite and " + (positive ? "> 0" : "≥ 0"));
        }
    }

    /** Values of a single coil (tank): inductance and series resistance. */
    public static LinkValues tank(double l, double r) {
        return new LinkValues(l, 0, 0, r, 0);
    }

    /** Values from a coupling factor k instead of M. */
    public static LinkValues fromCoupling(double l1, double l2, double k, double r1, double r2) {
        if (!(k >= 0 && k < 1)) {
            throw new IllegalArgumentException("coupling factor k = " + k + " must be in [0, 1)");
        }
        return new LinkValues(l1, l2, k * Math.sqrt(l1 * l2), r1, r2);
    }

    /** Coupling factor M/√(L1·L2). */
    public double k() {
        return l2 == 0 ? 0 : m / Math.sqrt(l1 * l2);
    }

    public LinkValues withMutual(double newM) {
        return new LinkValues(l1, l2, newM, r1, r2);
    }

    public LinkValues withResistances(double newR1, double newR2) {
        return new LinkValues(l1, l2, m, newR1, newR2);
    }
}
