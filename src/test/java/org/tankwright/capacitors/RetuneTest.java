package org.tankwright.capacitors;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Re-tune arithmetic from ω² = 1/(LC) (standard circuit theory) and the shorted-secondary coupling formula. */
class RetuneTest {

    @Test
    void measuredFrequencyGivesInductanceAndPositiveTrim() {
        // 100 nF measured at 95 kHz, design 100 kHz: L = 1/((2π·95k)²·100n) = 28.07 µH,
        // C_needed = 100 nF·(95/100)² = 90.25 nF → lower: negative trim
        Retune.Result r = Retune.fromMeasuredFrequency(100e3, 100e-9, 95e3, CatalogueReader.demo().parts());
        assertEquals(1 / Math.pow(2 * Math.PI * 95e3, 2) / 100e-9, r.inductance(), 1e-18);
        assertEquals(28.066e-6, r.inductance(), 0.001e-6, "hand value");
        assertEquals(90.25e-9, r.capacitanceNeeded(), 1e-19);
        assertEquals(-9.75e-9, r.trim(), 1e-19);
        // series part: C·Cn/(C − Cn) = 100·90.25/9.75 nF = 925.6 nF
        assertEquals(100e-9 * 90.25e-9 / 9.75e-9, r.seriesCapacitance(), 1e-18);
        assertEquals("series", r.options().get(0).position());
        assertTrue(Math.abs(r.options().get(0).frequencyError()) < 0.01, "a catalogue part lands within 1 %");

        Retune.Result up = Retune.fromMeasuredFrequency(100e3, 100e-9, 105e3, List.of());
        assertEquals(100e-9 * 1.05 * 1.05 - 100e-9, up.trim(), 1e-19, "C·(fm/fd)² − C");
        assertTrue(up.action().contains("parallel"));
    }

    @Test
    void trimOptionsLandNearTheDesignFrequency() {
        Retune.Result r = Retune.fromMeasuredInductance(100e3, 100e-9, 24e-6, CatalogueReader.demo().parts());
        assertTrue(r.trim() > 0);
        for (Retune.TrimOption o : r.options()) {
            double f = 1 / (2 * Math.PI * Math.sqrt(24e-6 * o.resultingCapacitance()));
            assertEquals(f, o.resultingFrequency(), 1e-6);
            assertEquals(100e-9 + o.capacitance(), o.resultingCapacitance(), 1e-20, "parallel capacitances add");
        }
    }

    @Test
    void removingStringsFromAKnownBank() {
        CapacitorPart p = CapacitorPart.builder("p", 10e-9, Dielectric.POLYPROPYLENE).build();
        BankLayout bank = BankLayout.of(p, 1, 10); // 100 nF
        double l = 1 / Math.pow(2 * Math.PI * 100e3, 2) / 90e-9; // needs 90 nF
        List<Retune.TrimOption> o = Retune.removalOptions(bank, l, 100e3);
        assertEquals(90e-9, o.get(0).resultingCapacitance(), 1e-20);
        assertEquals(0, o.get(0).frequencyError(), 1e-12);
    }

    @Test
    void couplingFromOpenAndShortedReadings() {
        // L1,short = L1(1 − k²): k = 0.3 gives L1,short = 0.91·L1,open
        assertEquals(0.3, Retune.coupling(100e-6, 91e-6), 1e-12);
        assertEquals(0, Retune.coupling(50e-6, 50e-6), 0);
        String m = assertThrows(IllegalArgumentException.class, () -> Retune.coupling(50e-6, 60e-6)).getMessage();
        assertTrue(m.contains("l-short") && m.contains("exceeds"), m);
    }
}
