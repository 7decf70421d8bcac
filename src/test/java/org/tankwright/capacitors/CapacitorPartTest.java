package org.tankwright.capacitors;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CapacitorPartTest {
    static CapacitorPart pp(String id, double c, double esl) {
        return CapacitorPart.builder(id, c, Dielectric.POLYPROPYLENE).tanDelta(2e-4, 1e3).lossExponent(0)
                .esl(esl).dcRating(1600).acRating(500.0).currentRating(10).build();
    }

    @Test
    void esrFromTanDelta() {
        // definition of the loss tangent, tan δ = ESR/X_C = ESR·ωC (IEC 60384-1, tangent of loss angle)
        CapacitorPart p = CapacitorPart.builder("a", 100e-9, Dielectric.C0G).tanDelta(1e-3, 100e3).build();
        double expected = 1e-3 / (2 * Math.PI * 100e3 * 100e-9); // 15.915 mΩ
        assertEquals(0.0159155, expected, 1e-6, "hand value 1e-3/(2π·100 kHz·100 nF)");
        assertEquals(expected, p.esrAt(100e3), 1e-15);
        // C0G loss flat with frequency (exponent 0): ESR falls as 1/f
        assertEquals(expected / 10, p.esrAt(1e6), 1e-15);
        // ESR given at a frequency converts to the same tan δ there
        CapacitorPart q = CapacitorPart.builder("b", 100e-9, Dielectric.C0G).esr(expected, 100e3).build();
        assertEquals(1e-3, q.tanDeltaAt(100e3), 1e-15);
    }

    @Test
    void lossLawCarriesTanDeltaWithFrequency() {
        CapacitorPart p = CapacitorPart.builder("a", 10e-9, Dielectric.POLYPROPYLENE).tanDelta(3e-4, 1e3).build();
        assertEquals(0.35, p.lossExponent(), 0, "polypropylene default exponent");
        assertEquals(3e-4 * Math.pow(100, 0.35), p.tanDeltaAt(100e3), 1e-15);
    }

    @Test
    void selfResonantFrequency() {
        // SRF = 1/(2π√(LC)), standard circuit theory: 10 nH with 100 nF resonates at 5.0329 MHz
        CapacitorPart p = pp("a", 100e-9, 10e-9);
        assertEquals(5.0329212e6, p.srf(), 1.0);
        assertEquals(Double.POSITIVE_INFINITY, pp("b", 1e-9, 0).srf());
    }

    @Test
    void acRatingFollowsTableThenRollsOff() {
        CapacitorPart p = CapacitorPart.builder("a", 10e-9, Dielectric.POLYPROPYLENE).tanDelta(3e-4, 1e3).currentRating(100)
                .acRatingTable(List.of(new AcRatingPoint(1e3, 500), new AcRatingPoint(100e3, 50))).build();
        assertEquals(500, p.acRatingAt(100), 1e-9, "flat below the table");
        assertEquals(Math.sqrt(500 * 50), p.acRatingAt(10e3), 1e-9, "log-log midpoint is the geometric mean");
        assertEquals(50 / Math.sqrt(4), p.acRatingAt(400e3), 1e-9, "dissipation-limited 1/√f past the table");
        CapacitorPart limitedByCurrent = CapacitorPart.builder("b", 100e-9, Dielectric.POLYPROPYLENE).acRating(500.0)
                .currentRating(2).build();
        assertEquals(2 / (2 * Math.PI * 100e3 * 100e-9), limitedByCurrent.acRatingAt(100e3), 1e-9, "I/(ωC)");
    }

    @Test
    void invalidFieldsAreNamed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CapacitorPart.builder("x1", -1e-9, Dielectric.C0G).build());
        assertTrue(e.getMessage().contains("capacitance_F") && e.getMessage().contains("-1.0E-9")
                && e.getMessage().contains("positive"), e.getMessage());
    }
}
