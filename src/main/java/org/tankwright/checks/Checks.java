package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The checks engine: runs every rule over an analysis result and returns the findings, most
 * severe first (then by rule id). Pure and fast: call it at the end of the pipeline on every
 * recompute.
 */
public final class Checks {
    private Checks() {
    }

    /** Every rule, in id order. Adding a rule is adding its class and one entry here. */
    public static final List<Rule> RULES = List.of(
            new CapacitorRules.Voltage(),
            new CapacitorRules.Current(),
            new CapacitorRules.Dissipation(),
            new CapacitorRules.VoltageRate(),
            new CapacitorRules.SelfResonance(),
            new CapacitorRules.Class2Ceramic(),
            new CapacitorRules.BridgeIntoParallelCapacitor(),
            new EnergyRules.BankEnergy(),
            new EnergyRules.BankCharge(),
            new EnergyRules.DcLink(),
            new ExposureRules.ReferenceLevel(),
            new ExposureRules.ImplantedDevices(),
            new HeaterRules.HotWorkpiece(),
            new HeaterRules.StrayMetal(),
            new HeaterRules.Coolant(),
            new HeaterRules.HotWorkCoil(),
            new CoilRules.SelfResonance(),
            new CoilRules.CurrentDensity(),
            new CoilRules.LitzStrands(),
            new CoilRules.TurnToTurn(),
            new CoilRules.WindingToCore(),
            new NetworkRules.FundamentalValidity(),
            new NetworkRules.Bifurcation(),
            new NetworkRules.ZeroVoltageSwitching(),
            new NetworkRules.RemovedReceiver(),
            new NetworkRules.OpenLoadVoltage(),
            new NetworkRules.TargetUnreachable(),
            new NetworkRules.ReactiveBridgeCurrent(),
            new RadioRules.FrequencyBand(),
            new VoltageRules.AboveExtraLowVoltage(),
            new VoltageRules.MainsWithoutIsolation(),
            new VoltageRules.ClearanceCreepage());

    /** Most severe first, then by rule id, then by element. */
    public static final Comparator<Finding> ORDER = Comparator.comparing(Finding::severity)
            .thenComparing(Finding::id).thenComparing(f -> f.element() == null ? "" : f.element());

    /** Runs every rule on {@code r}; a rule that fails reports it as a notice instead of stopping the others. */
    public static List<Finding> run(AnalysisResult r) {
        List<Finding> out = new ArrayList<>();
        for (Rule rule : RULES) {
            try {
                rule.check(r, out);
            } catch (RuntimeException e) {
                out.add(new Finding(rule.id(), Severity.NOTICE, Double.NaN, Double.NaN, "", "", "",
                        "The check \"" + rule.title() + "\" could not run on this result (" + e + ").",
                        "Report this as a defect of the program."));
            }
        }
        out.sort(ORDER);
        return List.copyOf(out);
    }

    /**
     * A copy of {@code r} with its findings filled in by {@link #run}: the pipeline's last step
     * ({@code return Checks.attach(result);} at the end of {@code Analysis.run}).
     */
    public static AnalysisResult attach(AnalysisResult r) {
        return new AnalysisResult(r.design(), r.coils(), r.coupling(), r.network(), r.stresses(), r.envelope(),
                r.banks(), r.heater(), r.exposure(), run(r), r.notes(), r.computeNanos());
    }

    /** Whether any finding is a danger (the command line exits with status 5). */
    public static boolean anyDanger(List<Finding> findings) {
        return findings.stream().anyMatch(f -> f.severity() == Severity.DANGER);
    }

    /**
     * The general cautions shown on first start and on every sheet, whatever the design. The
     * last one is the deferral to local codes and licensed practice.
     */
    public static List<String> cautions() {
        return CAUTIONS;
    }

    private static final List<String> CAUTIONS = List.of(
            "High voltage: a resonant tank builds voltages many times its supply, often far above extra-low voltage "
                    + "(50 V a.c., 120 V d.c.). Treat every tank node as live while powered; enclose it; measure with "
                    + "probes rated for the voltage and frequency.",
            "Mains: a bus taken from the mains without an isolating transformer puts every node of the circuit at "
                    + "mains potential against earth. Isolate it or build it as mains equipment.",
            "Stored energy: capacitors stay charged after switch-off. Fit bleeder resistors, wait, and measure before "
                    + "touching; discharge through a resistor.",
            "Magnetic fields: the field next to a running coil is far stronger than at the screening distance. Keep "
                    + "people with pacemakers, defibrillators or other active implants away.",
            "Hot metal: induction heats any conductor in the field. Remove rings, watches and jewellery; keep tools, "
                    + "coins and foreign objects off pads and away from work coils; heated workpieces and work coils burn.",
            "Radio: the operating frequency and its harmonics are subject to local radio and interference rules.",
            Finding.DEFERRAL);
}
