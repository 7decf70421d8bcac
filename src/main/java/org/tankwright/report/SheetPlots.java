package org.tankwright.report;

import org.jfree.chart.JFreeChart;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.charts.ChartStyle;
import org.tankwright.charts.Figure;
import org.tankwright.charts.ResultFigures;

import java.awt.Font;
import java.util.List;

/**
 * The sheet's plots: the shared figures of a result ({@link ResultFigures}, the same the window
 * shows: input impedance and phase, power and efficiency, capacitor voltage against frequency,
 * coupling against distance and offset, the envelope map) in paper colours with a font sized
 * for print. A figure the result cannot draw is left out of the sheet.
 */
final class SheetPlots {
    private SheetPlots() {
    }

    /** Paper style with a font sized for a printed page. */
    static ChartStyle style() {
        ChartStyle p = ChartStyle.paper();
        return new ChartStyle(p.background(), p.foreground(), p.grid(), p.marker(), p.series(),
                new Font(Font.SANS_SERIF, Font.PLAIN, 8));
    }

    /** The charts this result can show, in the shared order. */
    static List<JFreeChart> charts(AnalysisResult r) {
        return ResultFigures.all(r, style()).stream().filter(Figure::present).map(Figure::chart).toList();
    }
}
