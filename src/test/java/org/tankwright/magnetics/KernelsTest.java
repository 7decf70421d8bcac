package org.tankwright.magnetics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.tankwright.units.Constants;

class KernelsTest {

    /** K(m) and E(m) by the AGM against Hipparchus LegendreEllipticIntegral (general-purpose library). */
    @Test
    void ellipticIntegralsMatchHipparchus() {
        for (double m : new double[] {0, 1e-9, 1e-3, 0.1, 0.5, 0.9, 0.99, 0.999999, 1 - 1e-12}) {
            assertEquals(LegendreEllipticIntegral.bigK(m), Elliptic.k(m), 1e-13 * LegendreEllipticIntegral.bigK(m),
                    "K(" + m + ") vs Hipparchus");
            assertEquals(LegendreEllipticIntegral.bigE(m), Elliptic.e(m), 1e-12, "E(" + m + ") vs Hipparchus");
        }
    }

    /** Maxwell's coaxial formula against Neumann's integral M = (µ0 R1 R2/2)∫cosφ/r dφ (composite Gauss-Legendre, Hipparchus nodes). */
    @Test
    void maxwellMatchesNeumannIntegral() {
        double[][] cases = {{0.1, 0.1, 0.01}, {0.1, 0.05, 0.0}, {0.1, 0.12, 0.3}, {0.02, 0.3, 1.0}, {0.1, 0.1, 2.0}};
        CompositeGauss gauss = new CompositeGauss(12);
        for (double[] c : cases) {
            double r1 = c[0];
            double r2 = c[1];
            double d = c[2];
            double integral = gauss.integrate(
                    phi -> Math.cos(phi) / Math.sqrt(r1 * r1 + r2 * r2 - 2 * r1 * r2 * Math.cos(phi) + d * d),
                    0, 2 * Math.PI, 400);
            double neumann = Constants.MU0 * r1 * r2 / 2 * integral;
            assertEquals(neumann, MutualKernels.coaxialRings(r1, r2, d), 1e-9 * Math.abs(neumann),
                    "Maxwell vs Neumann for " + java.util.Arrays.toString(c));
        }
    }

    /** The small-k series branch of the Maxwell kernel joins the elliptic branch smoothly (switch at m = 1e-3). */
    @Test
    void maxwellSeriesBranchIsContinuous() {
        double r = 0.1;
        // m = 4r²/(4r² + d²) = 1e-3  →  d = 2r·sqrt(1/m − 1)
        double dSwitch = 2 * r * Math.sqrt(1 / 1e-3 - 1);
        double below = MutualKernels.coaxialRings(r, r, dSwitch * (1 + 1e-9));
        double above = MutualKernels.coaxialRings(r, r, dSwitch * (1 - 1e-9));
        assertEquals(below, above, 1e-8 * below, "branch continuity");
        // and both agree with the dipole limit µ0 π r⁴ / (2 d³) (Grover 1946) to the expected order m
        double dipole = Constants.MU0 * Math.PI * Math.pow(r, 4) / (2 * Math.pow(dSwitch, 3));
        assertEquals(dipole, below, 2e-3 * dipole);
    }

    /**
     * Straight-filament kernel against a brute-force Neumann double integral (composite
     * Gauss-Legendre with Hipparchus nodes): parallel, inclined coplanar, sharing a vertex, and skew in 3-D.
     */
    @Test
    void segmentKernelMatchesNeumannDoubleIntegral() {
        Segment[][] pairs = {
                {new Segment(0, 0, 0, 1, 0, 0, 1e-3), new Segment(0.2, 0.1, 0, 1.5, 0.1, 0, 1e-3)},
                {new Segment(0, 0, 0, 1, 0, 0, 1e-3), new Segment(1.5, 0.05, 0, 0.3, 0.05, 0, 1e-3)},
                {new Segment(0, 0, 0, 1, 0, 0, 1e-3), new Segment(1.2, 0, 0, 2, 0, 0, 1e-3)},
                {new Segment(0, 0, 0, 1, 0, 0, 1e-3), new Segment(1, 0, 0, 1.5, 0.8, 0, 1e-3)},
                {new Segment(0, 0, 0, 1, 0, 0, 1e-3), new Segment(0.2, 0.05, 0, 1.0, 0.6, 0, 1e-3)},
                {new Segment(0, 0, 0, 1, 0, 0, 1e-3), new Segment(0.3, -0.4, 0.2, 0.9, 0.5, 0.25, 1e-3)},
        };
        for (Segment[] p : pairs) {
            double reference = neumann(p[0], p[1]);
            assertEquals(reference, MutualKernels.segments(p[0], p[1]), 2e-7 * Math.abs(reference) + 1e-15,
                    "segment pair " + p[0] + " / " + p[1]);
        }
    }

    /**
     * Brute-force Neumann integral by composite fixed Gauss-Legendre rules from Hipparchus
     * (GaussIntegratorFactory). Both parameters are stretched quadratically toward the ends where the
     * filaments may meet (s = la(1 − w²) from a's end, t = lb·q² from b's start), which removes the
     * 1/r corner singularity of touching filaments.
     */
    private static double neumann(Segment a, Segment b) {
        double la = a.length();
        double lb = b.length();
        double[] u = {(a.x1() - a.x0()) / la, (a.y1() - a.y0()) / la, (a.z1() - a.z0()) / la};
        double[] v = {(b.x1() - b.x0()) / lb, (b.y1() - b.y0()) / lb, (b.z1() - b.z0()) / lb};
        double cos = u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
        CompositeGauss gauss = new CompositeGauss(12);
        double integral = gauss.integrate(w -> {
            double s = la * (1 - w * w);
            double px = a.x0() + s * u[0];
            double py = a.y0() + s * u[1];
            double pz = a.z0() + s * u[2];
            return 2 * la * w * gauss.integrate(q -> {
                double t = lb * q * q;
                return 2 * lb * q / Math.sqrt(sq(px - b.x0() - t * v[0]) + sq(py - b.y0() - t * v[1])
                        + sq(pz - b.z0() - t * v[2]));
            }, 0, 1, 60);
        }, 0, 1, 60);
        return Constants.MU0 / (4 * Math.PI) * cos * integral;
    }

    private static double sq(double x) {
        return x * x;
    }

    /** Rosa 1908 / Grover 1946 straight-wire self inductance: long-wire limit (µ0 l/2π)(ln(2l/a) − 3/4). */
    @Test
    void straightWireSelfInductance() {
        double l = 1.0;
        double a = 1e-4;
        double expected = Constants.MU0 * l / (2 * Math.PI) * (Math.log(2 * l / a) - 0.75);
        assertEquals(expected, MutualKernels.segmentSelf(l, a), 1e-4 * expected);
    }

    /**
     * Ring field: on the axis Bz = µ0 R²/(2(R² + z²)^{3/2}) (textbook Biot–Savart); off the axis the field
     * is consistent with the flux through coaxial circles computed by Maxwell's mutual-inductance formula:
     * dΦ/dr = 2πr Bz and dΦ/dz = −2πr Br.
     */
    @Test
    void ringFieldMatchesAxisFormulaAndFlux() {
        double rr = 0.1;
        double[] b = new double[2];
        MutualKernels.ringField(rr, 0.0, 0.05, b);
        assertEquals(Constants.MU0 * rr * rr / (2 * Math.pow(rr * rr + 0.0025, 1.5)), b[1], 1e-15);
        assertEquals(0.0, b[0], 0.0);
        double r = 0.06;
        double z = 0.04;
        double h = 1e-6;
        MutualKernels.ringField(rr, r, z, b);
        double dPhiDr = (MutualKernels.coaxialRings(rr, r + h, z) - MutualKernels.coaxialRings(rr, r - h, z)) / (2 * h);
        double dPhiDz = (MutualKernels.coaxialRings(rr, r, z + h) - MutualKernels.coaxialRings(rr, r, z - h)) / (2 * h);
        assertEquals(dPhiDr, 2 * Math.PI * r * b[1], 1e-6 * Math.abs(dPhiDr));
        assertEquals(dPhiDz, -2 * Math.PI * r * b[0], 1e-6 * Math.abs(dPhiDz));
    }
}
