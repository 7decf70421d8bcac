package org.tankwright.ui.panes;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.CoilReport;
import org.tankwright.analysis.CouplingReport;
import org.tankwright.analysis.HeaterReport;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.design.Compensation;
import org.tankwright.design.Design;
import org.tankwright.design.Token;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/**
 * The key figures of a result as rows of text, each through the one formatter. Only what the
 * result holds is shown; a value it does not hold is shown as a dash, never as zero or NaN,
 * and the sections it lacks are named once below the table.
 */
final class Readings {

    /** One row: what, its value, and a note (its source, or why it is missing). */
    record Row(String quantity, String value, String note) { }

    private Readings() {
    }

    /** What the result does not hold, said once below the table; null when it holds every section that applies. */
    static String missing(AnalysisResult r) {
        List<String> gaps = new ArrayList<>();
        if (r.coils() == null || r.coils().isEmpty()) {
            gaps.add("coil L, R, Q and SRF");
        }
        if (r.design().isLink() && r.coupling() == null) {
            gaps.add("M and k");
        }
        if (r.network() == null) {
            gaps.add("tuned capacitors, output power, efficiency and input phase");
        }
        if (r.design().workpiece() != null && r.heater() == null) {
            gaps.add("the heater's cold and hot points");
        }
        return gaps.isEmpty() ? null : "Not computed for this design: " + String.join("; ", gaps) + ".";
    }

    static List<Row> of(AnalysisResult r) {
        List<Row> rows = new ArrayList<>();
        Design d = r.design();
        NetworkReport n = r.network();
        rows.add(new Row("design", d.name(), Token.of(d.kind())));
        Compensation c = d.compensation();
        rows.add(new Row("compensation", c.topology().token(), ""));
        rows.add(new Row("design frequency", q(d.frequency(), Dimension.FREQUENCY, 4), "given"));
        if (n != null) {
            double[] zs = n.zeroPhaseFrequencies();
            for (int i = 0; i < zs.length; i++) {
                // several zero-phase frequencies (a bifurcated link) are numbered from the lowest
                String name = zs.length == 1 ? "zero-phase frequency" : "zero-phase frequency " + (i + 1) + " of " + zs.length;
                rows.add(new Row(name, q(zs[i], Dimension.FREQUENCY, 4), n.bifurcated() ? "bifurcated" : ""));
            }
        }
        for (CoilReport coil : r.coils() == null ? List.<CoilReport>of() : r.coils()) {
            String who = coil.label() != null ? coil.label() : coil.role();
            rows.add(new Row("L " + who, q(coil.inductance(), Dimension.INDUCTANCE, 3), coil.inductanceSource()));
            rows.add(new Row("R ac " + who, q(coil.resistanceAc(), Dimension.RESISTANCE, 3), coil.resistanceModel()));
            rows.add(new Row("Q " + who, Quantities.number(coil.q(), 3), "ωL/R ac"));
            rows.add(new Row("SRF " + who, q(coil.selfResonance(), Dimension.FREQUENCY, 3), "estimated self-resonance"));
        }
        CouplingReport k = r.coupling();
        if (k != null) {
            rows.add(new Row("M", q(k.mutual(), Dimension.INDUCTANCE, 3), k.source()));
            rows.add(new Row("k", Quantities.number(k.k(), 3), k.source()));
        }
        if (n != null) {
            rows.add(new Row("C1 (primary)", q(n.c1(), Dimension.CAPACITANCE, 3), c.c1() == null ? "tuned" : "given"));
            if (!c.topology().singleTank()) {
                rows.add(new Row("C2 (secondary)", q(n.c2(), Dimension.CAPACITANCE, 3), c.c2() == null ? "tuned" : "given"));
            }
            rows.add(new Row("output power", q(n.powerOut(), Dimension.POWER, 3), "into the load"));
            rows.add(new Row("efficiency", q(n.efficiency(), Dimension.FRACTION, 3), "output / input power"));
            rows.add(new Row("input phase", q(n.inputPhaseDeg(), Dimension.ANGLE, 3), "positive is inductive"));
            rows.add(new Row("source current", q(n.sourceCurrent(), Dimension.CURRENT, 3), "rms"));
        } else {
            rows.add(capacitor("C1 (primary)", c.c1()));
            if (!c.topology().singleTank()) {
                rows.add(capacitor("C2 (secondary)", c.c2()));
            }
        }
        HeaterReport h = r.heater();
        if (h != null) {
            rows.add(new Row("power cold → hot", q(h.cold().power(), Dimension.POWER, 3) + " → " + q(h.hot().power(), Dimension.POWER, 3), ""));
            rows.add(new Row("frequency cold → hot", q(h.cold().resonantFrequency(), Dimension.FREQUENCY, 3) + " → "
                    + q(h.hot().resonantFrequency(), Dimension.FREQUENCY, 3), ""));
            rows.add(new Row("heating time", q(h.heatingTime(), Dimension.TIME, 3), "estimate"));
        }
        if (r.exposure() != null) {
            rows.add(new Row("B at " + q(r.exposure().distance(), Dimension.LENGTH, 2), q(r.exposure().bRms(), Dimension.FLUX_DENSITY, 3),
                    r.exposure().method()));
        }
        rows.add(new Row("analysis time", q(r.computeNanos() * 1e-9, Dimension.TIME, 3), ""));
        return rows;
    }

    /** A value through the one formatter; a dash when the result has none. */
    static String q(double v, Dimension d, int sig) {
        return Double.isFinite(v) ? Quantities.format(v, d, sig) : "—";
    }

    private static Row capacitor(String what, Double value) {
        return value == null ? new Row(what, "auto", "to be tuned by the analysis")
                : new Row(what, Quantities.format(value, Dimension.CAPACITANCE, 3), "given");
    }
}
