package org.tankwright.ui.panes;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Compensation;
import org.tankwright.design.Design;
import org.tankwright.design.Token;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/**
 * The key figures of a result as rows of text, each through the one formatter. Only what the
 * result holds is shown; what it does not hold yet is said once, never shown as zero.
 */
final class Readings {

    /** One row: what, its value, and a note (the source or why it is missing). */
    record Row(String quantity, String value, String note) { }

    private Readings() {
    }

    /** What the result does not hold yet, said once below the table; null when it holds everything. */
    static String missing(AnalysisResult r) {
        return "Not computed by this version of the analysis: coil L, R, Q and SRF, M and k, tuned capacitors,"
                + " output power, efficiency and input phase.";
    }

    static List<Row> of(AnalysisResult r) {
        List<Row> rows = new ArrayList<>();
        Design d = r.design();
        rows.add(new Row("design", d.name(), Token.of(d.kind())));
        Compensation c = d.compensation();
        rows.add(new Row("compensation", c.topology().token(), ""));
        rows.add(new Row("design frequency", Quantities.format(d.frequency(), Dimension.FREQUENCY, 4), "given"));
        rows.add(capacitor("C1 (primary)", c.c1()));
        if (!c.topology().singleTank()) {
            rows.add(capacitor("C2 (secondary)", c.c2()));
        }
        if (d.source() != null) {
            rows.add(new Row("source", Token.of(d.source().kind()), sourceLevel(d)));
        }
        if (d.placement() != null && d.placement().distance() != null) {
            rows.add(new Row("distance", Quantities.format(d.placement().distance(), Dimension.LENGTH, 3), "given"));
        }
        rows.add(new Row("analysis time", Quantities.format(r.computeNanos() * 1e-9, Dimension.TIME, 3), ""));
        return rows;
    }

    private static Row capacitor(String what, Double value) {
        return value == null ? new Row(what, "auto", "tuned by the analysis")
                : new Row(what, Quantities.format(value, Dimension.CAPACITANCE, 3), "given");
    }

    private static String sourceLevel(Design d) {
        var s = d.source();
        if (s.vdc() != null) {
            return Quantities.format(s.vdc(), Dimension.VOLTAGE, 3) + " bus";
        }
        if (s.vrms() != null) {
            return Quantities.format(s.vrms(), Dimension.VOLTAGE, 3) + " rms";
        }
        if (s.irms() != null) {
            return Quantities.format(s.irms(), Dimension.CURRENT, 3) + " rms";
        }
        return "";
    }
}
