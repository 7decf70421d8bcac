package org.tankwright.capacitors;

import org.tankwright.provenance.Provenance;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Bench re-tune arithmetic for a tank that resonates at ω² = 1/(LC):
 * from a measured resonant frequency f_m with the installed capacitance C, the real
 * L = 1/((2πf_m)²C); from a measured L directly. The capacitance for the design frequency f_d is
 * C_needed = 1/((2πf_d)²L) (with a measured frequency: C·(f_m/f_d)²), and the trim is
 * C_needed − C: positive means add a part in parallel; negative means put a part in series
 * (C_s = C·C_needed/(C − C_needed)) or take capacitance out of the bank.
 *
 * <p>Coupling from two readings of coil 1 with coil 2 at its place, open and then shorted:
 * a shorted lossless secondary reflects −M²/L2, so L1,short = L1(1 − k²) and
 * k = √(1 − L1,short/L1,open). Holds when coil 2's reactance at the measuring frequency is
 * much larger than its resistance.
 */
public final class Retune {
    private static final Provenance PROVENANCE = Provenance.ranged("ideal LC resonance; shorted-secondary coupling",
            "ω² = 1/(LC); L1,short = L1(1 − k²) for a lossless shorted secondary (standard circuit theory)",
            "the measured frequency includes the capacitor ESL and coil self-capacitance; k needs ωL2 ≫ R2");

    private Retune() {
    }

    /**
     * One way to make the trim.
     *
     * @param position            "parallel" (added across the bank), "series" (in series with the bank) or "remove"
     * @param parts               the part(s) used; two parts are in parallel with each other
     * @param capacitance         their capacitance together, F
     * @param resultingCapacitance the tank capacitance after the change, F
     * @param resultingFrequency  the resonant frequency after the change, Hz
     * @param frequencyError      resulting/design − 1
     * @param note                what to watch
     */
    public record TrimOption(String position, List<CapacitorPart> parts, double capacitance, double resultingCapacitance,
                             double resultingFrequency, double frequencyError, String note) {
    }

    /**
     * Re-tune result.
     *
     * @param inductance           L as built, H
     * @param installedCapacitance C installed, F
     * @param designFrequency      Hz
     * @param capacitanceNeeded    F
     * @param trim                 C_needed − C, F (positive: add)
     * @param action               the trim in words
     * @param seriesCapacitance    for a negative trim, the part in series that makes it (F), else null
     * @param options              catalogue parts that make the trim, best first
     * @param provenance           model and validity
     */
    public record Result(double inductance, double installedCapacitance, double designFrequency,
                         double capacitanceNeeded, double trim, String action, Double seriesCapacitance,
                         List<TrimOption> options, Provenance provenance) {
    }

    /** From a resonant frequency measured with the installed capacitance. */
    public static Result fromMeasuredFrequency(double designFrequency, double installedCapacitance,
                                               double measuredFrequency, List<CapacitorPart> catalogue) {
        positive("measured frequency", measuredFrequency, "Hz");
        positive("capacitance", installedCapacitance, "F");
        double w = 2 * Math.PI * measuredFrequency;
        return fromMeasuredInductance(designFrequency, installedCapacitance, 1 / (w * w * installedCapacitance), catalogue);
    }

    /** From a measured inductance. */
    public static Result fromMeasuredInductance(double designFrequency, double installedCapacitance,
                                                double inductance, List<CapacitorPart> catalogue) {
        positive("design frequency", designFrequency, "Hz");
        positive("capacitance", installedCapacitance, "F");
        positive("inductance", inductance, "H");
        double w = 2 * Math.PI * designFrequency;
        double needed = 1 / (w * w * inductance);
        double trim = needed - installedCapacitance;
        String action;
        Double series = null;
        List<TrimOption> options;
        if (trim >= 0) {
            action = "add capacitance in parallel with the bank";
            options = options("parallel", trim, catalogue, installedCapacitance, inductance, designFrequency);
        } else {
            series = installedCapacitance * needed / (installedCapacitance - needed);
            action = "lower the capacitance: a part in series with the bank (it carries the full tank current),"
                    + " or remove capacitance from the bank";
            options = options("series", series, catalogue, installedCapacitance, inductance, designFrequency);
        }
        return new Result(inductance, installedCapacitance, designFrequency, needed, trim, action, series, options, PROVENANCE);
    }

    /** k = √(1 − L1,short/L1,open). */
    public static double coupling(double lOpen, double lShort) {
        positive("l-open", lOpen, "H");
        positive("l-short", lShort, "H");
        if (lShort > lOpen) {
            throw new IllegalArgumentException("l-short = " + lShort + " H exceeds l-open = " + lOpen
                    + " H: shorting the other coil can only lower the inductance; check the readings");
        }
        return Math.sqrt(1 - lShort / lOpen);
    }

    /**
     * Ways to take capacitance out of an installed bank: remove whole strings, or its trim part.
     * Each option gives the frequency it lands on.
     */
    public static List<TrimOption> removalOptions(BankLayout installed, double inductance, double designFrequency) {
        List<TrimOption> out = new ArrayList<>();
        for (int k = 1; k < installed.parallel(); k++) {
            BankLayout l = new BankLayout(installed.part(), installed.series(), installed.parallel() - k,
                    installed.trim(), installed.trimPosition());
            out.add(option("remove", List.of(installed.part()), installed.capacitance() - l.capacitance(), l.capacitance(),
                    inductance, designFrequency, "remove " + k + " string(s) of " + installed.series() + " part(s)"));
        }
        if (installed.trim() != null) {
            BankLayout l = BankLayout.of(installed.part(), installed.series(), installed.parallel());
            out.add(option("remove", List.of(installed.trim()), installed.capacitance() - l.capacitance(), l.capacitance(),
                    inductance, designFrequency, "remove the trim part"));
        }
        out.sort(Comparator.comparingDouble(o -> Math.abs(o.frequencyError())));
        return out;
    }

    private static List<TrimOption> options(String position, double wanted, List<CapacitorPart> catalogue,
                                            double installed, double inductance, double designFrequency) {
        List<TrimOption> out = new ArrayList<>();
        if (catalogue == null || wanted == 0) {
            return out;
        }
        catalogue = catalogue.stream().filter(p -> p.dielectric().suitsResonantTank()).toList(); // no class-2, no polyester
        if (catalogue.isEmpty()) {
            return out;
        }
        CapacitorPart bestSingle = null;
        for (CapacitorPart p : catalogue) {
            if (bestSingle == null || err(p.capacitance(), wanted) < err(bestSingle.capacitance(), wanted)) {
                bestSingle = p;
            }
        }
        CapacitorPart a = null;
        CapacitorPart b = null;
        for (int i = 0; i < catalogue.size(); i++) {
            double ci = catalogue.get(i).capacitance();
            if (ci > wanted * 1.5) {
                continue;
            }
            for (int j = i; j < catalogue.size(); j++) {
                double c = ci + catalogue.get(j).capacitance();
                if (a == null || err(c, wanted) < err(a.capacitance() + b.capacitance(), wanted)) {
                    a = catalogue.get(i);
                    b = catalogue.get(j);
                }
            }
        }
        String note = position.equals("series") ? "in series with the bank: it carries the full tank current"
                : "across the bank: it takes the full bank voltage";
        out.add(option(position, List.of(bestSingle), bestSingle.capacitance(), result(position, installed, bestSingle.capacitance()),
                inductance, designFrequency, note));
        if (a != null) {
            double c = a.capacitance() + b.capacitance();
            out.add(option(position, List.of(a, b), c, result(position, installed, c), inductance, designFrequency,
                    note + "; the two parts in parallel with each other"));
        }
        out.sort(Comparator.comparingDouble(o -> Math.abs(o.frequencyError())));
        return out;
    }

    private static double result(String position, double installed, double c) {
        return position.equals("series") ? installed * c / (installed + c) : installed + c;
    }

    private static TrimOption option(String position, List<CapacitorPart> parts, double c, double total,
                                     double inductance, double designFrequency, String note) {
        double f = 1 / (2 * Math.PI * Math.sqrt(inductance * total));
        return new TrimOption(position, parts, c, total, f, f / designFrequency - 1, note);
    }

    private static double err(double c, double wanted) {
        return Math.abs(Math.log(c / wanted));
    }

    private static void positive(String what, double v, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " = " + v + " " + unit + ": must be a positive number");
        }
    }
}
