package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.CoilReport;
import org.tankwright.analysis.ElementStress;
import org.tankwright.design.Coil;
import org.tankwright.design.Enums.CoilShape;
import org.tankwright.design.Enums.WireKind;
import org.tankwright.units.Dimension;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.q;

/** Rules on the coils: self-resonance, current density, litz strands, turn and winding voltages. */
final class CoilRules {
    private CoilRules() {
    }

    /** A coil report with its side (0 primary or work coil, 1 secondary) and its design entry. */
    record Side(int index, CoilReport report, Coil coil) {
        String path() {
            return Read.coilPath(index);
        }

        String id() {
            return Read.coilId(index);
        }

        String name() {
            return report.role() + " coil" + (report.label() == null || report.label().isEmpty() ? "" : " \"" + report.label() + "\"");
        }
    }

    /** The coils of a result, each with its side and design entry. */
    static List<Side> sides(AnalysisResult r) {
        if (r.coils() == null) {
            return List.of();
        }
        List<Side> out = new java.util.ArrayList<>();
        for (int i = 0; i < r.coils().size() && i < 2; i++) {
            if (r.coils().get(i) != null) {
                out.add(new Side(i, r.coils().get(i), Read.coil(r.design(), i)));
            }
        }
        return out;
    }

    /** TW-L01: the coil's self-resonance below or too close to the operating frequency. */
    static final class SelfResonance extends BaseRule {
        SelfResonance() {
            super("TW-L01", "coil self-resonance", Limits.SRF_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            double f = Read.frequency(r);
            for (Side s : sides(r)) {
                CapacitorRules.srf(this, out, s.report().selfResonance(), f, s.path(), "the " + s.name());
            }
        }
    }

    /** TW-L02: rms current density in a round or litz winding above what still air cools. */
    static final class CurrentDensity extends BaseRule {
        CurrentDensity() {
            super("TW-L02", "current density in the winding", Limits.CURRENT_DENSITY_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (Side s : sides(r)) {
                WireKind kind = s.coil() == null || s.coil().wire() == null ? null
                        : s.coil().wire().kind() == null ? WireKind.ROUND : s.coil().wire().kind();
                if (kind != WireKind.ROUND && kind != WireKind.LITZ) {
                    continue; // tubes are water-cooled (TW-H03); traces follow their own rules
                }
                double i = Read.rmsCurrent(Read.stress(r, s.id()));
                double a = s.report().conductorArea();
                if (!finite(i) || !finite(a) || a <= 0) {
                    continue;
                }
                double j = i / a;
                if (j > Limits.CURRENT_DENSITY_AIR) {
                    add(out, Severity.NOTICE, j, Limits.CURRENT_DENSITY_AIR, "A/m²", s.path() + ".wire",
                            "The " + s.name() + " carries " + q(i, Dimension.CURRENT) + " rms in "
                                    + num(a * 1e6) + " mm² of copper: " + num(j / 1e6)
                                    + " A/mm², above the " + num(Limits.CURRENT_DENSITY_AIR / 1e6)
                                    + " A/mm² an air-cooled winding usually carries.",
                            "Use a thicker conductor or more litz strands, or plan forced cooling and check the "
                                    + "winding temperature against the insulation's class.");
                }
            }
        }

        private static String num(double x) {
            return Read.num(x, 3);
        }
    }

    /** TW-L03: litz strands thicker than the skin depth. */
    static final class LitzStrands extends BaseRule {
        LitzStrands() {
            super("TW-L03", "litz strand diameter against skin depth",
                    "common practice; Sullivan, IEEE Trans. Power Electronics 14(2), 1999");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (Side s : sides(r)) {
                double d = s.report().strandDiameter();
                double delta = s.report().skinDepth();
                if (!finite(d) || !finite(delta) || delta <= 0) {
                    continue;
                }
                double limit = Limits.LITZ_STRAND_PER_SKIN_DEPTH * delta;
                if (d > limit) {
                    add(out, Severity.NOTICE, d, limit, "m", s.path() + ".wire.strand_diameter_m",
                            "The litz strands of the " + s.name() + " (" + q(d, Dimension.LENGTH) + ") are thicker "
                                    + "than the skin depth (" + q(delta, Dimension.LENGTH) + "): skin and proximity "
                                    + "losses rise and the litz loses its point.",
                            "Choose litz with strands no thicker than the skin depth at the operating frequency.");
                }
            }
        }
    }

    /** The coil's worst terminal peak voltage, NaN when unknown. */
    static double coilVoltage(AnalysisResult r, Side s) {
        return Read.peakVoltage(Read.stress(r, s.id()));
    }

    /**
     * TW-L04: voltage between adjacent turns (or layers) above the minimum of Paschen's curve in
     * air, where partial discharge can start and erode the insulation.
     */
    static final class TurnToTurn extends BaseRule {
        TurnToTurn() {
            super("TW-L04", "voltage between adjacent turns", Limits.PASCHEN_SOURCE);
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (Side s : sides(r)) {
                double v = coilVoltage(r, s);
                double n = s.report().turns();
                if (!finite(v) || !finite(n) || n < 2) {
                    continue;
                }
                Integer layers = s.coil() == null ? null : s.coil().layers();
                boolean multi = s.coil() != null && s.coil().shape() == CoilShape.MULTILAYER && layers != null && layers > 1;
                // Uniform distribution along the winding: V/N between turns; between the ends of adjacent layers of a
                // back-and-forth winding 2·V/layers (common practice).
                double adjacent = multi ? 2 * v / layers : v / n;
                if (adjacent > Limits.PASCHEN_MIN_AIR) {
                    add(out, Severity.NOTICE, adjacent, Limits.PASCHEN_MIN_AIR, "V", s.path(),
                            "Adjacent " + (multi ? "layers" : "turns") + " of the " + s.name() + " differ by about "
                                    + q(adjacent, Dimension.VOLTAGE) + " peak (voltage spread evenly over the winding), "
                                    + "above the " + q(Limits.PASCHEN_MIN_AIR, Dimension.VOLTAGE)
                                    + " below which air cannot break down: partial discharge can erode the insulation.",
                            "Space the turns, use insulation rated for the voltage and frequency (partial-discharge free), "
                                    + (multi ? "wind in sections (bank winding) to lower the voltage between layers, " : "")
                                    + "or split the winding's voltage with a distributed capacitor.");
                }
            }
        }
    }

    /**
     * TW-L05: the winding's voltage to ferrite or ground above the Paschen minimum; a series
     * capacitor split across both coil ends halves it (common practice).
     */
    static final class WindingToCore extends BaseRule {
        WindingToCore() {
            super("TW-L05", "winding voltage to ferrite or ground",
                    Limits.PASCHEN_SOURCE + "; common practice of split series capacitors");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            for (Side s : sides(r)) {
                double v = coilVoltage(r, s);
                if (!finite(v) || v <= Limits.PASCHEN_MIN_AIR) {
                    continue;
                }
                boolean series = Read.seriesCompensated(r.design(), s.index());
                boolean ferrite = s.coil() != null && s.coil().backing() != null;
                String to = ferrite ? "its ferrite or shield and ground" : "ground and nearby metal";
                String action = series
                        ? "Split the series capacitor into two parts of twice the capacitance, one at each end of the "
                        + "coil: the winding then swings about " + q(v / 2, Dimension.VOLTAGE) + " peak either side of "
                        + "its middle instead of " + q(v, Dimension.VOLTAGE) + ". Insulate the winding from " + to
                        + " for the remaining voltage."
                        : "Insulate the winding from " + to + " for this voltage (creepage, partial-discharge-free "
                        + "insulation); with parallel compensation the full voltage stays across the coil.";
                add(out, Severity.NOTICE, v, Limits.PASCHEN_MIN_AIR, "V", s.path(),
                        "The terminals of the " + s.name() + " reach " + q(v, Dimension.VOLTAGE) + " peak; with "
                                + (series ? "its capacitor at one end" : "a grounded end") + " nearly all of it can "
                                + "appear between the winding and " + to + ".",
                        action);
            }
        }
    }
}
