package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.ResultFixtures;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class RadioRulesTest {
    @Test
    void frequencyOutsideEveryBandIsANotice() {
        // 500 kHz: above the 100–300 kHz of ETSI EN 303 417 and the 315–405 kHz of ITU-R SM.2449, below 6.78 MHz.
        ResultFixtures.Tank t = new ResultFixtures.Tank();
        t.frequency = 500e3;
        Finding f = fires(t.build(), "TW-R01", "$.frequency_Hz", Severity.NOTICE);
        assertTrue(f.action().contains("radio rules"), f.action());
        assertTrue(f.source().contains("5.150"), f.source());
    }

    @Test
    void frequencyInsideABandIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-R01"); // 85 kHz: 79–90 kHz, ITU-R SM.2110
        quiet(ResultFixtures.heater(), "TW-R01"); // 164–168 kHz: 100–300 kHz, ETSI EN 303 417
        ResultFixtures.Tank t = new ResultFixtures.Tank();
        t.frequency = 13.56e6; // ITU Radio Regulations No. 5.150
        quiet(t.build(), "TW-R01");
    }
}
