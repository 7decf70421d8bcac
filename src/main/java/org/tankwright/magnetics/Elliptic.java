package org.tankwright.magnetics;

/**
 * Complete elliptic integrals of the first and second kind by the arithmetic-geometric mean.
 * The argument is the parameter {@code m = k²} (0 ≤ m < 1).
 *
 * <p>K(m) = π / (2·AGM(1, √(1−m))); E(m) = K(m)·(1 − Σ 2^(n−1) c_n²) with c_0² = m
 * (Abramowitz &amp; Stegun 17.6). Converges quadratically: a handful of steps reach machine precision.
 */
public final class Elliptic {
    private Elliptic() {
    }

    /** Complete elliptic integral of the first kind K(m). */
    public static double k(double m) {
        checkParameter(m);
        if (m == 1.0) {
            return Double.POSITIVE_INFINITY;
        }
        double a = 1.0;
        double b = Math.sqrt(1.0 - m);
        for (int i = 0; i < 64 && Math.abs(a - b) > 1e-15 * a; i++) {
            double an = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = an;
        }
        return Math.PI / (2.0 * a);
    }

    /** Complete elliptic integral of the second kind E(m). */
    public static double e(double m) {
        checkParameter(m);
        if (m == 1.0) {
            return 1.0;
        }
        double[] ke = new double[2];
        kAndE(m, ke);
        return ke[1];
    }

    /** K(m) and E(m) from one arithmetic-geometric mean into {@code out[0]}, {@code out[1]}; 0 ≤ m < 1, unchecked. */
    static void kAndE(double m, double[] out) {
        double a = 1.0;
        double b = Math.sqrt(1.0 - m);
        double sum = 0.5 * m; // 2^(-1) c0², c0² = m
        double pow = 0.5;
        for (int i = 0; i < 64; i++) {
            double c = 0.5 * (a - b);
            double an = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = an;
            pow *= 2.0;
            sum += pow * c * c;
            if (Math.abs(c) <= 1e-15 * a) {
                break;
            }
        }
        out[0] = Math.PI / (2.0 * a);
        out[1] = out[0] * (1.0 - sum);
    }

    private static void checkParameter(double m) {
        if (!(m >= 0.0 && m <= 1.0)) {
            throw new IllegalArgumentException("elliptic parameter m must lie in [0, 1], got " + m);
        }
    }
}
