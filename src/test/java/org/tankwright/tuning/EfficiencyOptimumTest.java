package org.tankwright.tuning;

import org.junit.jupiter.api.Test;
import org.tankwright.circuit.CapacitorSpec;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topologies;
import org.tankwright.circuit.Topology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** SS maximum efficiency and optimal load, closed forms against the solver. */
class EfficiencyOptimumTest {
    private static final double F = 100e3;
    private static final double W = 2 * Math.PI * F;

    private static PhasorSolver ss(LinkValues v, double rl) {
        return new PhasorSolver(Topologies.link(Topology.SS, v, CapacitorSpec.ideal(1 / (W * W * v.l1())),
                CapacitorSpec.ideal(1 / (W * W * v.l2())), Source.sine(50), rl));
    }

    @Test
    void seriesSeriesClosedFormsMatchSolver() {
        for (double k : new double[]{0.05, 0.15, 0.4}) {
            LinkValues v = LinkValues.fromCoupling(60e-6, 45e-6, k, 0.08, 0.05);
            double q1 = W * v.l1() / v.r1();
            double q2 = W * v.l2() / v.r2();
            EfficiencyOptimum closed = EfficiencyOptimum.seriesSeriesClosedForm(k, q1, q2, v.r2());
            EfficiencyOptimum num = EfficiencyOptimum.numerical(ss(v, 5), F);
            // Closed forms: ηmax = k²Q1Q2/(1+√(1+k²Q1Q2))², RL,opt = R2√(1+k²Q1Q2) (MODELS.md §3; e.g. the
            // standard SS link-efficiency result, Wang, Covic & Stielau 2004 analysis of the series-tuned secondary).
            assertEquals(closed.efficiency(), num.efficiency(), 1e-10, "ηmax, k = " + k);
            assertEquals(closed.load(), num.load(), 1e-4 * closed.load(), "RL,opt, k = " + k);
        }
    }

    @Test
    void seriesSeriesEfficiencyAtAnyLoadMatchesReflectedImpedanceFormula() {
        // η = ω²M²RL / ((R2+RL)(R1(R2+RL) + ω²M²)) for a tuned SS link (reflected resistance ω²M²/(R2+RL)).
        LinkValues v = LinkValues.fromCoupling(60e-6, 45e-6, 0.2, 0.1, 0.07);
        for (double rl : new double[]{0.5, 3, 20}) {
            PhasorSolver s = ss(v, rl);
            s.solve(F);
            int src = s.network().sourceIndex();
            double eta = s.loss(s.indexOf(Topologies.LOAD)) / s.sourceTerminalPower(src);
            double wm2 = W * W * v.m() * v.m();
            double expected = wm2 * rl / ((v.r2() + rl) * (v.r1() * (v.r2() + rl) + wm2));
            assertEquals(expected, eta, 1e-12, "RL = " + rl);
        }
    }

    @Test
    void numericalOptimumWorksForEveryTopology() {
        LinkValues v = LinkValues.fromCoupling(60e-6, 45e-6, 0.2, 0.1, 0.07);
        for (Topology t : new Topology[]{Topology.SP, Topology.PS, Topology.PP}) {
            LinkDesign d = LinkDesign.of(t, v, F, Source.sine(50), new org.tankwright.circuit.Load.Resistor(8));
            TuningResult r = Tuner.tune(d);
            // the optimum is at least as good as the nominal load and as its neighbours on the load axis
            assertTrue(r.optimum().efficiency() >= r.operatingPoint().efficiency() - 1e-12, t.name());
            PhasorSolver s = new PhasorSolver(Tuner.network(d, r.c1(), r.c2(), r.optimum().load() * 1.05));
            s.solve(F);
            double etaNear = s.loss(s.indexOf(Topologies.LOAD)) / s.sourceTerminalPower(s.network().sourceIndex());
            assertTrue(r.optimum().efficiency() >= etaNear, t + " optimum beats a 5 % larger load");
        }
    }
}
