package org.tankwright.report;

import org.jfree.chart.JFreeChart;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Series;
import org.tankwright.charts.ChartStyle;
import org.tankwright.charts.Curve;
import org.tankwright.charts.XYFigures;
import org.tankwright.units.Dimension;

import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Predicate;

/**
 * The sheet's plots, built with the shared chart builders from the result's series: input
 * impedance and phase against frequency, capacitor voltages against frequency, and coupling
 * against lateral offset. A plot whose series the result does not hold is left out.
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

    /** The charts this result can show, in sheet order. */
    static List<JFreeChart> charts(AnalysisResult r) {
        List<JFreeChart> out = new ArrayList<>();
        List<Series> net = r.network() == null || r.network().sweeps() == null ? List.of() : r.network().sweeps();
        List<Series> cpl = r.coupling() == null || r.coupling().sweeps() == null ? List.of() : r.coupling().sweeps();
        ChartStyle style = style();
        List<Series> impedance = pick(net, s -> s.xDim() == Dimension.FREQUENCY && s.yDim() == Dimension.RESISTANCE
                && mentions(s, "imped"));
        List<Series> phase = pick(net, s -> s.xDim() == Dimension.FREQUENCY && s.yDim() == Dimension.ANGLE);
        if (!impedance.isEmpty()) {
            Series x = impedance.get(0);
            out.add(XYFigures.twoAxes("Input impedance and phase against frequency", x.xLabel(), Dimension.FREQUENCY,
                    false, x.yLabel(), Dimension.RESISTANCE, curves(impedance),
                    phase.isEmpty() ? "phase" : phase.get(0).yLabel(), Dimension.ANGLE, curves(phase),
                    x.markerX(), "operating", style));
        }
        List<Series> capV = pick(net, s -> s.xDim() == Dimension.FREQUENCY && s.yDim() == Dimension.VOLTAGE
                && (mentions(s, "c1") || mentions(s, "c2") || mentions(s, "capacitor")));
        if (!capV.isEmpty()) {
            Series x = capV.get(0);
            out.add(XYFigures.lines("Capacitor voltage against frequency", x.xLabel(), Dimension.FREQUENCY, false,
                    "voltage (rms)", Dimension.VOLTAGE, curves(capV), x.markerX(), "operating", style));
        }
        List<Series> kOffset = pick(cpl, s -> s.xDim() == Dimension.LENGTH && mentions(s, "offset")
                && s.yDim() == Dimension.DIMENSIONLESS && isCoupling(s));
        if (!kOffset.isEmpty()) {
            Series x = kOffset.get(0);
            out.add(XYFigures.lines("Coupling k against lateral offset", x.xLabel(), Dimension.LENGTH, false,
                    x.yLabel(), Dimension.DIMENSIONLESS, curves(kOffset), x.markerX(), "nominal", style));
        }
        return out;
    }

    /** A series of the coupling coefficient: its y is named k, or its id or title says coupling. */
    private static boolean isCoupling(Series s) {
        return "k".equalsIgnoreCase(s.yLabel().strip()) || s.id().toLowerCase(Locale.ROOT).startsWith("k-")
                || mentions(s, "coupling");
    }

    private static boolean mentions(Series s, String word) {
        String all = (s.id() + " " + s.title() + " " + s.yLabel() + " " + s.xLabel()).toLowerCase(Locale.ROOT);
        return all.contains(word);
    }

    private static List<Series> pick(List<Series> all, Predicate<Series> p) {
        List<Series> out = new ArrayList<>();
        for (Series s : all) {
            if (s.size() > 1 && p.test(s)) {
                out.add(s);
            }
        }
        return out;
    }

    private static List<Curve> curves(List<Series> list) {
        List<Curve> out = new ArrayList<>();
        for (Series s : list) {
            out.add(new Curve(s.title() == null || s.title().isBlank() ? s.yLabel() : s.title(), s.x(), s.y()));
        }
        return out;
    }
}
