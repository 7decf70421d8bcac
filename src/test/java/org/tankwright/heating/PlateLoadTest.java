package org.tankwright.heating;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.MutualKernels;
import org.tankwright.magnetics.PolygonSpiral;
import org.tankwright.magnetics.Segment;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;
import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;
import org.tankwright.units.Constants;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The flat coil over a plate (Dodd & Deeds integral): its limits against independent formulas. */
class PlateLoadTest {
    private static final double ALUMINIUM = 1 / 2.82e-8; // S/m, resistivity 2.82e-8 Ω·m (handbook value, from memory)
    private static final double[] SPIRAL_R = new double[12];
    private static final double[] SPIRAL_H = new double[12];

    static {
        // a 12-turn spiral, radii 20 … 86 mm, rings 6 mm above the plate
        for (int i = 0; i < 12; i++) {
            SPIRAL_R[i] = 0.020 + 0.006 * i;
            SPIRAL_H[i] = 0.006;
        }
    }

    /** Σ_i Σ_j M(r_i, r_j, h_i + h_j): the coil with its mirror image below the plate surface. */
    private static double imageMutual(double[] r, double[] h) {
        double m = 0;
        for (int i = 0; i < r.length; i++) {
            for (int j = 0; j < r.length; j++) {
                m += MutualKernels.coaxialRings(r[i], r[j], h[i] + h[j]);
            }
        }
        return m;
    }

    @Test
    void besselJ1AgreesWithCommonsMath() {
        // reference: Apache Commons Math BesselJ (Netlib RJBESL); A&S 9.4.4 quotes 1.3e-8·x below x = 3, 9.4.6 4e-8 above
        for (double x = 0; x < 200; x += 0.37) {
            assertEquals(BesselJ.value(1, x), BesselJ1.of(x), 5e-8, "x = " + x);
            assertEquals(-BesselJ.value(1, x), BesselJ1.of(-x), 5e-8, "x = " + -x);
        }
    }

    @Test
    void perfectConductorIsTheMirrorImage() {
        // image method: a perfect conductor (Γ = −1) mirrors the coil with reversed current, so
        // ΔL = −M(coil, image at 2h) with Maxwell's coaxial-ring formula (Maxwell 1873 §701; Grover 1946)
        double omega = 2 * Math.PI * 30e3;
        PlateLoad one = PlateLoad.rings(new double[] {0.05}, new double[] {0.004});
        Complex dz1 = one.impedanceChange(omega, Double.POSITIVE_INFINITY, 1, Double.POSITIVE_INFINITY);
        double expected1 = -MutualKernels.coaxialRings(0.05, 0.05, 0.008);
        assertEquals(expected1, dz1.getImaginary() / omega, 1e-6 * Math.abs(expected1));
        assertEquals(0, dz1.getReal(), 1e-15);

        PlateLoad spiral = PlateLoad.rings(SPIRAL_R, SPIRAL_H);
        Complex dz = spiral.impedanceChange(omega, Double.POSITIVE_INFINITY, 1, 0.002);
        double expected = -imageMutual(SPIRAL_R, SPIRAL_H);
        assertEquals(expected, dz.getImaginary() / omega, 1e-6 * Math.abs(expected));
        // a good conductor many reference depths thick approaches it (δ = 0.097 mm in aluminium at 1 MHz)
        Complex al = spiral.impedanceChange(2 * Math.PI * 1e6, ALUMINIUM, 1, 0.01);
        assertEquals(expected, al.getImaginary() / (2 * Math.PI * 1e6), 0.03 * Math.abs(expected));
    }

    @Test
    void permeableNonConductorIsTheMagnetostaticImage() {
        // Smythe, Static and Dynamic Electricity §7.18 (image of a current before a permeable half-space):
        // the image carries (µr − 1)/(µr + 1) of the current with the same sense, so ΔL = +η·M(coil, image)
        double omega = 2 * Math.PI * 10e3;
        PlateLoad spiral = PlateLoad.rings(SPIRAL_R, SPIRAL_H);
        for (double mu : new double[] {2, 50, 2000}) {
            double eta = (mu - 1) / (mu + 1);
            Complex dz = spiral.impedanceChange(omega, 0, mu, Double.POSITIVE_INFINITY);
            double expected = eta * imageMutual(SPIRAL_R, SPIRAL_H);
            assertEquals(expected, dz.getImaginary() / omega, 1e-6 * expected, "µr = " + mu);
            assertEquals(0, dz.getReal(), 1e-12 * expected * omega, "no loss without conductivity");
        }
    }

    @Test
    void singleLoopAgreesWithAnIndependentQuadrature() {
        // the same integral for one ring over a steel half-space, evaluated differently: Apache Commons Math's
        // adaptive Legendre–Gauss integrator with its own BesselJ and Complex arithmetic, on x = α·h
        double r = 0.04;
        double h = 0.005;
        double omega = 2 * Math.PI * 25e3;
        double sigma = 5e6;
        double mu = 40;
        double t = 0.003;
        Complex ours = PlateLoad.rings(new double[] {r}, new double[] {h}).impedanceChange(omega, sigma, mu, t);
        IterativeLegendreGaussIntegrator integ = new IterativeLegendreGaussIntegrator(16, 1e-11, 1e-14);
        double[] parts = new double[2];
        for (int part = 0; part < 2; part++) {
            int which = part;
            UnivariateFunction f = x -> {
                double a = x / h;
                Complex a1 = new Complex(a * a, omega * Constants.MU0 * mu * sigma).sqrt();
                Complex rr = a1.negate().add(mu * a).divide(a1.add(mu * a));
                Complex e = a1.multiply(-2 * t).exp();
                Complex g = rr.multiply(Complex.ONE.subtract(e)).divide(Complex.ONE.subtract(rr.multiply(rr).multiply(e)));
                double j = BesselJ.value(1, a * r);
                double v = r * r * j * j * Math.exp(-2 * a * h) / h;
                return v * (which == 0 ? g.getReal() : g.getImaginary());
            };
            double sum = 0;
            for (int p = 0; p < 400; p++) { // x ∈ [0, 40] in pieces of 0.1
                sum += integ.integrate(1_000_000, f, 0.1 * p, 0.1 * (p + 1));
            }
            parts[part] = sum;
        }
        double c = omega * Math.PI * Constants.MU0;
        Complex independent = new Complex(-c * parts[1], c * parts[0]);
        assertEquals(independent.getReal(), ours.getReal(), 1e-6 * Math.abs(independent.getReal()));
        assertEquals(independent.getImaginary(), ours.getImaginary(), 1e-6 * Math.abs(independent.getImaginary()));
        assertTrue(ours.getReal() > 0, "a lossy plate takes power");
    }

    @Test
    void thinPlateAtLowFrequencyTakesTheUndisturbedFieldsPower() {
        // low-frequency limit, t ≪ δ: the eddy currents do not disturb the field, E = −jω·A_φ of the coil in free
        // space, P = σ·ω²·∫∫|A_φ|²dA dz through the plate (Faraday's law, as for the bar); A_φ(ρ, z) = Σ M(r_i, ρ,
        // h_i + z)/(2πρ) per ampere with Maxwell's coaxial-ring formula, the depth by 4-point Gauss–Legendre.
        // Hence R ∝ f².
        double t = 0.0005;
        PlateLoad spiral = PlateLoad.rings(SPIRAL_R, SPIRAL_H);
        IterativeLegendreGaussIntegrator integ = new IterativeLegendreGaussIntegrator(16, 1e-10, 1e-14);
        double[] zx = {-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526};
        double[] zw = {0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538};
        double volumeIntegral = 0;
        for (int q = 0; q < 4; q++) {
            double z = 0.5 * t * (1 + zx[q]);
            UnivariateFunction a2 = rho -> {
                double a = 0;
                for (int i = 0; i < SPIRAL_R.length; i++) {
                    a += MutualKernels.coaxialRings(SPIRAL_R[i], rho, SPIRAL_H[i] + z) / (2 * Math.PI * rho);
                }
                return a * a * 2 * Math.PI * rho;
            };
            double area = 0;
            for (int p = 0; p < 500; p++) { // ρ to 1 m in 2 mm pieces
                area += integ.integrate(1_000_000, a2, 1e-9 + 0.002 * p, 0.002 * (p + 1));
            }
            // beyond 1 m the coil is a dipole of moment m = Σπr_i²: A_φ = µ0·m/(4πρ²), ∫|A|²2πρdρ = π(µ0m/4π)²/R²
            double moment = 0;
            for (double r : SPIRAL_R) {
                moment += Math.PI * r * r;
            }
            area += Math.PI * Math.pow(Constants.MU0 * moment / (4 * Math.PI), 2);
            volumeIntegral += 0.5 * t * zw[q] * area;
        }
        double previousError = Double.POSITIVE_INFINITY;
        for (double f : new double[] {1000, 100, 10, 1}) {
            double omega = 2 * Math.PI * f;
            double low = ALUMINIUM * omega * omega * volumeIntegral;
            double r = spiral.impedanceChange(omega, ALUMINIUM, 1, t).getReal();
            double err = Math.abs(r / low - 1);
            assertTrue(err < previousError, f + " Hz: " + err);
            previousError = err;
        }
        assertTrue(previousError < 2e-4, "at 1 Hz (t = δ/190) within 0.02 %: " + previousError);
    }

    @Test
    void thickPlateAtHighFrequencyTakesTheThinSkinPower() {
        // high-frequency limit, t ≫ δ: the surface field is the perfect conductor's, twice the free ring's radial
        // field at the surface (image method; ring field by Smythe §7.10 elliptic integrals), and the power is
        // (ρ/δ)·∫|H_t|²dA (surface impedance of a good conductor, Jackson, Classical Electrodynamics §8.1). So R ∝ √f.
        double r0 = 0.04;
        double h = 0.005;
        PlateLoad one = PlateLoad.rings(new double[] {r0}, new double[] {h});
        IterativeLegendreGaussIntegrator integ = new IterativeLegendreGaussIntegrator(16, 1e-10, 1e-14);
        double[] b = new double[2];
        UnivariateFunction h2 = rho -> {
            MutualKernels.ringField(r0, rho, -h, b);
            double ht = 2 * b[0] / Constants.MU0;
            return ht * ht * 2 * Math.PI * rho;
        };
        double surface = 0;
        for (int p = 0; p < 4000; p++) { // to 4 m in 1 mm pieces
            surface += integ.integrate(1_000_000, h2, 1e-9 + 0.001 * p, 0.001 * (p + 1));
        }
        double rho = 1 / ALUMINIUM;
        double previous = Double.POSITIVE_INFINITY;
        for (double f : new double[] {1e4, 1e5, 1e6, 1e7}) {
            double delta = ReferenceDepth.of(rho, f, 1);
            double thinSkin = rho / delta * surface;
            double r = one.impedanceChange(2 * Math.PI * f, ALUMINIUM, 1, Double.POSITIVE_INFINITY).getReal();
            double err = Math.abs(r / thinSkin - 1);
            assertTrue(err < previous, f + " Hz: " + err);
            previous = err;
        }
        assertTrue(previous < 0.01, "at 10 MHz (δ = h/190) within 1 %: " + previous);
    }

    @Test
    void surfaceFieldOverAPerfectConductorIsTwiceTheFreeRingsField() {
        // image method: the tangential field on a perfect conductor doubles the free field (Smythe §7.10 ring field)
        double r0 = 0.04;
        double h = 0.005;
        double[] b = new double[2];
        MutualKernels.ringField(r0, r0, -h, b);
        double expected = 2 * Math.abs(b[0]) / Constants.MU0;
        double ours = PlateLoad.rings(new double[] {r0}, new double[] {h})
                .peakSurfaceField(1e5, Double.POSITIVE_INFINITY, 1, 0.01);
        assertEquals(expected, ours, 1e-5 * expected);
    }

    @Test
    void polygonSpiralAsEqualAreaRingsNearlyMatchesItsOwnImage() {
        // the equal-area ring approximation (ours) against the exact perfect-conductor limit of the polygon coil itself:
        // ΔL = −M(coil, mirror image) with Neumann's formula for straight filaments (Grover 1946 ch. 7)
        // measured: ΔL within 0.4 % (square), 0.08 % (hexagon), 0.07 % (octagon) at an 8 mm gap; 3 %, 0.7 %, 0.2 % at 2 mm
        for (int sides : new int[] {4, 6, 8}) {
            for (double gap : new double[] {0.008, 0.002}) {
                PolygonSpiral coil = new PolygonSpiral(sides, 0.16, 0.04, 10,
                        Conductor.RoundWire.bare(0.002, ConductorMaterial.COPPER));
                FlatWorkCoil rings = FlatWorkCoil.of(coil, 20e-6, 0.01);
                double omega = 2 * Math.PI * 30e3;
                double ours = PlateLoad.of(rings, new PlateGeometry(0.5, 0.01, gap))
                        .impedanceChange(omega, Double.POSITIVE_INFINITY, 1, 0.01).getImaginary() / omega;
                double plane = coil.zMin() - gap;
                List<Filament> f = coil.filaments();
                double image = 0;
                for (Filament a : f) {
                    for (Filament b : f) {
                        image += MutualKernels.segments((Segment) a, (Segment) b.mirroredZ(plane));
                    }
                }
                double tolerance = sides == 4 ? (gap < 0.005 ? 0.04 : 0.006) : 0.01;
                assertEquals(-image, ours, tolerance * image, sides + " sides, gap " + gap);
            }
        }
    }

    @Test
    void magneticPlateIteratesMuWithItsSurfaceField() {
        WorkpieceMaterial steel = WorkpieceMaterials.builtIn().require("carbon-steel");
        FlatWorkCoil coil = new FlatWorkCoil(SPIRAL_R, new double[12], 0.09, 20e-6, 0.02);
        PlateGeometry plate = new PlateGeometry(0.3, 0.004, 0.006);
        WorkpieceMedium cold = new WorkpieceMedium.OfMaterial(steel, 20);
        LoadedPlateCoil low = PlateLoad.onPlate(coil, plate, cold, 30e3, 5);
        LoadedPlateCoil high = PlateLoad.onPlate(coil, plate, cold, 30e3, 60);
        // consistency of the iteration: the µr used is the material's at the peak (√2 × rms) surface field
        for (LoadedPlateCoil l : new LoadedPlateCoil[] {low, high}) {
            assertEquals(steel.relativePermeability(Math.sqrt(2) * l.surfaceField(), 20), l.muR(), 1e-6 * l.muR());
            assertTrue(l.muIterations() > 0);
            assertTrue(l.provenance().valid(), l.provenance().notes().toString());
        }
        // steel saturates: a stronger field lowers µr (common practice: tens, not hundreds, at heating fields)
        assertTrue(high.muR() < low.muR(), low.muR() + " vs " + high.muR());
        // above the Curie point µr = 1 and no iteration
        LoadedPlateCoil hot = PlateLoad.onPlate(coil, plate, new WorkpieceMedium.OfMaterial(steel, 900), 30e3, 60);
        assertEquals(1, hot.muR(), 0);
        assertEquals(0, hot.muIterations());
        // magnetic steel raises L above the hot plate's (its µr pulls flux in, the hot plate's eddy currents push out)
        assertTrue(high.loadedInductance() > hot.loadedInductance());
        assertTrue(hot.loadedInductance() < coil.emptyInductance());
    }

    @Test
    void smallPlateIsFlaggedOutsideValidity() {
        FlatWorkCoil coil = new FlatWorkCoil(SPIRAL_R, new double[12], 0.09, 20e-6, 0.02);
        WorkpieceMedium al = new WorkpieceMedium.Fixed(2.82e-8, 1);
        LoadedPlateCoil small = PlateLoad.onPlate(coil, new PlateGeometry(0.19, 0.004, 0.006), al, 30e3, 10);
        assertFalse(small.provenance().valid());
        assertTrue(small.provenance().notes().stream().anyMatch(n -> n.contains("infinite-plate")));
        LoadedPlateCoil big = PlateLoad.onPlate(coil, new PlateGeometry(0.26, 0.004, 0.006), al, 30e3, 10);
        assertTrue(big.provenance().valid());
    }

    @Test
    void badInputNamesTheValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new PlateGeometry(0.2, 0, 0.005));
        assertTrue(e.getMessage().contains("plate thickness"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> PlateLoad.rings(new double[] {0.05}, new double[] {0}));
        assertTrue(e.getMessage().contains("height above the plate"), e.getMessage());
    }
}
