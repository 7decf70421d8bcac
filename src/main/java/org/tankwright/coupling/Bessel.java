package org.tankwright.coupling;

/**
 * Bessel functions J0 and J1 of real argument for the spectral kernel: the power series
 * (Abramowitz &amp; Stegun 9.1.10) below x = 12, Hankel's asymptotic expansion (A&amp;S 9.2.5, 9.2.9,
 * 9.2.10) above, summed to its smallest term. Absolute error below about 1e-11.
 */
final class Bessel {
    private static final double SWITCH = 12;

    private Bessel() {
    }

    static double j0(double x) {
        double a = Math.abs(x);
        return a < SWITCH ? series(0, a) : asymptotic(0, a);
    }

    static double j1(double x) {
        double a = Math.abs(x);
        double v = a < SWITCH ? series(1, a) : asymptotic(1, a);
        return x < 0 ? -v : v;
    }

    /** Σ (−x²/4)^k / (k! (k+ν)!) · (x/2)^ν. */
    private static double series(int nu, double x) {
        double q = -0.25 * x * x;
        double term = nu == 0 ? 1 : 0.5 * x;
        double sum = term;
        for (int k = 1; k < 80; k++) {
            term *= q / (k * (double) (k + nu));
            sum += term;
            if (Math.abs(term) < 1e-17 * Math.abs(sum) && Math.abs(term) < 1e-20) {
                break;
            }
        }
        return sum;
    }

    /** √(2/(πx)) (P cos χ − Q sin χ), χ = x − (ν/2 + 1/4)π, P and Q summed to the smallest term. */
    private static double asymptotic(int nu, double x) {
        double mu = 4.0 * nu * nu;
        double p = 1;
        double q = 0;
        double t = 1;
        double prev = Double.POSITIVE_INFINITY;
        for (int k = 1; k < 60; k++) {
            double odd = 2 * k - 1;
            t *= (mu - odd * odd) / (k * 8 * x);
            double at = Math.abs(t);
            if (at > prev || at < 1e-17) {
                break;
            }
            prev = at;
            // t_k enters P (even k) or Q (odd k) with sign (−1)^⌊k/2⌋
            double s = ((k / 2) % 2 == 0) ? t : -t;
            if (k % 2 == 0) {
                p += s;
            } else {
                q += s;
            }
        }
        double chi = x - (0.5 * nu + 0.25) * Math.PI;
        return Math.sqrt(2 / (Math.PI * x)) * (p * Math.cos(chi) - q * Math.sin(chi));
    }
}
