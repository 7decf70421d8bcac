package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.BankReport;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.ResultFixtures;
import org.tankwright.design.Enums.SourceKind;
import org.tankwright.design.Enums.Topology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tankwright.checks.RuleTestSupport.fires;
import static org.tankwright.checks.RuleTestSupport.quiet;

class CapacitorRulesTest {
    private static double envelopeVoltageScale(AnalysisResult r, String id) {
        ElementStress s = r.stresses().stream().filter(x -> x.id().equals(id)).findFirst().orElseThrow();
        return s.worstVoltagePeak() / s.voltagePeak();
    }

    @Test
    void voltageOverTheDeratedRatingIsAWarningAtTheEnvelopesWorstPoint() {
        // Limit: the part's derated voltage rating (datasheet).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.partVoltageRating = 1000;
        AnalysisResult r = p.build();
        Finding f = fires(r, "TW-C01", "C1", Severity.WARNING);
        BankReport b = r.banks().get(0);
        assertEquals(b.partVoltagePeak() * envelopeVoltageScale(r, "C1"), f.value(), 1e-6);
        assertEquals(1000, f.limit());
        assertTrue(f.message().contains("margin -"), f.message());
    }

    @Test
    void thinVoltageMarginIsANotice() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        AnalysisResult base = p.build();
        double worst = base.banks().get(0).partVoltagePeak() * envelopeVoltageScale(base, "C1");
        p.partVoltageRating = worst / 0.95; // 5 % margin, under the 10 % common-practice margin
        fires(p.build(), "TW-C01", "C1", Severity.NOTICE);
    }

    @Test
    void voltageWithinRatingIsQuiet() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.partVoltageRating = 3000;
        quiet(p.build(), "TW-C01");
    }

    @Test
    void voltageRatingOfAStressRowIsUsedWithoutBanks() {
        // Limit: a rating entered on the element itself (datasheet).
        AnalysisResult r = ResultFixtures.measuredTank();
        ElementStress c = r.stresses().get(0);
        ElementStress rated = new ElementStress(c.id(), c.role(), c.voltageRms(), c.voltagePeak(), c.currentRms(),
                c.currentPeak(), c.loss(), c.worstVoltagePeak(), c.worstCurrentRms(), c.worstAt(), 40.0, Double.NaN);
        Finding f = fires(ResultFixtures.withStresses(r, java.util.List.of(rated, r.stresses().get(1))), "TW-C01", "C1",
                Severity.WARNING);
        assertEquals(c.voltagePeak(), f.value(), 1e-9);
    }

    @Test
    void currentOverTheRatingIsAWarning() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.partCurrentRating = 2; // the part's derated rms current rating (datasheet)
        fires(p.build(), "TW-C02", "C1", Severity.WARNING);
    }

    @Test
    void currentWithinRatingIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-C02"); // 12.4 A over 4 strings, worst 5.6 A per part against 12 A
    }

    @Test
    void lossyPartIsACaution() {
        // Limit: about 1 W per film part in still air (common practice); loss = ESR·I², ESR = tan δ/(ωC).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.partTanDelta = 0.02;
        Finding f = fires(p.build(), "TW-C03", "C1", Severity.CAUTION);
        assertEquals(1.0, f.limit());
    }

    @Test
    void lowLossPartIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-C03");
    }

    @Test
    void dvdtOverTheRatingIsAWarning() {
        // dV/dt of a sine is ω·V_peak; limit: the part's pulse rating (datasheet).
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.partDvDtRating = 1e8;
        AnalysisResult r = p.build();
        Finding f = fires(r, "TW-C04", "C1", Severity.WARNING);
        BankReport b = r.banks().get(0);
        assertEquals(2 * Math.PI * 85e3 * b.partVoltagePeak() * envelopeVoltageScale(r, "C1"), f.value(), 1e-3);
    }

    @Test
    void dvdtWithinRatingIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-C04");
    }

    @Test
    void selfResonanceTooCloseIsANotice() {
        // SRF = 1/(2π√(ESL·C)); common practice: at least 5 × the operating frequency.
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.partEsl = 20e-6; // exaggerated: SRF of a 12 nF part ≈ 324 kHz
        AnalysisResult r = p.build();
        Finding f = fires(r, "TW-C05", "C1", Severity.NOTICE);
        assertEquals(5 * 85e3, f.limit(), 1e-6);
        assertTrue(f.value() < f.limit());
    }

    @Test
    void selfResonanceFarAboveIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-C05");
    }

    @Test
    void classTwoCeramicIsANotice() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.class2 = true;
        p.dielectric = "X7R ceramic";
        Finding f = fires(p.build(), "TW-C06", "C1", Severity.NOTICE);
        assertTrue(f.source().contains("IEC 60384-9"));
    }

    @Test
    void filmIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-C06");
    }

    @Test
    void bridgeDrivingAParallelCapacitorIsADanger() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.topology = Topology.PS;
        Finding f = fires(p.build(), "TW-C07", "$.compensation.topology", Severity.DANGER);
        assertTrue(f.action().endsWith(Finding.DEFERRAL));
        ResultFixtures.Tank t = new ResultFixtures.Tank();
        t.topology = Topology.PARALLEL;
        t.sourceKind = SourceKind.HALF_BRIDGE;
        fires(t.build(), "TW-C07", "$.compensation.topology", Severity.DANGER);
    }

    @Test
    void seriesPrimaryOrCurrentFedParallelTankIsQuiet() {
        quiet(ResultFixtures.ssLink(), "TW-C07");
        quiet(ResultFixtures.heater(), "TW-C07"); // current-fed parallel tank
        ResultFixtures.Tank t = new ResultFixtures.Tank();
        t.topology = Topology.PARALLEL; // a sine source has no edges
        quiet(t.build(), "TW-C07");
    }
}
