package org.tankwright.tuning;

import org.junit.jupiter.api.Test;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Load;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topologies;
import org.tankwright.circuit.Topology;

import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The operating envelope: control holds the target, worst points, interior search, trip levels, faults. */
class OperatingEnvelopeTest {
    private static final double F = 85e3;
    private static final LinkValues NOMINAL = LinkValues.fromCoupling(120e-6, 90e-6, 0.25, 0.08, 0.06);
    /** An invented gap table: k falls and the self inductances drop as the coils separate. */
    private static final CouplingPath GAP = CouplingPath.table(List.of(
            CouplingPoint.ofK(0.25, 120e-6, 90e-6), CouplingPoint.ofK(0.18, 116e-6, 87e-6),
            CouplingPoint.ofK(0.12, 114e-6, 86e-6)));

    private static TuningResult tuned(Topology t, Source src, Load load) {
        return Tuner.tune(LinkDesign.of(t, NOMINAL, F, src, load).withTargetPhase(0), false);
    }

    @Test
    void busVoltageControlHoldsOutputPowerWherever_reachable() {
        TuningResult r = tuned(Topology.SS, Source.fullBridge(400, 1), new Load.Rectifier(Load.Filter.CAPACITIVE, 30));
        EnvelopeSpec spec = EnvelopeSpec.of(GAP, 15, 60, F, new ControlSpec(ControlSpec.Knob.AMPLITUDE,
                ControlSpec.Quantity.OUTPUT_POWER, 3000, 800)).withTemperatureRange(20, 100);
        EnvelopeResult e = OperatingEnvelope.evaluate(r, spec);
        assertEquals(5 * 5 * 5, e.grid().size());
        for (EnvelopeResult.Point p : e.grid()) {
            if (p.reachable()) {
                assertEquals(3000, p.output(), 1e-6, "the held output power");
                assertTrue(p.amplitude() <= 800 + 1e-9);
            } else {
                assertEquals(800, p.amplitude(), 0, "an unreachable point sits at the limit");
                assertTrue(p.output() < 3000);
            }
        }
        // the worst values bound every grid point
        for (Stress st : new Stress[]{Stress.I_L1, Stress.V_C1_PEAK, Stress.V_C2_PEAK, Stress.I_L2}) {
            double w = e.worst().get(st).value();
            assertTrue(w > 0);
        }
        assertTrue(e.trip().primaryOverCurrent() > e.worst().get(Stress.I_L1).value());
        assertEquals(1.1 * e.worst().get(Stress.I_L1).value(), e.trip().primaryOverCurrent(), 1e-9, "10 % margin");
        // holding the output power, the hottest coils (largest resistance, 1 + α·80 K) lose the most
        assertEquals(100, e.worst().get(Stress.LOSSES).at().temperatureC(), 1e-9);
    }

    @Test
    void interiorSearchFindsAPeakBetweenGridPoints() {
        // Target out of reach everywhere: the bridge sits at its limit and the primary current peaks near the
        // series resonance, between the three frequency grid points; a dense scan is the reference.
        TuningResult r = tuned(Topology.SS, Source.sine(50), new Load.Resistor(8));
        EnvelopeSpec spec = EnvelopeSpec.of(CouplingPath.fixed(CouplingPoint.ofK(0.05, 120e-6, 90e-6)), 8, 8, F,
                new ControlSpec(ControlSpec.Knob.AMPLITUDE, ControlSpec.Quantity.OUTPUT_POWER, 1e9, 50))
                .withFrequencyRange(0.8 * F, 1.15 * F).withGrid(3);
        EnvelopeResult e = OperatingEnvelope.evaluate(r, spec);
        OperatingEnvelope env = OperatingEnvelope.of(r, spec);
        double dense = 0;
        for (int i = 0; i <= 4000; i++) {
            double f = 0.8 * F + 0.35 * F * i / 4000;
            dense = Math.max(dense, env.controlledAt(0, 8, f, 20).op().stress(Topologies.L1).iRms());
        }
        EnvelopeResult.Worst w = e.worst().get(Stress.I_L1);
        double gridMax = 0;
        for (double f : new double[]{0.8 * F, 0.975 * F, 1.15 * F}) {
            gridMax = Math.max(gridMax, env.controlledAt(0, 8, f, 20).op().stress(Topologies.L1).iRms());
        }
        assertTrue(w.value() > gridMax * 1.01, "the interior search beats the grid");
        assertEquals(dense, w.value(), 1e-3 * dense, "and reaches the dense-scan maximum");
        assertTrue(w.at().frequency() > 0.8 * F && w.at().frequency() < 1.15 * F);
    }

    @Test
    void randomInteriorPointsNeverExceedTheWorst() {
        TuningResult r = tuned(Topology.SP, Source.sine(100), new Load.Resistor(40));
        EnvelopeSpec spec = EnvelopeSpec.of(GAP, 20, 80, F, new ControlSpec(ControlSpec.Knob.AMPLITUDE,
                ControlSpec.Quantity.OUTPUT_VOLTAGE, 150, 400)).withFrequencyRange(0.97 * F, 1.03 * F);
        EnvelopeResult e = OperatingEnvelope.evaluate(r, spec);
        OperatingEnvelope env = OperatingEnvelope.of(r, spec);
        Random rnd = new Random(7);
        for (int i = 0; i < 300; i++) {
            double s = rnd.nextDouble();
            double load = 20 * Math.pow(4, rnd.nextDouble());
            double f = F * (0.97 + 0.06 * rnd.nextDouble());
            OperatingEnvelope.Controlled x = env.controlledAt(s, load, f, 20);
            for (Stress st : new Stress[]{Stress.I_L1, Stress.I_L2, Stress.V_C1_PEAK, Stress.V_C2_PEAK}) {
                assertTrue(st.of(x.op()) <= e.worst().get(st).value() * (1 + 2e-3),
                        st + " at a random interior point stays within the reported worst");
            }
            if (x.reachable()) {
                assertEquals(150, x.op().outputVoltage(), 1e-9 * 150);
            }
        }
    }

    @Test
    void removedReceiverAndOpenLoadInSsAreCaught() {
        // SS with the receiver removed: the primary current is limited only by R1 (MODELS.md §3)
        // (L1 fixed here, so the primary stays tuned when the receiver goes)
        TuningResult r = tuned(Topology.SS, Source.sine(100), new Load.Resistor(10));
        EnvelopeSpec spec = EnvelopeSpec.of(CouplingPath.fixed(CouplingPoint.ofK(0.25, 120e-6, 90e-6)), 5, 20, F,
                new ControlSpec(ControlSpec.Knob.AMPLITUDE, ControlSpec.Quantity.OUTPUT_POWER, 500, 300));
        EnvelopeResult e = OperatingEnvelope.evaluate(r, spec);
        EnvelopeResult.Fault removed = e.faults().get(0);
        assertTrue(removed.name().contains("removed"));
        assertTrue(removed.detected());
        OperatingEnvelope.Controlled nominal = OperatingEnvelope.of(r, spec).controlledAt(0, 10, F, 20);
        assertEquals(nominal.amplitude() / NOMINAL.r1(), removed.iL1Held(), 1e-9 * removed.iL1Held(), "I1 = V/R1");
        assertEquals(300 / NOMINAL.r1(), removed.iL1Limit(), 1e-9 * removed.iL1Limit(), "controller at its limit");
        // an open load in SS: no secondary current, the primary again limited by R1, the output voltage ωM·I1
        EnvelopeResult.Fault open = e.faults().get(1);
        assertEquals("load open", open.name());
        assertTrue(open.vOutHeld() > e.trip().outputOverVoltage() && open.detected());
    }

    @Test
    void spOpenLoadIsBenignAndDutyControlWorks() {
        TuningResult r = tuned(Topology.SP, Source.fullBridge(300, 1), new Load.Rectifier(Load.Filter.INDUCTIVE, 40));
        EnvelopeSpec spec = EnvelopeSpec.of(GAP, 30, 60, F, new ControlSpec(ControlSpec.Knob.DUTY,
                ControlSpec.Quantity.OUTPUT_VOLTAGE, 200, 0));
        EnvelopeResult e = OperatingEnvelope.evaluate(r, spec);
        for (EnvelopeResult.Point p : e.grid()) {
            if (p.reachable()) {
                assertEquals(200, p.output(), 1e-9 * 200);
                assertTrue(p.duty() > 0 && p.duty() <= 1);
            }
        }
        EnvelopeResult.Fault open = e.faults().stream().filter(f -> f.name().equals("load open")).findFirst().orElseThrow();
        // SP driven by a voltage has a nearly load-independent output voltage (common practice): an open load
        // barely moves it, so the output over-voltage trip does not fire and the result says so
        assertTrue(open.vOutHeld() < 1.05 * 200, "SP open load: the output voltage stays near its set value");
        assertFalse(open.detected());
        assertTrue(e.warnings().stream().anyMatch(w -> w.contains("load open")));
    }

    @Test
    void batteryChargingEnvelope() {
        TuningResult r = tuned(Topology.SS, Source.fullBridge(400, 1), new Load.Battery(300));
        EnvelopeSpec spec = EnvelopeSpec.of(GAP, 250, 400, F, new ControlSpec(ControlSpec.Knob.AMPLITUDE,
                ControlSpec.Quantity.OUTPUT_POWER, 2000, 800)).withGrid(3);
        EnvelopeResult e = OperatingEnvelope.evaluate(r, spec);
        for (EnvelopeResult.Point p : e.grid()) {
            if (p.reachable()) {
                assertEquals(2000, p.output(), 1e-6 * 2000);
            }
        }
        assertFalse(e.keyValues().isEmpty());
    }

    @Test
    void gapByOffsetSurface() {
        // an invented 3 × 3 table: rows = gap (small to large), columns = offset (0 to largest)
        CouplingPoint[][] table = {
                {CouplingPoint.ofK(0.30, 124e-6, 92e-6), CouplingPoint.ofK(0.24, 123e-6, 91e-6), CouplingPoint.ofK(0.15, 122e-6, 91e-6)},
                {CouplingPoint.ofK(0.25, 120e-6, 90e-6), CouplingPoint.ofK(0.20, 120e-6, 90e-6), CouplingPoint.ofK(0.12, 119e-6, 89e-6)},
                {CouplingPoint.ofK(0.18, 117e-6, 88e-6), CouplingPoint.ofK(0.14, 117e-6, 88e-6), CouplingPoint.ofK(0.08, 116e-6, 87e-6)}};
        CouplingSurface surface = CouplingSurface.table(table);
        assertEquals(table[2][1].m(), surface.at(1, 0.5).m(), 1e-18, "the table's own points are returned exactly");
        assertEquals((table[0][0].l1() + table[1][1].l1() + table[0][1].l1() + table[1][0].l1()) / 4,
                surface.at(0.25, 0.25).l1(), 1e-15, "bilinear in the cell");
        TuningResult r = tuned(Topology.SS, Source.fullBridge(400, 1), new Load.Battery(300));
        EnvelopeSpec spec = EnvelopeSpec.of(surface, 300, 300, F, new ControlSpec(ControlSpec.Knob.AMPLITUDE,
                ControlSpec.Quantity.OUTPUT_POWER, 2000, 800)).withGrid(4);
        EnvelopeResult e = OperatingEnvelope.evaluate(r, spec);
        assertEquals(16, e.grid().size(), "4 gaps × 4 offsets");
        // SS holding power into a fixed battery voltage: I2 is fixed by the power, and the secondary loop gives
        // |I1| = |R2 + R_ac|·I2/(ωM) with the tuned secondary, so I1 is largest at the weakest coupling (common
        // practice, from the SS equations): the largest gap and offset
        EnvelopeResult.Worst w = e.worst().get(Stress.I_L1);
        assertEquals(1, w.at().s(), 1e-9);
        assertEquals(1, w.at().t(), 1e-9);
    }
}
