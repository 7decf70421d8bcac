package org.tankwright.capacitors;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A bank is written the way a builder reads it: the trim is the small correction, never a copy of
 * the main part nor the larger contributor (common practice for tank capacitor banks). Rewriting
 * never changes the nominal capacitance.
 */
class BankLayoutCanonicalTest {
    private static CapacitorPart part(String id, double c) {
        return CapacitorPart.builder(id, c, Dielectric.POLYPROPYLENE).tanDelta(3e-4, 1e3).esl(10e-9)
                .dcRating(1000.0).acRating(300.0).currentRating(5.0).maxDissipation(1.0).dvdtRating(1e9).build();
    }

    @Test
    void aTrimOfTheMainPartIsOneMoreString() {
        CapacitorPart p = part("a", 2.2e-6);
        BankLayout l = new BankLayout(p, 1, 3, p, TrimPosition.PARALLEL);
        BankLayout c = l.canonical();
        assertEquals(BankLayout.of(p, 1, 4), c);
        assertEquals(l.capacitance(), c.capacitance(), 1e-18);
        BankLayout s = new BankLayout(p, 2, 1, p, TrimPosition.SERIES);
        assertEquals(BankLayout.of(p, 3, 1), s.canonical());
        assertEquals(s.capacitance(), s.canonical().capacitance(), 1e-18);
    }

    @Test
    void theLargerContributorIsTheMainPart() {
        CapacitorPart small = part("small", 6.8e-9);
        CapacitorPart big = part("big", 100e-9);
        BankLayout across = new BankLayout(small, 1, 1, big, TrimPosition.PARALLEL).canonical();
        assertEquals(big, across.part());
        assertEquals(small, across.trim());
        assertEquals(106.8e-9, across.capacitance(), 1e-15);
        // in series the smaller capacitance sets the bank: it is the main part
        BankLayout series = new BankLayout(small, 1, 1, big, TrimPosition.SERIES).canonical();
        assertEquals(small, series.part());
        BankLayout swapped = new BankLayout(big, 1, 1, small, TrimPosition.SERIES).canonical();
        assertEquals(small, swapped.part());
        assertEquals(big, swapped.trim());
        // an array with a trim is left as it is
        BankLayout array = new BankLayout(small, 1, 2, big, TrimPosition.PARALLEL);
        assertEquals(array, array.canonical());
    }

    @Test
    void searchResultsAreWrittenAsBuilt() {
        CapacitorPart p = part("p", 2.2e-6);
        BankRequest req = BankRequest.of(8.8e-6, 0.01, BankStress.sinusoidal(3, 10, 0, 60e3)).withBounds(1, 3, true, 5);
        BankSearchResult r = BankSynthesis.search(req, List.of(p));
        assertTrue(r.best() != null, () -> r.nearMisses().toString() + r.rejectedParts());
        // with parallel ≤ 3, only 1 × 3 plus the same part across reaches 8.8 µF: it is shown as 1 × 4
        assertEquals(BankLayout.of(p, 1, 4), r.best().layout());
        for (CapacitorBank b : r.banks()) {
            assertTrue(b.layout().trim() == null || !b.layout().trim().id().equals(b.layout().part().id()), b.layout().describe());
        }
    }
}
