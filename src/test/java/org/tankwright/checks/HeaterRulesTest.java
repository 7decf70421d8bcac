package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.ResultFixtures;
import org.tankwright.design.Enums.WireKind;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class HeaterRulesTest {
    @Test
    void hotWorkpieceIsAWarning() {
        // EN ISO 13732-1: bare metal above about 51 °C burns in a minute's contact.
        Finding f = fires(ResultFixtures.heater(), "TW-H01", "$.workpiece.temperature_hot_degC", Severity.WARNING);
        assertEquals(900, f.value());
        assertEquals(51, f.limit());
    }

    @Test
    void warmWorkpieceIsQuiet() {
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.temperatureHot = 45;
        quiet(h.build(), "TW-H01");
    }

    @Test
    void strayMetalCautionForEveryHeater() {
        Finding f = fires(ResultFixtures.heater(), "TW-H02", "$.workpiece", Severity.CAUTION);
        assertTrue(f.action().contains("rings"), f.action());
    }

    @Test
    void noStrayMetalCautionForALink() {
        quiet(ResultFixtures.ssLink(), "TW-H02");
    }

    @Test
    void tubeCoilGetsTheFlowItNeeds() {
        // Flow = P/(ρ·c_p·ΔT) = 125 W/(1000 kg/m³ · 4186 J/(kg·K) · 10 K) ≈ 0.18 L/min.
        Finding f = fires(ResultFixtures.heater(), "TW-H03", "$.workpiece.coolant_rise_degC", Severity.CAUTION);
        assertEquals(ResultFixtures.heater().heater().cold().coilLoss() / (1000 * 4186 * 10), f.value(), 1e-12);
    }

    @Test
    void solidWireWorkCoilIsTold() {
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.wireKind = WireKind.ROUND;
        fires(h.build(), "TW-H03", "$.primary.wire", Severity.CAUTION);
    }

    @Test
    void lowCoilLossIsQuiet() {
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.coilResistance = 0.001; // about 13 W, under the 25 W an air-cooled coil sheds (common practice)
        quiet(h.build(), "TW-H03");
    }

    @Test
    void hotWorkCoilIsACaution() {
        ResultFixtures.Heater h = new ResultFixtures.Heater();
        h.coilTemperature = 70;
        fires(h.build(), "TW-H04", "$.primary.temperature_degC", Severity.CAUTION);
    }

    @Test
    void cooledWorkCoilIsQuiet() {
        quiet(ResultFixtures.heater(), "TW-H04"); // 40 °C
    }
}
