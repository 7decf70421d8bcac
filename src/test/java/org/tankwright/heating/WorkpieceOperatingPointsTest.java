package org.tankwright.heating;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;

import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Cold and hot operating points of the two invented heater presets (presets/bolt-heater.json and
 * presets/small-forge.json: coil turns, diameter less the tube, pitch × turns, bar and temperatures
 * as there; tank capacitance for the preset's frequency with the empty coil; coil current and coil
 * resistance chosen here).
 */
class WorkpieceOperatingPointsTest {
    private static final WorkpieceMaterial STEEL = WorkpieceMaterials.builtIn().require("carbon-steel");

    private static HeaterEnvelope solve(WorkCoil coil, BarGeometry bar, double f0, double coldC, double hotC,
                                        double current) {
        double c = 1 / (Math.pow(2 * Math.PI * f0, 2) * coil.emptyInductance());
        return HeaterOperatingPoints.solve(coil, bar, STEEL, coldC, hotC, c, current);
    }

    static HeaterEnvelope boltHeater() {
        return solve(WorkCoil.withNagaokaInductance(6, 0.048, 0.034, 0.008), BarGeometry.solid(0.020, 0.060),
                60e3, 20, 850, 250);
    }

    static HeaterEnvelope smallForge() {
        return solve(WorkCoil.withNagaokaInductance(8, 0.088, 0.062, 0.010), BarGeometry.solid(0.025, 0.150),
                25e3, 20, 1100, 400);
    }

    /** The bar's own permeance term µr·Re F, which is all that changes between the points. */
    private static double barPermeance(OperatingPoint p, double radius) {
        LoadedWorkCoil l = p.load();
        Complex f = AxialFieldBar.fluxFactor(radius, 0, l.referenceDepth(), l.muR());
        return l.muR() * f.getReal();
    }

    @Test
    void steelLosesItsMagnetismAndTheFrequencyRisesAsTheComputedInductanceFalls() {
        for (HeaterEnvelope e : new HeaterEnvelope[] {boltHeater(), smallForge()}) {
            double radius = e.cold().load().bar().referenceDepth() * e.cold().load().bar().radiusOverDepth();
            assertTrue(e.cold().magnetic());
            assertFalse(e.hot().magnetic());
            assertTrue(e.cold().load().muR() > 10 && e.cold().load().muR() < 100, "cold µr tens at heating fields");
            assertEquals(1.0, e.hot().load().muR());
            // the sign of L_hot − L_cold is the sign of the bar's permeance change (µr·Re F), computed independently
            double permeanceChange = barPermeance(e.hot(), radius) - barPermeance(e.cold(), radius);
            assertEquals(Math.signum(permeanceChange), Math.signum(e.inductanceShift()));
            // and the tank frequency moves the other way: f = 1/(2π√(LC))
            assertEquals(-Math.signum(e.inductanceShift()), Math.signum(e.frequencyShift()));
            assertTrue(e.frequencyShift() > 0, "these presets: hot steel pushes more flux out, frequency rises");
            // each point resonates with its own L
            for (OperatingPoint p : new OperatingPoint[] {e.cold(), e.hot()}) {
                double f = 1 / (2 * Math.PI * Math.sqrt(p.load().loadedInductance() * p.tankCapacitance()));
                assertEquals(f, p.resonantFrequency(), 1e-8 * f);
                // parallel tank: I_C = V·ωC = I·|R + jωL|·ωC = I·√(1 + 1/Q²) at ω = 1/√(LC)
                double q = p.load().qualityFactor();
                assertEquals(p.load().coilCurrent() * Math.sqrt(1 + 1 / (q * q)), p.capacitorCurrent(),
                        1e-6 * p.capacitorCurrent());
            }
            assertEquals(e.cold().resonantFrequency(), e.driverMinimumFrequency());
            assertEquals(e.hot().resonantFrequency(), e.driverMaximumFrequency());
        }
    }

    @Test
    void hotSteelTakesLessPowerAtTheSameCurrent() {
        // thin-skin power ∝ √(ρ·µr): cold √(0.17·44) ≈ 2.7, hot √(1.1·1) ≈ 1.05 (µΩ·m)^½ — about 2.5× less hot,
        // and the hot bar is only a few δ across, so its thin-skin ratio falls below 1 as well
        for (HeaterEnvelope e : new HeaterEnvelope[] {boltHeater(), smallForge()}) {
            assertTrue(e.powerRatioAtSameCurrent() < 0.5, "P_hot/P_cold = " + e.powerRatioAtSameCurrent());
            assertTrue(e.hot().load().efficiency() < e.cold().load().efficiency());
            assertTrue(e.hot().load().bar().thinSkinRatio() < e.cold().load().bar().thinSkinRatio());
        }
    }

    @Test
    void worstCasesPointWhereThePhysicsSays() {
        HeaterEnvelope e = boltHeater();
        Map<String, HeaterEnvelope.WorstCase> w = e.worstCases().stream()
                .collect(Collectors.toMap(HeaterEnvelope.WorstCase::quantity, Function.identity()));
        // V = I·√(L/C) at resonance: the larger L (cold) gives the higher capacitor voltage
        assertEquals(HeaterEnvelope.Point.COLD, w.get("capacitor voltage at the set coil current").worst());
        assertEquals(HeaterEnvelope.Point.HOT, w.get("coil efficiency").worst());
        assertEquals(HeaterEnvelope.Point.HOT, w.get("resonant frequency").worst());
        assertEquals(HeaterEnvelope.Point.HOT, w.get("power into the workpiece at the set coil current").worst());
        for (HeaterEnvelope.WorstCase c : e.worstCases()) {
            assertTrue(Double.isFinite(c.cold()) && Double.isFinite(c.hot()), c.quantity());
        }
    }

    @Test
    void thinBarAtLowFrequencyRaisesTheCoilInductanceWhenCold() {
        // µr·δ/a > 1: the cold magnetic bar pulls flux in (L > L0); hot it pushes a little out (L < L0)
        HeaterEnvelope e = solve(WorkCoil.withNagaokaInductance(20, 0.1, 0.012, 0.01), BarGeometry.solid(0.008, 0.1),
                2e3, 20, 900, 5);
        assertTrue(e.cold().load().inductanceChange() > 0);
        assertTrue(e.hot().load().inductanceChange() < 0);
        assertTrue(e.frequencyShift() > 0);
    }

    @Test
    void belowTheCuriePointTheBarStaysMagnetic() {
        // a bolt heated to 600 °C stays magnetic: µr falls with the saturation (Kuz'min m(T)) and ρ rises ≈ 4×
        HeaterEnvelope e = solve(WorkCoil.withNagaokaInductance(6, 0.048, 0.034, 0.008), BarGeometry.solid(0.020, 0.060),
                60e3, 20, 600, 250);
        assertTrue(e.hot().magnetic());
        assertTrue(e.hot().load().muR() > 1 && e.hot().load().muR() < e.cold().load().muR());
        assertTrue(e.hot().load().resistivity() > 3 * e.cold().load().resistivity());
    }
}
