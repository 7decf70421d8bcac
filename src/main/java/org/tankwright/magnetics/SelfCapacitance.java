package org.tankwright.magnetics;

import org.tankwright.materials.Conductor;
import org.tankwright.units.Constants;

/**
 * Self-capacitance of a coil from the electrostatics of its turns (a physics-based estimate, no fitted
 * coefficients): each turn is a charged ring (a polygon turn a ring of equal perimeter); the winding's
 * potential rises linearly with conductor length from 0 at the first end to V at the other, as at low
 * frequency with one end at ground potential (the condition of Medhurst's measurements, Wireless
 * Engineer 1947). The ring charges follow from the potential-coefficient matrix (ring-to-ring potential
 * (q/2π²ε0) K(m)/√((R1+R2)² + z²), the ring's own potential evaluated at its wire surface), and the
 * self-capacitance from the stored energy, C = Σ qᵢvᵢ/V².
 *
 * <p>Limits, stated: thin-wire approximation (close-wound turns with thin insulation have more
 * turn-to-turn capacitance than this), insulation and former permittivity ignored (ε = ε0), no ground
 * plane or nearby coil (both shift the value). Traces charge like round wire of radius w/4.
 */
final class SelfCapacitance {
    /** How the estimate is made, for results. */
    static final String DESCRIPTION = "estimate: electrostatics of the turns as charged rings with a linear voltage "
            + "along the wire, one end at ground potential (physics-based; insulation permittivity ignored)";

    private SelfCapacitance() {
    }

    /**
     * @param radius    ring radius of each turn in winding order, m
     * @param z         axial position of each turn, m
     * @param potential potential of each turn as a share of the end-to-end voltage (0..1)
     * @param chargeRadius radius of the conductor surface for the ring's own potential, m
     */
    static double compute(double[] radius, double[] z, double[] potential, double chargeRadius) {
        int n = radius.length;
        double[][] p = new double[n][n];
        double c0 = 1.0 / (2 * Math.PI * Math.PI * Constants.EPS0);
        boolean uniform = uniformColumn(radius, z);
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                double v;
                if (uniform && i > 0) {
                    v = p[0][j - i]; // depends only on the separation
                } else {
                    double dz = i == j ? chargeRadius : z[i] - z[j];
                    double s = (radius[i] + radius[j]) * (radius[i] + radius[j]) + dz * dz;
                    double m = 4 * radius[i] * radius[j] / s;
                    v = c0 * Elliptic.k(Math.min(m, 1 - 1e-16)) / Math.sqrt(s);
                }
                p[i][j] = v;
                p[j][i] = v;
            }
        }
        double[] q = solveSymmetric(p, potential.clone());
        double energy2 = 0;
        for (int i = 0; i < n; i++) {
            energy2 += q[i] * potential[i];
        }
        return energy2;
    }

    private static boolean uniformColumn(double[] radius, double[] z) {
        int n = radius.length;
        if (n < 3) {
            return false;
        }
        double pitch = z[1] - z[0];
        for (int i = 1; i < n; i++) {
            if (radius[i] != radius[0] || Math.abs(z[i] - z[0] - i * pitch) > 1e-12 * Math.abs(pitch) * n) {
                return false;
            }
        }
        return pitch != 0;
    }

    /** Radius of the conductor surface carrying the charge: bare radius, bundle or tube radius, w/4 for a trace. */
    static double chargeRadius(Conductor c) {
        if (c instanceof Conductor.RoundWire w) {
            return 0.5 * w.diameter();
        }
        if (c instanceof Conductor.Litz l) {
            return 0.5 * l.bundleDiameter();
        }
        if (c instanceof Conductor.Tube t) {
            return 0.5 * t.outerDiameter();
        }
        return 0.25 * ((Conductor.Trace) c).width();
    }

    /** Cholesky solve of a symmetric positive-definite system (overwrites a). */
    private static double[] solveSymmetric(double[][] a, double[] b) {
        int n = b.length;
        for (int j = 0; j < n; j++) {
            double d = a[j][j];
            for (int k = 0; k < j; k++) {
                d -= a[j][k] * a[j][k];
            }
            if (!(d > 0)) {
                throw new ArithmeticException("potential-coefficient matrix is not positive definite");
            }
            d = Math.sqrt(d);
            a[j][j] = d;
            for (int i = j + 1; i < n; i++) {
                double s = a[i][j];
                for (int k = 0; k < j; k++) {
                    s -= a[i][k] * a[j][k];
                }
                a[i][j] = s / d;
            }
        }
        for (int i = 0; i < n; i++) {
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= a[i][k] * b[k];
            }
            b[i] = s / a[i][i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = b[i];
            for (int k = i + 1; k < n; k++) {
                s -= a[k][i] * b[k];
            }
            b[i] = s / a[i][i];
        }
        return b;
    }
}
