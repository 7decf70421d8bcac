package org.tankwright.circuit;

import org.tankwright.tuning.ControlSpec;
import org.tankwright.tuning.CouplingPath;
import org.tankwright.tuning.CouplingPoint;
import org.tankwright.tuning.EnvelopeSpec;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.OperatingEnvelope;
import org.tankwright.tuning.Tuner;
import org.tankwright.tuning.TuningResult;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;

/**
 * Benchmark (not a test): one phasor solve, one operating point, a 2,000-point frequency sweep,
 * the full tune of each invented scenario, and an operating envelope. Run with
 * {@code java -cp target/classes:target/test-classes:<deps> org.tankwright.circuit.CircuitBenchmark}.
 */
public final class CircuitBenchmark {
    private static volatile double sink;

    private CircuitBenchmark() {
    }

    public static void main(String[] args) {
        double f = 85e3;
        double w = 2 * Math.PI * f;
        LinkValues v = LinkValues.fromCoupling(120e-6, 90e-6, 0.2, 0.08, 0.06);
        Network ss = Topologies.link(Topology.SS, v, new CapacitorSpec(1 / (w * w * v.l1()), 0.01, 5e-9),
                new CapacitorSpec(1 / (w * w * v.l2()), 0.01, 5e-9), Source.fullBridge(400, 1), 12);
        PhasorSolver s = new PhasorSolver(ss);
        report("phasor solve (SS, 6 elements)", 200_000, () -> {
            s.solve(f);
            return s.currentRe(0);
        });
        Load.Rectifier rect = new Load.Rectifier(Load.Filter.CAPACITIVE, 15);
        report("operating point (SS, rectifier load, all stresses)", 100_000,
                () -> OperatingPoint.of(s, Topology.SS, Source.fullBridge(400, 1), rect, f, BridgeParts.NONE).pOut());
        Load.Battery bat = new Load.Battery(350);
        report("operating point (SS, battery sink, iterated)", 5_000,
                () -> OperatingPoint.of(s, Topology.SS, Source.fullBridge(400, 1), bat, f, BridgeParts.NONE).pOut());
        report("frequency sweep, 2,000 points", 300,
                () -> Sweeps.frequency(s, f / 2, 2 * f, 2000, true).x()[1999]);

        List<LinkDesign> presets = List.of(
                LinkDesign.of(Topology.SS, v, f, Source.fullBridge(400, 1), rect),
                LinkDesign.of(Topology.SP, v, f, Source.sine(200), new Load.Rectifier(Load.Filter.INDUCTIVE, 60)),
                LinkDesign.of(Topology.PS, v, f, Source.current(20), new Load.Resistor(10)),
                LinkDesign.of(Topology.PP, v, f, Source.current(20), new Load.Resistor(60)),
                LinkDesign.of(Topology.SS, v, f, Source.fullBridge(400, 1), bat),
                LinkDesign.of(Topology.SERIES_TANK, LinkValues.tank(2e-6, 0.02), 150e3, Source.halfBridge(300), null),
                LinkDesign.of(Topology.PARALLEL_TANK, LinkValues.tank(1e-6, 0.01), 200e3, Source.current(50), null));
        for (LinkDesign d : presets) {
            String name = d.topology() + " " + (d.load() == null ? "tank" : d.load().getClass().getSimpleName());
            report("tune " + name + " (no bifurcation thresholds)", 50, () -> Tuner.tune(d, false).c1());
            report("tune " + name + " (full)", 5, () -> Tuner.tune(d).c1());
        }
        TuningResult tuned = Tuner.tune(presets.get(0), false);
        CouplingPath gap = CouplingPath.table(List.of(CouplingPoint.ofK(0.2, 120e-6, 90e-6),
                CouplingPoint.ofK(0.12, 115e-6, 87e-6)));
        EnvelopeSpec spec = EnvelopeSpec.of(gap, 8, 40, f, new ControlSpec(ControlSpec.Knob.AMPLITUDE,
                ControlSpec.Quantity.OUTPUT_POWER, 3000, 800)).withFrequencyRange(80e3, 90e3).withTemperatureRange(20, 100);
        report("operating envelope 5^4 grid + interior search", 5, () -> OperatingEnvelope.evaluate(tuned, spec).grid().size());
    }

    private static void report(String what, int reps, Supplier<Number> work) {
        for (int i = 0; i < Math.max(3, reps / 5); i++) {
            sink += work.get().doubleValue();
        }
        double[] t = new double[7];
        for (int k = 0; k < t.length; k++) {
            long t0 = System.nanoTime();
            for (int i = 0; i < reps; i++) {
                sink += work.get().doubleValue();
            }
            t[k] = (System.nanoTime() - t0) / 1e3 / reps;
        }
        Arrays.sort(t);
        double us = t[t.length / 2];
        System.out.printf(Locale.ROOT, "%-62s %12s%n", what, us < 1000 ? String.format(Locale.ROOT, "%.3f µs", us)
                : String.format(Locale.ROOT, "%.3f ms", us / 1000));
    }
}
