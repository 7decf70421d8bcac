package org.tankwright.capacitors;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Bank arithmetic as exact identities of circuit theory (Kirchhoff's laws; series capacitors
 * add reciprocally, parallel ones add; a series string divides voltage inversely to C, parallel
 * branches divide current in proportion to C).
 */
class BankArithmeticTest {
    static final DeratingRules NO_IMBALANCE = new DeratingRules(0.8, 0.8, 0.8, 0.8, 0.5, 3.0, 0.0, false);

    static CapacitorPart ideal(String id, double c, double tol) {
        // nearly lossless, no ESL: the bank is a pure capacitance network
        return CapacitorPart.builder(id, c, Dielectric.POLYPROPYLENE).tolerance(tol).tanDelta(1e-9, 1e3).lossExponent(0)
                .esl(0).dcRating(2000).acRating(1000.0).currentRating(100).build();
    }

    static BankEvaluator evaluator(double target, double vrms, double irms) {
        BankRequest r = BankRequest.of(target, 0.02, BankStress.sinusoidal(vrms, irms, 0, 100e3)).withDerating(NO_IMBALANCE);
        return new BankEvaluator(r);
    }

    @Test
    void seriesAndParallelCapacitance() {
        CapacitorPart p = ideal("p", 10e-9, 0);
        assertEquals(4 * 10e-9 / 3, BankLayout.of(p, 3, 4).capacitance(), 0, "m·C/n");
        CapacitorPart t = ideal("t", 1e-9, 0);
        BankLayout par = new BankLayout(p, 2, 2, t, TrimPosition.PARALLEL);
        assertEquals(10e-9 + 1e-9, par.capacitance(), 1e-24, "parallel capacitances add");
        BankLayout ser = new BankLayout(p, 1, 1, ideal("s", 40e-9, 0), TrimPosition.SERIES);
        assertEquals(1 / (1 / 10e-9 + 1 / 40e-9), ser.capacitance(), 1e-24, "series: reciprocals add");
        assertEquals(5, par.partCount());
    }

    @Test
    void sharingWithoutToleranceIsEqual() {
        for (int n = 1; n <= 9; n++) {
            assertEquals(1.0 / n, BankEvaluator.seriesShare(n, 0), 1e-15);
            assertEquals(1.0 / n, BankEvaluator.parallelShare(n, 0), 1e-15);
        }
        assertEquals(1.0, BankEvaluator.seriesShare(1, 0.1), 0);
    }

    @Test
    void worstSeriesShareAtToleranceEdge() {
        // direct: worst part at C(1−t), the others at C(1+t); voltage ∝ 1/C
        double t = 0.05;
        int n = 4;
        double c = 1.0;
        double inv = 1 / (c * (1 - t)) + (n - 1) / (c * (1 + t));
        assertEquals((1 / (c * (1 - t))) / inv, BankEvaluator.seriesShare(n, t), 1e-15);
    }

    @Test
    void partVoltageAndCurrentSplitEvenly() {
        CapacitorPart p = ideal("p", 10e-9, 0);
        BankLayout l = BankLayout.of(p, 3, 4);
        double c = l.capacitance();
        double w = 2 * Math.PI * 100e3;
        double v = 300;
        double i = v * w * c; // consistent stress
        CapacitorBank b = evaluator(c, v, i).evaluate(l);
        assertEquals(v / 3, b.main().voltageRms(), 1e-6, "each of 3 series parts takes V/3");
        assertEquals(i / 4, b.main().currentRms(), 1e-9, "each of 4 strings carries I/4");
        assertEquals(b.main().voltageRms() * w * p.capacitance(), b.main().currentRms(), 1e-9, "part I = ωCV");
        assertEquals(Math.sqrt(2) * v / 3, b.main().peakVoltage(), 1e-6);
        assertTrue(b.feasible());
    }

    @Test
    void bankEsrAndEslScaleAsNOverM() {
        CapacitorPart p = CapacitorPart.builder("p", 10e-9, Dielectric.C0G).tanDelta(1e-3, 1e6).esl(5e-9).dcRating(1000)
                .acRating(300.0).currentRating(3).build();
        CapacitorBank b = evaluator(20e-9 / 3, 100, 0).evaluate(BankLayout.of(p, 3, 2));
        assertEquals(1.5 * p.esrAt(100e3), b.esr(), 1e-12, "ESR·n/m");
        assertEquals(1.5 * 5e-9, b.esl(), 1e-17, "ESL·n/m");
        assertEquals(p.srf(), b.srf(), 1e-3 * p.srf(), "identical parts: bank SRF equals part SRF");
    }

    @Test
    void trimCurrentsAndVoltagesObeyKirchhoff() {
        CapacitorPart p = ideal("p", 10e-9, 0);
        CapacitorPart t = ideal("t", 2.2e-9, 0);
        double w = 2 * Math.PI * 100e3;
        BankLayout par = new BankLayout(p, 2, 3, t, TrimPosition.PARALLEL);
        CapacitorBank bp = evaluator(par.capacitance(), 400, 0).evaluate(par);
        double iMain = bp.main().currentRms() * 3; // 3 strings
        assertEquals(bp.currentRms(), iMain + bp.trim().currentRms(), 1e-6 * bp.currentRms(), "KCL: branch currents add");
        assertEquals(400 * w * par.capacitance(), bp.currentRms(), 1e-6 * bp.currentRms(), "I = ωCV");
        BankLayout ser = new BankLayout(p, 2, 3, ideal("s", 100e-9, 0), TrimPosition.SERIES);
        CapacitorBank bs = evaluator(ser.capacitance(), 0, 2).evaluate(ser);
        assertEquals(bs.voltageRms(), bs.main().voltageRms() * 2 + bs.trim().voltageRms(), 1e-6 * bs.voltageRms(),
                "KVL: series voltages add");
    }

    @Test
    void paralleledStringsDeratedForImbalance() {
        CapacitorPart p = ideal("p", 10e-9, 0.05);
        BankRequest r = BankRequest.of(40e-9, 0.02, BankStress.sinusoidal(100, 0, 0, 100e3));
        CapacitorBank b = new BankEvaluator(r).evaluate(BankLayout.of(p, 1, 4));
        double share = BankEvaluator.parallelShare(4, 0.05) * (1 + r.derating().parallelImbalance());
        assertEquals(b.currentRms() * share, b.main().currentRms(), 1e-9);
        assertFalse(b.warnings().stream().noneMatch(w -> w.contains("layout and ESL")));
    }

    @Test
    void bankFeedsTheToleranceStudy() {
        CapacitorPart p = CapacitorPart.builder("c", 10e-9, Dielectric.C0G).tolerance(0.02).build();
        CapacitorPart t = CapacitorPart.builder("t", 1e-9, Dielectric.C0G).tolerance(0.10).build();
        BankLayout l = new BankLayout(p, 1, 2, t, TrimPosition.PARALLEL);
        CapacitorBank b = evaluator(21e-9, 100, 0).evaluate(l);
        // parallel: worst-case relative tolerance is the capacitance-weighted mean
        assertEquals((20e-9 * 0.02 + 1e-9 * 0.10) / 21e-9, b.tolerance(), 1e-15);
        var param = b.toleranceParameter("C1");
        assertEquals(b.capacitance(), param.nominal(), 0);
        assertEquals(b.tolerance(), param.spread().tolerance(), 0);
        assertEquals(30e-6, param.tempcoSpreadPerK(), 1e-18, "C0G: 0 ± 30 ppm/K (EIA class-1 code)");
    }

    @Test
    void eachLimitIsCheckedAndNamed() {
        // common-practice derating 0.8 on a 1000 V DC rating: DC + AC peak ≤ 800 V
        CapacitorPart p = CapacitorPart.builder("p", 10e-9, Dielectric.POLYPROPYLENE).tolerance(0).tanDelta(2e-4, 1e3)
                .lossExponent(0).esl(5e-9).dcRating(1000).acRating(400.0).currentRating(5).dvdtRating(300e6)
                .maxDissipation(1.0).build();
        BankLayout one = BankLayout.of(p, 1, 1);
        double f = 50e3;
        BankEvaluator dcOk = new BankEvaluator(BankRequest.of(10e-9, 0.02, BankStress.sinusoidal(300, 0, 300, f)));
        BankEvaluator dcHigh = new BankEvaluator(BankRequest.of(10e-9, 0.02, BankStress.sinusoidal(300, 0, 400, f)));
        CapacitorBank ok = dcOk.evaluate(one);
        assertEquals(300 + Math.sqrt(2) * ok.voltageRms(), ok.main().peakVoltage(), 1e-9, "AC and DC together");
        assertTrue(ok.main().peakVoltage() <= 800);
        assertTrue(ok.feasible(), ok.main().limitingCheck());
        CapacitorBank high = dcHigh.evaluate(one);
        assertFalse(high.feasible());
        assertTrue(high.main().limitingCheck().contains("voltage"), high.main().limitingCheck());
        // dV/dt of a sinusoid is 2πf·peak: 300 V rms at 50 kHz = 133 V/µs > 0.4 × 300 V/µs
        BankEvaluator fast = new BankEvaluator(BankRequest.of(10e-9, 0.02, BankStress.sinusoidal(300, 0, 0, f))
                .withDerating(new DeratingRules(1, 1, 1, 1, 0.4, 3, 0, false)));
        CapacitorBank b = fast.evaluate(one);
        assertEquals(2 * Math.PI * f * Math.sqrt(2) * b.voltageRms(), b.main().dvdt(), 1e-3);
        assertEquals("dV/dt", b.main().limitingCheck());
        // dissipation: I²·ESR against the part's limit (a lossy part, tan δ 1 %)
        CapacitorPart lossy = CapacitorPart.builder("l", 10e-9, Dielectric.POLYESTER).tolerance(0).tanDelta(0.01, 50e3)
                .esl(5e-9).dcRating(1000).acRating(400.0).currentRating(5).maxDissipation(0.1).build();
        BankEvaluator hot = new BankEvaluator(BankRequest.of(10e-9, 0.02, BankStress.sinusoidal(100, 0, 0, f)));
        CapacitorBank h = hot.evaluate(BankLayout.of(lossy, 1, 1));
        assertEquals(h.main().currentRms() * h.main().currentRms() * lossy.esrAt(f), h.main().dissipation(), 1e-15);
        assertEquals("dissipation", h.main().limitingCheck());
        assertFalse(h.feasible());
    }
}
