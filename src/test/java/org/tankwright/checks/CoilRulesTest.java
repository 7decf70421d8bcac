package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ResultFixtures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class CoilRulesTest {
    @Test
    void coilSelfResonanceTooCloseIsANotice() {
        // f_SR = 1/(2π√(L·C_self)) = 1/(2π√(300 µH · 1 nF)) ≈ 291 kHz < 5 × 85 kHz (common practice).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.selfCapacitance = 1e-9;
        Finding f = fires(p.build(), "TW-L01", "$.primary", Severity.NOTICE);
        assertEquals(1 / (2 * Math.PI * Math.sqrt(300e-6 * 1e-9)), f.value(), 1);
    }

    @Test
    void coilSelfResonanceFarAboveIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-L01"); // 40 pF: 1.45 MHz, 17 × the operating frequency
        quiet(ResultFixtures.measuredTank(), "TW-L01"); // unknown SRF: no finding
    }

    @Test
    void currentDensityAboveFiveAmpsPerSquareMillimetreIsANotice() {
        // 100 strands of 0.1 mm: 0.785 mm²; 22 A worst → 28 A/mm² > 5 A/mm² (common practice).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.litzStrands = 100;
        AnalysisResult r = p.build();
        Finding f = fires(r, "TW-L02", "$.primary.wire", Severity.NOTICE);
        double area = 100 * Math.PI * 0.05e-3 * 0.05e-3;
        double worst = r.stresses().stream().filter(s -> s.id().equals("L1")).findFirst().orElseThrow().worstCurrentRms();
        assertEquals(worst / area, f.value(), 1e-6 * f.value());
    }

    @Test
    void currentDensityOfTheDefaultPadIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-L02"); // 1000 strands: 7.85 mm², about 2.8 A/mm²
        quiet(ResultFixtures.heater(), "TW-L02"); // a water-cooled tube is judged by TW-H03
    }

    @Test
    void litzStrandsThickerThanTheSkinDepthAreANotice() {
        // Copper skin depth at 85 kHz: √(ρ/(π f µ0)) ≈ 0.226 mm (ρ = 1.7241e-8 Ω·m, IEC 60028).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.strandDiameter = 0.4e-3;
        p.litzStrands = 100;
        Finding f = fires(p.build(), "TW-L03", "$.primary.wire.strand_diameter_m", Severity.NOTICE);
        assertEquals(0.226e-3, f.limit(), 0.001e-3);
    }

    @Test
    void thinLitzStrandsAreQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-L03"); // 0.1 mm strands
    }

    @Test
    void turnToTurnVoltageAbovePaschenMinimumIsANotice() {
        // 5.1 kV peak over 8 turns: 640 V between turns, above Paschen's minimum of about 327 V in air.
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.turns1 = 8;
        Finding f = fires(p.build(), "TW-L04", "$.primary", Severity.NOTICE);
        assertEquals(327, f.limit());
        assertTrue(f.value() > 600);
    }

    @Test
    void manyTurnsKeepTheTurnVoltageQuiet() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.turns1 = 40;
        quiet(p.build(), "TW-L04");
    }

    @Test
    void seriesCompensatedCoilGetsTheSplitCapacitorAdvice() {
        // Common practice: a series capacitor split across both coil ends halves the winding's swing.
        Finding f = fires(ResultFixtures.ssLink(), "TW-L05", "$.primary", Severity.NOTICE);
        assertTrue(f.action().startsWith("Split the series capacitor"), f.action());
        assertTrue(f.source().contains("Paschen"));
    }

    @Test
    void parallelCompensatedCoilGetsInsulationAdvice() {
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.vdc = 200; // tank 628 V peak
        Finding f = fires(h.build(), "TW-L05", "$.primary", Severity.NOTICE);
        assertTrue(f.action().startsWith("Insulate"), f.action());
    }

    @Test
    void lowCoilVoltageIsQuiet() {
        quiet(ResultFixtures.heater(), "TW-L05"); // 151 V peak < 327 V
    }
}
