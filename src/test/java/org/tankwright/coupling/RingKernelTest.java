package org.tankwright.coupling;

import org.tankwright.bench.NeumannReference;
import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.MutualKernels;
import org.tankwright.units.Constants;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class RingKernelTest {

    @Test
    void coaxialMatchesMaxwellAndNeumann() {
        double[][] cases = {{0.1, 0.1, 0.05}, {0.2, 0.05, 0.01}, {0.1, 0.12, 0.3}, {0.05, 0.05, 2.0}};
        for (double[] c : cases) {
            double m = RingKernel.coaxial(c[0], c[1], c[2]);
            // Maxwell, Treatise (1873) §701, as implemented independently in MutualKernels.coaxialRings
            // MutualKernels evaluates the bracket (2/k − k)K − (2/k)E directly, which cancels a little at small k
            // (about 6e-11 relative at k² = 0.0025); the Neumann check below is the tight one.
            assertEquals(MutualKernels.coaxialRings(c[0], c[1], c[2]), m, 1e-9 * Math.abs(m), "Maxwell closed form");
            // Neumann's double integral computed directly, slowly
            double ref = NeumannReference.rings(c[0], c[1], c[2], 0, 1200);
            assertEquals(ref, m, 1e-10 * Math.abs(ref), "Neumann double integral");
            assertEquals(m, RingKernel.mutual(c[0], c[1], c[2], 0), 0, "lateral 0 reduces to Maxwell");
        }
    }

    @Test
    void closeCoaxialRingsMatchMaxwellsSeries() {
        // Maxwell's series for two close coaxial circles (A Dynamical Theory of the Electromagnetic Field,
        // Phil. Trans. 155, 1865, §112), to second order, in SI with c = a1 − a and r² = c² + b²:
        // M = µ0 a [ln(8a/r)(1 + c/(2a) + (3b² + c²)/(16a²)) − (2 + c/(2a) + (b² − 3c²)/(16a²))]
        double a = 0.1;
        double[][] cases = {{0.098, 0.003, 1e-5}, {0.102, 0.003, 1e-5}, {0.1, 0.005, 1e-5}, {0.095, 0.01, 2e-4}};
        for (double[] t : cases) {
            double a1 = t[0];
            double b = t[1];
            double c = a1 - a;
            double r = Math.hypot(c, b);
            double series = Constants.MU0 * a * (Math.log(8 * a / r) * (1 + c / (2 * a) + (3 * b * b + c * c) / (16 * a * a))
                    - (2 + c / (2 * a) + (b * b - 3 * c * c) / (16 * a * a)));
            double m = RingKernel.coaxial(a, a1, b);
            assertEquals(series, m, t[2] * m, "Maxwell 1865 series, a1 = " + a1 + ", b = " + b);
        }
    }

    @Test
    void offsetRingsMatchNeumann() {
        // r1, r2, dz, lateral — including the primary axis passing through the secondary (lateral = r2)
        double[][] cases = {{0.1, 0.1, 0.05, 0.03}, {0.1, 0.05, 0.02, 0.05}, {0.1, 0.1, 0.02, 0.15},
                {0.3, 0.1, 0.1, 0.4}, {0.1, 0.1, 0.01, 0.1}, {0.05, 0.2, 0.03, 0.2}};
        for (double[] c : cases) {
            double m = RingKernel.mutual(c[0], c[1], c[2], c[3]);
            double ref = NeumannReference.rings(c[0], c[1], c[2], c[3], 1600);
            assertEquals(ref, m, 1e-8 * Math.abs(ref) + 1e-17, "Neumann double integral, case " + java.util.Arrays.toString(c));
            // M12 = M21: exchange the rings
            assertEquals(m, RingKernel.mutual(c[1], c[0], -c[2], c[3]), 1e-9 * Math.abs(m) + 1e-18, "reciprocity");
        }
    }

    @Test
    void offsetRingsMatchFluxOfClosedFormField() {
        // Independent route: flux of ring 1's closed-form B_z (Smythe §7.10) through the disc of ring 2
        double r1 = 0.1;
        double r2 = 0.06;
        double dz = 0.04;
        double d = 0.07;
        double[] b = new double[3];
        int nr = 64;
        int nt = 400;
        double flux = 0;
        org.hipparchus.analysis.integration.gauss.GaussIntegrator rule =
                new org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory().legendre(nr, 0, r2);
        for (int i = 0; i < nr; i++) {
            double rho = rule.getPoint(i);
            double w = rule.getWeight(i);
            for (int j = 0; j < nt; j++) {
                double t = 2 * Math.PI * j / nt;
                RingKernel.fluxDensity(r1, d + rho * Math.cos(t), rho * Math.sin(t), dz, b);
                flux += w * rho * b[2] * 2 * Math.PI / nt;
            }
        }
        double m = RingKernel.mutual(r1, r2, dz, d);
        assertEquals(flux, m, 1e-9 * Math.abs(m), "flux of B through ring 2 (Hipparchus Gauss-Legendre in radius)");
    }

    @Test
    void farFieldApproachesDipoleLimit() {
        // Two coaxial loops far apart: M -> µ0 π R1² R2² / (2 d³) (magnetic dipole coupling, common practice)
        double r1 = 0.05;
        double r2 = 0.03;
        for (double dist : new double[] {5, 20}) {
            double dipole = Constants.MU0 * Math.PI * r1 * r1 * r2 * r2 / (2 * dist * dist * dist);
            double m = RingKernel.mutual(r1, r2, dist, 0);
            assertEquals(dipole, m, 3 * (r1 * r1 + r2 * r2) / (dist * dist) * dipole, "dipole limit at " + dist);
        }
        // Side by side in one plane far apart: M -> −µ0 π R1² R2² / (4 d³) (dipole, equatorial position)
        double side = 10;
        double dipoleSide = -Constants.MU0 * Math.PI * r1 * r1 * r2 * r2 / (4 * side * side * side);
        assertEquals(dipoleSide, RingKernel.mutual(r1, r2, 0, side), 1e-3 * Math.abs(dipoleSide), "equatorial dipole");
    }

    @Test
    void ellipticCombinationMatchesHipparchus() {
        for (double m : new double[] {0.01, 0.1, 0.3, 0.7, 0.99, 0.999999}) {
            double k = org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral.bigK(m);
            double e = org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral.bigE(m);
            double expected = ((2 - m) * k - 2 * e) / (m * m);
            // the direct difference loses about 1e-16/m² to cancellation; ours does not
            assertEquals(expected, RingKernel.f(m), 1e-12 / (m * m) * Math.abs(expected), "Hipparchus K and E at m=" + m);
        }
        for (double m : new double[] {1e-9, 1e-5, 1e-3}) {
            // power series of [(2−m)K − 2E]/m² from the hypergeometric series of K and E (A&S 17.3.11, 17.3.12)
            double series = Math.PI / 16 * (1 + 0.75 * m + 75.0 / 128 * m * m + 245.0 / 512 * m * m * m);
            assertEquals(series, RingKernel.f(m), 1e-13, "series at m=" + m);
        }
        assertTrue(Math.abs(RingKernel.f(0) - Math.PI / 16) < 1e-16, "limit π/16");
    }
}
