package org.tankwright.tuning;

import org.tankwright.circuit.BatterySolver;
import org.tankwright.circuit.CapacitorSpec;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Load;
import org.tankwright.circuit.Network;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Topologies;
import org.tankwright.circuit.Topology;

import java.util.ArrayList;
import java.util.List;

/**
 * Sizes the compensation of a {@link LinkDesign} and solves its operating point: textbook C1 and
 * C2, C1 moved alone (with every loss) to the target phase, the operating point, every zero-phase
 * frequency in [f/2, 2f], the load and coupling at which the design bifurcates, and the maximum
 * efficiency with its load.
 */
public final class Tuner {
    private static final int BATTERY_PASSES = 30;

    private Tuner() {
    }

    /** Tunes and solves; the whole result, ready for every face (with the bifurcation thresholds). */
    public static TuningResult tune(LinkDesign d) {
        return tune(d, true);
    }

    /**
     * Tunes and solves; {@code thresholds} = false skips the search for the load and coupling at
     * which the design bifurcates (the costly part, a few hundred thousand solves) for fast recomputes.
     */
    public static TuningResult tune(LinkDesign d, boolean thresholds) {
        return d.topology().isLink() ? tuneLink(d, thresholds, true) : tuneTank(d);
    }

    /**
     * Tunes and solves a link or a tank without the scan for every zero-phase frequency, the efficiency
     * optimum and the bifurcation thresholds: for a first tuning whose capacitors are replaced by real
     * parts and solved again (that second solve makes the scan).
     */
    public static TuningResult tuneWithoutScan(LinkDesign d) {
        return d.topology().isLink() ? tuneLink(d, false, false) : tuneTank(d, false);
    }

    /** The network of a design with the given capacitors (the load as its AC resistance, 1 Ω for a battery until solved). */
    public static Network network(LinkDesign d, double c1, double c2, double rLoad) {
        CapacitorSpec cs1 = new CapacitorSpec(c1, d.esr1(), d.esl1());
        if (!d.topology().isLink()) {
            return Topologies.tank(d.topology(), d.coils().l1(), d.coils().r1(), cs1, d.source());
        }
        return Topologies.link(d.topology(), d.coils(), cs1, new CapacitorSpec(c2, d.esr2(), d.esl2()), d.source(), rLoad);
    }

    /**
     * Tunes and solves a single tank without the scan for every zero-phase frequency: for loops that
     * re-tune many times (a heater's current and permeability iteration) and only need the last scan.
     */
    public static TuningResult tuneTankWithoutScan(LinkDesign d) {
        if (d.topology().isLink()) {
            throw new IllegalArgumentException("tuneTankWithoutScan takes a single tank, not " + d.topology());
        }
        return tuneTank(d, false);
    }

    private static TuningResult tuneTank(LinkDesign d) {
        return tuneTank(d, true);
    }

    private static TuningResult tuneTank(LinkDesign d, boolean scan) {
        double w = 2 * Math.PI * d.frequency();
        double cText = TextbookCompensation.c1(d.topology(), d.coils(), w, 0);
        double c = d.c1() > 0 ? d.c1() : cText;
        PhasorSolver s = new PhasorSolver(network(d, c, 0, 0));
        PhaseSolve phase = null;
        List<String> notes = new ArrayList<>();
        if (d.c1() <= 0) {
            // The capacitor that gives the target phase with the coil's resistance (a low-Q parallel tank's
            // zero-phase point lies below 1/(2π√(LC))); a bridge-driven tank aims a little inductive.
            phase = ZeroPhaseSolver.solve(s, d.frequency(), d.targetPhase(), cText);
            c = phase.c1();
            if (!phase.reached()) {
                notes.add("target phase " + d.targetPhase() + "° not reachable by C alone: " + phase.note());
            }
        }
        OperatingPoint op = OperatingPoint.of(s, d.topology(), d.source(), d.load(), d.frequency(), d.parts());
        double[] zpf = scan ? Bifurcation.zeroPhaseFrequencies(s, d.frequency()) : new double[0];
        return new TuningResult(d, c, 0, cText, 0, phase, op, zpf, null, null, null, null, notes);
    }

    private static TuningResult tuneLink(LinkDesign d, boolean thresholds, boolean scan) {
        double f = d.frequency();
        double w = 2 * Math.PI * f;
        LinkValues v = d.coils();
        Topology t = d.topology();
        List<String> notes = new ArrayList<>();
        double c2Text = TextbookCompensation.c2(v.l2(), w);
        double c2 = d.c2() > 0 ? d.c2() : TextbookCompensation.c2(v.l2() + d.esl2(), w);
        Load load = d.load();
        boolean battery = load instanceof Load.Battery;
        double rNom = battery ? w * v.l2() : load.acResistance();
        double c1Text = textbook(t, v, w, rNom);
        double c1 = d.c1() > 0 ? d.c1() : c1Text;
        PhasorSolver s = new PhasorSolver(network(d, c1, c2, battery ? 1 : rNom));
        int ld = s.indexOf(Topologies.LOAD);
        int c1i = s.indexOf(Topologies.C1);
        PhaseSolve phase = null;
        int passes = battery ? BATTERY_PASSES : 1;
        for (int pass = 0; pass < passes; pass++) {
            if (battery) {
                double r = BatterySolver.solve(s, ld, f, ((Load.Battery) load).fundamentalRms());
                double change = Math.abs(r - rNom) / Math.max(r, 1e-300);
                rNom = r;
                c1Text = textbook(t, v, w, Double.isInfinite(rNom) ? Double.MAX_VALUE : rNom);
                if (pass > 0 && change < 1e-10) {
                    break;
                }
                if (d.c1() <= 0 && phase == null) {
                    s.setCapacitance(c1i, c1Text);
                }
            }
            if (d.c1() <= 0) {
                phase = ZeroPhaseSolver.solve(s, f, d.targetPhase(), phase == null ? c1Text : phase.c1());
                c1 = phase.c1();
            }
        }
        if (phase != null && !phase.reached()) {
            notes.add("target phase " + d.targetPhase() + "° not reachable by C1 alone: " + phase.note());
        }
        OperatingPoint op = OperatingPoint.of(s, t, d.source(), load, f, d.parts());
        double[] zpf = scan ? Bifurcation.zeroPhaseFrequencies(s, f) : new double[0];
        EfficiencyOptimum optimum = scan ? EfficiencyOptimum.numerical(s, f) : null;
        EfficiencyOptimum closed = null;
        if (t == Topology.SS && v.r1() > 0 && v.r2() > 0) {
            closed = EfficiencyOptimum.seriesSeriesClosedForm(v.k(), w * v.l1() / v.r1(), w * v.l2() / v.r2(), v.r2());
        }
        double x2 = w * v.l2();
        double[] loads = thresholds ? Bifurcation.loadThresholds(s, f, x2 * 1e-3, x2 * 1e3) : null;
        double[] couplings = thresholds ? Bifurcation.couplingThresholds(s, f, 0.01, 0.95) : null;
        if (zpf.length > 1) {
            notes.add("bifurcated: " + zpf.length + " zero-phase frequencies between f/2 and 2f");
        }
        return new TuningResult(d, c1, c2, c1Text, c2Text, phase, op, zpf, optimum, closed, loads, couplings, notes);
    }

    private static double textbook(Topology t, LinkValues v, double w, double rLoad) {
        double c = TextbookCompensation.c1(t, v, w, rLoad);
        if (!(c > 0) || Double.isInfinite(c)) {
            throw new IllegalArgumentException("the textbook C1 of " + t + " is not defined at load " + rLoad
                    + " Ω (PS needs a load resistance above 0, PP a finite one)");
        }
        return c;
    }
}
