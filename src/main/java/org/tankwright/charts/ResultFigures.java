package org.tankwright.charts;

import java.util.List;
import org.tankwright.analysis.AnalysisResult;

/**
 * The figures of one result, in the order the window's plot tabs and the sheet show them.
 * Each is drawn from series the result holds; a figure whose series the result does not hold
 * says so instead of showing an empty plot.
 */
public final class ResultFigures {

    /** Titles, in order. */
    public static final List<String> TITLES = List.of(
            "Input impedance", "Power and efficiency", "Capacitor voltage", "Coupling", "Operating envelope", "Tolerance");

    private static final String NO_SWEEP = "Not computed for this design: the analysis result holds no frequency sweep yet.";

    private ResultFigures() {
    }

    /** Every figure of {@code r}, styled with {@code style}. */
    public static List<Figure> all(AnalysisResult r, ChartStyle style) {
        return List.of(
                Figure.missing(TITLES.get(0), NO_SWEEP),
                Figure.missing(TITLES.get(1), NO_SWEEP),
                Figure.missing(TITLES.get(2), NO_SWEEP),
                Figure.missing(TITLES.get(3), r.design().isLink()
                        ? "Not computed for this design: the analysis result holds no coupling sweep over distance and offset yet."
                        : "Not applicable: a single tank has no second coil to couple to."),
                Figure.missing(TITLES.get(4), "Not computed for this design: the analysis result holds no envelope map yet."),
                Figure.missing(TITLES.get(5), "Not computed for this design: the analysis result holds no tolerance study samples yet."));
    }
}
