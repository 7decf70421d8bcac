package org.tankwright.analysis;

import org.tankwright.circuit.Load;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topologies;
import org.tankwright.coupling.CoupledCoils;
import org.tankwright.coupling.CouplingResult;
import org.tankwright.coupling.CouplingSweep;
import org.tankwright.design.Design;
import org.tankwright.design.Envelope;
import org.tankwright.tuning.ControlSpec;
import org.tankwright.tuning.CouplingSurface;
import org.tankwright.tuning.CouplingPoint;
import org.tankwright.tuning.EnvelopeResult;
import org.tankwright.tuning.EnvelopeSpec;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.OperatingEnvelope;
import org.tankwright.tuning.Stress;
import org.tankwright.tuning.TuningResult;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The operating envelope of a link: the coupling the placement range gives (from the coupling
 * model), the load, frequency and temperature ranges, a controller holding the output, and a
 * map of efficiency over distance × offset.
 */
final class EnvelopeStage {

    private EnvelopeStage() {
    }

    static boolean applies(Design d) {
        return d.isLink() && d.envelope() != null;
    }

    static EnvelopeReport link(Design d, TuningResult tuned, CouplingStage.Linked linked) {
        Envelope env = d.envelope();
        LinkDesign ld = tuned.design();
        OperatingPoint nominal = tuned.operatingPoint();
        double distance = d.placement().distance() == null ? Double.NaN : d.placement().distance();
        double dMin = env.distanceMin() != null ? env.distanceMin() : distance;
        double dMax = env.distanceMax() != null ? env.distanceMax() : distance;
        double offMax = env.offsetMax() != null ? env.offsetMax() : 0.0;
        CouplingSurface surface;
        CouplingStage.EnvelopeGrid grid = linked == null ? null : linked.grid();
        if (grid != null) {
            CouplingResult[][] rs = grid.results();
            CouplingPoint[][] table = new CouplingPoint[rs.length][rs[0].length];
            for (int i = 0; i < rs.length; i++) {
                for (int j = 0; j < rs[i].length; j++) {
                    table[i][j] = new CouplingPoint(rs[i][j].mutual(), rs[i][j].inductanceA(), rs[i][j].inductanceB());
                }
            }
            surface = CouplingSurface.table(table);
        } else {
            CouplingPoint p = new CouplingPoint(ld.coils().m(), ld.coils().l1(), ld.coils().l2());
            surface = (s, t) -> p;
        }
        Load load = ld.load();
        double nomLoad = load instanceof Load.Battery b ? b.volts() : load instanceof Load.Resistor r ? r.ohms()
                : ((Load.Rectifier) load).dcOhms();
        double loadMin = load instanceof Load.Battery ? nomLoad : env.loadMin() != null ? env.loadMin() : nomLoad;
        double loadMax = load instanceof Load.Battery ? nomLoad : env.loadMax() != null ? env.loadMax() : nomLoad;
        double f = ld.frequency();
        double fMin = env.frequencyMin() != null ? env.frequencyMin() : f;
        double fMax = env.frequencyMax() != null ? env.frequencyMax() : f;
        double tRef = d.primary().temperature();
        double tMin = env.temperatureMin() != null ? env.temperatureMin() : tRef;
        double tMax = env.temperatureMax() != null ? env.temperatureMax() : tRef;
        Source src = ld.source();
        boolean duty = src.kind() == Source.Kind.FULL_BRIDGE && src.duty() < 1.0;
        double target = d.load().targetPower() != null ? d.load().targetPower() : nominal.pOut();
        ControlSpec control = new ControlSpec(duty ? ControlSpec.Knob.DUTY : ControlSpec.Knob.AMPLITUDE,
                ControlSpec.Quantity.OUTPUT_POWER, target, src.value());
        EnvelopeSpec spec = EnvelopeSpec.of(surface, loadMin, loadMax, f, control).withFrequencyRange(fMin, fMax)
                .withTemperatureRange(tMin, tMax).withResistanceTemperature(tRef, EnvelopeSpec.COPPER_ALPHA).withGrid(5);
        EnvelopeResult r;
        try {
            r = OperatingEnvelope.evaluate(tuned, spec);
        } catch (IllegalArgumentException e) {
            throw new AnalysisException("the operating envelope cannot be solved: " + e.getMessage(), false);
        }
        List<WorstCase> worst = new ArrayList<>();
        for (Map.Entry<Stress, EnvelopeResult.Worst> e : r.worst().entrySet()) {
            EnvelopeResult.Worst w = e.getValue();
            String key = e.getKey().key();
            worst.add(new WorstCase(key, element(key), w.value(), dimension(key), at(w.at(), load)));
        }
        List<String> unreachable = new ArrayList<>();
        for (EnvelopeResult.Coordinates c : r.unreachable()) {
            unreachable.add(at(c, load));
        }
        double removed = Double.NaN;
        double open = Double.NaN;
        for (EnvelopeResult.Fault fault : r.faults()) {
            if (fault.name().startsWith("receiver removed")) {
                removed = fault.unbounded() ? Double.POSITIVE_INFINITY : fault.iL1Held();
            } else if (fault.name().startsWith("load open") || fault.name().startsWith("battery disconnected")) {
                open = fault.unbounded() ? Double.POSITIVE_INFINITY : fault.vOutHeld();
            }
        }
        EnvelopeReport.EnvelopeMap map = grid == null ? null : efficiencyMap(tuned, grid);
        return new EnvelopeReport(r.grid().size(), List.copyOf(worst), r.trip().primaryOverCurrent(),
                r.trip().outputOverVoltage(), List.copyOf(unreachable), removed, open, map);
    }

    /** Efficiency at fixed drive and capacitors over the envelope grid of distance × offset. */
    private static EnvelopeReport.EnvelopeMap efficiencyMap(TuningResult tuned, CouplingStage.EnvelopeGrid grid) {
        LinkDesign ld = tuned.design();
        CouplingResult[][] rs = grid.results();
        double[][] v = new double[rs.length][rs[0].length];
        PhasorSolver s = tuned.newSolver();
        int l1 = s.indexOf(Topologies.L1);
        int l2 = s.indexOf(Topologies.L2);
        for (int i = 0; i < rs.length; i++) {
            for (int j = 0; j < rs[i].length; j++) {
                CouplingResult c = rs[i][j];
                s.setInductance(l1, c.inductanceA());
                s.setInductance(l2, c.inductanceB());
                s.setMutual(0, c.mutual());
                OperatingPoint op = OperatingPoint.of(s, ld.topology(), ld.source(), ld.load(), ld.frequency(), ld.parts());
                v[i][j] = op.efficiency();
            }
        }
        return new EnvelopeReport.EnvelopeMap("efficiency at the nominal drive", grid.distances().clone(),
                grid.offsets().clone(), v);
    }

    /** A heater's envelope is its cold and hot points: the worst of each stress is the larger of the two. */
    static EnvelopeReport heater(HeaterStage.Heated h, Design d) {
        List<WorstCase> worst = new ArrayList<>();
        String coldAt = "cold point, " + Quantities.format(h.report().cold().temperature(), Dimension.TEMPERATURE, 3);
        String hotAt = "hot point, " + Quantities.format(h.report().hot().temperature(), Dimension.TEMPERATURE, 3)
                + " at " + Quantities.format(h.hot().design().frequency(), Dimension.FREQUENCY, 4);
        for (org.tankwright.circuit.ElementStress c : h.cold().operatingPoint().elements()) {
            if (!h.hot().operatingPoint().has(c.name()) || c.name().equals(Topologies.SOURCE)) {
                continue;
            }
            org.tankwright.circuit.ElementStress x = h.hot().operatingPoint().stress(c.name());
            String e = c.name().toLowerCase(java.util.Locale.ROOT);
            boolean hotV = x.vPeak() > c.vPeak();
            worst.add(new WorstCase("v_" + e + "_peak_V", c.name(), Math.max(c.vPeak(), x.vPeak()), Dimension.VOLTAGE,
                    hotV ? hotAt : coldAt));
            boolean hotI = x.iRms() > c.iRms();
            worst.add(new WorstCase("i_" + e + "_A", c.name(), Math.max(c.iRms(), x.iRms()), Dimension.CURRENT,
                    hotI ? hotAt : coldAt));
        }
        return new EnvelopeReport(2, List.copyOf(worst), Double.NaN, Double.NaN, List.of(), Double.NaN, Double.NaN, null);
    }

    static String element(String key) {
        String k = key.toLowerCase(java.util.Locale.ROOT);
        for (String e : new String[] {"c1", "c2", "l1", "l2"}) {
            if (k.contains("_" + e)) {
                return e.toUpperCase(java.util.Locale.ROOT);
            }
        }
        if (k.startsWith("switch") || k.startsWith("zvs")) {
            return "S";
        }
        if (k.startsWith("diode")) {
            return "D";
        }
        if (k.startsWith("v_out")) {
            return "RL";
        }
        return "";
    }

    static Dimension dimension(String key) {
        if (key.endsWith("_A")) {
            return Dimension.CURRENT;
        }
        if (key.endsWith("_V")) {
            return Dimension.VOLTAGE;
        }
        if (key.endsWith("_W")) {
            return Dimension.POWER;
        }
        return Dimension.DIMENSIONLESS;
    }

    private static String at(EnvelopeResult.Coordinates c, Load load) {
        String l = load instanceof Load.Battery ? Quantities.format(c.load(), Dimension.VOLTAGE, 3)
                : Quantities.format(c.load(), Dimension.RESISTANCE, 3);
        return "k " + Quantities.number(c.k(), 3) + ", load " + l + ", " + Quantities.format(c.frequency(), Dimension.FREQUENCY, 4)
                + ", " + Quantities.format(c.temperatureC(), Dimension.TEMPERATURE, 3);
    }
}
