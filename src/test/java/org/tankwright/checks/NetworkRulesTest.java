package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.ResultFixtures;
import org.tankwright.design.Enums.Topology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class NetworkRulesTest {
    @Test
    void lowLoadedQIsANotice() {
        // Loaded Q = ωL/(R + Rs) = 62.8/(0.5 + 30) ≈ 2.1 < 3 (common practice for the fundamental analysis).
        ResultFixtures.Tank t = new ResultFixtures.Tank();
        t.sourceResistance = 30;
        Finding f = fires(t.build(), "TW-N01", "$.compensation", Severity.NOTICE);
        assertEquals(2 * Math.PI * 100e3 * 100e-6 / 30.5, f.value(), 1e-9);
    }

    @Test
    void adequateLoadedQIsQuiet() {
        quiet(ResultFixtures.measuredTank(), "TW-N01"); // Q ≈ 25
        quiet(ResultFixtures.ssLink(), "TW-N01"); // Q ≈ 5.6
    }

    @Test
    void bifurcationIsANotice() {
        // Wang, Covic, Stielau 2004: more than one zero-phase frequency.
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.bifurcated = true;
        assertEquals(3, fires(p.build(), "TW-N02", "$.compensation", Severity.NOTICE).value());
    }

    @Test
    void singleZeroPhaseFrequencyIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-N02");
    }

    @Test
    void hardSwitchingIsANotice() {
        // Zero phase: turn-off current √2·I·sin 0 = 0 < 2·Coss·Vdc/t_dead = 2·150 pF·400 V/200 ns = 0.6 A.
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.phaseDeg = 0;
        Finding f = fires(p.build(), "TW-N03", "$.compensation.target_phase_deg", Severity.NOTICE);
        assertEquals(2 * 150e-12 * 400 / 200e-9, f.limit(), 1e-12);
        p.phaseDeg = -5;
        assertTrue(fires(p.build(), "TW-N03", null).message().contains("capacitive"));
    }

    @Test
    void inductiveTuningSwitchesAtZeroVoltage() {
        quiet(ResultFixtures.ssLink(), "TW-N03"); // 12° inductive: 3.6 A at turn-off
        quiet(ResultFixtures.measuredTank(), "TW-N03"); // a sine source has no bridge
    }

    @Test
    void removedReceiverCurrentRiseIsAWarning() {
        // SS without the secondary: the primary current is limited only by R1, Rs and the detuning.
        Finding f = fires(ResultFixtures.ssLink(), "TW-N04", "$.envelope.receiver_removable", Severity.WARNING);
        assertTrue(f.value() > 2 * f.limit(), f.toString());
    }

    @Test
    void fixedReceiverIsQuiet() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.receiverRemovable = false;
        quiet(p.build(), "TW-N04");
    }

    @Test
    void openLoadVoltageAboveExtraLowVoltageIsAWarning() {
        // SP: the parallel secondary is a current source; open, its voltage rises (IEC 61140 for the DC output: 120 V).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.topology = Topology.SP;
        Finding f = fires(p.build(), "TW-N05", "RL", Severity.WARNING);
        assertEquals(120, f.limit());
    }

    @Test
    void seriesSecondaryHasNoOpenLoadRise() {
        quiet(ResultFixtures.ssLink(), "TW-N05");
    }

    @Test
    void unreachableTargetIsANotice() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.unreachable.add("k = 0.18, load 28 Ω");
        fires(p.build(), "TW-N06", "$.load.target_power_W", Severity.NOTICE);
    }

    @Test
    void reachableTargetIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-N06");
    }

    @Test
    void mostlyReactiveBridgeCurrentIsANotice() {
        // Power factor cos 75° = 0.26: the bridge carries 1/0.26 = 3.9 × the current the power needs
        // (common practice: apparent against real power).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.phaseDeg = 75;
        p.phaseStated = false;
        Finding f = fires(p.build(), "TW-N07", "$.frequency_Hz", Severity.NOTICE);
        assertEquals(75, f.value(), 1e-9);
        assertTrue(f.message().contains("3.9"), f.message());
        p.phaseDeg = -75;
        assertEquals(75, fires(p.build(), "TW-N07", null).value(), 1e-9);
    }

    @Test
    void statedPowerControlPhaseOrNearResonanceIsQuiet() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.phaseDeg = 75;
        p.phaseStated = true; // the design asks for 75°: its own power control
        quiet(p.build(), "TW-N07");
        quiet(ResultFixtures.ssLink(), "TW-N07"); // 12°
        quiet(ResultFixtures.measuredTank(), "TW-N07"); // a sine source has no bridge
    }
}
