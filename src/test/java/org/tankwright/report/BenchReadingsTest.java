package org.tankwright.report;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.capacitors.Retune;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.ResultFixtures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class BenchReadingsTest {

    @Test
    void lowVoltageStepScalesEveryReadingLinearlyAndPowerWithTheSquare() {
        AnalysisResult r = ResultFixtures.ssLink();
        BenchReadings.Plan p = BenchReadings.of(r);
        double s = p.scale();
        assertTrue(s > 0 && s < 1, "the fixture's 2.8 kV peak needs a reduced drive");
        assertEquals(r.network().sourceVoltage() * s, p.drive(), 1e-9);
        assertEquals(r.network().sourceCurrent() * s, find(p, "Input current").expected(), 1e-12);
        ElementStress c1 = r.stresses().get(0);
        assertEquals(c1.voltageRms() * s, find(p, "C1 capacitor voltage").expected(), 1e-9);
        assertEquals(r.network().powerOut() * s * s, find(p, "Power into the dummy load").expected(), 1e-9);
        assertEquals(r.network().efficiency(), find(p, "Efficiency").expected(), 0.0, "efficiency does not scale");
        assertEquals(r.network().loadAc(), p.dummyLoad(), 0.0);
        for (ElementStress e : r.stresses()) {
            assertTrue(Math.sqrt(2) * e.voltageRms() * s <= BenchReadings.LOW_STEP_PEAK + 1e-9, e.id() + " stays below the low-step peak");
        }
    }

    @Test
    void lowSourcesAreNotScaledAndDriveLevelsAreRoundNumbers() {
        ResultFixtures.Tank quiet = new ResultFixtures.Tank();
        quiet.sourceVrms = 0.1;
        BenchReadings.Plan p = BenchReadings.of(quiet.build());
        assertEquals(1.0, p.scale(), 1e-12, "a tank whose parts stay below the low-step peak is tested at its own level");
        assertEquals(0.1, p.drive(), 0.0);
        BenchReadings.Plan loud = BenchReadings.of(ResultFixtures.measuredTank());
        // 1.5 V into Q ≈ 25 puts about 53 V peak on C1: the drive drops to a round 0.5 V
        assertEquals(0.5, loud.drive(), 1e-12);
        assertEquals(0.5 / 1.5, loud.scale(), 1e-12);
        assertEquals(1.0, BenchReadings.niceFloor(1.5), 0.0);
        assertEquals(2.0, BenchReadings.niceFloor(2.0), 0.0);
        assertEquals(50.0, BenchReadings.niceFloor(72.0), 0.0);
        assertEquals(0.2, BenchReadings.niceFloor(0.31), 1e-15);
    }

    @Test
    void bandsAreTheDesignsAcceptanceLimits() {
        BenchReadings.Plan p = BenchReadings.of(ResultFixtures.ssLink());
        // Defaults of the design file format: frequency 3 %, power 20 % (design.Tolerances)
        assertEquals(0.03, p.frequencyLimit(), 1e-12);
        assertEquals(0.20, p.powerLimit(), 1e-12);
        BenchReadings.Reading f = find(p, "Resonant frequency");
        assertEquals(f.expected() * 0.97, f.min(f.expected()), 1e-6);
        BenchReadings.Reading eta = p.full().stream().filter(x -> x.quantity().startsWith("Efficiency")).findFirst().orElseThrow();
        assertEquals(1.0, eta.max(0.97), 0.0, "an efficiency band stops at 100 %");
    }

    @Test
    void heaterFullPowerHasColdAndHotValues() {
        AnalysisResult r = ResultFixtures.heater();
        BenchReadings.Plan p = BenchReadings.of(r);
        assertTrue(p.heater());
        assertTrue(p.currentDriven());
        BenchReadings.Reading f = p.full().get(0);
        assertEquals(r.heater().cold().resonantFrequency(), f.expected(), 0.0);
        assertEquals(r.heater().hot().resonantFrequency(), f.expectedHot(), 0.0);
    }

    @Test
    void retuneFollowsThomsonsFormula() {
        double c = 47e-9;
        double fd = 100e3;
        double fm = 95e3;
        Retune.Result r = Retune.fromMeasuredFrequency(fd, c, fm, java.util.List.of());
        double needed = r.capacitanceNeeded();
        // f = 1/(2π√(LC)) (Thomson): L as built from the measurement, then C for the design frequency
        double l = 1 / (Math.pow(2 * Math.PI * fm, 2) * c);
        assertEquals(l, r.inductance(), l * 1e-12);
        assertEquals(1 / (Math.pow(2 * Math.PI * fd, 2) * l), needed, needed * 1e-12);
        assertEquals(c * (fm / fd) * (fm / fd), needed, needed * 1e-12, "C·(f_meas/f_design)²");
        double trim = r.seriesCapacitance();
        assertEquals(needed, c * trim / (c + trim), needed * 1e-12, "series combination gives the needed value");
        assertThrows(IllegalArgumentException.class, () -> Retune.fromMeasuredFrequency(fd, 0, fm, java.util.List.of()));
    }

    private static BenchReadings.Reading find(BenchReadings.Plan p, String start) {
        return p.low().stream().filter(x -> x.quantity().startsWith(start)).findFirst().orElseThrow(() -> new AssertionError(start));
    }
}
