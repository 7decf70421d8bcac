package org.tankwright.magnetics;

import org.tankwright.units.Constants;

/**
 * Mutual-inductance kernels between filaments, shared by the coil model (self inductance as a
 * sum of mutual terms) and the coupling model.
 */
public final class MutualKernels {
    private MutualKernels() {
    }

    /**
     * Maxwell's formula for two coaxial circular filaments of radii {@code r1}, {@code r2} whose
     * planes are {@code d} apart: M = µ0 √(r1 r2) [(2/k − k) K(k²) − (2/k) E(k²)],
     * k² = 4 r1 r2 / ((r1 + r2)² + d²). Source: Maxwell, Treatise (1873) §701; Grover (1946) ch. 13.
     * For small k the bracket suffers cancellation; there the series form is used instead.
     */
    public static double coaxialRings(double r1, double r2, double d) {
        if (!(r1 > 0 && r2 > 0)) {
            throw new IllegalArgumentException("ring radii must be > 0, got " + r1 + ", " + r2);
        }
        double m = 4.0 * r1 * r2 / ((r1 + r2) * (r1 + r2) + d * d);
        double k = Math.sqrt(m);
        if (m < 1e-3) {
            // Series of the bracket in m (Grover 1946, eq. 77 type expansion):
            // (2/k − k)K − (2/k)E = (π/16) k³ (1 + 3/4 m + 75/128 m² + 245/512 m³ + ...)
            double series = 1 + 0.75 * m + 75.0 / 128.0 * m * m + 245.0 / 512.0 * m * m * m;
            return Constants.MU0 * Math.sqrt(r1 * r2) * Math.PI / 16.0 * k * m * series;
        }
        return Constants.MU0 * Math.sqrt(r1 * r2) * ((2.0 / k - k) * Elliptic.k(m) - 2.0 / k * Elliptic.e(m));
    }
}
