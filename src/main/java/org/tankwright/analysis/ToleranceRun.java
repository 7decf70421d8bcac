package org.tankwright.analysis;

import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Load;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Topologies;
import org.tankwright.design.Design;
import org.tankwright.design.Tolerances;
import org.tankwright.tolerance.CancelToken;
import org.tankwright.tolerance.Limit;
import org.tankwright.tolerance.Parameter;
import org.tankwright.tolerance.ProgressListener;
import org.tankwright.tolerance.StudyResult;
import org.tankwright.tolerance.TemperatureRange;
import org.tankwright.tolerance.ToleranceStudy;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.TuningResult;

import java.util.ArrayList;
import java.util.List;

/**
 * The tolerance study of an analysed design: Monte Carlo over the capacitors (tolerance and
 * temperature drift), the inductances, the coupling and the load, with the drive and the tuned
 * capacitor values held, each sample solved at the design frequency by the same network solver.
 */
public final class ToleranceRun {
    /** The outcomes of every study. */
    public static final String FREQUENCY = "resonant_frequency_Hz";
    /** Output power of a link; input power of a single tank or heater. */
    public static final String POWER = "output_power_W";
    public static final String EFFICIENCY = "efficiency";
    public static final String C1_VOLTAGE = "c1_voltage_peak_V";
    /** Temperature drift of polypropylene film, about −200 ppm/K (from memory), used when the bank's part is unknown. */
    static final double FILM_TEMPCO_PPM = -200;

    private ToleranceRun() {
    }

    /** Runs the study the design describes (its {@code tolerances} section, or the defaults). */
    public static StudyResult run(AnalysisResult base, CancelToken cancel, ProgressListener progress) {
        Tolerances t = tolerances(base.design());
        return run(base, t.samples(), t.seed(), cancel, progress);
    }

    /** The design's tolerance settings, or the defaults when it has none. */
    public static Tolerances tolerances(Design d) {
        return d.tolerances() != null ? d.tolerances()
                : new Tolerances(0.05, 0.03, 0.05, 0.10, 30, 2000, 1, 0.03, 0.20);
    }

    /** Runs the study with a given number of samples and seed. */
    public static StudyResult run(AnalysisResult base, int samples, long seed, CancelToken cancel,
                                  ProgressListener progress) {
        Design d = base.design();
        Tolerances t = tolerances(d);
        NetworkReport n = base.network();
        boolean link = d.isLink();
        double l1 = link ? base.coupling().l1() : base.heater() != null ? base.heater().cold().inductance()
                : base.coils().get(0).inductance();
        double r1 = base.heater() != null ? base.heater().cold().workResistance() + base.coils().get(0).resistanceAc()
                : base.coils().get(0).resistanceAc();
        double l2 = link ? base.coupling().l2() : 0;
        double r2 = link ? base.coils().get(1).resistanceAc() : 0;
        double m = link ? base.coupling().mutual() : 0;
        LinkValues values = link ? new LinkValues(l1, l2, m, r1, r2) : LinkValues.tank(l1, r1);
        double c1 = n.c1();
        double c2 = link ? n.c2() : 0;
        LinkDesign ld = NetworkStage.linkDesign(d, d.frequency(), values, c1, c2);
        TuningResult tuned = NetworkStage.tune(ld);
        Load load = ld.load();
        double k = link ? m / Math.sqrt(l1 * l2) : 0;

        List<Parameter> params = new ArrayList<>();
        params.add(Parameter.normal("C1", c1, t.capacitance()).withTempcoPpm(FILM_TEMPCO_PPM, 0));
        params.add(link ? Parameter.normal("C2", c2, t.capacitance()).withTempcoPpm(FILM_TEMPCO_PPM, 0) : Parameter.fixed("C2", 0));
        params.add(Parameter.normal("L1", l1, t.inductance()));
        params.add(link ? Parameter.normal("L2", l2, t.inductance()) : Parameter.fixed("L2", 0));
        params.add(link ? Parameter.normal("k", k, t.coupling()) : Parameter.fixed("k", 0));
        boolean variableLoad = load != null && !(load instanceof Load.Battery);
        params.add(variableLoad ? Parameter.normal("load", 1.0, t.load()) : Parameter.fixed("load", 1.0));

        OperatingPoint nominal = tuned.operatingPoint();
        double f0 = 1 / (2 * Math.PI * Math.sqrt(l1 * c1));
        double pNom = link ? nominal.pOut() : nominal.pIn();
        List<Limit> limits = new ArrayList<>();
        limits.add(new Limit(FREQUENCY, f0 * (1 - t.frequencyLimit()), f0 * (1 + t.frequencyLimit())));
        limits.add(new Limit(POWER, pNom * (1 - t.powerLimit()), pNom * (1 + t.powerLimit())));
        for (ElementStress s : base.stresses()) {
            if (s.id().equals("C1") && Double.isFinite(s.voltageRating())) {
                limits.add(new Limit(C1_VOLTAGE, 0, s.voltageRating()));
            }
        }
        ThreadLocal<PhasorSolver> solvers = ThreadLocal.withInitial(tuned::newSolver);
        List<String> outcomes = link ? List.of(FREQUENCY, POWER, EFFICIENCY, C1_VOLTAGE) : List.of(FREQUENCY, POWER, C1_VOLTAGE);
        ToleranceStudy study = ToleranceStudy.of(params, outcomes, (p, out) -> {
            PhasorSolver s = solvers.get();
            s.setCapacitance(s.indexOf(Topologies.C1), p[0]);
            s.setInductance(s.indexOf(Topologies.L1), p[2]);
            if (link) {
                s.setCapacitance(s.indexOf(Topologies.C2), p[1]);
                s.setInductance(s.indexOf(Topologies.L2), p[3]);
                s.setMutual(0, p[4] * Math.sqrt(p[2] * p[3]));
            }
            OperatingPoint op = OperatingPoint.of(s, ld.topology(), ld.source(), scaled(load, p[5]), ld.frequency(), ld.parts());
            out[0] = 1 / (2 * Math.PI * Math.sqrt(p[2] * p[0]));
            out[1] = link ? op.pOut() : op.pIn();
            if (link) {
                out[2] = op.efficiency();
            }
            out[link ? 3 : 2] = op.stress(Topologies.C1).vPeak();
        }).withSamples(samples).withSeed(seed).withLimits(limits)
                .withTemperature(new TemperatureRange(25 - t.temperatureSwing(), 25 + t.temperatureSwing(), 25));
        return study.run(cancel, progress);
    }

    private static Load scaled(Load load, double factor) {
        if (load instanceof Load.Resistor r) {
            return new Load.Resistor(r.ohms() * factor);
        }
        if (load instanceof Load.Rectifier r) {
            return new Load.Rectifier(r.kind(), r.dcOhms() * factor);
        }
        return load;
    }
}
