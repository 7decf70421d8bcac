package org.tankwright.numerics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.junit.jupiter.api.Test;

class KelvinTest {

    /**
     * Abramowitz &amp; Stegun, Handbook of Mathematical Functions, Table 9.12 (ber x, bei x),
     * values quoted to 8 decimals from memory of the table; the integral check below is the
     * independent full-precision reference.
     */
    @Test
    void matchesAbramowitzStegunTable912() {
        double[][] table = {
                // x, ber x, bei x
                {1.0, 0.98438178, 0.24956604},
                {2.0, 0.75173418, 0.97229163},
                {5.0, -6.23008248, 0.11603438},
        };
        for (double[] row : table) {
            assertEquals(row[1], Kelvin.ber(row[0]), 6e-9, "ber(" + row[0] + ") vs A&S Table 9.12");
            assertEquals(row[2], Kelvin.bei(row[0]), 6e-9, "bei(" + row[0] + ") vs A&S Table 9.12");
        }
    }

    /**
     * Independent reference: Bessel's integral J0(z) = (1/π)∫₀^π cos(z sin θ) dθ and
     * J1(z) = (1/π)∫₀^π cos(θ − z sin θ) dθ (A&amp;S 9.1.21), valid for complex z, evaluated at
     * z = x e^{3πi/4} with composite Gauss-Legendre (Hipparchus nodes) and Hipparchus complex arithmetic.
     * Covers both the series and the asymptotic branch.
     */
    @Test
    void matchesBesselIntegralFromHipparchus() {
        for (double x : new double[] {0.3, 1.7, 4.4, 8.0, 13.0, 19.5, 24.0, 26.0, 31.0, 45.0, 80.0}) {
            org.hipparchus.complex.Complex z = new org.hipparchus.complex.Complex(-x * Math.sqrt(0.5), x * Math.sqrt(0.5));
            double[] j0 = integrate(z, 0);
            double[] j1 = integrate(z, 1);
            double envelope = Math.exp(x * Math.sqrt(0.5)) / Math.sqrt(2 * Math.PI * Math.max(x, 0.5));
            double tol = 2e-12 * Math.max(1.0, envelope);
            Complex a = Kelvin.j0(x);
            Complex b = Kelvin.j1(x);
            assertEquals(j0[0], a.getReal(), tol, "ber(" + x + ") vs Bessel integral");
            assertEquals(j0[1], a.getImaginary(), tol, "bei(" + x + ") vs Bessel integral");
            assertEquals(j1[0], b.getReal(), tol, "ber1(" + x + ") vs Bessel integral");
            assertEquals(j1[1], b.getImaginary(), tol, "bei1(" + x + ") vs Bessel integral");
        }
    }

    /** Composite 12-point Gauss-Legendre (Hipparchus nodes) on 200 panels over [0, π]. */
    private static double[] integrate(org.hipparchus.complex.Complex z, int order) {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(12, 0, 1);
        int panels = 200;
        double h = Math.PI / panels;
        double re = 0;
        double im = 0;
        for (int p = 0; p < panels; p++) {
            for (int i = 0; i < rule.getNumberOfPoints(); i++) {
                org.hipparchus.complex.Complex v = integrand(z, order, h * (p + rule.getPoint(i)));
                re += rule.getWeight(i) * h * v.getReal();
                im += rule.getWeight(i) * h * v.getImaginary();
            }
        }
        return new double[] {re / Math.PI, im / Math.PI};
    }

    private static org.hipparchus.complex.Complex integrand(org.hipparchus.complex.Complex z, int order, double t) {
        org.hipparchus.complex.Complex arg = z.multiply(Math.sin(t));
        return order == 0 ? arg.cos() : arg.negate().add(t).cos();
    }

    /** Derivatives are consistent with the values (central difference), on both branches. */
    @Test
    void derivativesMatchNumericalDifferentiation() {
        for (double x : new double[] {0.8, 3.0, 12.0, 30.0, 60.0}) {
            double h = 1e-5 * Math.max(1, x);
            Kelvin.Values v = Kelvin.values(x);
            double scale = Math.exp(x * Math.sqrt(0.5)) / Math.sqrt(x);
            assertEquals((Kelvin.ber(x + h) - Kelvin.ber(x - h)) / (2 * h), v.berPrime(), 1e-7 * scale, "ber' at " + x);
            assertEquals((Kelvin.bei(x + h) - Kelvin.bei(x - h)) / (2 * h), v.beiPrime(), 1e-7 * scale, "bei' at " + x);
        }
    }

    /** Series and asymptotic branches agree where they meet (continuity at the switch). */
    @Test
    void branchesAgreeAtSwitchPoint() {
        double x = Kelvin.SERIES_LIMIT;
        Kelvin.Values below = Kelvin.scaledValues(Math.nextDown(x));
        Kelvin.Values above = Kelvin.scaledValues(Math.nextUp(x));
        double env = 1 / Math.sqrt(2 * Math.PI * x);
        assertEquals(below.ber(), above.ber(), 1e-12 * env);
        assertEquals(below.bei(), above.bei(), 1e-12 * env);
        assertEquals(below.berPrime(), above.berPrime(), 1e-12 * env);
        assertEquals(below.beiPrime(), above.beiPrime(), 1e-12 * env);
    }

    /**
     * Round-wire skin effect R/R0: low-frequency limit 1 + x⁴/192 and high-frequency limit
     * x/(2√2) + 1/4 (exact Bessel solution's expansions, e.g. Ramo, Whinnery &amp; Van Duzer);
     * internal reactance → x²/8 (internal inductance µ0/8π, common textbook result).
     */
    @Test
    void skinEffectRatioLimits() {
        assertEquals(1 + Math.pow(0.1, 4) / 192, Kelvin.skinResistanceRatio(0.1), 1e-11);
        assertEquals(0.1 * 0.1 / 8, Kelvin.skinReactanceRatio(0.1), 1e-8);
        for (double x : new double[] {200, 2000, 1e5}) {
            double expected = x / (2 * Math.sqrt(2)) + 0.25;
            assertEquals(expected, Kelvin.skinResistanceRatio(x), 1e-3 * expected / x * 10, "R/R0 at x=" + x);
            assertTrue(Double.isFinite(Kelvin.skinReactanceRatio(x)));
        }
        assertEquals(0.0, Kelvin.skinResistanceRatio(0) - 1.0, 0.0);
    }

    @Test
    void rejectsBadArguments() {
        assertThrows(IllegalArgumentException.class, () -> Kelvin.ber(-1));
        assertThrows(IllegalArgumentException.class, () -> Kelvin.ber(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Kelvin.values(2000));
        assertTrue(Double.isFinite(Kelvin.scaledValues(1e6).ber()));
    }
}
