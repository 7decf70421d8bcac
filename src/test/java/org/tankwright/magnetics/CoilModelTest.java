package org.tankwright.magnetics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.RecordComponent;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;
import org.tankwright.numerics.Kelvin;
import org.tankwright.units.Constants;

class CoilModelTest {
    private static final Conductor WIRE = new Conductor.RoundWire(1e-3, 1.1e-3, ConductorMaterial.COPPER);

    /** Copper at 100 kHz, 20 °C: δ = √(ρ/(π f µ0)) = 0.2090 mm (handbook value ≈ 0.21 mm; IEC 60028 ρ). */
    @Test
    void skinDepthOfCopper() {
        double delta = WireLoss.skinDepth(ConductorMaterial.COPPER.resistivity(20), 100e3);
        assertEquals(0.2090e-3, delta, 0.0005e-3);
        assertEquals(0.2090e-3 / Math.sqrt(100), WireLoss.skinDepth(ConductorMaterial.COPPER.resistivity(20), 10e6),
                0.0001e-3, "δ ∝ 1/√f");
    }

    /**
     * Rac/Rdc of round wire against the exact Bessel solution R/R0 = Re[(v/2) J0(v)/J1(v)], v = x e^{3πi/4}
     * (internal impedance of a round wire, e.g. Ramo, Whinnery &amp; Van Duzer), with J0, J1 from Bessel's
     * integral in Hipparchus complex arithmetic; and against the classic skin-effect table built on A&amp;S
     * Table 9.12 ber/bei values (x = 1..5: 1.005, 1.078, 1.318, 1.678, 2.043; values from memory, each also held
     * to the exact Bessel reference computed here, so a wrong remembered value would fail the test).
     */
    @Test
    void roundWireSkinEffectMatchesExactBessel() {
        CompositeGauss gauss = new CompositeGauss(12);
        for (double x : new double[] {0.5, 1.5, 3, 6, 12, 30}) {
            Complex v = new Complex(-x * Math.sqrt(0.5), x * Math.sqrt(0.5));
            Complex j0 = bessel(gauss, v, 0);
            Complex j1 = bessel(gauss, v, 1);
            double exact = v.multiply(0.5).multiply(j0).divide(j1).getReal();
            assertEquals(exact, Kelvin.skinResistanceRatio(x), 1e-10 * exact, "R/R0 at x = " + x);
        }
        double[][] table = {{1, 1.005}, {2, 1.078}, {3, 1.318}, {4, 1.678}, {5, 2.043}};
        for (double[] row : table) {
            assertEquals(row[1], Kelvin.skinResistanceRatio(row[0]), 6e-4, "skin table at x = " + row[0]);
        }
        // through the conductor API: x = √2 a/δ
        double delta = 0.2e-3;
        assertEquals(Kelvin.skinResistanceRatio(Math.sqrt(2) * 0.5e-3 / delta), WireLoss.skinRatio(WIRE, delta), 1e-15);
    }

    private static Complex bessel(CompositeGauss gauss, Complex z, int order) {
        double re = gauss.integrate(t -> z.multiply(Math.sin(t)).negate().add(order * t).cos().getReal(), 0, Math.PI, 200);
        double im = gauss.integrate(t -> z.multiply(Math.sin(t)).negate().add(order * t).cos().getImaginary(), 0,
                Math.PI, 200);
        return new Complex(re / Math.PI, im / Math.PI);
    }

    /**
     * Round-wire proximity factor: low-frequency eddy loss of a cylinder in a transverse field π x⁴/8, the
     * high-frequency limit 2π a/δ = √2 π x (surface field 2H sin φ), and the volume integral
     * 2π ∫ξ(ber'² + bei'²)dξ/(ber² + bei²) of the same diffusion solution (derived; checked by quadrature).
     */
    @Test
    void proximityFactorLimitsAndVolumeIntegral() {
        assertEquals(Math.PI / 8 * Math.pow(0.05, 4), WireLoss.proximityFactor(0.05), 1e-4 * Math.PI / 8 * Math.pow(0.05, 4));
        double x = 400;
        assertEquals(Math.sqrt(2) * Math.PI * x, WireLoss.proximityFactor(x), 0.01 * Math.sqrt(2) * Math.PI * x);
        CompositeGauss gauss = new CompositeGauss(12);
        for (double xi : new double[] {0.7, 2.5, 6, 15}) {
            double integral = gauss.integrate(s -> {
                Kelvin.Values v = Kelvin.values(s);
                return s * (v.berPrime() * v.berPrime() + v.beiPrime() * v.beiPrime());
            }, 0, xi, 40);
            Kelvin.Values v = Kelvin.values(xi);
            double expected = 2 * Math.PI * integral / (v.ber() * v.ber() + v.bei() * v.bei());
            assertEquals(expected, WireLoss.proximityFactor(xi), 1e-9 * expected, "φ(" + xi + ")");
        }
    }

    /** IEC 60028 α = 0.00393/K: hot copper at 100 °C has 31.4 % more DC resistance than at 20 °C. */
    @Test
    void dcResistanceWithTemperature() {
        CoilModel m = CoilModel.of(new SingleLayerSolenoid(50e-3, 20, 2e-3, WIRE));
        assertEquals(1.3144, m.resistanceDc(100) / m.resistanceDc(20), 1e-4);
        double expected = 1.0 / 58e6 * 20 * Math.hypot(Math.PI * 50e-3, 2e-3) / (Math.PI * 0.25e-6);
        assertEquals(expected, m.resistanceDc(20), 1e-12 * expected);
    }

    @Test
    void acResistanceBehaves() {
        CoilModel sol = CoilModel.of(new SingleLayerSolenoid(50e-3, 20, 2e-3, WIRE));
        assertEquals(sol.resistanceDc(20), sol.resistanceAc(10, 20), 1e-6 * sol.resistanceDc(20), "DC limit");
        assertTrue(sol.resistanceProximity(1e6, 20) > sol.resistanceProximity(1e5, 20), "proximity grows with f");
        CoilModel loop = CoilModel.of(new SingleLoop(0.1, WIRE));
        assertEquals(0.0, loop.resistanceProximity(1e6, 20), 0.0, "a single loop has no other turns");
        // litz beats solid wire of the same copper at 200 kHz (strand model, Bartoli et al. 1996)
        Conductor litz = new Conductor.Litz(100, 0.1e-3, 1.25e-3, ConductorMaterial.COPPER);
        Conductor solid = new Conductor.RoundWire(1e-3, 1.25e-3, ConductorMaterial.COPPER);
        CoilModel l = CoilModel.of(new FlatSpiral(100e-3, 40e-3, 12, litz));
        CoilModel s = CoilModel.of(new FlatSpiral(100e-3, 40e-3, 12, solid));
        assertEquals(l.resistanceDc(20), s.resistanceDc(20), 1e-9, "same copper area");
        assertTrue(l.resistanceAc(200e3, 20) < 0.7 * s.resistanceAc(200e3, 20));
        assertEquals(l.resistanceDc(20), l.resistanceAc(100, 20), 1e-6 * l.resistanceDc(20));
    }

    /** The charge of an isolated thin ring: C = 4π²ε0R/ln(8R/a) (Smythe, Static and Dynamic Electricity). */
    @Test
    void ringCapacitanceMatchesThinRingFormula() {
        double r = 0.1;
        double a = 1e-3;
        double c = SelfCapacitance.compute(new double[] {r}, new double[] {0}, new double[] {1}, a);
        assertEquals(4 * Math.PI * Math.PI * Constants.EPS0 * r / Math.log(8 * r / a), c, 1e-4 * c, "thin-ring limit, a/R = 0.01");
    }

    @Test
    void selfResonanceAndApparentInductanceAreConsistent() {
        CoilModel m = CoilModel.of(new SingleLayerSolenoid(50e-3, 20, 2e-3, WIRE));
        double srf = m.selfResonance();
        assertEquals(1 / (2 * Math.PI * Math.sqrt(m.inductance() * m.selfCapacitance())), srf, 1e-6 * srf);
        assertTrue(m.selfCapacitance() > 0.3e-12 && m.selfCapacitance() < 20e-12, "C = " + m.selfCapacitance());
        double f = srf / 2;
        assertEquals(m.inductanceAt(f, 20) / 0.75, m.apparentInductance(f, 20), 1e-9 * m.inductance());
        assertTrue(m.apparentInductance(2 * srf, 20) < 0, "capacitive above self-resonance");
        CoilResult r = m.analyse(new OperatingPoint(srf * 1.5, 20, 1));
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("self-resonance")), r.warnings().toString());
    }

    /** Internal inductance: a solid wire loses µ0/8π per metre at full skin effect (Grover's Y: 1/4 → 0). */
    @Test
    void internalInductanceFallsWithFrequency() {
        CoilModel m = CoilModel.of(new SingleLoop(0.2, WIRE));
        double drop = m.inductance() - m.inductanceAt(1e9, 20);
        assertEquals(Constants.MU0 / (8 * Math.PI) * Math.PI * 0.2, drop, 0.01 * drop);
        assertEquals(m.inductance(), m.inductanceAt(1, 20), 1e-6 * m.inductance());
    }

    @Test
    void everyKindGivesFiniteResults() throws Exception {
        Conductor trace = Conductor.Trace.ofCopperWeight(1.5e-3, 2, ConductorMaterial.COPPER);
        Conductor tube = new Conductor.Tube(6e-3, 1e-3, ConductorMaterial.COPPER);
        Conductor litz = new Conductor.Litz(400, 0.071e-3, 1.9e-3, ConductorMaterial.ALUMINIUM);
        List<CoilGeometry> all = List.of(
                new SingleLayerSolenoid(60e-3, 8, 10e-3, tube),
                MultilayerSolenoid.closeWound(20e-3, 60, 4, WIRE),
                new FlatSpiral(200e-3, 80e-3, 12, litz),
                new PolygonSpiral(4, 50e-3, 20e-3, 6, trace),
                new PolygonSpiral(6, 50e-3, 20e-3, 6, trace),
                new PolygonSpiral(8, 50e-3, 20e-3, 6, trace),
                new RectangularSpiral(300e-3, 200e-3, 200e-3, 100e-3, 10, litz),
                new SingleLoop(100e-3, tube));
        for (CoilGeometry g : all) {
            assertTrue(g.problems().isEmpty(), g + " " + g.problems());
            CoilResult r = CoilModel.analyse(g, new OperatingPoint(85e3, 60, 10));
            for (RecordComponent rc : CoilResult.class.getRecordComponents()) {
                if (rc.getType() == double.class) {
                    double v = (double) rc.getAccessor().invoke(r);
                    assertTrue(Double.isFinite(v), g.kind() + " " + rc.getName() + " = " + v);
                }
            }
            assertTrue(r.inductance() > 0 && r.resistanceAc() >= r.resistanceDc() * 0.999 && r.q() > 0, g.kind());
            assertTrue(!r.qCurve().isEmpty());
            assertEquals(r.models().get(0).name(), r.chosenModel());
        }
    }

    @Test
    void invalidInputIsRefusedWithMessages() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CoilModel.of(new SingleLayerSolenoid(50e-3, 0, 2e-3, WIRE)));
        assertTrue(e.getMessage().contains("turns = 0"), e.getMessage());
        CoilModel m = CoilModel.of(new SingleLayerSolenoid(50e-3, 10, 2e-3, WIRE));
        e = assertThrows(IllegalArgumentException.class, () -> m.analyse(new OperatingPoint(Double.NaN, 20, 1)));
        assertTrue(e.getMessage().contains("frequency = NaN"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> m.analyse(new OperatingPoint(1e5, 20, -1)));
        assertTrue(e.getMessage().contains("current = -1.0 A"), e.getMessage());
    }
}
