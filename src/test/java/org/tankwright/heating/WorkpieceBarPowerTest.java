package org.tankwright.heating;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tankwright.units.Constants;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The exact bar solution against its two asymptotes and an independent numerical integration. */
class WorkpieceBarPowerTest {
    private static final double RHO_COPPER = 1.724e-8;
    private static final double A = 0.01;
    private static final double H0 = 2e4;

    private static double frequencyForRadiusOverDepth(double u, double rho, double muR) {
        return ReferenceDepth.frequencyFor(rho, muR, A / u);
    }

    @Test
    void approachesThinSkinLimitWithDeficitHalfDepthOverRadius() {
        // Thin-skin limit 2πa·H0²·ρ/δ (MODELS.md §5; Davies 1990); the next Hankel term (A&S 9.7.1) gives
        // P'/P_thin ≈ 1 − δ/(2a) + O((δ/a)²): derived in docs/models.md.
        double previousError = Double.MAX_VALUE;
        for (double u : new double[] {10, 100, 1000, 10000}) {
            double f = frequencyForRadiusOverDepth(u, RHO_COPPER, 1);
            BarResponse r = AxialFieldBar.solve(A, 0, RHO_COPPER, 1, f, H0);
            assertEquals(u, r.radiusOverDepth(), 1e-9 * u);
            double error = Math.abs(r.thinSkinRatio() - 1);
            assertTrue(error < previousError, "thin-skin ratio must approach 1 as a/δ grows; a/δ=" + u);
            previousError = error;
            assertEquals(1 - 0.5 / u, r.thinSkinRatio(), 1.0 / (u * u), "P'/P_thin ≈ 1 − δ/2a at a/δ=" + u);
        }
        assertTrue(previousError < 1e-4);
    }

    @Test
    void approachesLowFrequencyClosedFormAndScalesAsFrequencySquared() {
        // a ≪ δ: P' = π·ω²·µ²·H0²·a⁴/(8ρ) (Faraday's law with the undisturbed field, derived in docs/models.md)
        for (double muR : new double[] {1, 80}) {
            for (double u : new double[] {0.1, 0.01, 0.001}) {
                double f = frequencyForRadiusOverDepth(u, 1.1e-6, muR);
                BarResponse r = AxialFieldBar.solve(A, 0, 1.1e-6, muR, f, H0);
                double omega = 2 * Math.PI * f;
                double mu = Constants.MU0 * muR;
                double closed = Math.PI * omega * omega * mu * mu * H0 * H0 * Math.pow(A, 4) / (8 * 1.1e-6);
                assertEquals(closed, r.lowFrequencyLimit(), 1e-12 * closed);
                // the relative deviation is of order x⁴/24 with x = √2·a/δ
                double x = Math.sqrt(2) * u;
                assertEquals(1.0, r.powerPerLength() / closed, Math.max(0.1 * Math.pow(x, 4), 1e-12),
                        "low-frequency asymptote at a/δ=" + u + ", µr=" + muR);
            }
            double f1 = frequencyForRadiusOverDepth(0.001, 1.1e-6, muR);
            double p1 = AxialFieldBar.solve(A, 0, 1.1e-6, muR, f1, H0).powerPerLength();
            double p2 = AxialFieldBar.solve(A, 0, 1.1e-6, muR, 2 * f1, H0).powerPerLength();
            assertEquals(4.0, p2 / p1, 1e-9, "P' ∝ f² for a ≪ δ");
        }
    }

    /**
     * Independent check: integrate H'' + H'/r = k²H (k² = 2j/δ²) by fourth-order Runge–Kutta from the
     * axis (or the bore, with ρH'(c) = jωµ0·c·H(c)/2) to the surface; F = 2H'(a)/(k²·a·H(a)).
     */
    private static Complex numericalFluxFactor(double a, double c, double delta, double muR) {
        Complex k2 = new Complex(0, 2 / (delta * delta));
        int n = 6000;
        double r0 = c > 0 ? c : a * 1e-6;
        Complex h = Complex.ONE;
        Complex dh = c > 0 ? k2.multiply(c / (2 * muR)) : k2.multiply(r0 / 2);
        double step = (a - r0) / n;
        double r = r0;
        for (int i = 0; i < n; i++) {
            Complex[] k1 = deriv(r, h, dh, k2);
            Complex[] kk2 = deriv(r + step / 2, h.add(k1[0].multiply(step / 2)), dh.add(k1[1].multiply(step / 2)), k2);
            Complex[] k3 = deriv(r + step / 2, h.add(kk2[0].multiply(step / 2)), dh.add(kk2[1].multiply(step / 2)), k2);
            Complex[] k4 = deriv(r + step, h.add(k3[0].multiply(step)), dh.add(k3[1].multiply(step)), k2);
            h = h.add(k1[0].add(kk2[0].multiply(2)).add(k3[0].multiply(2)).add(k4[0]).multiply(step / 6));
            dh = dh.add(k1[1].add(kk2[1].multiply(2)).add(k3[1].multiply(2)).add(k4[1]).multiply(step / 6));
            r += step;
        }
        return dh.multiply(2).divide(k2.multiply(a).multiply(h));
    }

    private static Complex[] deriv(double r, Complex h, Complex dh, Complex k2) {
        return new Complex[] {dh, k2.multiply(h).subtract(dh.divide(r))};
    }

    @Test
    void matchesNumericalIntegrationOfTheFieldEquation() {
        for (double u : new double[] {0.5, 1.5, 4.0}) {
            double delta = A / u;
            Complex exact = AxialFieldBar.fluxFactor(A, 0, delta, 1);
            Complex num = numericalFluxFactor(A, 0, delta, 1);
            assertEquals(num.getReal(), exact.getReal(), 1e-7, "solid bar, Re F, a/δ=" + u);
            assertEquals(num.getImaginary(), exact.getImaginary(), 1e-7, "solid bar, Im F, a/δ=" + u);
            for (double muR : new double[] {1, 30}) {
                Complex t = AxialFieldBar.fluxFactor(A, 0.6 * A, delta, muR);
                Complex tn = numericalFluxFactor(A, 0.6 * A, delta, muR);
                assertEquals(tn.getReal(), t.getReal(), 1e-7, "tube, Re F, a/δ=" + u + " µr=" + muR);
                assertEquals(tn.getImaginary(), t.getImaginary(), 1e-7, "tube, Im F, a/δ=" + u + " µr=" + muR);
            }
        }
    }

    @Test
    void tubeTendsToSolidBarAndToItsLowFrequencyClosedForm() {
        double delta = A / 2.0;
        Complex solid = AxialFieldBar.fluxFactor(A, 0, delta, 20);
        Complex pinhole = AxialFieldBar.fluxFactor(A, 1e-7 * A, delta, 20);
        assertEquals(solid.getReal(), pinhole.getReal(), 1e-8);
        assertEquals(solid.getImaginary(), pinhole.getImaginary(), 1e-8);
        // wall 30 δ thick: the bore is shielded and the tube behaves as the solid bar
        Complex thick = AxialFieldBar.fluxFactor(A, 0.7 * A, 0.3 * A / 30, 1);
        Complex thickSolid = AxialFieldBar.fluxFactor(A, 0, 0.3 * A / 30, 1);
        assertEquals(thickSolid.getImaginary(), thick.getImaginary(), 1e-12);
        // low frequency, with the bore flux at µ0 (derived closed form, docs/models.md)
        for (double muR : new double[] {1, 40}) {
            double f = ReferenceDepth.frequencyFor(2e-7, muR, 1000 * A);
            BarResponse r = AxialFieldBar.solve(A, 0.5 * A, 2e-7, muR, f, H0);
            assertEquals(1.0, r.powerPerLength() / r.lowFrequencyLimit(), 1e-6, "tube low-frequency limit µr=" + muR);
        }
    }
}
