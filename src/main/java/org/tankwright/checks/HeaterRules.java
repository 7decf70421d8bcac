package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.HeaterReport;
import org.tankwright.design.Coil;
import org.tankwright.design.Enums.WireKind;
import org.tankwright.units.Dimension;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.q;

/** Rules for induction heaters: hot metal, stray metal, cooling of the work coil. */
final class HeaterRules {
    private HeaterRules() {
    }


    /** TW-H01: the workpiece gets hot enough to burn. */
    static final class HotWorkpiece extends BaseRule {
        HotWorkpiece() {
            super("TW-H01", "hot workpiece", Limits.BURN_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            HeaterReport h = r.heater();
            if (h == null || h.hot() == null || !finite(h.hot().temperature())
                    || h.hot().temperature() <= Limits.BURN_THRESHOLD_C) {
                return;
            }
            add(out, Severity.WARNING, h.hot().temperature(), Limits.BURN_THRESHOLD_C, "°C",
                    "$.workpiece.temperature_hot_degC",
                    "The workpiece is heated to " + q(h.hot().temperature(), Dimension.TEMPERATURE)
                            + ", far above the " + q(Limits.BURN_THRESHOLD_C, Dimension.TEMPERATURE)
                            + " at which bare metal burns skin; it stays hot long after the heater stops and may not glow.",
                    "Handle the workpiece with tongs and heat-resistant gloves, set it down on a non-flammable rest, "
                            + "keep flammables away, and wear eye protection.");
        }
    }

    /** TW-H02: stray metal (rings, watches, tools) near a work coil heats fast. */
    static final class StrayMetal extends BaseRule {
        StrayMetal() {
            super("TW-H02", "stray metal near the work coil", "common practice (induction heats any conductor in the field)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            HeaterReport h = r.heater();
            if (h == null) {
                return;
            }
            double field = h.cold() == null ? Double.NaN : h.cold().surfaceField();
            add(out, Severity.CAUTION, field, Double.NaN, "A/m", "$.workpiece",
                    "The work coil's field" + (finite(field) ? " (about " + q(field, Dimension.FIELD_STRENGTH)
                            + " at the workpiece)" : "") + " heats any metal inside or near it within seconds: rings, "
                            + "watches, bracelets, tools, screws and the bench.",
                    "Take off rings, watches and jewellery before working at the heater, keep tools and loose metal "
                            + "away from the coil, and build the fixture from non-conducting, heat-resistant parts.");
        }
    }

    /** TW-H03: the work coil's loss needs coolant flow (or cannot be shed in air). */
    static final class Coolant extends BaseRule {
        Coolant() {
            super("TW-H03", "work-coil cooling", Limits.WORK_COIL_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            HeaterReport h = r.heater();
            if (h == null) {
                return;
            }
            double loss = Read.max(h.cold() == null ? Double.NaN : h.cold().coilLoss(),
                    h.hot() == null ? Double.NaN : h.hot().coilLoss());
            if (!finite(loss) || loss <= Limits.WORK_COIL_AIR_LOSS) {
                return;
            }
            Coil c = r.design() == null ? null : r.design().primary();
            boolean tube = c != null && c.wire() != null && c.wire().kind() == WireKind.TUBE;
            double rise = r.design() != null && r.design().workpiece() != null ? r.design().workpiece().coolantRise() : Double.NaN;
            if (tube) {
                double flow = h.coolantFlow();
                add(out, Severity.CAUTION, flow, Double.NaN, "m³/s", "$.workpiece.coolant_rise_degC",
                        "The work coil dissipates up to " + q(loss, Dimension.POWER) + ": it needs a coolant flow of at "
                                + "least " + (finite(flow) ? Read.num(flow * 6e4, 3)
                                + " L/min" : "the computed value") + (finite(rise) ? " of water for a " + q(rise,
                                Dimension.TEMPERATURE) + " rise" : "") + ". Without flow the tube overheats within "
                                + "seconds and can burst with steam.",
                        "Run the water before the inverter, fit a flow switch that stops the inverter, keep the outlet "
                                + "below 40 °C or so, and use non-conductive hose long enough to insulate the coil's voltage.");
            } else {
                add(out, Severity.CAUTION, loss, Limits.WORK_COIL_AIR_LOSS, "W", "$.primary.wire",
                        "The work coil dissipates up to " + q(loss, Dimension.POWER) + " but is not a cooled tube: "
                                + "it will run hot enough to burn and to damage its insulation.",
                        "Wind the work coil from copper tube with water flowing through it, or cool it with forced air and use "
                                + "insulation rated for its temperature, or lower the coil current.");
            }
        }
    }

    /** TW-H04: the work coil itself runs hot enough to burn. */
    static final class HotWorkCoil extends BaseRule {
        HotWorkCoil() {
            super("TW-H04", "hot work coil", Limits.BURN_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            if (r.heater() == null || r.design() == null || r.design().primary() == null) {
                return;
            }
            double t = r.design().primary().temperature();
            if (!finite(t) || t <= Limits.BURN_THRESHOLD_C) {
                return;
            }
            add(out, Severity.CAUTION, t, Limits.BURN_THRESHOLD_C, "°C", "$.primary.temperature_degC",
                    "The work coil runs at " + q(t, Dimension.TEMPERATURE) + ", above the "
                            + q(Limits.BURN_THRESHOLD_C, Dimension.TEMPERATURE) + " at which bare metal burns skin.",
                    "Increase the coolant flow to keep the coil cool, and do not touch it until it has cooled.");
        }
    }
}
