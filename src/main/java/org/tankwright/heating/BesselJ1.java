package org.tankwright.heating;

/**
 * Bessel function J1 of real argument for the plate model's spectral integral, from the polynomial
 * approximations of Abramowitz &amp; Stegun 9.4.4 (|x| ≤ 3, error below 1.3e-8·|x|) and 9.4.6
 * (|x| ≥ 3: J1 = f1·cos θ1/√x, errors of f1 and θ1 below 4e-8 and 9e-8). Fast rather than exact:
 * the plate integral needs J1 at thousands of nodes per ring.
 */
final class BesselJ1 {
    private BesselJ1() {
    }

    static double of(double x) {
        double a = Math.abs(x);
        double v;
        if (a <= 3) {
            double y = (a / 3) * (a / 3);
            v = a * (0.5 + y * (-0.56249985 + y * (0.21093573 + y * (-0.03954289 + y * (0.00443319
                    + y * (-0.00031761 + y * 0.00001109))))));
        } else {
            double y = 3 / a;
            double f1 = 0.79788456 + y * (0.00000156 + y * (0.01659667 + y * (0.00017105 + y * (-0.00249511
                    + y * (0.00113653 - y * 0.00020033)))));
            double t1 = a - 2.35619449 + y * (0.12499612 + y * (0.00005650 + y * (-0.00637879 + y * (0.00074348
                    + y * (0.00079824 - y * 0.00029166)))));
            v = f1 * Math.cos(t1) / Math.sqrt(a);
        }
        return x < 0 ? -v : v;
    }
}
