package org.tankwright.numerics;

import org.apache.commons.math3.complex.Complex;

/**
 * Kelvin functions of the second kind, order zero: ker x, kei x and their derivatives, for x &gt; 0,
 * with the modified Bessel functions of complex argument they come from:
 * <pre>
 *   ker x + i kei x   = K0(x e^{πi/4})                 (A&amp;S 9.9.2)
 *   ker' x + i kei' x = −e^{πi/4} K1(x e^{πi/4})
 * </pre>
 * Method: for x ≤ {@value #INTEGRAL_LIMIT} the integral K_n(z) = ∫_0^∞ e^{−z cosh t} cosh(nt) dt
 * (A&amp;S 9.6.24) by the trapezoid rule, which converges geometrically for this analytic integrand
 * and, unlike the ascending series, loses nothing to cancellation; above it Hankel's expansion
 * K_ν(z) ≈ √(π/2z)·e^{−z}·Σ a_k(ν)/z^k (A&amp;S 9.7.2), whose smallest term is below e^{−2x} ≈ 4·10⁻¹⁸.
 * Accuracy about 10⁻¹⁰ relative to the envelope e^{−x/√2}·√(π/2x), checked against A&amp;S Table 9.12
 * and the Wronskian with {@link Kelvin}'s I0, I1.
 *
 * <p>The {@code scaled} values are multiplied by e^{+x/√2} and stay finite for any x &gt; 0.
 */
public final class KelvinK {
    /** Largest x evaluated by the integral; Hankel's expansion above it. */
    public static final double INTEGRAL_LIMIT = 20.0;
    /** Trapezoid step of the integral. */
    private static final double STEP = 0.1;
    /** Largest x for which the unscaled values do not underflow to zero. */
    public static final double UNSCALED_LIMIT = 1000.0;

    private static final double INV_SQRT2 = Math.sqrt(0.5);

    private KelvinK() {
    }

    /** ker x, kei x, ker' x, kei' x at one argument (all scaled by the same factor when scaled). */
    public record Values(double ker, double kei, double kerPrime, double keiPrime) {
        private Values times(double f) {
            return new Values(ker * f, kei * f, kerPrime * f, keiPrime * f);
        }
    }

    /** ker x. */
    public static double ker(double x) {
        return values(x).ker();
    }

    /** kei x. */
    public static double kei(double x) {
        return values(x).kei();
    }

    /** ker' x = d ker x / dx. */
    public static double kerPrime(double x) {
        return values(x).kerPrime();
    }

    /** kei' x = d kei x / dx. */
    public static double keiPrime(double x) {
        return values(x).keiPrime();
    }

    /** The four values, unscaled; x in (0, {@value #UNSCALED_LIMIT}]. */
    public static Values values(double x) {
        check(x);
        if (x > UNSCALED_LIMIT) {
            throw new IllegalArgumentException("Kelvin functions ker/kei underflow for x > " + UNSCALED_LIMIT
                    + ", got x = " + x + "; use the scaled values");
        }
        return (x <= INTEGRAL_LIMIT ? integral(x) : asymptotic(x)).times(Math.exp(-x * INV_SQRT2));
    }

    /** The four values each multiplied by e^{+x/√2}; any finite x &gt; 0. */
    public static Values scaledValues(double x) {
        check(x);
        return x <= INTEGRAL_LIMIT ? integral(x) : asymptotic(x);
    }

    /** K0(x e^{πi/4}) = ker x + i kei x. */
    public static Complex k0(double x) {
        Values v = values(x);
        return new Complex(v.ker(), v.kei());
    }

    /** K1(x e^{πi/4}) = −e^{−πi/4}(ker' x + i kei' x). */
    public static Complex k1(double x) {
        Values v = values(x);
        return new Complex(v.kerPrime(), v.keiPrime()).multiply(new Complex(-INV_SQRT2, INV_SQRT2));
    }

    private static void check(double x) {
        if (!(x > 0.0) || Double.isInfinite(x)) {
            throw new IllegalArgumentException("Kelvin function ker/kei argument must be finite and > 0, got " + x);
        }
    }

    /**
     * K_n(z) = ∫_0^∞ e^{−z cosh t} cosh(nt) dt (A&amp;S 9.6.24), times e^{x/√2}, by the trapezoid rule
     * with step {@value #STEP}: the integrand is analytic in the strip |Im t| &lt; π/4, so the error
     * is of order e^{−2π(π/4)/h} ≈ 10⁻²¹ (trapezoid rule for analytic integrands, Trefethen &amp;
     * Weideman, SIAM Review 56 (2014)); terms are summed until they fall below 10⁻¹⁸ of the sum.
     */
    private static Values integral(double x) {
        double s = x * INV_SQRT2;
        double k0r = 0.0;
        double k0i = 0.0;
        double k1r = 0.0;
        double k1i = 0.0;
        for (int i = 0; i < 100000; i++) {
            double t = i * STEP;
            double c = Math.cosh(t);
            double w = (i == 0 ? 0.5 : 1.0) * Math.exp(-s * (c - 1.0));
            double re = w * Math.cos(s * c);
            double im = -w * Math.sin(s * c);
            k0r += re;
            k0i += im;
            k1r += re * c;
            k1i += im * c;
            if (w * c < 1e-18 * (Math.abs(k1r) + Math.abs(k1i))) {
                break;
            }
        }
        k0r *= STEP;
        k0i *= STEP;
        k1r *= STEP;
        k1i *= STEP;
        // ker' + i kei' = −e^{iπ/4} K1
        return new Values(k0r, k0i, -INV_SQRT2 * (k1r - k1i), -INV_SQRT2 * (k1r + k1i));
    }

    /** Hankel's expansion times e^{x/√2}: the exponential e^{−z} becomes the pure phase e^{−ix/√2}. */
    private static Values asymptotic(double x) {
        double wr = INV_SQRT2 / x; // 1/z = e^{−iπ/4}/x
        double wi = -INV_SQRT2 / x;
        double[] s0 = hankelSum(0.0, wr, wi);
        double[] s1 = hankelSum(4.0, wr, wi);
        // prefactor √(π/(2x))·e^{−iπ/8}·e^{−ix/√2}
        double phase = -x * INV_SQRT2 - Math.PI / 8.0;
        double amp = Math.sqrt(Math.PI / (2.0 * x));
        double pr = amp * Math.cos(phase);
        double pi = amp * Math.sin(phase);
        double k0r = pr * s0[0] - pi * s0[1];
        double k0i = pr * s0[1] + pi * s0[0];
        double k1r = pr * s1[0] - pi * s1[1];
        double k1i = pr * s1[1] + pi * s1[0];
        double dr = -INV_SQRT2 * (k1r - k1i);
        double di = -INV_SQRT2 * (k1r + k1i);
        return new Values(k0r, k0i, dr, di);
    }

    /** Σ_k a_k(ν) w^k with mu = 4ν², w = 1/z (all terms added, A&amp;S 9.7.2); stops at the smallest term. */
    private static double[] hankelSum(double mu, double wr, double wi) {
        double sr = 1.0;
        double si = 0.0;
        double tr = 1.0;
        double ti = 0.0;
        double last = Double.MAX_VALUE;
        for (int k = 1; k < 200; k++) {
            double odd = 2.0 * k - 1.0;
            double c = (mu - odd * odd) / (8.0 * k);
            double nr = c * (tr * wr - ti * wi);
            double ni = c * (tr * wi + ti * wr);
            double mag = Math.abs(nr) + Math.abs(ni);
            if (mag >= last) {
                break;
            }
            tr = nr;
            ti = ni;
            sr += tr;
            si += ti;
            last = mag;
            if (mag < 1e-17) {
                break;
            }
        }
        return new double[] {sr, si};
    }
}
