package org.tankwright.analysis;

import org.tankwright.checks.Checks;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.Topologies;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.DesignKind;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.TuningResult;

import java.util.ArrayList;
import java.util.List;

/**
 * The one analysis pipeline: coils → coupling → network and tuning → capacitor banks (and the
 * network again with the banks' real values) → operating envelope → stresses → field exposure →
 * checks. Pure: the same design gives the same result; safe to call off the event thread.
 */
public final class Analysis {
    /** How much of the pipeline to run. */
    public enum Scope {
        /** The operating point alone: coils, coupling at the nominal place, tuning, banks, stresses, checks. */
        OPERATING_POINT,
        /** Everything: also the sweeps against frequency, load, coupling, gap and offset, and the operating envelope. */
        FULL
    }

    private Analysis() {
    }

    /**
     * Gives up when the thread running the analysis is interrupted: a window that recomputes on
     * every edit interrupts the analysis of an edit it no longer needs. Checked between stages and
     * inside the envelope's grid; the interrupt flag is left set for the caller.
     *
     * @throws java.util.concurrent.CancellationException when interrupted
     */
    static void stopIfInterrupted() {
        if (Thread.currentThread().isInterrupted()) {
            throw new java.util.concurrent.CancellationException("analysis interrupted");
        }
    }

    /** Analyses a design completely. */
    public static AnalysisResult run(Design design) {
        return run(design, Scope.FULL);
    }

    /**
     * Analyses a design.
     *
     * @throws AnalysisException when the design cannot be analysed (the message names the field)
     * @throws java.util.concurrent.CancellationException when the calling thread is interrupted meanwhile
     */
    public static AnalysisResult run(Design d, Scope scope) {
        long t0 = System.nanoTime();
        boolean full = scope == Scope.FULL;
        List<String> notes = new ArrayList<>();
        double f = d.frequency();
        CoilStage.Analysed primary = CoilStage.analyse(d.kind() == DesignKind.HEATER ? "work coil" : "primary",
                d.primary(), f, "$.primary");
        List<CoilReport> coils = new ArrayList<>();
        coils.add(primary.report());
        CouplingReport coupling = null;
        CouplingStage.Linked linked = null;
        HeaterReport heater = null;
        HeaterStage.Heated heated = null;
        TuningResult tuned;
        List<BankReport> banks = new ArrayList<>();
        if (d.kind() == DesignKind.HEATER) {
            heated = HeaterStage.solve(d, primary);
            heater = heated.report();
            tuned = heated.cold();
        } else if (d.isLink()) {
            CoilStage.Analysed secondary = CoilStage.analyse("secondary", d.secondary(), f, "$.secondary");
            coils.add(secondary.report());
            linked = CouplingStage.couple(d, primary, secondary, full);
            coupling = linked.report();
            stopIfInterrupted();
            LinkValues values = new LinkValues(coupling.l1(), coupling.l2(), coupling.mutual(),
                    primary.report().resistanceAc(), secondary.report().resistanceAc());
            tuned = firstTuning(d, NetworkStage.linkDesign(d, f, values, fixed(d.compensation().c1()),
                    fixed(d.compensation().c2())));
            // Banks are sized for the worst stress over the envelope when it is solved, else for the operating point.
            stopIfInterrupted();
            EnvelopeReport first = full && EnvelopeStage.applies(d) ? EnvelopeStage.link(d, tuned, linked) : null;
            stopIfInterrupted();
            tuned = withBanks(d, tuned, first, banks, notes, full);
        } else {
            LinkValues values = LinkValues.tank(primary.report().inductance(), primary.report().resistanceAc());
            tuned = firstTuning(d, NetworkStage.linkDesign(d, f, values, fixed(d.compensation().c1()), 0));
            tuned = withBanks(d, tuned, null, banks, notes, false);
        }
        if (heated != null && BankStage.enabled(d)) {
            // The heater's tank capacitor is sized for the worse of its cold and hot points, then both
            // points are solved again with the bank's real capacitance, ESR and ESL.
            BankStage.Chosen c = addBank(d, tuned.operatingPoint(), EnvelopeStage.heater(heated, d), "C1", tuned.c1(), banks, notes);
            if (c != null) {
                heated = HeaterStage.solve(d, primary, new HeaterStage.Bank(c.bank().capacitance(), c.bank().esr(), c.bank().esl()), heated);
                heater = heated.report();
                tuned = heated.cold();
                notes.add("heater solved again with the chosen bank's real capacitance, ESR and ESL");
            }
        }
        stopIfInterrupted();
        NetworkReport network = NetworkStage.report(tuned, full);
        stopIfInterrupted();
        EnvelopeReport envelope = full && EnvelopeStage.applies(d) ? EnvelopeStage.link(d, tuned, linked)
                : heated != null ? EnvelopeStage.heater(heated, d) : null;
        OperatingPoint op = tuned.operatingPoint();
        List<ElementStress> stresses = StressStage.rows(op, envelope, banks, d.kind() == DesignKind.HEATER);
        ExposureReport exposure = d.isLink() ? ExposureStage.link(d, tuned, linked)
                : ExposureStage.single(d, primary.geometry(), op.stress(Topologies.L1).iRms(), f);
        AnalysisResult r = new AnalysisResult(d, List.copyOf(coils), coupling, network, stresses, envelope,
                List.copyOf(banks), heater, exposure, List.of(), List.copyOf(notes), 0L);
        r = Checks.attach(r);
        return new AnalysisResult(r.design(), r.coils(), r.coupling(), r.network(), r.stresses(), r.envelope(),
                r.banks(), r.heater(), r.exposure(), r.findings(), r.notes(), System.nanoTime() - t0);
    }

    /** Quality factor of the tank a capacitor sits in: its reactive power over the tank's losses. */
    private static double tankQ(OperatingPoint op, String capacitor) {
        String coil = capacitor.equals("C2") ? Topologies.L2 : Topologies.L1;
        if (!op.has(coil)) {
            return Double.NaN;
        }
        var c = op.stress(capacitor);
        double reactive = c.vRms() * c.iRms();
        double loss = op.stress(coil).loss() + c.loss();
        if (op.has(Topologies.LOAD) && capacitor.equals("C2")) {
            loss += op.stress(Topologies.LOAD).loss();
        } else if (op.has(Topologies.LOAD) && op.topology().isLink()) {
            loss += op.stress(Topologies.LOAD).loss() + op.stress(Topologies.L2).loss();
        }
        return loss > 0 ? reactive / loss : Double.NaN;
    }

    /**
     * The first tuning of a link or tank: without the zero-phase scan when banks will replace its
     * capacitors (the network is then solved again with theirs, and that solve scans).
     */
    private static TuningResult firstTuning(Design d, LinkDesign ld) {
        return BankStage.enabled(d) ? NetworkStage.tuneBeforeBanks(ld) : NetworkStage.tune(ld);
    }

    private static double fixed(Double c) {
        return c == null ? 0 : c;
    }

    /** Chooses real banks for the tuned capacitors and solves the network again with their real C, ESR and ESL. */
    private static TuningResult withBanks(Design d, TuningResult tuned, EnvelopeReport envelope, List<BankReport> banks,
                                          List<String> notes, boolean thresholds) {
        if (!BankStage.enabled(d)) {
            return thresholds ? NetworkStage.tune(tuned.design(), true) : tuned;
        }
        OperatingPoint op = tuned.operatingPoint();
        boolean link = tuned.design().topology().isLink();
        BankStage.Chosen c1 = addBank(d, op, envelope, "C1", tuned.c1(), banks, notes);
        BankStage.Chosen c2 = link ? addBank(d, op, envelope, "C2", tuned.c2(), banks, notes) : null;
        if (c1 == null && c2 == null) {
            return NetworkStage.tune(tuned.design(), thresholds); // the first tuning had no scan
        }
        LinkDesign ld = tuned.design();
        double newC1 = c1 != null ? c1.bank().capacitance() : tuned.c1();
        double newC2 = link ? (c2 != null ? c2.bank().capacitance() : tuned.c2()) : 0;
        LinkDesign real = ld.withCapacitors(newC1, newC2).withCapacitorLosses(
                c1 != null ? c1.bank().esr() : 0, c1 != null ? c1.bank().esl() : 0,
                c2 != null ? c2.bank().esr() : 0, c2 != null ? c2.bank().esl() : 0);
        TuningResult again = NetworkStage.tune(real, thresholds);
        notes.add("operating point solved again with the chosen banks' real capacitance, ESR and ESL");
        return new TuningResult(again.design(), again.c1(), again.c2(), tuned.c1Textbook(), tuned.c2Textbook(),
                again.phase(), again.operatingPoint(), again.zeroPhaseFrequencies(), again.optimum(),
                again.closedForm(), again.bifurcationLoads(), again.bifurcationCouplings(), again.notes());
    }

    private static BankStage.Chosen addBank(Design d, OperatingPoint op, EnvelopeReport envelope, String id,
                                            double target, List<BankReport> banks, List<String> notes) {
        org.tankwright.circuit.ElementStress s = op.stress(id);
        double vRms = s.vRms();
        double iRms = s.iRms();
        if (envelope != null) {
            String e = id.toLowerCase(java.util.Locale.ROOT);
            for (WorstCase w : envelope.worst()) {
                if (w.quantity().equals("v_" + e + "_peak_V")) {
                    vRms = Math.max(vRms, (w.value() - s.dcBias()) / Math.sqrt(2));
                } else if (w.quantity().equals("i_" + e + "_A")) {
                    iRms = Math.max(iRms, w.value());
                }
            }
        }
        BankStage.Chosen c = BankStage.choose(id, target, vRms, iRms, s.vRms(), s.iRms(), s.dcBias(), op.frequency(),
                tankQ(op, id), d);
        if (c.report() == null) {
            notes.add(c.note());
            return null;
        }
        banks.add(c.report());
        return c;
    }
}
