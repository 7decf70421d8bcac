package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ResultFixtures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class VoltageRulesTest {
    @Test
    void tankAboveFiftyVoltsRmsIsAWarning() {
        // IEC 61140 / IEC 60449: extra-low voltage ends at 50 V a.c. rms (70.7 V peak for a sine).
        AnalysisResult r = ResultFixtures.heater(); // π·48 V/√2 = 107 V rms across the tank
        Finding f = fires(r, "TW-V01", "C1", Severity.WARNING);
        assertEquals(50 * Math.sqrt(2), f.limit(), 1e-9, "IEC 60449 band I, as a sine's peak");
        assertEquals(Math.PI * 48, f.value(), 1e-6);
        assertTrue(f.action().endsWith(Finding.DEFERRAL));
    }

    @Test
    void aboveTheLowVoltageBandIsADanger() {
        // IEC 60449 band II ends at 1000 V a.c. rms: above it is high voltage.
        Finding f = fires(ResultFixtures.ssLink(), "TW-V01", "L1", Severity.DANGER);
        assertEquals(1000 * Math.sqrt(2), f.limit(), 1e-9);
        assertTrue(f.message().contains("worst envelope point"), "the envelope's worst case is named: " + f.message());
    }

    @Test
    void busAndDcOutputAreHeldToTheDcBand() {
        // IEC 61140: 120 V ripple-free d.c.
        AnalysisResult r = ResultFixtures.ssLink();
        assertEquals(120, fires(r, "TW-V01", "$.source.vdc_V", Severity.WARNING).limit());
        assertEquals(120, fires(r, "TW-V01", "RL", Severity.WARNING).limit());
    }

    @Test
    void sineSourceAboveFiftyVoltsFires() {
        ResultFixtures.Tank t = new ResultFixtures.Tank();
        t.sourceVrms = 60; // IEC 61140: above 50 V rms
        t.sourceResistance = 1000;
        fires(t.build(), "TW-V01", "$.source.vrms_V", Severity.WARNING);
    }

    @Test
    void heaterHotPointCountsWhenItsStressRowIsLower() {
        // The heater's hot-point tank voltage is held to IEC 61140 even if the stress row shows less.
        AnalysisResult r = ResultFixtures.heater();
        AnalysisResult low = ResultFixtures.withStresses(r, r.stresses().stream().map(s -> new org.tankwright.analysis.ElementStress(
                s.id(), s.role(), 10, 14.1, s.currentRms(), s.currentPeak(), s.loss(), Double.NaN, Double.NaN, "",
                Double.NaN, Double.NaN)).toList());
        assertEquals(Math.PI * 48, fires(low, "TW-V01", "C1", Severity.WARNING).value(), 1e-6);
    }

    @Test
    void smallTankStaysQuiet() {
        // 1.5 V rms × loaded Q 25 = 37.7 V rms: inside IEC 61140 extra-low voltage.
        quiet(ResultFixtures.measuredTank(), "TW-V01");
    }

    @Test
    void mainsBusWithoutIsolationIsADanger() {
        // IEC 61140: a non-isolated mains-derived circuit is at mains potential.
        Finding f = fires(ResultFixtures.ssLink(), "TW-V02", "$.source.mains_derived", Severity.DANGER);
        assertTrue(f.action().endsWith(Finding.DEFERRAL));
    }

    @Test
    void isolatedMainsBusIsQuiet() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.isolated = true;
        quiet(p.build(), "TW-V02");
    }

    @Test
    void unstatedMainsOriginOfAHighBusIsANotice() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.mainsDerived = null;
        fires(p.build(), "TW-V02", "$.source.mains_derived", Severity.NOTICE);
    }

    @Test
    void clearancePointerNamesIec60664PartFourAboveThirtyKilohertz() {
        // IEC 60664-4 applies above 30 kHz.
        Finding f = fires(ResultFixtures.ssLink(), "TW-V03", "L1", Severity.NOTICE);
        assertTrue(f.action().contains("IEC 60664-4"), f.action());
        assertTrue(f.source().contains("IEC 60664-1"));
    }

    @Test
    void clearancePointerQuietAtExtraLowVoltage() {
        quiet(ResultFixtures.measuredTank(), "TW-V03");
    }
}
