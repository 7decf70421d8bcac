package org.tankwright.coupling;

import org.tankwright.magnetics.Elliptic;
import org.tankwright.units.Constants;

/**
 * Closed forms and single integrals for circular filaments whose axes are parallel to z.
 *
 * <p>Everything is built on one regular function of the elliptic parameter
 * {@code m = 4Rρ/((R+ρ)²+z²)}: {@code f(m) = [(2−m)K(m) − 2E(m)]/m²}, which tends to π/16 as m → 0.
 * With it the vector potential of a ring of radius R per ampere is
 * {@code A_φ = (4µ0R²/π)·ρ·f(m)/D^{3/2}}, {@code D = (R+ρ)²+z²} (Smythe, <i>Static and Dynamic
 * Electricity</i> §7.10, rewritten), Maxwell's mutual inductance of coaxial rings is
 * {@code 8µ0R1²R2² f(m)/D^{3/2}}, and the mutual inductance of laterally offset parallel rings is
 * the single integral of {@code A_φ} along the second ring (the parallel-axis case of
 * Grover 1946, ch. 13, and Babic et al., IEEE Trans. Magn. 46(9), 2010):
 * <pre>M = (8µ0 R1² R2 / π) ∫₀^π (R2 + d cos φ) f(m(φ)) / D(φ)^{3/2} dφ,  ρ(φ)² = R2² + d² + 2 R2 d cos φ</pre>
 * The integrand is smooth and periodic, so the trapezoidal rule converges exponentially; it is
 * refined by doubling until two successive sums agree.
 */
public final class RingKernel {
    /** Default relative tolerance of one ring-pair integral. */
    public static final double DEFAULT_TOLERANCE = 1e-9;
    private static final int START_INTERVALS = 8;
    private static final int MAX_LEVEL = 14;
    /** COS[L][i]: cosines of the nodes first used at doubling level L (odd multiples of π/(2N)). */
    private static final double[][] NEW_COS = new double[MAX_LEVEL + 1][];
    private static final double[] START_COS = new double[START_INTERVALS + 1];

    static {
        for (int i = 0; i <= START_INTERVALS; i++) {
            START_COS[i] = Math.cos(Math.PI * i / START_INTERVALS);
        }
        int n = START_INTERVALS;
        for (int level = 1; level <= MAX_LEVEL; level++) {
            double[] c = new double[n];
            for (int i = 0; i < n; i++) {
                c[i] = Math.cos(Math.PI * (2 * i + 1) / (2.0 * n));
            }
            NEW_COS[level] = c;
            n *= 2;
        }
    }

    private RingKernel() {
    }

    /**
     * f(m) = [(2−m)K(m) − 2E(m)]/m² without cancellation: with the arithmetic-geometric mean
     * a_n, b_n and c_n (c_{n+1} = c_n²/(4a_{n+1})), (2−m)K − 2E = K·Σ_{n≥1} 2ⁿ c_n²
     * (Abramowitz &amp; Stegun 17.6.3–17.6.4), and c_1 = m/(2(1+√(1−m))) carries the m² factor exactly.
     */
    public static double f(double m) {
        if (!(m >= 0 && m < 1)) {
            throw new IllegalArgumentException("elliptic parameter must lie in [0, 1), got " + m);
        }
        if (m < 1e-12) {
            return Math.PI / 16 * (1 + 0.75 * m);
        }
        double b = Math.sqrt(1 - m);
        double c = 0.5 / (1 + b); // c_1 / m
        double a = 0.5 * (1 + b);
        b = Math.sqrt(b);
        double sum = 2 * c * c; // Σ 2ⁿ (c_n/m)²
        double pow = 2;
        for (int i = 0; i < 40; i++) {
            double an = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = an;
            c = c * c * m / (4 * a); // (c_{n+1}/m) = (c_n/m)² m / (4 a_{n+1})
            pow *= 2;
            double term = pow * c * c;
            sum += term;
            if (term <= 1e-17 * sum && c * m <= 1e-16 * a) {
                break;
            }
        }
        return Math.PI / (2 * a) * sum;
    }

    /** Maxwell's formula for coaxial rings of radii r1, r2 with planes dz apart, in henries. */
    public static double coaxial(double r1, double r2, double dz) {
        double s = r1 + r2;
        double d = s * s + dz * dz;
        double m = 4 * r1 * r2 / d;
        return 8 * Constants.MU0 * r1 * r1 * r2 * r2 * f(m) / (d * Math.sqrt(d));
    }

    /** Mutual inductance of parallel-axis rings at the default tolerance. */
    public static double mutual(double r1, double r2, double dz, double lateral) {
        return mutual(r1, r2, dz, lateral, DEFAULT_TOLERANCE);
    }

    /**
     * Mutual inductance in henries of two rings with axes parallel to z, radii r1 and r2, planes
     * {@code dz} apart and axes {@code lateral} apart; both currents counter-clockwise seen from +z.
     * Coaxial rings (lateral = 0) take Maxwell's closed form.
     */
    public static double mutual(double r1, double r2, double dz, double lateral, double tolerance) {
        if (!(r1 > 0 && r2 > 0)) {
            throw new IllegalArgumentException("ring radii must be > 0, got " + r1 + ", " + r2);
        }
        double d = Math.abs(lateral);
        if (d <= 1e-15 * (r1 + r2)) {
            return coaxial(r1, r2, dz);
        }
        // Integrate along the smaller ring: its points sweep the field of the larger more gently.
        double rp = Math.max(r1, r2);
        double rs = Math.min(r1, r2);
        double z2 = dz * dz;
        double crit = Math.sqrt(tolerance);
        double sumAbs = 0;
        double sum = 0;
        for (int i = 0; i <= START_INTERVALS; i++) {
            double g = offsetIntegrand(rp, rs, z2, d, START_COS[i]);
            double w = (i == 0 || i == START_INTERVALS) ? 0.5 : 1.0;
            sum += w * g;
            sumAbs += w * Math.abs(g);
        }
        int n = START_INTERVALS;
        double estimate = sum / n;
        for (int level = 1; level <= MAX_LEVEL; level++) {
            double[] cs = NEW_COS[level];
            for (double c : cs) {
                double g = offsetIntegrand(rp, rs, z2, d, c);
                sum += g;
                sumAbs += Math.abs(g);
            }
            n *= 2;
            double next = sum / n;
            double diff = Math.abs(next - estimate);
            estimate = next;
            // Exponential convergence: the error of the finer sum is about diff²/scale.
            if (diff <= crit * 0.1 * sumAbs / n) {
                break;
            }
        }
        // (8µ0 rp² rs / π) · π · mean of the trapezoid nodes
        return 8 * Constants.MU0 * rp * rp * rs * estimate;
    }

    private static double offsetIntegrand(double rp, double rs, double z2, double d, double cosPhi) {
        double rho2 = rs * rs + d * d + 2 * rs * d * cosPhi;
        double rho = Math.sqrt(Math.max(rho2, 0));
        double s = rp + rho;
        double dd = s * s + z2;
        double m = 4 * rp * rho / dd;
        return (rs + d * cosPhi) * f(Math.min(m, Math.nextDown(1.0))) / (dd * Math.sqrt(dd));
    }

    /**
     * The factor g with A = g·(−y', x', 0) for a ring of radius r at the origin, per ampere,
     * at the point (x', y', z') relative to the ring centre: g = (4µ0r²/π) f(m)/D^{3/2}.
     */
    public static double potentialFactor(double r, double x, double y, double z) {
        double rho = Math.sqrt(x * x + y * y);
        double s = r + rho;
        double dd = s * s + z * z;
        double m = 4 * r * rho / dd;
        if (m >= 1) {
            throw new IllegalArgumentException("point lies on the ring filament");
        }
        return 4 * Constants.MU0 * r * r / Math.PI * f(m) / (dd * Math.sqrt(dd));
    }

    /**
     * Flux density per ampere of a ring of radius r at the point (x, y, z) relative to its centre,
     * written into out[0..2] (Smythe §7.10; Simpson et al., NASA/TM-2001-211264 give the same form).
     */
    public static void fluxDensity(double r, double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = 0;
        out[2] = 0;
        addFluxDensity(r, x, y, z, 1, out);
    }

    /** Adds {@code weight} times the ring's flux density per ampere at (x, y, z) into out[0..2]. */
    public static void addFluxDensity(double r, double x, double y, double z, double weight, double[] out) {
        double rho = Math.sqrt(x * x + y * y);
        double s = r + rho;
        double dd = s * s + z * z;
        double q = (r - rho) * (r - rho) + z * z;
        double m = 4 * r * rho / dd;
        if (q == 0 || m >= 1) {
            throw new IllegalArgumentException("field point lies on a ring filament");
        }
        double kk = Elliptic.k(m);
        double ee = Elliptic.e(m);
        double c = weight * Constants.MU0 / (2 * Math.PI) / Math.sqrt(dd);
        out[2] += c * (kk + (r * r - rho * rho - z * z) / q * ee);
        if (rho <= 1e-12 * r) {
            return;
        }
        double brho = c * z / rho * (-kk + (r * r + rho * rho + z * z) / q * ee);
        out[0] += brho * x / rho;
        out[1] += brho * y / rho;
    }
}
