package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.BankReport;
import org.tankwright.analysis.ElementStress;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.Topology;
import org.tankwright.units.Dimension;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.pct;
import static org.tankwright.checks.Read.q;

/** Rules on the tank capacitors: ratings and margins, self-resonance, dielectric, harmonic currents. */
final class CapacitorRules {
    private CapacitorRules() {
    }

    private static final String RATING = "the part's derated rating (datasheet rating with the derating rule applied)";
    private static final String FAILS = "An over-stressed capacitor can overheat, vent or burst. ";

    /** The banks of a result (never null). */
    static List<BankReport> banks(AnalysisResult r) {
        return r.banks() == null ? List.of() : r.banks();
    }

    /**
     * Holds one stress of the worst part of each bank to its derated rating: over the rating is a
     * warning (the part may fail violently), a margin under {@link Limits#THIN_MARGIN} a notice.
     * Without banks, a capacitor's stress row with a rating is held instead.
     */
    abstract static class RatingRule extends BaseRule {
        private final String what;
        private final Dimension dim;

        RatingRule(String id, String title, String what, Dimension dim) {
            super(id, title, RATING);
            this.what = what;
            this.dim = dim;
        }

        /** The worst part's value at the operating point (NaN when unknown). */
        abstract double value(BankReport b);

        /** The part's derated rating (NaN when unknown). */
        abstract double rating(BankReport b);

        /** The factor from the operating point to the envelope's worst point, from the element's stress row. */
        abstract double scale(ElementStress s);

        /** The stress row's own value and rating, when no bank was chosen (NaN pair when none). */
        double[] fromStress(ElementStress s) {
            return new double[] {Double.NaN, Double.NaN};
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            List<BankReport> banks = banks(r);
            for (BankReport b : banks) {
                ElementStress s = Read.stress(r, b.id());
                double k = scale(s);
                judge(out, b.id(), value(b) * k, rating(b), k > 1, s, "worst part of " + b.id() + " (" + b.part() + ")");
            }
            if (banks.isEmpty() && r.stresses() != null) {
                for (ElementStress s : r.stresses()) {
                    if (s != null && s.id() != null && s.id().startsWith("C")) {
                        double[] vr = fromStress(s);
                        judge(out, s.id(), vr[0], vr[1], false, s, s.id());
                    }
                }
            }
        }

        private void judge(List<Finding> out, String id, double v, double rating, boolean envelope, ElementStress s,
                           String who) {
            if (!finite(v) || !finite(rating) || rating <= 0) {
                return;
            }
            double margin = 1 - v / rating;
            String text = "The " + what + " of the " + who + " is " + Read.q(v, dim) + " " + Read.where(s, envelope)
                    + " against " + q(rating, dim) + ": margin " + pct(margin) + ".";
            if (margin < 0) {
                add(out, Severity.WARNING, v, rating, dim.symbol(), id, FAILS + text,
                        "Use parts with a higher rating, more parts in series (voltage) or in parallel (current), "
                                + "or lower the stress; keep the bank behind a cover until it is fixed.");
            } else if (margin < Limits.THIN_MARGIN) {
                add(out, Severity.NOTICE, v, rating, dim.symbol(), id, text + " The margin is thin.",
                        "Leave at least " + pct(Limits.THIN_MARGIN) + " margin below the derated rating "
                                + "(common practice) for tolerance, heating and ageing.");
            }
        }
    }

    /** TW-C01: peak voltage (AC with DC bias) of the worst part against its derated voltage rating. */
    static final class Voltage extends RatingRule {
        Voltage() {
            super("TW-C01", "capacitor voltage against its derated rating", "peak voltage (AC with DC bias)",
                    Dimension.VOLTAGE);
        }

        @Override
        double value(BankReport b) {
            return b.partVoltagePeak();
        }

        @Override
        double rating(BankReport b) {
            return b.partVoltageRating();
        }

        @Override
        double scale(ElementStress s) {
            return Read.voltageScale(s);
        }

        @Override
        double[] fromStress(ElementStress s) {
            return new double[] {Read.peakVoltage(s), s.voltageRating()};
        }
    }

    /** TW-C02: rms current of the worst part (with unequal sharing) against its derated current rating. */
    static final class Current extends RatingRule {
        Current() {
            super("TW-C02", "capacitor current against its derated rating", "rms current", Dimension.CURRENT);
        }

        @Override
        double value(BankReport b) {
            return b.partCurrent();
        }

        @Override
        double rating(BankReport b) {
            return b.partCurrentRating();
        }

        @Override
        double scale(ElementStress s) {
            return Read.currentScale(s);
        }

        @Override
        double[] fromStress(ElementStress s) {
            return new double[] {Read.rmsCurrent(s), s.currentRating()};
        }
    }

    /** TW-C04: dV/dt of the worst part against its pulse rating. */
    static final class VoltageRate extends RatingRule {
        VoltageRate() {
            super("TW-C04", "capacitor dV/dt against its rating", "dV/dt", Dimension.VOLTAGE_RATE);
        }

        @Override
        double value(BankReport b) {
            return b.partDvDt();
        }

        @Override
        double rating(BankReport b) {
            return b.partDvDtRating();
        }

        @Override
        double scale(ElementStress s) {
            return Read.voltageScale(s);
        }
    }

    /** TW-C03: dissipation of one part above what a film part sheds in still air without a thermal check. */
    static final class Dissipation extends BaseRule {
        Dissipation() {
            super("TW-C03", "capacitor dissipation", Limits.CAPACITOR_LOSS_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (BankReport b : banks(r)) {
                double k = Read.currentScale(Read.stress(r, b.id()));
                double p = b.partLoss() * k * k;
                if (finite(p) && p > Limits.CAPACITOR_PART_LOSS) {
                    add(out, Severity.CAUTION, p, Limits.CAPACITOR_PART_LOSS, "W", b.id(),
                            "Each part of " + b.id() + " dissipates up to " + q(p, Dimension.POWER)
                                    + " (ESR × current²); a film part in still air runs hot above about "
                                    + q(Limits.CAPACITOR_PART_LOSS, Dimension.POWER) + ". A hot capacitor can vent or burst.",
                            "Check the temperature rise with the datasheet's thermal resistance or its "
                                    + "AC-voltage-against-frequency curve; spread the current over more parts, use "
                                    + "lower-loss parts, or cool the bank.");
                }
            }
        }
    }

    /** TW-C05: the part's self-resonance below or too close to the operating frequency. */
    static final class SelfResonance extends BaseRule {
        SelfResonance() {
            super("TW-C05", "capacitor self-resonance", Limits.SRF_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            double f = Read.frequency(r);
            for (BankReport b : banks(r)) {
                srf(this, out, b.partSrf(), f, b.id(), "a part of " + b.id());
            }
        }
    }

    /** Adds the self-resonance finding shared by capacitors and coils, if any. */
    static void srf(BaseRule rule, List<Finding> out, double srf, double f, String element, String who) {
        if (!finite(srf) || !finite(f) || srf <= 0 || srf >= Limits.SRF_RATIO * f) {
            return;
        }
        String m = srf <= f
                ? "The self-resonant frequency of " + who + " (" + q(srf, Dimension.FREQUENCY) + ") is at or below the "
                + "operating frequency (" + q(f, Dimension.FREQUENCY) + "): it behaves as the opposite reactance there."
                : "The self-resonant frequency of " + who + " (" + q(srf, Dimension.FREQUENCY) + ") is only "
                + Read.num(srf / f, 2) + " × the operating frequency; its apparent value is "
                + pct(1 / (1 - (f / srf) * (f / srf)) - 1) + " off the nominal.";
        rule.add(out, Severity.NOTICE, srf, Limits.SRF_RATIO * f, "Hz", element, m,
                "Keep the operating frequency below a fifth of the self-resonance (common practice): "
                        + "smaller parts, lower ESL or inductance, fewer turns or less self-capacitance.");
    }

    /** TW-C06: class-2 ceramic dielectric in a resonant tank. */
    static final class Class2Ceramic extends BaseRule {
        Class2Ceramic() {
            super("TW-C06", "class-2 ceramic in a tank", "IEC 60384-9 dielectric classes; common practice for resonant tanks");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (BankReport b : banks(r)) {
                if (b.class2()) {
                    add(out, Severity.NOTICE, Double.NaN, Double.NaN, "", b.id(),
                            b.id() + " uses a class-2 ceramic (" + b.dielectric() + "): its capacitance falls with DC "
                                    + "bias and AC voltage, drifts with temperature and ages, and its loss is high, "
                                    + "so the tank detunes and the part heats.",
                            "Use class-1 ceramic (C0G/NP0) or polypropylene film in resonant tanks (common practice).");
                }
            }
        }
    }

    /** TW-C07: a voltage-fed bridge driving a capacitor placed across the coil. */
    static final class BridgeIntoParallelCapacitor extends BaseRule {
        BridgeIntoParallelCapacitor() {
            super("TW-C07", "voltage-fed bridge driving a parallel capacitor",
                    "common practice (square-wave harmonics into a capacitor: i = C·dv/dt)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            Design d = r.design();
            Topology t = Read.topology(d);
            if (t == null || !Read.voltageFedBridge(d)
                    || !(t == Topology.PARALLEL || t == Topology.PS || t == Topology.PP)) {
                return;
            }
            add(out, Severity.DANGER, Double.NaN, Double.NaN, "", "$.compensation.topology",
                    "A voltage-fed bridge drives the primary capacitor directly (" + t.token() + "). Each switching edge "
                            + "charges that capacitor through the switches alone: current spikes limited only by "
                            + "wiring resistance and inductance, which the fundamental-harmonic analysis does not show. "
                            + "Switches and capacitors can fail explosively.",
                    "Put an inductor in series between the bridge and the parallel capacitor (an LCL or CLC stage), "
                            + "drive the tank from a current-fed inverter, or use series compensation on the primary.");
        }
    }
}
