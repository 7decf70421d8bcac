package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ElementStress;
import org.tankwright.design.Coil;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.LoadKind;
import org.tankwright.design.Enums.SourceKind;
import org.tankwright.design.Enums.Topology;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/** Null- and NaN-safe reading of a result, and the formatting the rules' messages share. */
final class Read {
    private Read() {
    }

    /** The stress row of an element, or null. */
    static ElementStress stress(AnalysisResult r, String id) {
        if (r.stresses() == null) {
            return null;
        }
        for (ElementStress s : r.stresses()) {
            if (s != null && id.equals(s.id())) {
                return s;
            }
        }
        return null;
    }

    /** The largest finite value among {@code xs}, or NaN when none is finite. */
    static double max(double... xs) {
        double m = Double.NaN;
        for (double x : xs) {
            if (Double.isFinite(x) && (Double.isNaN(m) || x > m)) {
                m = x;
            }
        }
        return m;
    }

    /** The worst peak voltage of a stress row (operating point or envelope), NaN when unknown. */
    static double peakVoltage(ElementStress s) {
        return s == null ? Double.NaN : max(s.voltagePeak(), s.worstVoltagePeak());
    }

    /** The worst rms current of a stress row (operating point or envelope), NaN when unknown. */
    static double rmsCurrent(ElementStress s) {
        return s == null ? Double.NaN : max(s.currentRms(), s.worstCurrentRms());
    }

    /** How much the envelope's worst voltage exceeds the operating point's (1 without an envelope). */
    static double voltageScale(ElementStress s) {
        return s != null && s.voltagePeak() > 0 && s.worstVoltagePeak() > s.voltagePeak()
                ? s.worstVoltagePeak() / s.voltagePeak() : 1.0;
    }

    /** How much the envelope's worst current exceeds the operating point's (1 without an envelope). */
    static double currentScale(ElementStress s) {
        return s != null && s.currentRms() > 0 && s.worstCurrentRms() > s.currentRms()
                ? s.worstCurrentRms() / s.currentRms() : 1.0;
    }

    /** Where the worst point of a stress lies, for messages ("at the operating point" or "at ..."). */
    static String where(ElementStress s, boolean envelopeWorse) {
        if (!envelopeWorse) {
            return "at the operating point";
        }
        return s != null && s.worstAt() != null && !s.worstAt().isEmpty()
                ? "at the worst envelope point (" + s.worstAt() + ")" : "at the worst operating point";
    }

    /** The DC bus voltage: the network's, else the design's {@code source.vdc_V}; NaN when neither is known. */
    static double busVoltage(AnalysisResult r) {
        if (r.network() != null && finite(r.network().busVoltage())) {
            return r.network().busVoltage();
        }
        Design d = r.design();
        return d != null && d.source() != null && d.source().vdc() != null ? d.source().vdc() : Double.NaN;
    }

    /** A heater's tank peak voltage over its cold and hot points (√2 × the larger rms), NaN without a heater. */
    static double heaterTankPeak(AnalysisResult r) {
        if (r.heater() == null) {
            return Double.NaN;
        }
        double cold = r.heater().cold() == null ? Double.NaN : r.heater().cold().capacitorVoltage();
        double hot = r.heater().hot() == null ? Double.NaN : r.heater().hot().capacitorVoltage();
        return Math.sqrt(2) * max(cold, hot);
    }

    static boolean finite(double x) {
        return Double.isFinite(x);
    }

    /** The operating frequency: the network's, else the design's; NaN when neither is known. */
    static double frequency(AnalysisResult r) {
        if (r.network() != null && finite(r.network().frequency()) && r.network().frequency() > 0) {
            return r.network().frequency();
        }
        return r.design() != null && r.design().frequency() != null ? r.design().frequency() : Double.NaN;
    }

    static Topology topology(Design d) {
        return d == null || d.compensation() == null ? null : d.compensation().topology();
    }

    static SourceKind sourceKind(Design d) {
        return d == null || d.source() == null ? null : d.source().kind();
    }

    static boolean voltageFedBridge(Design d) {
        SourceKind k = sourceKind(d);
        return k == SourceKind.FULL_BRIDGE || k == SourceKind.HALF_BRIDGE;
    }

    /** Whether the coil on {@code side} (0 primary, 1 secondary) has its capacitor in series. */
    static boolean seriesCompensated(Design d, int side) {
        Topology t = topology(d);
        if (t == null) {
            return false;
        }
        return switch (t) {
            case SS -> true;
            case SP -> side == 0;
            case PS -> side == 1;
            case SERIES -> side == 0;
            default -> false;
        };
    }

    /** Whether the load is behind a rectifier (a DC output). */
    static boolean dcOutput(Design d) {
        return d != null && d.load() != null && d.load().kind() != null && d.load().kind() != LoadKind.RESISTOR;
    }

    /** The design's coil on a side (0 primary, 1 secondary), or null. */
    static Coil coil(Design d, int side) {
        if (d == null) {
            return null;
        }
        return side == 0 ? d.primary() : d.secondary();
    }

    /** The JSON path of a coil. */
    static String coilPath(int side) {
        return side == 0 ? "$.primary" : "$.secondary";
    }

    /** The inductor's element id on a side. */
    static String coilId(int side) {
        return side == 0 ? "L1" : "L2";
    }

    /** A quantity with its unit, through the one formatter ({@code "2.70 kV"}). */
    static String q(double v, Dimension d) {
        return Quantities.format(v, d, 3);
    }

    /** A plain number to {@code sig} significant digits. */
    static String num(double x, int sig) {
        return Quantities.number(x, sig);
    }

    /** A fraction as a percentage ({@code "12 %"}). */
    static String pct(double fraction) {
        return Quantities.format(fraction, Dimension.FRACTION, 2);
    }
}
