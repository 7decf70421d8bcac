package org.tankwright.circuit;

import org.junit.jupiter.api.Test;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.Tuner;
import org.tankwright.tuning.TuningResult;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A battery as a voltage sink behind a capacitive-filter rectifier (fundamental (2√2/π)·Vbat, Steigerwald 1988). */
class BatteryLoadTest {
    private static final double F = 85e3;
    private static final double W = 2 * Math.PI * F;
    private static final LinkValues V = LinkValues.fromCoupling(100e-6, 80e-6, 0.2, 0.05, 0.05);

    private static Network ss(Source s) {
        return Topologies.link(Topology.SS, V, CapacitorSpec.ideal(1 / (W * W * V.l1())),
                CapacitorSpec.ideal(1 / (W * W * V.l2())), s, 1);
    }

    @Test
    void converges() {
        Load.Battery bat = new Load.Battery(48);
        OperatingPoint op = OperatingPoint.solve(ss(Source.sine(60)), Topology.SS, Source.sine(60), bat, F, BridgeParts.NONE);
        double vFund = 2 * Math.sqrt(2) / Math.PI * 48;
        assertEquals(vFund, op.stress(Topologies.LOAD).vRms(), 1e-9 * vFund, "load fundamental = (2√2/π)·Vbat");
        assertEquals(48, op.outputVoltage(), 0);
        // the sink takes Vbat·Idc = the fundamental power (lossless bridge, Steigerwald 1988 waveforms)
        assertEquals(op.pOut(), op.outputVoltage() * op.outputCurrent(), 1e-9 * op.pOut());
        // the battery is not a fixed resistor: doubling the drive changes its equivalent resistance
        OperatingPoint op2 = OperatingPoint.solve(ss(Source.sine(120)), Topology.SS, Source.sine(120), bat, F, BridgeParts.NONE);
        assertTrue(Math.abs(op2.loadAc() / op.loadAc() - 1) > 0.1);
        assertEquals(vFund, op2.stress(Topologies.LOAD).vRms(), 1e-9 * vFund);
    }

    @Test
    void seriesSeriesGivesLoadIndependentCurrent() {
        // SS at resonance with a lossless primary: I2 = V1/(ωM) whatever the load (common practice, SS as a
        // constant-current output), so P = (2√2/π)·Vbat·V1/(ωM).
        LinkValues lossless1 = new LinkValues(V.l1(), V.l2(), V.m(), 0, 0.05);
        Network net = Topologies.link(Topology.SS, lossless1, CapacitorSpec.ideal(1 / (W * W * V.l1())),
                CapacitorSpec.ideal(1 / (W * W * V.l2())), Source.sine(30), 1);
        for (double vb : new double[]{24, 48, 96}) {
            OperatingPoint op = OperatingPoint.solve(net, Topology.SS, Source.sine(30), new Load.Battery(vb), F, BridgeParts.NONE);
            double i2 = 30 / (W * V.m());
            assertEquals(i2, op.stress(Topologies.L2).iRms(), 1e-9 * i2);
            assertEquals(2 * Math.sqrt(2) / Math.PI * vb * i2, op.pOut(), 1e-8 * op.pOut());
        }
    }

    @Test
    void noChargeWhenTheOpenCircuitVoltageIsTooLow() {
        OperatingPoint op = OperatingPoint.solve(ss(Source.sine(1)), Topology.SS, Source.sine(1), new Load.Battery(400), F,
                BridgeParts.NONE);
        assertEquals(0, op.pOut(), 0);
        assertTrue(Double.isInfinite(op.loadAc()));
        assertFalse(op.warnings().isEmpty());
    }

    @Test
    void tunerConvergesWithABatteryOnEveryTopology() {
        for (Topology t : new Topology[]{Topology.SS, Topology.SP, Topology.PS, Topology.PP}) {
            Source src = t.primarySeries() ? Source.sine(80) : Source.current(4);
            TuningResult r = Tuner.tune(LinkDesign.of(t, V, F, src, new Load.Battery(36)), false);
            if (r.operatingPoint().pOut() > 0) {
                assertEquals(0, r.operatingPoint().inputPhaseDeg(), 1e-6, t + ": zero phase with the battery's equivalent");
            }
        }
    }
}
