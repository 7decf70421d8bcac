package org.tankwright.charts;

import org.tankwright.analysis.ToleranceRun;
import org.tankwright.tolerance.StudyResult;
import org.tankwright.units.Dimension;

/** Histograms of a tolerance study's outcomes. */
public final class ToleranceFigures {

    private ToleranceFigures() {
    }

    /** The dimension an outcome is given in, from its name. */
    public static Dimension dimensionOf(String outcome) {
        return switch (outcome) {
            case ToleranceRun.FREQUENCY -> Dimension.FREQUENCY;
            case ToleranceRun.POWER -> Dimension.POWER;
            case ToleranceRun.EFFICIENCY -> Dimension.FRACTION;
            case ToleranceRun.C1_VOLTAGE -> Dimension.VOLTAGE;
            default -> Dimension.DIMENSIONLESS;
        };
    }

    /** The histogram of {@code outcome} over the study's completed samples. */
    public static Figure histogram(StudyResult r, String outcome, ChartStyle style) {
        int j = r.outcomeNames().indexOf(outcome);
        String title = "Tolerance: " + outcome.replace('_', ' ');
        if (j < 0 || r.completed() == 0) {
            return Figure.missing(title, "Not computed: the study has no samples of " + outcome + ".");
        }
        int q = r.outcomeNames().size();
        double[] values = new double[r.completed()];
        for (int i = 0; i < values.length; i++) {
            values[i] = r.outcomeValues()[i * q + j];
        }
        int bins = (int) Math.max(10, Math.min(60, Math.sqrt(values.length)));
        String subtitle = r.completed() + " of " + r.requested() + " samples" + (r.cancelled() ? " (stopped)" : "")
                + ", yield " + Math.round(r.overallYield() * 1000) / 10.0 + " %";
        return Figure.of(title, MapFigures.histogram(title + " — " + subtitle, outcome.replace('_', ' '), dimensionOf(outcome),
                values, bins, style));
    }
}
