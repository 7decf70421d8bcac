package org.tankwright.cli;

import org.tankwright.circuit.BridgeParts;
import org.tankwright.circuit.ElementStress;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Load;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topology;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.Tuner;
import org.tankwright.tuning.TuningResult;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintStream;
import java.util.Locale;
import java.util.concurrent.Callable;

/** {@code tankwright tune}: sizes the compensation of a link or a tank from entered L, R, M values and prints its operating point. */
@Command(name = "tune", mixinStandardHelpOptions = true,
        description = {"Size the compensation capacitors of a two-coil link (SS, SP, PS, PP) or a single series or "
                + "parallel tank from entered values, and print the operating point: impedance, phase, power, "
                + "efficiency and every coil's and capacitor's voltage and current.",
                "Caution: resonant capacitors carry many times the supply voltage; treat every node as live "
                        + "and follow local codes and licensed practice."})
public final class TuneCommand implements Callable<Integer> {
    @Option(names = "--topology", required = true, description = "SS, SP, PS, PP, series or parallel")
    String topology;
    @Option(names = "--l1", description = "primary self inductance") String l1;
    @Option(names = "--l2", description = "secondary self inductance") String l2;
    @Option(names = "--m", description = "mutual inductance") String m;
    @Option(names = "--k", description = "coupling factor (instead of --m)") String k;
    @Option(names = "--r1", description = "primary coil series AC resistance") String r1;
    @Option(names = "--r2", description = "secondary coil series AC resistance") String r2;
    @Option(names = "--l", description = "tank coil inductance (series or parallel tank)") String l;
    @Option(names = "--r", description = "tank coil series resistance") String r;
    @Option(names = "--c", description = "tank capacitance") String c;
    @Option(names = "--f0", description = "tank resonant frequency (instead of --c)") String f0;
    @Option(names = "--load", description = "AC ohms at the secondary terminals, or DC ohms with --rectifier") String load;
    @Option(names = "--rectifier", description = "cap or ind: bridge rectifier with capacitive or inductive filter") String rectifier;
    @Option(names = "--battery", description = "battery charge voltage behind a capacitive-filter rectifier (instead of --load)") String battery;
    @Option(names = "--frequency", description = "drive frequency (a tank defaults to its resonant frequency)") String frequency;
    @Option(names = "--vin", description = "rms sine source voltage") String vin;
    @Option(names = "--iin", description = "rms source current (current-fed)") String iin;
    @Option(names = "--vdc", description = "DC bus voltage of a bridge") String vdc;
    @Option(names = "--bridge", description = "full or half (with --vdc; default full)") String bridge;
    @Option(names = "--duty", description = "phase-shift duty D of a full bridge, (0, 1] (default 1)") String duty;
    @Option(names = "--source-resistance", description = "series resistance of a voltage source") String sourceR;
    @Option(names = "--target-phase", description = "target input phase in degrees, positive inductive "
            + "(default 10 with a bridge, 0 otherwise)") String targetPhase;
    @Option(names = "--c1", description = "fixed primary capacitance (else sized)") String c1;
    @Option(names = "--c2", description = "fixed secondary capacitance (else sized)") String c2;
    @Option(names = "--esr1", description = "primary capacitor bank ESR") String esr1;
    @Option(names = "--esr2", description = "secondary capacitor bank ESR") String esr2;
    @Option(names = "--esl1", description = "primary capacitor bank ESL") String esl1;
    @Option(names = "--esl2", description = "secondary capacitor bank ESL") String esl2;
    @Option(names = "--coss", description = "output capacitance of one bridge switch, for the ZVS margin") String coss;
    @Option(names = "--dead-time", description = "bridge dead time, for the ZVS margin") String deadTime;
    @Option(names = "--json", description = "print JSON (SI values) instead of a table") boolean json;

    PrintStream out = System.out;

    @Override
    public Integer call() {
        Topology t;
        try {
            t = Topology.parse(topology);
        } catch (IllegalArgumentException e) {
            throw usage("--topology: " + e.getMessage());
        }
        LinkDesign design = t.isLink() ? linkDesign(t) : tankDesign(t);
        TuningResult result;
        try {
            result = Tuner.tune(design);
        } catch (IllegalStateException e) {
            throw new ExitCodes.UserError(ExitCodes.REFUSED, "computation refused: " + e.getMessage());
        } catch (IllegalArgumentException e) {
            throw invalid(e.getMessage());
        }
        if (json) {
            CliSupport.printJson(result.keyValues(), out);
        } else {
            printTable(result);
        }
        return ExitCodes.OK;
    }

    private LinkDesign linkDesign(Topology t) {
        for (String[] pair : new String[][]{{"--l", l}, {"--r", r}, {"--c", c}, {"--f0", f0}}) {
            if (pair[1] != null) {
                throw usage(pair[0] + " is for a single tank (--topology series|parallel); a link takes --l1 --l2 ...");
            }
        }
        double vl1 = required("--l1", l1, Dimension.INDUCTANCE);
        double vl2 = required("--l2", l2, Dimension.INDUCTANCE);
        double vr1 = positiveOrZero("--r1", r1, Dimension.RESISTANCE);
        double vr2 = positiveOrZero("--r2", r2, Dimension.RESISTANCE);
        if ((m == null) == (k == null)) {
            throw usage("give exactly one of --m (mutual inductance) or --k (coupling factor)");
        }
        LinkValues v;
        try {
            if (k != null) {
                double kk = CliSupport.quantity("--k", k, Dimension.DIMENSIONLESS);
                v = LinkValues.fromCoupling(vl1, vl2, kk, vr1, vr2);
            } else {
                v = new LinkValues(vl1, vl2, CliSupport.quantity("--m", m, Dimension.INDUCTANCE), vr1, vr2);
            }
        } catch (IllegalArgumentException e) {
            throw invalid(e.getMessage());
        }
        double f = required("--frequency", frequency, Dimension.FREQUENCY);
        return finish(t, v, f, source(), load());
    }

    private LinkDesign tankDesign(Topology t) {
        for (String[] pair : new String[][]{{"--l1", l1}, {"--l2", l2}, {"--m", m}, {"--k", k}, {"--r1", r1},
                {"--r2", r2}, {"--load", load}, {"--rectifier", rectifier}, {"--battery", battery}, {"--c2", c2},
                {"--esr2", esr2}, {"--esl2", esl2}, {"--target-phase", targetPhase}}) {
            if (pair[1] != null) {
                throw usage(pair[0] + " is for a two-coil link; a " + topology + " tank takes --l, --r, --c or --f0");
            }
        }
        double vl = required("--l", l, Dimension.INDUCTANCE);
        double vr = positiveOrZero("--r", r, Dimension.RESISTANCE);
        if (c != null && f0 != null) {
            throw usage("give --c or --f0, not both");
        }
        if (c1 != null) {
            throw usage("a tank's capacitor is --c");
        }
        double cap;
        if (c != null) {
            cap = positive("--c", c, Dimension.CAPACITANCE);
        } else if (f0 != null) {
            double w0 = 2 * Math.PI * positive("--f0", f0, Dimension.FREQUENCY);
            cap = 1 / (w0 * w0 * vl);
        } else if (frequency != null) {
            double w = 2 * Math.PI * positive("--frequency", frequency, Dimension.FREQUENCY);
            cap = 1 / (w * w * vl);
        } else {
            throw usage("a tank needs --c, --f0 or --frequency");
        }
        double f = frequency != null ? positive("--frequency", frequency, Dimension.FREQUENCY)
                : 1 / (2 * Math.PI * Math.sqrt(vl * cap));
        LinkDesign d = finish(t, LinkValues.tank(vl, vr), f, source(), null);
        return d.withCapacitors(cap, 0);
    }

    private LinkDesign finish(Topology t, LinkValues v, double f, Source src, Load ld) {
        double target = targetPhase == null ? LinkDesign.defaultTargetPhaseDeg(src)
                : CliSupport.quantity("--target-phase", targetPhase, Dimension.ANGLE);
        if (!(Math.abs(target) < 90)) {
            throw invalid("--target-phase: " + target + "° must be between −90° and 90°");
        }
        BridgeParts parts = new BridgeParts(positiveOrZero("--coss", coss, Dimension.CAPACITANCE),
                positiveOrZero("--dead-time", deadTime, Dimension.TIME));
        try {
            return new LinkDesign(t, v, f, src, ld,
                    positiveOrZero("--c1", c1, Dimension.CAPACITANCE), positiveOrZero("--c2", c2, Dimension.CAPACITANCE),
                    positiveOrZero("--esr1", esr1, Dimension.RESISTANCE), positiveOrZero("--esl1", esl1, Dimension.INDUCTANCE),
                    positiveOrZero("--esr2", esr2, Dimension.RESISTANCE), positiveOrZero("--esl2", esl2, Dimension.INDUCTANCE),
                    target, parts);
        } catch (IllegalArgumentException e) {
            throw invalid(e.getMessage());
        }
    }

    private Source source() {
        int given = (vin != null ? 1 : 0) + (vdc != null ? 1 : 0) + (iin != null ? 1 : 0);
        if (given != 1) {
            throw usage("give exactly one source: --vin (rms sine), --vdc with --bridge full|half, or --iin (rms current)");
        }
        if (vdc == null && (bridge != null || duty != null)) {
            throw usage("--bridge and --duty go with --vdc");
        }
        double rs = positiveOrZero("--source-resistance", sourceR, Dimension.RESISTANCE);
        try {
            if (vin != null) {
                return Source.sine(positive("--vin", vin, Dimension.VOLTAGE)).withResistance(rs);
            }
            if (iin != null) {
                if (rs != 0) {
                    throw usage("--source-resistance applies to a voltage source, not --iin");
                }
                return Source.current(positive("--iin", iin, Dimension.CURRENT));
            }
            double bus = positive("--vdc", vdc, Dimension.VOLTAGE);
            double dd = duty == null ? 1 : CliSupport.quantity("--duty", duty, Dimension.FRACTION);
            if (!(dd > 0 && dd <= 1)) {
                throw invalid("--duty: " + dd + " must be in (0, 1]");
            }
            String b = bridge == null ? "full" : bridge.strip().toLowerCase(Locale.ROOT);
            return switch (b) {
                case "full" -> Source.fullBridge(bus, dd).withResistance(rs);
                case "half" -> {
                    if (dd != 1) {
                        throw usage("--duty (phase shift) needs a full bridge");
                    }
                    yield Source.halfBridge(bus).withResistance(rs);
                }
                default -> throw usage("--bridge: '" + bridge + "' is not known; allowed: full, half");
            };
        } catch (ExitCodes.UserError e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw invalid(e.getMessage());
        }
    }

    private Load load() {
        if ((load == null) == (battery == null)) {
            throw usage("give exactly one of --load (ohms) or --battery (volts)");
        }
        if (battery != null) {
            if (rectifier != null) {
                throw usage("--battery already implies a capacitive-filter rectifier; drop --rectifier");
            }
            return new Load.Battery(positive("--battery", battery, Dimension.VOLTAGE));
        }
        double rl = positiveOrZero("--load", load, Dimension.RESISTANCE);
        if (rectifier == null) {
            return new Load.Resistor(rl);
        }
        return switch (rectifier.strip().toLowerCase(Locale.ROOT)) {
            case "cap" -> new Load.Rectifier(Load.Filter.CAPACITIVE, rl);
            case "ind" -> new Load.Rectifier(Load.Filter.INDUCTIVE, rl);
            default -> throw usage("--rectifier: '" + rectifier + "' is not known; allowed: cap, ind");
        };
    }

    private static double required(String option, String text, Dimension d) {
        if (text == null) {
            throw usage(option + " is required");
        }
        return positive(option, text, d);
    }

    private static double positive(String option, String text, Dimension d) {
        double v = CliSupport.quantity(option, text, d);
        if (!(v > 0)) {
            throw invalid(option + ": " + text + " must be positive");
        }
        return v;
    }

    private static double positiveOrZero(String option, String text, Dimension d) {
        if (text == null) {
            return 0;
        }
        double v = CliSupport.quantity(option, text, d);
        if (!(v >= 0)) {
            throw invalid(option + ": " + text + " must be zero or positive");
        }
        return v;
    }

    private static ExitCodes.UserError usage(String msg) {
        return new ExitCodes.UserError(ExitCodes.USAGE, msg);
    }

    private static ExitCodes.UserError invalid(String msg) {
        return new ExitCodes.UserError(ExitCodes.INVALID_INPUT, msg);
    }

    private void printTable(TuningResult res) {
        OperatingPoint op = res.operatingPoint();
        boolean link = res.design().topology().isLink();
        row("topology", res.design().topology().name());
        row("drive frequency", Quantities.format(op.frequency(), Dimension.FREQUENCY, 4));
        row("C1 (solved / textbook)", Quantities.format(res.c1(), Dimension.CAPACITANCE, 4) + " / "
                + Quantities.format(res.c1Textbook(), Dimension.CAPACITANCE, 4));
        if (link) {
            row("C2 (solved / textbook)", Quantities.format(res.c2(), Dimension.CAPACITANCE, 4) + " / "
                    + Quantities.format(res.c2Textbook(), Dimension.CAPACITANCE, 4));
        } else if (res.design().coils().r1() > 0) {
            row("resonant frequency", Quantities.format(res.tankResonantFrequency(), Dimension.FREQUENCY, 4));
            row("Q, bandwidth", Quantities.number(res.tankQ(), 4) + ", "
                    + Quantities.format(res.tankResonantFrequency() / res.tankQ(), Dimension.FREQUENCY, 4));
        }
        row("input impedance", Quantities.format(op.inputImpedance().re(), Dimension.RESISTANCE, 4) + " "
                + (op.inputImpedance().im() < 0 ? "− j" : "+ j")
                + Quantities.format(Math.abs(op.inputImpedance().im()), Dimension.RESISTANCE, 4));
        double phase = Math.abs(op.inputPhaseDeg()) < 1e-9 ? 0 : op.inputPhaseDeg();
        row("input phase", Quantities.format(phase, Dimension.ANGLE, 3)
                + (phase > 0 ? " (inductive)" : phase < 0 ? " (capacitive)" : " (resistive)"));
        row("power in / out", Quantities.format(op.pIn(), Dimension.POWER, 4) + " / "
                + Quantities.format(op.pOut(), Dimension.POWER, 4));
        row("efficiency", Quantities.format(op.efficiency(), Dimension.FRACTION, 4));
        row("source current", Quantities.format(op.sourceCurrent(), Dimension.CURRENT, 4));
        if (op.bridge() != null) {
            row("DC bus current", Quantities.format(op.dcCurrent(), Dimension.CURRENT, 4));
            row("turn-off current", Quantities.format(Math.min(op.bridge().turnOffLeading(),
                    op.bridge().turnOffLagging()), Dimension.CURRENT, 3) + (op.bridge().partsGiven()
                    ? ", ZVS margin " + Quantities.format(op.bridge().zvsMargin(), Dimension.CURRENT, 3)
                    : " (give --coss and --dead-time for the ZVS margin)"));
        }
        out.printf(Locale.ROOT, "%n%-8s %12s %12s %12s %12s %12s%n", "element", "V rms", "V peak", "I rms", "I peak", "loss");
        for (ElementStress e : op.elements()) {
            out.printf(Locale.ROOT, "%-8s %12s %12s %12s %12s %12s%n", e.name(),
                    Quantities.format(e.vRms(), Dimension.VOLTAGE, 4), Quantities.format(e.vPeak(), Dimension.VOLTAGE, 4),
                    Quantities.format(e.iRms(), Dimension.CURRENT, 4), Quantities.format(e.iPeak(), Dimension.CURRENT, 4),
                    Quantities.format(e.loss(), Dimension.POWER, 3));
        }
        out.println();
        StringBuilder zp = new StringBuilder();
        for (double f : res.zeroPhaseFrequencies()) {
            zp.append(zp.length() == 0 ? "" : ", ").append(Quantities.format(f, Dimension.FREQUENCY, 5));
        }
        row("zero-phase frequencies", zp.length() == 0 ? "none in f/2..2f" : zp.toString());
        if (link) {
            row("load (AC)", Double.isInfinite(op.loadAc()) ? "open" : Quantities.format(op.loadAc(), Dimension.RESISTANCE, 4));
            row("max efficiency", Quantities.format(res.optimum().efficiency(), Dimension.FRACTION, 4) + " at "
                    + Quantities.format(res.optimum().load(), Dimension.RESISTANCE, 4) + " AC");
        }
        row("model verdict", op.verdict());
        for (String w : op.warnings()) {
            out.println("warning: " + w);
        }
        for (String n : res.notes()) {
            out.println("note: " + n);
        }
        out.println("Caution: capacitor and coil voltages can be lethal; follow local codes and licensed practice.");
    }

    private void row(String name, String value) {
        out.printf(Locale.ROOT, "%-26s %s%n", name, value);
    }
}
