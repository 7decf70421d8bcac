package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ElementStress;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.SourceKind;
import org.tankwright.design.Source;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.q;
import static org.tankwright.units.Dimension.FREQUENCY;
import static org.tankwright.units.Dimension.VOLTAGE;

/** Rules on voltages that can shock: extra-low-voltage bands, a mains-derived bus, insulation pointers. */
final class VoltageRules {
    private VoltageRules() {
    }

    private static final String ENCLOSE = "Enclose every part at this voltage so no one can touch it while powered "
            + "(covers that need a tool, or interlocked), keep probes and hands off while it runs, and treat it as "
            + "live until measured discharged.";

    /** TW-V01: any element, the bus, a sine source or a DC output above extra-low voltage. */
    static final class AboveExtraLowVoltage extends BaseRule {
        AboveExtraLowVoltage() {
            super("TW-V01", "voltage above extra-low voltage", Limits.VOLTAGE_BANDS);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            Design d = r.design();
            if (r.stresses() != null) {
                for (ElementStress s : r.stresses()) {
                    if (s == null || "S".equals(s.id()) || "D".equals(s.id())
                            || ("RL".equals(s.id()) && Read.dcOutput(d))) {
                        continue; // the bus and a DC output are judged as d.c. below
                    }
                    ac(out, s, r);
                }
            }
            dc(out, Read.busVoltage(r), "$.source.vdc_V", "the DC bus");
            if (r.network() != null && Read.dcOutput(d)) {
                dc(out, r.network().outputVoltage(), "RL", "the DC output");
            }
            Source src = d == null ? null : d.source();
            if (src != null && src.kind() == SourceKind.SINE && src.vrms() != null && src.vrms() > Limits.ELV_AC_RMS) {
                boolean high = src.vrms() > Limits.LV_AC_RMS;
                add(out, high ? Severity.DANGER : Severity.WARNING, src.vrms(),
                        high ? Limits.LV_AC_RMS : Limits.ELV_AC_RMS, "V", "$.source.vrms_V",
                        "The sine source gives " + q(src.vrms(), VOLTAGE) + " rms, above extra-low voltage ("
                                + q(Limits.ELV_AC_RMS, VOLTAGE) + " rms)" + (high ? " and above low voltage: high voltage." : "."),
                        ENCLOSE);
            }
        }

        private void ac(List<Finding> out, ElementStress s, AnalysisResult r) {
            double v = Read.max(Read.peakVoltage(s), ("C1".equals(s.id()) || "L1".equals(s.id())) ? Read.heaterTankPeak(r) : Double.NaN);
            if (!finite(v) || v <= Limits.elvAcPeak()) {
                return;
            }
            boolean high = v > Limits.lvAcPeak();
            boolean envelope = v > s.voltagePeak();
            add(out, high ? Severity.DANGER : Severity.WARNING, v, high ? Limits.lvAcPeak() : Limits.elvAcPeak(), "V",
                    s.id(), s.id() + (s.role() == null || s.role().isEmpty() ? "" : " (" + s.role() + ")") + " reaches " + q(v, VOLTAGE) + " peak "
                            + Read.where(s, envelope) + ", above extra-low voltage (" + q(Limits.ELV_AC_RMS, VOLTAGE)
                            + " rms, " + q(Limits.elvAcPeak(), VOLTAGE) + " peak for a sine)"
                            + (high ? "; above the low-voltage band too: this is high voltage." : "."),
                    ENCLOSE);
        }

        private void dc(List<Finding> out, double v, String element, String what) {
            if (!finite(v) || v <= Limits.ELV_DC) {
                return;
            }
            boolean high = v > Limits.LV_DC;
            add(out, high ? Severity.DANGER : Severity.WARNING, v, high ? Limits.LV_DC : Limits.ELV_DC, "V", element,
                    capital(what) + " is at " + q(v, VOLTAGE) + ", above extra-low voltage (" + q(Limits.ELV_DC, VOLTAGE)
                            + " ripple-free d.c.)" + (high ? "; above low voltage too: high voltage." : "."),
                    ENCLOSE);
        }
    }

    static String capital(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /** TW-V02: a DC bus taken from the mains without galvanic isolation makes every node mains-hazardous. */
    static final class MainsWithoutIsolation extends BaseRule {
        MainsWithoutIsolation() {
            super("TW-V02", "mains-derived bus without isolation", "IEC 61140 (protection against electric shock)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            Design d = r.design();
            Source s = d == null ? null : d.source();
            if (s == null) {
                return;
            }
            double bus = Read.busVoltage(r);
            if (Boolean.TRUE.equals(s.mainsDerived()) && !Boolean.TRUE.equals(s.isolated())) {
                String side = d.isLink()
                        ? "Every node of the primary side (bridge, capacitor, pad coil, its ferrite and any metal touching them)"
                        : "Every node of the circuit (bridge, tank capacitor, coil" + (d.workpiece() != null ? ", workpiece" : "") + ")";
                add(out, Severity.DANGER, bus, Double.NaN, "V", "$.source.mains_derived",
                        "The DC bus comes from the mains without galvanic isolation. " + side
                                + " is at mains potential against earth, whatever its own voltage.",
                        "Feed the bus through a mains-rated isolating transformer or an isolated converter, or build "
                                + "the whole circuit as mains equipment: enclosed, accessible metal earthed, residual-current "
                                + "protection, isolated probes or a differential probe for measurements.");
            } else if (s.mainsDerived() == null && finite(bus) && bus > Limits.ELV_DC) {
                add(out, Severity.NOTICE, bus, Limits.ELV_DC, "V", "$.source.mains_derived",
                        "The design does not say whether its " + q(bus, VOLTAGE) + " bus comes from the mains.",
                        "Set source.mains_derived (and source.isolated) so the shock checks can judge the circuit.");
            }
        }
    }

    /** TW-V03: a pointer to clearance and creepage sizing for the highest working voltage found. */
    static final class ClearanceCreepage extends BaseRule {
        ClearanceCreepage() {
            super("TW-V03", "clearance and creepage pointer", "IEC 60664-1; IEC 60664-4 above 30 kHz");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            double v = Double.NaN;
            String at = "";
            if (r.stresses() != null) {
                for (ElementStress s : r.stresses()) {
                    double p = Read.peakVoltage(s);
                    if (finite(p) && (!finite(v) || p > v)) {
                        v = p;
                        at = s.id();
                    }
                }
            }
            if (!finite(v) || v <= Limits.elvAcPeak()) {
                return;
            }
            double f = Read.frequency(r);
            boolean hf = finite(f) && f > Limits.IEC_60664_4_FROM;
            add(out, Severity.NOTICE, v, Double.NaN, "V", at,
                    "The highest working voltage is " + q(v, VOLTAGE) + " peak across " + at
                            + (finite(f) ? " at " + q(f, FREQUENCY) : "") + ". This is a pointer, not a layout check.",
                    "Size clearances and creepage distances for this peak working voltage by IEC 60664-1 (pollution "
                            + "degree, material group, overvoltage category)"
                            + (hf ? "; above 30 kHz also by IEC 60664-4, which lowers the withstand of air gaps and "
                            + "solid insulation with frequency and adds heating of the insulation." : "."));
        }
    }
}
