package org.tankwright.circuit;

import org.junit.jupiter.api.Test;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.Tuner;
import org.tankwright.tuning.TuningResult;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Sweeps agree with the operating point they pass through and leave the solver as they found it. */
class SweepsTest {
    private static final double F = 100e3;

    private static TuningResult tuned() {
        LinkValues v = LinkValues.fromCoupling(80e-6, 60e-6, 0.2, 0.05, 0.04);
        return Tuner.tune(LinkDesign.of(Topology.SP, v, F, Source.sine(100), new Load.Resistor(30)), false);
    }

    @Test
    void frequencySweepPassesThroughTheOperatingPoint() {
        TuningResult r = tuned();
        SweepSeries sw = Sweeps.frequency(r.newSolver(), F / 2, 2 * F, 2001, true);
        int mid = 1000; // the geometric middle of [f/2, 2f] is f
        assertEquals(F, sw.x()[mid], 1e-9 * F);
        OperatingPoint op = r.operatingPoint();
        assertEquals(op.inputPhaseDeg(), sw.get(Sweeps.PHASE)[mid], 1e-6);
        assertEquals(op.pOut(), sw.get(Sweeps.P_OUT)[mid], 1e-9 * op.pOut());
        assertEquals(op.stress(Topologies.C2).vRms(), sw.get(Sweeps.V_C2)[mid], 1e-9 * op.stress(Topologies.C2).vRms());
        assertEquals(op.inputImpedance().abs(), sw.get(Sweeps.Z_ABS)[mid], 1e-9 * op.inputImpedance().abs());
        assertTrue(sw.toCsv().startsWith("frequency_Hz,z_abs_ohm,phase_deg"));
    }

    @Test
    void loadAndCouplingSweepsRestoreTheSolver() {
        TuningResult r = tuned();
        PhasorSolver s = r.newSolver();
        SweepSeries byLoad = Sweeps.load(s, F, 1, 1000, 50, true);
        SweepSeries byK = Sweeps.coupling(s, F, 0.05, 0.4, 36);
        assertEquals(50, byLoad.get(Sweeps.EFFICIENCY).length);
        assertEquals(36, byK.get(Sweeps.I_L1).length);
        s.solve(F);
        int ld = s.indexOf(Topologies.LOAD);
        assertEquals(r.operatingPoint().pOut(), s.loss(ld), 1e-9 * r.operatingPoint().pOut());
        // efficiency along the load axis never exceeds the optimum found over the load
        for (double eta : byLoad.get(Sweeps.EFFICIENCY)) {
            assertTrue(eta <= r.optimum().efficiency() + 1e-12);
        }
    }
}
