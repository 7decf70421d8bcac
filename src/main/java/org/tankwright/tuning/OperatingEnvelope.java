package org.tankwright.tuning;

import org.tankwright.circuit.Load;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topologies;
import org.tankwright.tuning.EnvelopeResult.Coordinates;
import org.tankwright.tuning.EnvelopeResult.Fault;
import org.tankwright.tuning.EnvelopeResult.Point;
import org.tankwright.tuning.EnvelopeResult.TripLevels;
import org.tankwright.tuning.EnvelopeResult.Worst;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Walks a tuned link over its operating envelope with the capacitors fixed as tuned: at every
 * point it solves the control setting (bus voltage, source amplitude or duty) that holds the
 * target output, notes where the target cannot be reached (the controller then sits at its limit),
 * finds the worst value of each {@link Stress} on the grid and then refines it by a pattern search
 * through the interior of the envelope, derives the trip levels, and checks the fault cases.
 * Coordinates are normalised to [0, 1] per axis (coupling s and t, load, frequency, temperature);
 * the load axis is logarithmic.
 */
public final class OperatingEnvelope {
    private static final int REFINE_HALVINGS = 7;

    private final EnvelopeSpec spec;
    private final LinkDesign d;
    private final PhasorSolver s;
    private final int l1;
    private final int l2;
    private final int load;

    private OperatingEnvelope(TuningResult tuned, EnvelopeSpec spec) {
        this.spec = spec;
        this.d = tuned.design();
        if (!d.topology().isLink()) {
            throw new IllegalArgumentException("the operating envelope is for two-coil links, not " + d.topology());
        }
        if (spec.control().knob() == ControlSpec.Knob.DUTY && d.source().kind() != Source.Kind.FULL_BRIDGE) {
            throw new IllegalArgumentException("duty control needs a full bridge, the design has " + d.source().kind());
        }
        if (d.load() instanceof Load.Battery && spec.control().quantity() == ControlSpec.Quantity.OUTPUT_VOLTAGE) {
            throw new IllegalArgumentException("a battery fixes the output voltage: hold the output power instead");
        }
        this.s = new PhasorSolver(Tuner.network(d, tuned.c1(), tuned.c2(), 1));
        this.l1 = s.indexOf(Topologies.L1);
        this.l2 = s.indexOf(Topologies.L2);
        this.load = s.indexOf(Topologies.LOAD);
    }

    /** Evaluates the envelope of a tuned link. */
    public static EnvelopeResult evaluate(TuningResult tuned, EnvelopeSpec spec) {
        return new OperatingEnvelope(tuned, spec).run();
    }

    /** Prepares the envelope of a tuned link (for {@link #run} or single points via {@link #controlledAt}). */
    public static OperatingEnvelope of(TuningResult tuned, EnvelopeSpec spec) {
        return new OperatingEnvelope(tuned, spec);
    }

    /**
     * A solved, controlled point: the coordinates, the control setting (source amplitude and
     * duty), whether the target is reached there, and the operating point.
     */
    public record Controlled(Coordinates at, double amplitude, double duty, boolean reachable, OperatingPoint op) {
    }

    /**
     * The controlled operating point at coupling-path position s in [0, 1], a load in the design
     * load's unit, frequency f (Hz) and coil temperature (°C).
     */
    public Controlled controlledAt(double sPath, double loadValue, double f, double temperatureC) {
        return controlledAt(sPath, 0, loadValue, f, temperatureC);
    }

    /** The same on a two-axis coupling range: s and t in [0, 1]. */
    public Controlled controlledAt(double sAxis, double tAxis, double loadValue, double f, double temperatureC) {
        CouplingPoint cp = spec.coupling().at(sAxis, tAxis);
        Coordinates c = new Coordinates(sAxis, tAxis, cp.k(), cp.m(), cp.l1(), cp.l2(), loadValue, f, temperatureC);
        return control(c, loadAt(loadValue));
    }

    /** Walks the whole envelope. */
    public EnvelopeResult run() {
        int n = spec.gridPerAxis();
        int nc = n;
        int nl = spec.loadMin() == spec.loadMax() ? 1 : n;
        int nf = spec.frequencyMin() == spec.frequencyMax() ? 1 : n;
        int nt = spec.temperatureMinC() == spec.temperatureMaxC() ? 1 : n;
        int no = spec.twoCouplingAxes() ? n : 1;
        List<Point> grid = new ArrayList<>();
        List<Coordinates> unreachable = new ArrayList<>();
        Map<Stress, double[]> bestU = new EnumMap<>(Stress.class);
        Map<Stress, Controlled> best = new EnumMap<>(Stress.class);
        List<String> warnings = new ArrayList<>();
        for (int a = 0; a < nc; a++) {
            for (int b = 0; b < nl; b++) {
                if (Thread.currentThread().isInterrupted()) {
                    // the caller (a window recomputing on each edit) no longer wants this result
                    throw new java.util.concurrent.CancellationException("envelope solve interrupted");
                }
                for (int c = 0; c < nf; c++) {
                    for (int e = 0; e < nt; e++) {
                        for (int o = 0; o < no; o++) {
                            double[] u = {frac(a, nc), frac(b, nl), frac(c, nf), frac(e, nt), frac(o, no)};
                            Controlled x = control(u);
                            grid.add(new Point(x.at(), x.amplitude(), x.duty(), x.reachable(), held(x.op())));
                            if (!x.reachable()) {
                                unreachable.add(x.at());
                            }
                            consider(x, u, best, bestU);
                        }
                    }
                }
            }
        }
        boolean[] free = {true, nl > 1, nf > 1, nt > 1, no > 1};
        for (Stress st : best.keySet().toArray(new Stress[0])) {
            refine(st, bestU.get(st), free, best, bestU);
        }
        Map<Stress, Worst> worst = new EnumMap<>(Stress.class);
        for (Map.Entry<Stress, Controlled> e : best.entrySet()) {
            Controlled x = e.getValue();
            worst.put(e.getKey(), new Worst(e.getKey(), e.getKey().of(x.op()), x.at(), x.amplitude(), x.duty(), x.reachable()));
        }
        if (!unreachable.isEmpty()) {
            warnings.add(unreachable.size() + " of " + grid.size() + " grid points cannot reach the control target; "
                    + "the controller sits at its limit there");
        }
        double m = spec.tripMargin();
        TripLevels trip = new TripLevels((1 + m) * worst.get(Stress.I_L1).value(), (1 + m) * worst.get(Stress.V_OUT).value(),
                m, "worst value over the envelope (grid and interior search) raised by the margin");
        List<Fault> faults = faults(trip, warnings);
        return new EnvelopeResult(grid, worst, unreachable, trip, faults, warnings);
    }

    private static double frac(int i, int n) {
        return n == 1 ? 0 : (double) i / (n - 1);
    }

    private void consider(Controlled x, double[] u, Map<Stress, Controlled> best, Map<Stress, double[]> bestU) {
        for (Stress st : Stress.values()) {
            if (!st.appliesTo(x.op())) {
                continue;
            }
            Controlled old = best.get(st);
            if (old == null || st.badness(st.of(x.op())) > st.badness(st.of(old.op()))) {
                best.put(st, x);
                bestU.put(st, u.clone());
            }
        }
    }

    /** Pattern search from the worst grid point through the interior, step halving. */
    private void refine(Stress st, double[] start, boolean[] free, Map<Stress, Controlled> best,
                        Map<Stress, double[]> bestU) {
        double[] u = start.clone();
        double step = 1.0 / (spec.gridPerAxis() - 1);
        double current = st.badness(st.of(best.get(st).op()));
        for (int h = 0; h < REFINE_HALVINGS; h++) {
            boolean moved = true;
            while (moved) {
                moved = false;
                for (int dim = 0; dim < free.length; dim++) {
                    if (!free[dim]) {
                        continue;
                    }
                    for (int sign = -1; sign <= 1; sign += 2) {
                        double[] v = u.clone();
                        v[dim] = Math.max(0, Math.min(1, u[dim] + sign * step));
                        if (v[dim] == u[dim]) {
                            continue;
                        }
                        Controlled x = control(v);
                        if (!st.appliesTo(x.op())) {
                            continue;
                        }
                        double bad = st.badness(st.of(x.op()));
                        if (bad > current * (1 + 1e-12) + 1e-300) {
                            current = bad;
                            u = v;
                            best.put(st, x);
                            bestU.put(st, v);
                            moved = true;
                        }
                    }
                }
            }
            step /= 2;
        }
    }

    private Coordinates coordinates(double[] u) {
        CouplingPoint cp = spec.coupling().at(u[0], u[4]);
        double lo = spec.loadMin();
        double hi = spec.loadMax();
        double ld = lo == hi ? lo : lo * Math.pow(hi / lo, u[1]);
        double f = spec.frequencyMin() + (spec.frequencyMax() - spec.frequencyMin()) * u[2];
        double t = spec.temperatureMinC() + (spec.temperatureMaxC() - spec.temperatureMinC()) * u[3];
        return new Coordinates(u[0], u[4], cp.k(), cp.m(), cp.l1(), cp.l2(), ld, f, t);
    }

    private Load loadAt(double x) {
        Load base = d.load();
        if (base instanceof Load.Resistor) {
            return new Load.Resistor(x);
        }
        if (base instanceof Load.Rectifier r) {
            return new Load.Rectifier(r.kind(), x);
        }
        return new Load.Battery(x);
    }

    /** Sets the network to the coordinates (coils, coupling, resistances at temperature). */
    private void place(Coordinates c) {
        double scale = 1 + spec.alpha() * (c.temperatureC() - spec.referenceC());
        s.setInductance(l1, c.l1());
        s.setInductance(l2, c.l2());
        s.setMutual(0, c.m());
        s.setResistance(l1, d.coils().r1() * scale);
        s.setResistance(l2, d.coils().r2() * scale);
    }

    private Source sourceAt(double amplitude, double duty) {
        return d.source().withValue(amplitude).withDuty(duty);
    }

    private OperatingPoint solveAt(Coordinates c, Load ld, double amplitude, double duty) {
        place(c);
        return OperatingPoint.of(s, d.topology(), sourceAt(amplitude, duty), ld, c.frequency(), d.parts());
    }

    private double held(OperatingPoint op) {
        return spec.control().quantity() == ControlSpec.Quantity.OUTPUT_POWER ? op.pOut() : op.outputVoltage();
    }

    /** Solves the control setting at normalised coordinates u. */
    private Controlled control(double[] u) {
        Coordinates c = coordinates(u);
        return control(c, loadAt(c.load()));
    }

    private Controlled control(Coordinates c, Load ld) {
        ControlSpec cs = spec.control();
        boolean duty = cs.knob() == ControlSpec.Knob.DUTY;
        double aMax = duty ? d.source().value() : cs.amplitudeMax();
        double dMax = duty ? 1 : d.source().duty();
        OperatingPoint top = solveAt(c, ld, aMax, dMax);
        double yTop = held(top);
        double target = cs.target();
        if (!(yTop >= target * (1 - 1e-12))) {
            return new Controlled(c, aMax, dMax, false, top);
        }
        // fraction of the largest fundamental that holds the target
        double rho;
        if (ld.isLinear()) {
            rho = cs.quantity() == ControlSpec.Quantity.OUTPUT_POWER ? Math.sqrt(target / yTop) : target / yTop;
        } else {
            double lo = 0;
            double hi = 1;
            for (int it = 0; it < 60; it++) {
                double mid = (lo + hi) / 2;
                OperatingPoint op = solveFraction(c, ld, aMax, dMax, duty, mid);
                if (held(op) < target) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            rho = hi;
        }
        double a = duty ? aMax : aMax * rho;
        double dd = duty ? fractionToDuty(rho) : dMax;
        return new Controlled(c, a, dd, true, solveAt(c, ld, a, dd));
    }

    private OperatingPoint solveFraction(Coordinates c, Load ld, double aMax, double dMax, boolean duty, double rho) {
        return duty ? solveAt(c, ld, aMax, fractionToDuty(rho)) : solveAt(c, ld, aMax * rho, dMax);
    }

    /** The duty whose fundamental is the fraction rho of the square wave's: sin(πD/2) = rho. */
    private static double fractionToDuty(double rho) {
        return Math.max(1e-9, 2 / Math.PI * Math.asin(Math.min(1, rho)));
    }

    private List<Fault> faults(TripLevels trip, List<String> warnings) {
        CouplingPoint p0 = spec.coupling().at(0, 0);
        Coordinates nominal = new Coordinates(0, 0, p0.k(), p0.m(), p0.l1(), p0.l2(), nominalLoad(), d.frequency(),
                spec.referenceC());
        Controlled held = control(nominal, loadAt(nominal.load()));
        List<Fault> out = new ArrayList<>();
        Coordinates removed = weakest();
        out.add(fault("receiver removed (M = 0)", removed, loadAt(nominal.load()), held, trip));
        if (!(d.load() instanceof Load.Battery)) {
            out.add(fault("load open", nominal, open(), held, trip));
            out.add(fault("load short", nominal, loadAt(0), held, trip));
        } else {
            out.add(fault("battery disconnected", nominal, new Load.Resistor(Double.POSITIVE_INFINITY), held, trip));
        }
        for (Fault f : out) {
            if (!f.detected()) {
                warnings.add("fault '" + f.name() + "' is not caught by the primary over-current or output over-voltage "
                        + "trip; it needs its own protection or it is benign at these levels");
            }
        }
        return out;
    }

    private double nominalLoad() {
        Load l = d.load();
        if (l instanceof Load.Resistor r) {
            return r.ohms();
        }
        if (l instanceof Load.Rectifier r) {
            return r.dcOhms();
        }
        return ((Load.Battery) l).volts();
    }

    private Load open() {
        return d.load() instanceof Load.Resistor ? new Load.Resistor(Double.POSITIVE_INFINITY)
                : new Load.Rectifier(((Load.Rectifier) d.load()).kind(), Double.POSITIVE_INFINITY);
    }

    /** The coupling-path state with the smallest |M|, with M set to 0: the receiver taken away. */
    private Coordinates weakest() {
        CouplingPoint w = spec.coupling().at(0, 0);
        double ws = 0;
        double wt = 0;
        int nt = spec.twoCouplingAxes() ? 20 : 0;
        for (int i = 0; i <= 20; i++) {
            for (int j = 0; j <= nt; j++) {
                CouplingPoint p = spec.coupling().at(i / 20.0, nt == 0 ? 0 : j / 20.0);
                if (Math.abs(p.m()) < Math.abs(w.m())) {
                    w = p;
                    ws = i / 20.0;
                    wt = nt == 0 ? 0 : j / 20.0;
                }
            }
        }
        return new Coordinates(ws, wt, 0, 0, w.l1(), w.l2(), nominalLoad(), d.frequency(), spec.referenceC());
    }

    private Fault fault(String name, Coordinates at, Load ld, Controlled held, TripLevels trip) {
        try {
            OperatingPoint h = solveAt(at, ld, held.amplitude(), held.duty());
            Controlled lim = control(at, ld);
            OperatingPoint l = lim.op();
            boolean caught = Math.max(h.stress(Topologies.L1).iRms(), l.stress(Topologies.L1).iRms()) > trip.primaryOverCurrent()
                    || Math.max(h.outputVoltage(), l.outputVoltage()) > trip.outputOverVoltage();
            return new Fault(name, h.stress(Topologies.L1).iRms(), h.outputVoltage(), h.stress(Topologies.C1).vPeak(),
                    l.stress(Topologies.L1).iRms(), l.outputVoltage(), l.stress(Topologies.C1).vPeak(), caught, false);
        } catch (IllegalStateException singular) {
            return new Fault(name, 0, 0, 0, 0, 0, 0, true, true);
        }
    }
}
