package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.design.Enums.ExposureSet;
import org.tankwright.design.Enums.Population;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The limit tables against their published values. */
class LimitsTest {
    private static final double MU0 = 4e-7 * Math.PI;

    private static double level(ExposureSet s, Population p, double f) {
        return Limits.magneticReference(s, p, f).tesla();
    }

    @Test
    void icnirp2010MatchesItsTables() {
        // ICNIRP 2010, Health Physics 99:818–836, Tables 3 and 4 (B in T, f in Hz).
        assertEquals(2e-4, level(ExposureSet.ICNIRP_2010, Population.PUBLIC, 50), 1e-12, "public 50 Hz: 200 µT");
        assertEquals(8e-2 / 1000, level(ExposureSet.ICNIRP_2010, Population.PUBLIC, 1000), 1e-12, "public 1 kHz: 80 µT");
        assertEquals(27e-6, level(ExposureSet.ICNIRP_2010, Population.PUBLIC, 85e3), 1e-12, "public 85 kHz: 27 µT");
        assertEquals(4e-2 / 16, level(ExposureSet.ICNIRP_2010, Population.PUBLIC, 4), 1e-12, "public 4 Hz: 0.04/f²");
        assertEquals(1e-3, level(ExposureSet.ICNIRP_2010, Population.WORKER, 50), 1e-12, "occupational 50 Hz: 1 mT");
        assertEquals(0.3 / 1000, level(ExposureSet.ICNIRP_2010, Population.WORKER, 1000), 1e-12, "occupational 1 kHz");
        assertEquals(1e-4, level(ExposureSet.ICNIRP_2010, Population.WORKER, 85e3), 1e-12, "occupational 85 kHz: 100 µT");
    }

    @Test
    void icnirp1998MatchesItsTables() {
        // ICNIRP 1998, Health Physics 74:494–522, Tables 6 and 7 (from memory; the same values are in EU Recommendation 1999/519/EC).
        assertEquals(100e-6, level(ExposureSet.ICNIRP_1998, Population.PUBLIC, 50), 1e-12, "public 50 Hz: 100 µT");
        assertEquals(6.25e-6, level(ExposureSet.ICNIRP_1998, Population.PUBLIC, 85e3), 1e-12, "public 85 kHz: 6.25 µT");
        assertEquals(0.92e-6, level(ExposureSet.ICNIRP_1998, Population.PUBLIC, 1e6), 1e-12, "public 1 MHz: 0.92 µT");
        assertEquals(500e-6, level(ExposureSet.ICNIRP_1998, Population.WORKER, 50), 1e-12, "occupational 50 Hz: 500 µT");
        assertEquals(30.7e-6, level(ExposureSet.ICNIRP_1998, Population.WORKER, 30e3), 1e-12, "occupational 30 kHz");
        assertEquals(2.0e-6, level(ExposureSet.ICNIRP_1998, Population.WORKER, 1e6), 1e-12, "occupational 1 MHz: 2 µT");
    }

    @Test
    void tablesAreContinuousAtTheirEdges() {
        // The published pieces meet (ICNIRP 1998: 5/f_kHz µT at 0.8 kHz = 6.25 µT; 2.0/f_MHz at 65 kHz ≈ 30.7 µT).
        assertEquals(Limits.ICNIRP_1998_PUBLIC.at(799.999), Limits.ICNIRP_1998_PUBLIC.at(800.001), 1e-10);
        assertEquals(30.7e-6, Limits.ICNIRP_1998_WORKER.at(65.001e3), 0.1e-6);
        assertEquals(Limits.ICNIRP_2010_PUBLIC.at(24.999), Limits.ICNIRP_2010_PUBLIC.at(25.001), 1e-8);
    }

    @Test
    void between100kHzAnd10MHzTheStricterGoverns() {
        // ICNIRP 2020 whole-body, general public: H = 2.2/f_MHz A/m (from memory) → at 1 MHz µ0·2.2 A/m ≈ 2.76 µT,
        // stricter than ICNIRP 2010's 27 µT, so heating governs.
        Limits.ReferenceLevel at1M = Limits.magneticReference(ExposureSet.ICNIRP_2010, Population.PUBLIC, 1e6);
        assertEquals(MU0 * 2.2, at1M.tesla(), 1e-12);
        assertTrue(at1M.source().contains("2020"), at1M.source());
        // At 100 kHz the 2020 level is µ0·22 A/m ≈ 27.6 µT: the 2010 nerve level of 27 µT is stricter.
        Limits.ReferenceLevel at100k = Limits.magneticReference(ExposureSet.ICNIRP_2020, Population.PUBLIC, 100e3);
        assertEquals(27e-6, at100k.tesla(), 1e-12);
        assertTrue(at100k.source().contains("2010"), at100k.source());
        // Below 100 kHz only the 2010 table applies, whichever of the pair was chosen.
        assertEquals(27e-6, level(ExposureSet.ICNIRP_2020, Population.PUBLIC, 85e3), 1e-12);
        // Above 10 MHz only the 2020 table: occupational 4.9/f_MHz A/m at 20 MHz.
        assertEquals(MU0 * 4.9 / 20, level(ExposureSet.ICNIRP_2010, Population.WORKER, 20e6), 1e-12);
    }

    @Test
    void outsideEveryTableIsNaN() {
        assertTrue(Double.isNaN(level(ExposureSet.ICNIRP_2010, Population.PUBLIC, 0.5)));
        assertTrue(Double.isNaN(level(ExposureSet.ICNIRP_1998, Population.PUBLIC, 500e6)));
    }

    @Test
    void extraLowVoltageBands() {
        // IEC 61140 / IEC 60449: 50 V a.c. rms, 120 V ripple-free d.c.; low voltage to 1000 V a.c., 1500 V d.c.
        assertEquals(50, Limits.ELV_AC_RMS);
        assertEquals(120, Limits.ELV_DC);
        assertEquals(70.71, Limits.elvAcPeak(), 0.01);
        assertEquals(1500, Limits.LV_DC);
    }

    @Test
    void sourcesQuoteTheirLimits() {
        assertTrue(Limits.SRF_SOURCE.contains("at least 5 ×"), Limits.SRF_SOURCE);
        assertTrue(Limits.PASCHEN_SOURCE.contains("327 V"), Limits.PASCHEN_SOURCE);
        assertTrue(Limits.HAZARDOUS_ENERGY_SOURCE.contains("(20 J"), Limits.HAZARDOUS_ENERGY_SOURCE);
        assertTrue(Limits.CURRENT_DENSITY_SOURCE.contains("5 A/mm²"), Limits.CURRENT_DENSITY_SOURCE);
    }

    @Test
    void bandsFromTheRegulations() {
        // ITU Radio Regulations No. 5.150: 13.553–13.567 MHz; ITU-R SM.2110: 79–90 kHz for EV charging.
        assertNotNull(Limits.bandFor(13.56e6, 13.56e6));
        assertNotNull(Limits.bandFor(79e3, 90e3));
        assertNull(Limits.bandFor(1e6, 1e6));
        assertNull(Limits.bandFor(6.7e6, 6.78e6), "a range must fit inside one band");
    }
}
