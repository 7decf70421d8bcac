package org.tankwright.heating;

import org.junit.jupiter.api.Test;
import org.tankwright.materials.WorkpieceCurve;
import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Heating time, coolant flow and frequency advice. */
class WorkpieceTankToolsTest {
    private static final WorkpieceMaterial STEEL = WorkpieceMaterials.builtIn().require("carbon-steel");

    private static WorkpieceMaterial constantHeat(double cp) {
        return new WorkpieceMaterial("plain", "constant properties", WorkpieceCurve.constant(1e-6, "test"),
                WorkpieceCurve.constant(cp, "test"), 8000, "test", 2000, null);
    }

    @Test
    void constantPowerAndHeatGiveTheTextbookTime() {
        // t = m·c·ΔT / (P·(1 − loss fraction)) (energy balance)
        HeatingTime.Estimate e = HeatingTime.estimate(0.5, constantHeat(500), 20, 820, 2000,
                new LossAllowance.Fraction(0.25));
        assertTrue(e.reachable());
        assertEquals(0.5 * 500 * 800 / (2000 * 0.75), e.timeSeconds(), 1e-9);
        assertEquals(0.5 * 500 * 800, e.heatContent(), 1e-6);
        assertEquals(2000 * e.timeSeconds(), e.energyIn(), 1e-6);
    }

    /** ∫ c_p dT of the EN 1993-1-2 §3.4.1.2 carbon-steel formula, integrated in closed form (formula from memory). */
    private static double eurocodeEnthalpy(double t0, double t1) {
        double h = 0;
        double a = Math.max(t0, 20);
        double b = Math.min(t1, 600);
        if (b > a) {
            h += 425 * (b - a) + 0.773 / 2 * (b * b - a * a) - 1.69e-3 / 3 * (Math.pow(b, 3) - Math.pow(a, 3))
                    + 2.22e-6 / 4 * (Math.pow(b, 4) - Math.pow(a, 4));
        }
        a = Math.max(t0, 600);
        b = Math.min(t1, 735);
        if (b > a) {
            h += 666 * (b - a) + 13002 * Math.log((738 - a) / (738 - b));
        }
        a = Math.max(t0, 735);
        b = Math.min(t1, 900);
        if (b > a) {
            h += 545 * (b - a) + 17820 * Math.log((b - 731) / (a - 731));
        }
        a = Math.max(t0, 900);
        b = Math.min(t1, 1200);
        if (b > a) {
            h += 650 * (b - a);
        }
        return h;
    }

    @Test
    void steelHeatContentFollowsTheEurocodeSpecificHeat() {
        HeatingTime.Estimate e = HeatingTime.estimate(1.0, STEEL, 20, 1200, 5000, new LossAllowance.Fraction(0));
        double expected = eurocodeEnthalpy(20, 1200);
        assertEquals(expected, e.heatContent(), 0.02 * expected, "EN 1993-1-2 enthalpy 20→1200 °C");
        // the transformation peak: 700 → 800 °C takes far more heat than 500 → 600 °C
        double peak = HeatingTime.estimate(1.0, STEEL, 700, 800, 5000, new LossAllowance.Fraction(0)).heatContent();
        double plain = HeatingTime.estimate(1.0, STEEL, 500, 600, 5000, new LossAllowance.Fraction(0)).heatContent();
        assertTrue(peak > 1.5 * plain);
        assertEquals(eurocodeEnthalpy(700, 800), peak, 0.1 * peak);
    }

    @Test
    void radiationStopsTheHeatingWhereItEqualsThePower() {
        BarGeometry bar = BarGeometry.solid(0.02, 0.06);
        LossAllowance loss = new LossAllowance.Surface(bar.outerSurface(), 0.8, 15, 20);
        double power = 300;
        HeatingTime.Estimate e = HeatingTime.estimate(bar.mass(STEEL.density()), STEEL, 20, 1200, power, loss);
        assertFalse(e.reachable());
        assertFalse(e.provenance().valid());
        double atReached = loss.loss(power, e.reachedC());
        assertEquals(power, atReached, 0.02 * power, "balance temperature: radiation + convection = input");
        assertTrue(Double.isFinite(e.timeSeconds()));
    }

    @Test
    void temperatureDependentPowerFromTheHeater() {
        HeaterEnvelope env = WorkpieceOperatingPointsTest.boltHeater();
        WorkCoil coil = WorkCoil.withNagaokaInductance(6, 0.048, 0.034, 0.008);
        BarGeometry bar = BarGeometry.solid(0.020, 0.060);
        WorkpieceCurve p = HeaterOperatingPoints.powerCurve(coil, bar, STEEL, 20, 850,
                env.cold().tankCapacitance(), 250, 8);
        assertEquals(env.cold().load().workPower(), p.valueAt(20), 1e-6 * p.valueAt(20));
        assertEquals(env.hot().load().workPower(), p.valueAt(850), 1e-6 * p.valueAt(850));
        assertTrue(p.valueAt(771) < 0.6 * p.valueAt(769), "power steps down at the Curie point");
        HeatingTime.Estimate t = HeatingTime.estimate(bar.mass(STEEL.density()), STEEL, 20, 850, p::valueAt,
                new LossAllowance.Fraction(0.25));
        assertTrue(t.reachable());
        double slowest = bar.mass(STEEL.density()) * eurocodeEnthalpy(20, 850) / (0.75 * p.valueAt(850));
        double fastest = bar.mass(STEEL.density()) * eurocodeEnthalpy(20, 850) / (0.75 * p.valueAt(20));
        assertTrue(t.timeSeconds() > 0.9 * fastest && t.timeSeconds() < 1.1 * slowest);
    }

    @Test
    void coolantFlowFromTheHeatBalance() {
        // P = ρ·c_p·Q·ΔT with water at 20 °C (998.2 kg/m³, 4182 J/(kg·K), handbook values, from memory):
        // about 1.44 L/min per kW at 10 K rise (common practice rule of thumb ≈ 1.4 L/min per kW per 10 K)
        CoolantFlow c = CoolantFlow.water(1000, 10);
        assertEquals(1000 / (998.2 * 4182 * 10) * 60000, c.litresPerMinute(), 1e-9);
        assertEquals(1.44, c.litresPerMinute(), 0.01);
        assertEquals(c.volumeFlow() * 998.2, c.massFlow(), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> CoolantFlow.water(1000, 120));
    }

    @Test
    void frequencyAdviceBandIsFourToEightDepths() {
        double rho = 1.12e-6;
        FrequencyAdvice a = FrequencyAdvice.forBar(0.02, rho, 1, 30e3);
        assertEquals(0.02 / 4, ReferenceDepth.of(rho, a.lowFrequency(), 1), 1e-12);
        assertEquals(0.02 / 8, ReferenceDepth.of(rho, a.highFrequency(), 1), 1e-12);
        assertEquals(4.0, a.highFrequency() / a.lowFrequency(), 1e-9, "δ ∝ 1/√f: twice the ratio, four times f");
        assertEquals(FrequencyAdvice.Verdict.IN_BAND, a.verdict());
        assertEquals(FrequencyAdvice.Verdict.BELOW_BAND, FrequencyAdvice.forBar(0.02, rho, 1, 3e3).verdict());
        assertEquals(FrequencyAdvice.Verdict.ABOVE_BAND, FrequencyAdvice.forBar(0.02, rho, 1, 300e3).verdict());
    }

    @Test
    void heaterStudyGathersThePiecesConsistently() {
        WorkCoil coil = WorkCoil.withNagaokaInductance(8, 0.088, 0.062, 0.010);
        BarGeometry bar = BarGeometry.solid(0.025, 0.150);
        double c = 1 / (Math.pow(2 * Math.PI * 25e3, 2) * coil.emptyInductance());
        HeaterStudy s = HeaterStudy.run(coil, bar, STEEL, 20, 1100, c, 400, new LossAllowance.Fraction(0.3), 10);
        assertEquals(Math.PI * 0.0125 * 0.0125 * 0.15 * 7850, s.workpieceMass(), 1e-9);
        assertEquals(0.010 * 400 * 400, s.coolant().heatLoad(), 1e-9, "coil loss R_coil·I²");
        assertTrue(s.heatingTime().reachable());
        // the hot band lies far above the cold one: µr drops to 1 and ρ rises (δ ∝ √(ρ/µr))
        assertTrue(s.hotAdvice().lowFrequency() > 20 * s.coldAdvice().lowFrequency());
        assertEquals(s.envelope().hot().resonantFrequency(), s.hotAdvice().chosenFrequency());
        // series tank at the same bridge voltage: P ∝ R_work/(R_work + R_coil)²
        double ratio = s.envelope().powerRatioSeriesTankSameDrive();
        LoadedWorkCoil h = s.envelope().hot().load();
        LoadedWorkCoil k = s.envelope().cold().load();
        double expected = h.workResistance() / Math.pow(h.totalResistance(), 2)
                / (k.workResistance() / Math.pow(k.totalResistance(), 2));
        assertEquals(expected, ratio, 1e-12);
    }
}
