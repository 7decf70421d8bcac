package org.tankwright.coupling;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Adaptive Gauss–Legendre quadrature for the one-dimensional integrals of the filament kernels
 * (segment with segment, ring with segment). An interval is accepted when its 8-point rule agrees
 * with the sum over its two halves; otherwise both halves are refined. The integrand is a reusable
 * mutable object, so a pair sum allocates nothing per pair.
 */
final class AdaptiveGauss {
    private static final int ORDER = 8;
    private static final double[] X = new double[ORDER];
    private static final double[] W = new double[ORDER];
    private static final int MAX_DEPTH = 40;

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(ORDER);
        for (int i = 0; i < ORDER; i++) {
            X[i] = rule.getPoint(i);
            W[i] = rule.getWeight(i);
        }
    }

    /** A real function of one variable whose parameters are set before each integration. */
    abstract static class Integrand {
        abstract double value(double s);
    }

    private AdaptiveGauss() {
    }

    /** ∫_a^b f(s) ds to about {@code relTol} of ∫|f|. */
    static double integrate(Integrand f, double a, double b, double relTol) {
        double whole = rule(f, a, b);
        double scale = Math.abs(whole);
        return refine(f, a, b, whole, relTol, scale, 0);
    }

    private static double refine(Integrand f, double a, double b, double whole, double tol, double scale, int depth) {
        double mid = 0.5 * (a + b);
        double left = rule(f, a, mid);
        double right = rule(f, mid, b);
        double both = left + right;
        if (Math.abs(both - whole) <= tol * Math.max(scale, Math.abs(both)) || depth >= MAX_DEPTH) {
            return both;
        }
        return refine(f, a, mid, left, tol, scale, depth + 1) + refine(f, mid, b, right, tol, scale, depth + 1);
    }

    private static double rule(Integrand f, double a, double b) {
        double c = 0.5 * (a + b);
        double h = 0.5 * (b - a);
        double s = 0;
        for (int i = 0; i < ORDER; i++) {
            s += W[i] * f.value(c + h * X[i]);
        }
        return s * h;
    }
}
