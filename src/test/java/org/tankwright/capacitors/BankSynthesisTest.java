package org.tankwright.capacitors;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

class BankSynthesisTest {

    /** Every layout within the bounds, evaluated: the reference the pruned search must equal. */
    static List<CapacitorBank> bruteForce(BankRequest req, List<CapacitorPart> parts) {
        return org.tankwright.bench.BankComparison.bruteForce(req, parts, new long[1]);
    }

    static List<CapacitorPart> smallCatalogue(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] values = ESeries.E12.mantissas();
        List<CapacitorPart> parts = new ArrayList<>();
        for (int i = 0; i < 14; i++) {
            double c = values[rnd.nextInt(values.length)] * Math.pow(10, -9 + rnd.nextInt(2));
            double vdc = new double[]{630, 1000, 1600}[rnd.nextInt(3)];
            parts.add(CapacitorPart.builder("p" + i, c, i % 5 == 0 ? Dielectric.C0G : Dielectric.POLYPROPYLENE)
                    .tanDelta(3e-4, 1e3).esl(8e-9 + rnd.nextDouble() * 10e-9).dcRating(vdc).acRating(vdc / 3)
                    .currentRating(1 + rnd.nextDouble() * 6).maxDissipation(0.5 + rnd.nextDouble()).dvdtRating(1e9)
                    .price(Math.round(rnd.nextDouble() * 100) / 100.0).build());
        }
        return parts;
    }

    @Test
    void prunedSearchEqualsBruteForce() {
        for (long seed = 1; seed <= 4; seed++) {
            List<CapacitorPart> parts = smallCatalogue(seed);
            for (double target : new double[]{22e-9, 47e-9, 68e-9}) {
                BankRequest req = BankRequest.of(target, 0.03, BankStress.sinusoidal(600, 0, 0, 100e3))
                        .withBounds(4, 6, true, 5);
                List<CapacitorBank> expected = bruteForce(req, parts);
                BankSearchResult got = BankSynthesis.search(req, parts);
                assertEquals(describe(expected), describe(got.banks()), "seed " + seed + " target " + target);
                if (!expected.isEmpty()) {
                    assertEquals("best", got.verdicts().get(0));
                }
            }
        }
    }

    @Test
    void demoCatalogueMakesAFeasibleBank() {
        BankRequest req = BankRequest.of(47e-9, 0.02, BankStress.sinusoidal(400, 5, 0, 100e3));
        BankSearchResult r = BankSynthesis.search(req, CatalogueReader.demo().parts());
        CapacitorBank best = r.best();
        assertTrue(best != null, "a bank exists for 47 nF, 400 V, 100 kHz");
        assertTrue(Math.abs(best.deviation()) <= 0.02);
        assertTrue(best.feasible());
        // 400 V across 47 nF at 100 kHz makes 11.8 A, more than the 5 A given: the bank is checked at it
        assertEquals(400 * 2 * Math.PI * 100e3 * best.capacitance(), best.currentRms(), 0.01 * best.currentRms(), "ESL raises it slightly");
        for (int i = 1; i < r.banks().size(); i++) {
            assertTrue(BankSynthesis.ORDER.compare(r.banks().get(i - 1), r.banks().get(i)) < 0);
            assertFalse(r.verdicts().get(i).equals("best"));
        }
        assertTrue(best.warnings().stream().anyMatch(w -> w.contains("disagree")), best.warnings().toString());
    }

    @Test
    void partWithSrfBelowOperatingFrequencyIsRejected() {
        // Fact of the trade (common practice): above its SRF a capacitor behaves as an inductor.
        CapacitorPart big = CapacitorPart.builder("big", 1e-6, Dielectric.POLYPROPYLENE).tanDelta(3e-4, 1e3)
                .esl(100e-9).dcRating(1000).acRating(400.0).currentRating(30).build();
        assertEquals(503292.1, big.srf(), 1.0, "1/(2π√(100 nH·1 µF))");
        BankRequest req = BankRequest.of(1e-6, 0.02, BankStress.sinusoidal(10, 0, 0, 1e6));
        BankSearchResult r = BankSynthesis.search(req, List.of(big));
        assertNull(r.best());
        assertEquals("big", r.rejectedParts().get(0).partId());
        assertTrue(r.rejectedParts().get(0).reason().contains("SRF"), r.rejectedParts().get(0).reason());
        CapacitorBank direct = new BankEvaluator(req).evaluate(BankLayout.of(big, 1, 1));
        assertFalse(direct.feasible());
        assertEquals("SRF", direct.main().limitingCheck());
    }

    @Test
    void class2CeramicsAreRefusedByDefaultAndFlaggedWhenAllowed() {
        CapacitorPart x7r = CapacitorPart.builder("x", 10e-9, Dielectric.CLASS2_CERAMIC).tanDelta(0.025, 1e3)
                .esl(2e-9).dcRating(1000).acRating(300.0).currentRating(5).build();
        BankRequest req = BankRequest.of(10e-9, 0.02, BankStress.sinusoidal(50, 0, 0, 100e3));
        assertNull(BankSynthesis.search(req, List.of(x7r)).best());
        DeratingRules allow = new DeratingRules(0.8, 0.8, 0.8, 0.8, 0.5, 3, 0.15, true);
        CapacitorBank b = BankSynthesis.search(req.withDerating(allow), List.of(x7r)).best();
        assertTrue(b.warnings().stream().anyMatch(w -> w.contains("class-2")), b.warnings().toString());
    }

    @Test
    void fewerPartsThatFailAreExplained() {
        BankRequest req = BankRequest.of(47e-9, 0.02, BankStress.sinusoidal(1500, 0, 0, 100e3));
        BankSearchResult r = BankSynthesis.search(req, CatalogueReader.demo().parts());
        assertTrue(r.best() != null);
        assertFalse(r.nearMisses().isEmpty(), "a single 47 nF part cannot take 1.5 kV: a near miss names why");
        for (CapacitorBank miss : r.nearMisses()) {
            assertTrue(miss.partCount() < r.best().partCount());
            assertFalse(miss.feasible());
        }
    }

    @Test
    void eSeriesTemplateSearch() {
        BankRequest req = BankRequest.of(100e-9, 0.01, BankStress.sinusoidal(800, 0, 0, 50e3));
        BankSearchResult r = BankSynthesis.searchSeries(req, ESeries.E24, PartTemplate.named("pp-film-1600v"));
        assertTrue(r.best() != null);
        assertTrue(Math.abs(r.best().deviation()) <= 0.01);
    }

    private static List<String> describe(List<CapacitorBank> banks) {
        return banks.stream().map(b -> b.layout().describe() + String.format(" %.6e", b.capacitance())).toList();
    }
}
