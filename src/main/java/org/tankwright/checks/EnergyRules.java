package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.BankReport;
import org.tankwright.units.Dimension;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.q;

/** Rules on energy and charge stored in capacitors, with the discharge caution. */
final class EnergyRules {
    private EnergyRules() {
    }

    /** What to do before touching a charged capacitor: shared by every stored-energy finding. */
    static final String DISCHARGE = "Fit bleeder resistors that bring it below extra-low voltage within seconds of "
            + "switch-off, then before touching: switch off, wait, and measure it discharged with a meter rated for "
            + "the voltage; short it through a resistor, never with a bare screwdriver.";

    /** The bank's peak voltage across the whole bank at the envelope's worst point, V. */
    static double bankPeak(AnalysisResult r, BankReport b) {
        return b.partVoltagePeak() * Math.max(1, b.seriesCount()) * Read.voltageScale(Read.stress(r, b.id()));
    }

    /** TW-E01: energy ½CV² in a capacitor bank at the hazardous-energy level. */
    static final class BankEnergy extends BaseRule {
        BankEnergy() {
            super("TW-E01", "stored energy in a capacitor bank",
                    "IEC 60950-1 hazardous energy level (20 J; from memory)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (BankReport b : CapacitorRules.banks(r)) {
                double v = bankPeak(r, b);
                double e = 0.5 * b.capacitance() * v * v;
                if (finite(e) && e >= Limits.HAZARDOUS_ENERGY) {
                    add(out, Severity.WARNING, e, Limits.HAZARDOUS_ENERGY, "J", b.id(),
                            b.id() + " stores up to " + q(e, Dimension.ENERGY) + " (½CV² at " + q(v, Dimension.VOLTAGE)
                                    + " peak): enough to burn, weld a tool or throw molten metal when shorted.",
                            DISCHARGE);
                }
            }
        }
    }

    /** TW-E02: charge C·V of a bank above extra-low voltage, enough for a dangerous discharge shock. */
    static final class BankCharge extends BaseRule {
        BankCharge() {
            super("TW-E02", "charge of a capacitor bank", "IEC 61010-1 §6.3 (45 µC; from memory)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (BankReport b : CapacitorRules.banks(r)) {
                double v = bankPeak(r, b);
                double c = b.capacitance() * v;
                if (finite(c) && v > Limits.elvAcPeak() && c >= Limits.HAZARDOUS_CHARGE) {
                    add(out, Severity.WARNING, c, Limits.HAZARDOUS_CHARGE, "C", b.id(),
                            b.id() + " can hold " + Read.num(c * 1e6, 3) + " µC at "
                                    + q(v, Dimension.VOLTAGE) + " peak if switched off at the wrong instant: a discharge "
                                    + "through the body at this charge can be dangerous.",
                            DISCHARGE);
                }
            }
        }
    }

    /** TW-E03: a DC bus above extra-low voltage keeps its link capacitor charged after switch-off. */
    static final class DcLink extends BaseRule {
        DcLink() {
            super("TW-E03", "DC-link capacitor stays charged",
                    "IEC 61140 / IEC 60449 voltage bands; IEC 60950-1 hazardous energy level (20 J; from memory)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            double v = Read.busVoltage(r);
            if (!finite(v) || v <= Limits.ELV_DC) {
                return;
            }
            double perHundredMicro = 0.5 * 100e-6 * v * v;
            double cHazard = 2 * Limits.HAZARDOUS_ENERGY / (v * v);
            add(out, Severity.CAUTION, v, Limits.ELV_DC, "V", "$.source.vdc_V",
                    "The DC link holds " + q(v, Dimension.VOLTAGE) + " after switch-off until it is discharged: "
                            + q(perHundredMicro, Dimension.ENERGY) + " per 100 µF of link capacitance; "
                            + Read.num(cHazard * 1e6, 3) + " µF or more holds "
                            + q(Limits.HAZARDOUS_ENERGY, Dimension.ENERGY) + ".",
                    DISCHARGE);
        }
    }
}
