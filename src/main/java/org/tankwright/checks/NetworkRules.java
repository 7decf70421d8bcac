package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.EnvelopeReport;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.Topology;
import org.tankwright.units.Dimension;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.q;

/** Rules on the tuned network and its envelope. */
final class NetworkRules {
    private NetworkRules() {
    }

    /** TW-N01: loaded Q too low for the fundamental-harmonic analysis to hold. */
    static final class FundamentalValidity extends BaseRule {
        FundamentalValidity() {
            super("TW-N01", "fundamental-harmonic analysis validity", Limits.FHA_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            NetworkReport n = r.network();
            if (n == null || !finite(n.loadedQ()) || n.loadedQ() >= Limits.FHA_MIN_Q) {
                return;
            }
            add(out, Severity.NOTICE, n.loadedQ(), Limits.FHA_MIN_Q, "", "$.compensation",
                    "The loaded Q of the driven tank is " + Read.num(n.loadedQ(), 2)
                            + ": the current is no longer close to a sine, so every voltage, current and loss computed "
                            + "from the fundamental may be off, and harmonics are larger than it shows.",
                    "Raise the loaded Q (more inductance or a lighter load), or verify the stresses in a time-domain "
                            + "simulation and on the bench.");
        }
    }

    /** TW-N02: more than one zero-phase frequency near the design frequency. */
    static final class Bifurcation extends BaseRule {
        Bifurcation() {
            super("TW-N02", "bifurcation", "Wang, Covic, Stielau, IEEE Trans. Industrial Electronics 51(1), 2004");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            NetworkReport n = r.network();
            if (n == null || !n.bifurcated()) {
                return;
            }
            int count = n.zeroPhaseFrequencies() == null ? 0 : n.zeroPhaseFrequencies().length;
            add(out, Severity.NOTICE, count, 1, "", "$.compensation",
                    "The input phase crosses zero at " + count + " frequencies near the design frequency: the link is "
                            + "bifurcated, and a controller that tracks zero phase can jump to another mode with other "
                            + "power and stresses.",
                    "Keep k·Q below the bifurcation limit (a lower secondary Q, i.e. a heavier load, or less coupling), or "
                            + "run at a fixed frequency with a controller that cannot lock onto the other modes.");
        }
    }

    /** TW-N03: bridge not switching at zero voltage (turn-off current against 2·Coss·Vdc/t_dead). */
    static final class ZeroVoltageSwitching extends BaseRule {
        ZeroVoltageSwitching() {
            super("TW-N03", "zero-voltage switching of the bridge",
                    "common practice (turn-off current ≥ 2·Coss·Vdc/t_dead)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            NetworkReport n = r.network();
            if (n == null || !Read.voltageFedBridge(r.design()) || !finite(n.turnOffCurrent())
                    || !finite(n.zvsRequiredCurrent()) || n.turnOffCurrent() >= n.zvsRequiredCurrent()) {
                return;
            }
            boolean capacitive = n.turnOffCurrent() < 0;
            add(out, Severity.NOTICE, n.turnOffCurrent(), n.zvsRequiredCurrent(), "A", "$.compensation.target_phase_deg",
                    "The bridge turns off " + q(n.turnOffCurrent(), Dimension.CURRENT) + "; swinging the switch node "
                            + "within the dead time needs " + q(n.zvsRequiredCurrent(), Dimension.CURRENT) + ". "
                            + (capacitive ? "The load is capacitive: the body diodes are hard-commutated, which can "
                            + "destroy MOSFETs." : "The switches turn on hard: switching loss and interference rise."),
                    "Tune the primary for a slightly inductive input phase (compensation.target_phase_deg), lengthen "
                            + "the dead time, or use switches with less output capacitance.");
        }
    }

    /** TW-N04: in SS, removing the receiver lets the primary current rise. */
    static final class RemovedReceiver extends BaseRule {
        RemovedReceiver() {
            super("TW-N04", "removed-receiver current rise (SS)",
                    "Wang, Covic, Stielau 2004 (SS primary current Vin/R1 without the secondary)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            Design d = r.design();
            EnvelopeReport e = r.envelope();
            if (e == null || Read.topology(d) != Topology.SS || !finite(e.removedReceiverCurrent())
                    || (d.envelope() != null && Boolean.FALSE.equals(d.envelope().receiverRemovable()))) {
                return;
            }
            double covered = Read.rmsCurrent(Read.stress(r, "L1"));
            if (!finite(covered) || e.removedReceiverCurrent() <= covered) {
                return;
            }
            add(out, Severity.WARNING, e.removedReceiverCurrent(), covered, "A", "$.envelope.receiver_removable",
                    "With the receiver removed the primary current rises to " + q(e.removedReceiverCurrent(), Dimension.CURRENT)
                            + " (" + Read.num(e.removedReceiverCurrent() / covered, 2)
                            + " × the worst current of the envelope, " + q(covered, Dimension.CURRENT) + "); the primary "
                            + "capacitor voltage and the field rise with it.",
                    "Detect the receiver (or its absence) and stop or throttle the bridge, and trip on primary current"
                            + (finite(e.tripCurrent()) ? " (trip level " + q(e.tripCurrent(), Dimension.CURRENT) + ")" : "")
                            + "; rate C1 for the open-receiver voltage or make sure the trip acts first.");
        }
    }

    /** TW-N05: in SP and PP, an open load lets the output voltage rise. */
    static final class OpenLoadVoltage extends BaseRule {
        OpenLoadVoltage() {
            super("TW-N05", "open-load voltage rise (SP/PP)",
                    "IEC 61140 / IEC 60449 voltage bands; Wang, Covic, Stielau 2004 (parallel secondary as a current source)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            Design d = r.design();
            Topology t = Read.topology(d);
            EnvelopeReport e = r.envelope();
            if (e == null || (t != Topology.SP && t != Topology.PP) || !finite(e.openLoadVoltage())) {
                return;
            }
            double v = e.openLoadVoltage();
            boolean dc = Read.dcOutput(d);
            double elv = dc ? Limits.ELV_DC : Limits.ELV_AC_RMS;
            double vOut = r.network() == null ? Double.NaN : r.network().outputVoltage();
            if (v > elv) {
                add(out, Severity.WARNING, v, elv, "V", "RL",
                        "With the load disconnected the output rises to " + q(v, Dimension.VOLTAGE)
                                + (dc ? "" : " rms") + ", above extra-low voltage (" + q(elv, Dimension.VOLTAGE) + ")"
                                + (finite(vOut) ? "; it is " + q(vOut, Dimension.VOLTAGE) + " when loaded." : "."),
                        "Clamp or regulate the output (an over-voltage crowbar or a shorting switch across the secondary), "
                                + "trip on output voltage, and keep the output terminals covered.");
            } else if (finite(vOut) && vOut > 0 && v > 1.5 * vOut) {
                add(out, Severity.NOTICE, v, 1.5 * vOut, "V", "RL",
                        "With the load disconnected the output rises to " + q(v, Dimension.VOLTAGE) + " from "
                                + q(vOut, Dimension.VOLTAGE) + "; the load and the output capacitor must stand it.",
                        "Rate the output parts for the open-load voltage or clamp it.");
            }
        }
    }

    /** TW-N06: the output target cannot be reached somewhere in the envelope. */
    static final class TargetUnreachable extends BaseRule {
        TargetUnreachable() {
            super("TW-N06", "output target reachable over the envelope", "the design's own target (load.target_power_W)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            EnvelopeReport e = r.envelope();
            if (e == null || e.unreachable() == null || e.unreachable().isEmpty()) {
                return;
            }
            add(out, Severity.NOTICE, e.unreachable().size(), 0, "", "$.load.target_power_W",
                    "The output target cannot be reached at " + e.unreachable().size() + " envelope point"
                            + (e.unreachable().size() == 1 ? "" : "s") + ", for example " + String.join("; ", e.unreachable().subList(0, Math.min(3, e.unreachable().size())))
                            + (e.unreachable().size() > 3 ? " (and " + (e.unreachable().size() - 3) + " more)" : "") + ".",
                    "Raise the bus voltage or the coupling at the weak points, narrow the envelope, or accept less "
                            + "power there.");
        }
    }

    /** TW-N07: a voltage-fed bridge far from the tank's zero phase carries mostly reactive current. */
    static final class ReactiveBridgeCurrent extends BaseRule {
        ReactiveBridgeCurrent() {
            super("TW-N07", "reactive bridge current",
                    "common practice (power factor cos φ at the bridge; above " + Read.num(Limits.REACTIVE_PHASE_DEG, 2)
                            + "° the bridge carries more than twice the current the power needs)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            NetworkReport n = r.network();
            Design d = r.design();
            if (n == null || !Read.voltageFedBridge(d) || !finite(n.inputPhaseDeg())
                    || Math.abs(n.inputPhaseDeg()) <= Limits.REACTIVE_PHASE_DEG) {
                return;
            }
            Double target = d.compensation() == null ? null : d.compensation().targetPhase();
            if (target != null && Math.abs(target - n.inputPhaseDeg()) <= Limits.TARGET_PHASE_MATCH_DEG) {
                return; // the design asks for this phase: power control by frequency offset
            }
            double pf = Math.cos(Math.toRadians(n.inputPhaseDeg()));
            StringBuilder where = new StringBuilder();
            double nearest = nearestZeroPhase(n);
            if (finite(nearest)) {
                where.append(" The tank's input phase is zero at ").append(q(nearest, Dimension.FREQUENCY))
                        .append(", nearest to the operating ").append(q(n.frequency(), Dimension.FREQUENCY)).append('.');
            }
            String retune = finite(n.c1Textbook())
                    ? " or set C1 near " + q(n.c1Textbook(), Dimension.CAPACITANCE) + " (resonance with the primary at the design frequency)"
                    : "";
            add(out, Severity.NOTICE, Math.abs(n.inputPhaseDeg()), Limits.REACTIVE_PHASE_DEG, "°", "$.frequency_Hz",
                    "The input phase is " + Read.num(n.inputPhaseDeg(), 3) + "°: the bridge supplies "
                            + q(n.sourceCurrent(), Dimension.CURRENT) + " rms for " + q(n.powerIn(), Dimension.POWER)
                            + " (power factor " + Read.num(pf, 2) + "), so the switches, the bus capacitors and the wiring carry "
                            + Read.num(1 / Math.abs(pf), 2) + " × the current the power needs." + where,
                    "If this offset is not meant as power control, drive nearer the zero-phase frequency (a little on the "
                            + "inductive side, for zero-voltage switching)" + retune + "; if it is, state it as "
                            + "compensation.target_phase_deg.");
        }

        private static double nearestZeroPhase(NetworkReport n) {
            double best = Double.NaN;
            if (n.zeroPhaseFrequencies() != null) {
                for (double f : n.zeroPhaseFrequencies()) {
                    if (Double.isNaN(best) || Math.abs(f - n.frequency()) < Math.abs(best - n.frequency())) {
                        best = f;
                    }
                }
            }
            return best;
        }
    }
}
