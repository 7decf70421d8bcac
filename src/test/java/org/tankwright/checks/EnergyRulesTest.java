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
    void chargeAboveFortyFiveMicrocoulombsIsAWarning() {
        // Q = C·V = 1 µF · 151 V = 151 µC ≥ 45 µC (IEC 61010-1 §6.3).
        Finding f = fires(ResultFixtures.heater(), "TW-E02", "C1", Severity.WARNING);
        assertEquals(1e-6 * Math.PI * 48, f.value(), 1e-9);
        assertEquals(45e-6, f.limit());
    }

    @Test
    void chargeAtExtraLowVoltageIsQuiet() {
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.vdc = 20; // 62.8 V peak: below the 70.7 V peak of extra-low voltage
        AnalysisResult r = h.build();
        quiet(r, "TW-E02");
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
