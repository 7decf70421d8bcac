package org.tankwright.analysis;

import org.tankwright.circuit.BridgeParts;
import org.tankwright.circuit.BridgeStress;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Load;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.SweepSeries;
import org.tankwright.circuit.Sweeps;
import org.tankwright.circuit.Topology;
import org.tankwright.design.Design;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.Tuner;
import org.tankwright.tuning.TuningResult;
import org.tankwright.units.Dimension;

import java.util.ArrayList;
import java.util.List;

/** The design's network: topology, source and load mapped onto the circuit engine, tuned and solved. */
final class NetworkStage {
    static final int FREQUENCY_POINTS = 401;

    private NetworkStage() {
    }

    static Topology topology(org.tankwright.design.Enums.Topology t) {
        return switch (t) {
            case SS -> Topology.SS;
            case SP -> Topology.SP;
            case PS -> Topology.PS;
            case PP -> Topology.PP;
            case SERIES -> Topology.SERIES_TANK;
            case PARALLEL -> Topology.PARALLEL_TANK;
        };
    }

    static Source source(org.tankwright.design.Source s) {
        Source out = switch (s.kind()) {
            case SINE -> Source.sine(s.vrms());
            case FULL_BRIDGE -> Source.fullBridge(s.vdc(), s.duty());
            case HALF_BRIDGE -> Source.halfBridge(s.vdc()).withDuty(s.duty());
            case CURRENT -> Source.current(s.irms());
        };
        return s.resistance() > 0 ? out.withResistance(s.resistance()) : out;
    }

    static Load load(org.tankwright.design.Load l) {
        if (l == null) {
            return null;
        }
        return switch (l.kind()) {
            case RESISTOR -> new Load.Resistor(l.resistance());
            case RECTIFIER_CAP -> new Load.Rectifier(Load.Filter.CAPACITIVE, l.resistance());
            case RECTIFIER_IND -> new Load.Rectifier(Load.Filter.INDUCTIVE, l.resistance());
            case BATTERY -> new Load.Battery(l.batteryVoltage());
        };
    }

    static BridgeParts bridgeParts(org.tankwright.design.Source s) {
        if (s.coss() == null || s.deadTime() == null || s.coss() <= 0 || s.deadTime() <= 0) {
            return BridgeParts.NONE;
        }
        return new BridgeParts(s.coss(), s.deadTime());
    }

    /** The circuit engine's description of the design with the given coil values and fixed capacitors (0 = tune). */
    static LinkDesign linkDesign(Design d, double frequency, LinkValues values, double c1, double c2) {
        Topology t = topology(d.compensation().topology());
        Double phase = d.compensation().targetPhase();
        return new LinkDesign(t, values, frequency, source(d.source()), t.isLink() ? load(d.load()) : null, c1, c2,
                0, 0, 0, 0, phase, bridgeParts(d.source()));
    }

    static TuningResult tune(LinkDesign ld) {
        return tune(ld, false);
    }

    /** Tunes and solves a single tank without the zero-phase scan (inside iterations). */
    static TuningResult tuneTankQuickly(LinkDesign ld) {
        try {
            return Tuner.tuneTankWithoutScan(ld);
        } catch (IllegalArgumentException e) {
            throw new AnalysisException("the network cannot be solved: " + e.getMessage(), false);
        }
    }

    /**
     * Tunes and solves a link or tank without the zero-phase scan and the efficiency optimum: the first
     * tuning, whose capacitors become real banks and are solved again with the scan.
     */
    static TuningResult tuneBeforeBanks(LinkDesign ld) {
        try {
            return Tuner.tuneWithoutScan(ld);
        } catch (IllegalArgumentException e) {
            throw new AnalysisException("the network cannot be solved: " + e.getMessage(), false);
        }
    }

    /** Tunes and solves; {@code thresholds} adds the costly search for the load and coupling at which the link bifurcates. */
    static TuningResult tune(LinkDesign ld, boolean thresholds) {
        try {
            return Tuner.tune(ld, thresholds);
        } catch (IllegalArgumentException e) {
            throw new AnalysisException("the network cannot be solved: " + e.getMessage(), false);
        }
    }

    /** The network report of a tuned design, with frequency, load and coupling sweeps when {@code full}. */
    static NetworkReport report(TuningResult t, boolean full) {
        OperatingPoint op = t.operatingPoint();
        LinkDesign ld = t.design();
        Topology top = ld.topology();
        double f = ld.frequency();
        Source src = ld.source();
        boolean link = top.isLink();
        List<Series> sweeps = new ArrayList<>();
        if (full) {
            PhasorSolver solver = t.newSolver();
            SweepSeries fs = Sweeps.frequency(solver, f / 2, 2 * f, FREQUENCY_POINTS, true);
            add(sweeps, fs, Sweeps.Z_ABS, "impedance-vs-frequency", "Input impedance magnitude", "|Z|", Dimension.RESISTANCE, f);
            add(sweeps, fs, Sweeps.PHASE, "phase-vs-frequency", "Input phase (positive inductive)", "phase", Dimension.ANGLE, f);
            add(sweeps, fs, Sweeps.P_IN, "input-power-vs-frequency", "Input power", "P in", Dimension.POWER, f);
            add(sweeps, fs, Sweeps.V_C1, "c1-voltage-vs-frequency", "C1 voltage (rms)", "V C1", Dimension.VOLTAGE, f);
            add(sweeps, fs, Sweeps.I_L1, "l1-current-vs-frequency", "L1 current (rms)", "I L1", Dimension.CURRENT, f);
            if (link) {
                add(sweeps, fs, Sweeps.P_OUT, "output-power-vs-frequency", "Output power", "P out", Dimension.POWER, f);
                add(sweeps, fs, Sweeps.EFFICIENCY, "efficiency-vs-frequency", "Efficiency", "η", Dimension.FRACTION, f);
                add(sweeps, fs, Sweeps.V_C2, "c2-voltage-vs-frequency", "C2 voltage (rms)", "V C2", Dimension.VOLTAGE, f);
                double rl = op.loadAc();
                if (Double.isFinite(rl) && rl > 0) {
                    PhasorSolver s2 = t.newSolver();
                    SweepSeries ls = Sweeps.load(s2, f, rl / 20, rl * 20, 201, true);
                    add(sweeps, ls, Sweeps.EFFICIENCY, "efficiency-vs-load", "Efficiency against load", "η", Dimension.FRACTION, rl);
                    add(sweeps, ls, Sweeps.P_OUT, "output-power-vs-load", "Output power against load", "P out", Dimension.POWER, rl);
                }
                double k = ld.coils().k();
                PhasorSolver s3 = t.newSolver();
                SweepSeries ks = Sweeps.coupling(s3, f, Math.max(0.005, Math.abs(k) * 0.25), Math.min(0.95, Math.abs(k) * 2.5), 201);
                add(sweeps, ks, Sweeps.P_OUT, "output-power-vs-coupling", "Output power against coupling", "P out", Dimension.POWER, Math.abs(k));
                add(sweeps, ks, Sweeps.EFFICIENCY, "efficiency-vs-coupling", "Efficiency against coupling", "η", Dimension.FRACTION, Math.abs(k));
            }
        }
        BridgeStress b = op.bridge();
        double turnOff = b == null ? Double.NaN : b.zvsMargin() + b.zvsRequired();
        double required = b == null || !b.partsGiven() ? Double.NaN : b.zvsRequired();
        double[] zp = t.zeroPhaseFrequencies();
        boolean bifurcated = zp != null && zp.length > 1;
        List<String> notes = new ArrayList<>(t.notes());
        notes.addAll(op.warnings());
        notes.add(op.verdict());
        double eMax = link && t.optimum() != null ? t.optimum().efficiency() : Double.NaN;
        double lOpt = link && t.optimum() != null ? t.optimum().load() : Double.NaN;
        return new NetworkReport(top == Topology.SERIES_TANK ? "series" : top == Topology.PARALLEL_TANK ? "parallel" : top.name(),
                f, t.c1(), link ? t.c2() : Double.NaN, t.c1Textbook(), link ? t.c2Textbook() : Double.NaN,
                ld.targetPhase(), src.isCurrentFed() ? Double.NaN : src.fundamentalRms(),
                src.isBridge() ? src.value() : Double.NaN, op.inputImpedance().re(), op.inputImpedance().im(),
                op.inputPhaseDeg(), op.pIn(), link ? op.pOut() : Double.NaN, link ? op.efficiency() : Double.NaN,
                op.sourceCurrent(), src.isBridge() ? op.dcCurrent() : Double.NaN, link ? op.outputVoltage() : Double.NaN,
                link ? op.loadAc() : Double.NaN, zp == null ? new double[0] : zp.clone(), bifurcated, eMax, lOpt,
                op.loadedQ(), turnOff, required, t.keyValues(), List.copyOf(sweeps), List.copyOf(notes));
    }

    private static void add(List<Series> out, SweepSeries s, String key, String id, String title, String yLabel,
                            Dimension yDim, double marker) {
        double[] y = s.get(key);
        if (y == null) {
            return;
        }
        String xName = s.xName();
        Dimension xDim = xName.startsWith("frequency") ? Dimension.FREQUENCY
                : xName.startsWith("coupling") ? Dimension.DIMENSIONLESS : Dimension.RESISTANCE;
        String xLabel = xDim == Dimension.FREQUENCY ? "frequency" : xDim == Dimension.DIMENSIONLESS ? "coupling k" : "load";
        out.add(new Series(id, title, xLabel, xDim, yLabel, yDim, s.x(), y, marker));
    }
}
