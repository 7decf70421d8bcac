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
import org.tankwright.tuning.CouplingPath;
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
import java.util.Comparator;
import java.util.List;
import java.util.Map;

/**
 * The operating envelope of a link: the coupling the placement range gives (from the coupling
 * model), the load, frequency and temperature ranges, a controller holding the output, and a
 * map of efficiency over distance × offset.
 */
final class EnvelopeStage {
    static final int MAP_POINTS = 7;

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
        CoupledCoils model = linked.model();
        CouplingPath path;
        List<CouplingPoint> points = new ArrayList<>();
        if (model != null && Double.isFinite(dMin) && (dMax > dMin || offMax > 0)) {
            for (double dd : CouplingSweep.linspace(dMin, dMax, dMax > dMin ? 4 : 1)) {
                for (double off : CouplingSweep.linspace(0, offMax, offMax > 0 ? 4 : 1)) {
                    CouplingResult r = model.at(dd, off, 0);
                    if (Math.abs(r.mutual()) > 0) {
                        points.add(new CouplingPoint(Math.abs(r.mutual()), r.inductanceA(), r.inductanceB()));
                    }
                }
            }
            points.sort(Comparator.comparingDouble(CouplingPoint::k));
            path = points.size() > 1 ? CouplingPath.table(points) : CouplingPath.fixed(nominalPoint(ld));
        } else {
            path = CouplingPath.fixed(nominalPoint(ld));
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
        EnvelopeSpec spec = new EnvelopeSpec(path, loadMin, loadMax, fMin, fMax, tMin, tMax, EnvelopeSpec.COPPER_ALPHA,
                tRef, control, 5, EnvelopeSpec.DEFAULT_TRIP_MARGIN);
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
        EnvelopeReport.EnvelopeMap map = model == null || !(dMax > dMin || offMax > 0) ? null
                : efficiencyMap(tuned, model, dMin, dMax, offMax);
        return new EnvelopeReport(r.grid().size(), List.copyOf(worst), r.trip().primaryOverCurrent(),
                r.trip().outputOverVoltage(), List.copyOf(unreachable), removed, open, map);
    }

    private static CouplingPoint nominalPoint(LinkDesign ld) {
        return new CouplingPoint(ld.coils().m(), ld.coils().l1(), ld.coils().l2());
    }

    /** Efficiency at fixed drive and capacitors over distance × offset. */
    private static EnvelopeReport.EnvelopeMap efficiencyMap(TuningResult tuned, CoupledCoils model, double dMin,
                                                           double dMax, double offMax) {
        LinkDesign ld = tuned.design();
        double[] ds = CouplingSweep.linspace(dMin, dMax, MAP_POINTS);
        double[] os = CouplingSweep.linspace(0, Math.max(offMax, 1e-6), MAP_POINTS);
        double[][] v = new double[ds.length][os.length];
        PhasorSolver s = tuned.newSolver();
        int l1 = s.indexOf(Topologies.L1);
        int l2 = s.indexOf(Topologies.L2);
        for (int i = 0; i < ds.length; i++) {
            for (int j = 0; j < os.length; j++) {
                CouplingResult c = model.at(ds[i], os[j], 0);
                s.setInductance(l1, c.inductanceA());
                s.setInductance(l2, c.inductanceB());
                s.setMutual(0, c.mutual());
                OperatingPoint op = OperatingPoint.of(s, ld.topology(), ld.source(), ld.load(), ld.frequency(), ld.parts());
                v[i][j] = op.efficiency();
            }
        }
        return new EnvelopeReport.EnvelopeMap("efficiency at the nominal drive", ds, os, v);
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
