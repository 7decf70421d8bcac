package org.tankwright.bench;

import org.tankwright.units.Constants;

/**
 * Slow, direct reference values for mutual inductance: Neumann's double integral
 * M = (µ0/4π) ∮∮ dl1·dl2 / r evaluated by brute force, independent of the coupling kernels
 * (used by their tests and by the coupling benchmark).
 */
public final class NeumannReference {
    private static final double[] GX = {-0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498,
            0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363};
    private static final double[] GW = {0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620,
            0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763};

    private NeumannReference() {
    }

    /**
     * Two rings with axes parallel to z: ring 1 radius r1 at the origin, ring 2 radius r2 centred at
     * (dx, 0, dz). Product trapezoidal rule with n × n nodes (spectrally accurate for periodic integrands).
     */
    public static double rings(double r1, double r2, double dz, double dx, int n) {
        double h = 2 * Math.PI / n;
        double[] c = new double[n];
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            c[i] = Math.cos(i * h);
            s[i] = Math.sin(i * h);
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double x1 = r1 * c[i];
            double y1 = r1 * s[i];
            for (int j = 0; j < n; j++) {
                double x = dx + r2 * c[j] - x1;
                double y = r2 * s[j] - y1;
                double cosDiff = c[i] * c[j] + s[i] * s[j];
                sum += cosDiff / Math.sqrt(x * x + y * y + dz * dz);
            }
        }
        return Constants.MU0 / (4 * Math.PI) * r1 * r2 * sum * h * h;
    }

    /**
     * Two straight segments given as {x0, y0, z0, x1, y1, z1}: 8-point Gauss–Legendre product rule on
     * each of panels × panels sub-panels.
     */
    public static double segments(double[] a, double[] b, int panels) {
        double[] u = {a[3] - a[0], a[4] - a[1], a[5] - a[2]};
        double[] v = {b[3] - b[0], b[4] - b[1], b[5] - b[2]};
        double dot = u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
        double sum = 0;
        for (int p = 0; p < panels; p++) {
            for (int i = 0; i < 8; i++) {
                double s = (p + 0.5 + 0.5 * GX[i]) / panels;
                double ws = GW[i] * 0.5 / panels;
                double x1 = a[0] + s * u[0];
                double y1 = a[1] + s * u[1];
                double z1 = a[2] + s * u[2];
                for (int q = 0; q < panels; q++) {
                    for (int j = 0; j < 8; j++) {
                        double t = (q + 0.5 + 0.5 * GX[j]) / panels;
                        double wt = GW[j] * 0.5 / panels;
                        double x = b[0] + t * v[0] - x1;
                        double y = b[1] + t * v[1] - y1;
                        double z = b[2] + t * v[2] - z1;
                        sum += ws * wt / Math.sqrt(x * x + y * y + z * z);
                    }
                }
            }
        }
        return Constants.MU0 / (4 * Math.PI) * dot * sum;
    }

    /** Direct Neumann over every ring pair of two ring coils in parallel planes, coil b shifted by (dx, 0, dz); n × n nodes per pair. */
    public static double ringCoils(double[] radiiA, double[] radiiB, double dz, double dx, int n) {
        double s = 0;
        for (double ra : radiiA) {
            for (double rb : radiiB) {
                s += rings(ra, rb, dz, dx, n);
            }
        }
        return s;
    }
}
