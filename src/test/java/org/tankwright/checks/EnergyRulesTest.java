package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ResultFixtures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class EnergyRulesTest {
    @Test
    void bankAtTwentyJoulesIsAWarningWithTheDischargeCaution() {
        // ½CV² = ½ · 10 µF · (π · 1000 V)² ≈ 49 J ≥ 20 J (IEC 60950-1 hazardous energy level).
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.capacitance = 10e-6;
        h.vdc = 1000;
        Finding f = fires(h.build(), "TW-E01", "C1", Severity.WARNING);
        assertEquals(0.5 * 10e-6 * Math.pow(Math.PI * 1000, 2), f.value(), 1e-6);
        assertTrue(f.action().startsWith("Fit bleeder resistors"), f.action());
        assertTrue(f.action().endsWith(Finding.DEFERRAL));
    }

    @Test
    void smallBankEnergyIsQuiet() {
        quiet(ResultFixtures.heater(), "TW-E01"); // ½ · 1 µF · (151 V)² ≈ 11 mJ
    }

    @Test
    void capacitanceAboveATenthOfAMicrofaradUpTo450VoltsIsAWarning() {
        // IEC 60335-1 §8.1.4: between 42.4 V and 450 V peak at most 0.1 µF; the heater's 1 µF sits at 151 V peak.
        Finding f = fires(ResultFixtures.heater(), "TW-E02", "C1", Severity.WARNING);
        assertEquals(1e-6, f.value(), 1e-12);
        assertEquals(0.1e-6, f.limit(), 1e-15);
        assertEquals("F", f.unit());
    }

    @Test
    void chargeAboveFortyFiveMicrocoulombsIsAWarning() {
        // IEC 60335-1 §8.1.4: between 450 V and 15 kV peak at most 45 µC; C1 of the pad: 12 nF at 4.9 kV worst.
        AnalysisResult r = ResultFixtures.ssLink();
        Finding f = fires(r, "TW-E02", "C1", Severity.WARNING);
        assertEquals(45e-6, f.limit(), 1e-15);
        assertEquals(r.banks().get(0).capacitance() * EnergyRules.bankPeak(r, r.banks().get(0)), f.value(), 1e-12);
    }

    @Test
    void smallDischargeIsQuiet() {
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.vdc = 12; // 37.7 V peak: under the 42.4 V peak where the limits begin
        quiet(h.build(), "TW-E02");
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.vdc = 200; // C1 about 2.4 kV worst: 12 nF · 2.4 kV ≈ 29 µC < 45 µC
        quiet(p.build(), "TW-E02");
    }

    @Test
    void busAboveExtraLowVoltageGivesTheDcLinkCaution() {
        // IEC 61140: 120 V ripple-free d.c.; 20 J at 400 V takes 2·20/400² = 250 µF.
        Finding f = fires(ResultFixtures.ssLink(), "TW-E03", "$.source.vdc_V", Severity.CAUTION);
        assertTrue(f.message().contains("250 µF"), f.message());
    }

    @Test
    void lowBusIsQuiet() {
        quiet(ResultFixtures.heater(), "TW-E03"); // 48 V
    }
}
