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
                    Limits.HAZARDOUS_ENERGY_SOURCE);
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

    /**
     * TW-E02: a bank's discharge against the limits for a part not to count as live: capacitance
     * up to 450 V peak, charge up to 15 kV, energy above.
     */
    static final class BankCharge extends BaseRule {
        BankCharge() {
            super("TW-E02", "discharge of a capacitor bank", Limits.DISCHARGE_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (BankReport b : CapacitorRules.banks(r)) {
                double v = bankPeak(r, b);
                double c = b.capacitance();
                if (!finite(v) || !finite(c) || v <= Limits.DISCHARGE_FROM_PEAK) {
                    continue;
                }
                double value;
                double limit;
                String unit;
                String what;
                if (v <= Limits.DISCHARGE_CAPACITANCE_UPTO) {
                    value = c;
                    limit = Limits.DISCHARGE_CAPACITANCE;
                    unit = "F";
                    what = q(c, Dimension.CAPACITANCE) + " charged to " + q(v, Dimension.VOLTAGE) + " peak (above "
                            + q(limit, Dimension.CAPACITANCE) + " at this voltage)";
                } else if (v <= Limits.DISCHARGE_CHARGE_UPTO) {
                    value = c * v;
                    limit = Limits.DISCHARGE_CHARGE;
                    unit = "C";
                    what = Read.num(value * 1e6, 3) + " µC at " + q(v, Dimension.VOLTAGE) + " peak (above "
                            + Read.num(limit * 1e6, 3) + " µC at this voltage)";
                } else {
                    value = 0.5 * c * v * v;
                    limit = Limits.DISCHARGE_ENERGY;
                    unit = "J";
                    what = q(value, Dimension.ENERGY) + " at " + q(v, Dimension.VOLTAGE) + " peak (above "
                            + q(limit, Dimension.ENERGY) + ")";
                }
                if (value > limit) {
                    add(out, Severity.WARNING, value, limit, unit, b.id(),
                            b.id() + " can be left holding " + what + " if switched off at the wrong instant: its "
                                    + "discharge through the body is a shock hazard.",
                            DISCHARGE);
                }
            }
        }
    }

    /** TW-E03: a DC bus above extra-low voltage keeps its link capacitor charged after switch-off. */
    static final class DcLink extends BaseRule {
        DcLink() {
            super("TW-E03", "DC-link capacitor stays charged",
                    Limits.VOLTAGE_BANDS + "; " + Limits.HAZARDOUS_ENERGY_SOURCE);
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
