package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ExposureReport;
import org.tankwright.analysis.ResultFixtures;
import org.tankwright.design.Enums.ExposureSet;
import org.tankwright.design.Enums.Population;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class ExposureRulesTest {
    private static AnalysisResult pad(double distance, Population pop, ExposureSet set) {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.fieldDistance = distance;
        p.population = pop;
        p.exposureSet = set;
        return p.build();
    }

    @Test
    void fieldAboveThePublicLevelIsAWarning() {
        // ICNIRP 2010, general public, 3 kHz–10 MHz: 27 µT.
        AnalysisResult r = pad(0.4, Population.PUBLIC, ExposureSet.ICNIRP_2010);
        Finding f = fires(r, "TW-F01", "$.safety.field_distance_m", Severity.WARNING);
        assertEquals(27e-6, f.limit(), 1e-12);
        assertTrue(f.message().startsWith("Screening estimate"), f.message());
        assertTrue(f.action().endsWith(Finding.DEFERRAL));
        assertTrue(f.source().contains("ICNIRP 2010"), f.source());
    }

    @Test
    void sameFieldIsWithinTheOccupationalLevel() {
        // ICNIRP 2010, occupational, 3 kHz–10 MHz: 100 µT; the estimate at 0.4 m is about 55 µT.
        quiet(pad(0.4, Population.WORKER, ExposureSet.ICNIRP_2010), "TW-F01");
    }

    @Test
    void icnirp1998IsStricterAtEightyFiveKilohertz() {
        // ICNIRP 1998, general public, 0.8–150 kHz: 6.25 µT; the estimate at 0.8 m is about 6.8 µT.
        Finding f = fires(pad(0.8, Population.PUBLIC, ExposureSet.ICNIRP_1998), "TW-F01", null, Severity.WARNING);
        assertEquals(6.25e-6, f.limit(), 1e-12);
        quiet(pad(0.8, Population.PUBLIC, ExposureSet.ICNIRP_2010), "TW-F01");
    }

    @Test
    void noEstimateNoFinding() {
        quiet(ResultFixtures.measuredTank(), "TW-F01");
        quiet(ResultFixtures.withExposure(ResultFixtures.ssLink(),
                new ExposureReport(0.2, Double.NaN, 85e3, "none")), "TW-F01");
    }

    @Test
    void implantCautionFiresAboveThePublicLevelEvenForWorkers() {
        // EN 50527-1: implants presumed unaffected below the general-public reference levels.
        Finding f = fires(pad(0.4, Population.WORKER, ExposureSet.ICNIRP_2010), "TW-F02", null, Severity.CAUTION);
        assertEquals(27e-6, f.limit(), 1e-12);
    }

    @Test
    void implantCautionQuietBelowThePublicLevel() {
        quiet(ResultFixtures.ssLink(), "TW-F02"); // about 6.8 µT at 0.8 m against 27 µT
    }
}
