package org.tankwright.charts;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.jfree.chart.JFreeChart;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.EnvelopeReport;
import org.tankwright.analysis.Series;
import org.tankwright.units.Dimension;

/**
 * The figures of one result, in the order the window's plot tabs and the sheet show them, each
 * drawn from the series the result holds (chosen by their quantities, not their names). A
 * figure whose series the result does not hold says so instead of showing an empty plot.
 */
public final class ResultFigures {

    /** Titles, in order. */
    public static final List<String> TITLES = List.of(
            "Input impedance", "Power and efficiency", "Capacitor voltage", "Coupling", "Operating envelope", "Tolerance");

    private static final String NOT_COMPUTED = "Not computed for this design: ";

    private ResultFigures() {
    }

    /** Every figure of {@code r}, styled with {@code style}. */
    public static List<Figure> all(AnalysisResult r, ChartStyle style) {
        return all(r, null, style);
    }

    /**
     * Every figure of {@code r}; the frequency sweeps of {@code other} (another design or a saved
     * variant; may be null) are overlaid for comparison, their curves named after that design.
     */
    public static List<Figure> all(AnalysisResult r, AnalysisResult other, ChartStyle style) {
        List<Figure> out = new ArrayList<>();
        for (int i = 0; i < TITLES.size(); i++) {
            out.add(one(i, r, other, style));
        }
        return out;
    }

    /**
     * The figure at {@code index} of {@link #TITLES} alone (the window builds only the tab it
     * shows), with {@code other}'s frequency sweeps overlaid as in {@link #all(AnalysisResult, AnalysisResult, ChartStyle)}.
     */
    public static Figure one(int index, AnalysisResult r, AnalysisResult other, ChartStyle style) {
        String title = TITLES.get(index);
        return switch (index) {
            case 0 -> twoAxes(title, frequencySweeps(r, other), s -> s.yDim() == Dimension.RESISTANCE,
                    s -> s.yDim() == Dimension.ANGLE, operatingFrequency(r), style,
                    "the result holds no impedance sweep against frequency.");
            case 1 -> twoAxes(title, frequencySweeps(r, other), s -> s.yDim() == Dimension.POWER,
                    s -> s.yDim() == Dimension.FRACTION, operatingFrequency(r), style,
                    "the result holds no power or efficiency sweep against frequency.");
            case 2 -> lines(title, frequencySweeps(r, other), s -> s.yDim() == Dimension.VOLTAGE, operatingFrequency(r), style,
                    "the result holds no capacitor-voltage sweep against frequency.");
            case 3 -> coupling(r, style);
            case 4 -> envelope(r, style);
            case 5 -> Figure.missing(title, NOT_COMPUTED + "the analysis result does not carry tolerance-study samples yet.");
            default -> throw new IndexOutOfBoundsException("figure " + index + " of " + TITLES.size());
        };
    }

    private static double operatingFrequency(AnalysisResult r) {
        return r.network() != null ? r.network().frequency() : r.design().frequency();
    }

    /** {@code r}'s sweeps against frequency, then {@code other}'s (may be null), named after its design. */
    private static List<Series> frequencySweeps(AnalysisResult r, AnalysisResult other) {
        List<Series> frequency = new ArrayList<>(frequencySweeps(r));
        if (other != null) {
            for (Series s : frequencySweeps(other)) {
                frequency.add(new Series(s.id() + "-compared", s.title() + " — " + other.design().name(), s.xLabel(),
                        s.xDim(), s.yLabel(), s.yDim(), s.x(), s.y(), Double.NaN));
            }
        }
        return frequency;
    }

    private static List<Series> frequencySweeps(AnalysisResult r) {
        if (r.network() == null || r.network().sweeps() == null) {
            return List.of();
        }
        return r.network().sweeps().stream().filter(s -> s.xDim() == Dimension.FREQUENCY && s.size() > 1).toList();
    }

    private static Figure twoAxes(String title, List<Series> all, Predicate<Series> left, Predicate<Series> right, double op,
                                  ChartStyle style, String why) {
        List<Series> l = all.stream().filter(left).toList();
        List<Series> rr = all.stream().filter(right).toList();
        if (l.isEmpty() && rr.isEmpty()) {
            return Figure.missing(title, NOT_COMPUTED + why);
        }
        if (l.isEmpty() || rr.isEmpty()) {
            return lines(title, all, left.or(right), op, style, why);
        }
        Series x = l.get(0);
        JFreeChart chart = XYFigures.twoAxes(title, x.xLabel(), x.xDim(), true, axisLabel(l), l.get(0).yDim(), curves(l),
                axisLabel(rr), rr.get(0).yDim(), curves(rr), op, "operating", style);
        return Figure.of(title, chart);
    }

    private static Figure lines(String title, List<Series> all, Predicate<Series> which, double op, ChartStyle style, String why) {
        List<Series> s = all.stream().filter(which).toList();
        if (s.isEmpty()) {
            return Figure.missing(title, NOT_COMPUTED + why);
        }
        Series first = s.get(0);
        return Figure.of(title, XYFigures.lines(title, first.xLabel(), first.xDim(), first.xDim() == Dimension.FREQUENCY,
                axisLabel(s), first.yDim(), curves(s), op, "operating", style));
    }

    private static Figure coupling(AnalysisResult r, ChartStyle style) {
        String title = TITLES.get(3);
        if (!r.design().isLink()) {
            return Figure.missing(title, "Not applicable: a single tank or heater has no second coil to couple to.");
        }
        if (r.coupling() == null || r.coupling().sweeps() == null) {
            return Figure.missing(title, NOT_COMPUTED + "the result holds no coupling sweep over distance and offset.");
        }
        List<Series> k = r.coupling().sweeps().stream()
                .filter(s -> s.xDim() == Dimension.LENGTH && s.yDim() == Dimension.DIMENSIONLESS && s.size() > 1).toList();
        if (k.isEmpty()) {
            return Figure.missing(title, NOT_COMPUTED + "the result holds no k sweep over distance and offset.");
        }
        double marker = k.get(0).markerX();
        return Figure.of(title, XYFigures.lines(title, "distance or offset", Dimension.LENGTH, false, "k", Dimension.DIMENSIONLESS,
                curves(k), marker, "nominal", style));
    }

    private static Figure envelope(AnalysisResult r, ChartStyle style) {
        String title = TITLES.get(4);
        EnvelopeReport e = r.envelope();
        if (e == null || e.map() == null || e.map().values() == null || e.map().distances().length < 2
                || e.map().offsets().length < 2) {
            return Figure.missing(title, NOT_COMPUTED + "the result holds no map over distance × offset"
                    + (r.design().envelope() == null ? " (the design sets no envelope)." : "."));
        }
        EnvelopeReport.EnvelopeMap m = e.map();
        double[][] byOffset = new double[m.offsets().length][m.distances().length];
        for (int i = 0; i < m.distances().length; i++) {
            for (int j = 0; j < m.offsets().length; j++) {
                byOffset[j][i] = m.values()[i][j];
            }
        }
        return Figure.of(title, MapFigures.map(title + ": " + m.quantity(), "offset", Dimension.LENGTH, m.offsets(), "distance",
                Dimension.LENGTH, m.distances(), m.quantity(), dimensionOf(m.quantity()), byOffset, style));
    }

    /** One series: its own label; several on one axis: the quantity they share. */
    private static String axisLabel(List<Series> s) {
        return s.size() == 1 ? s.get(0).yLabel() : s.get(0).yDim().noun();
    }

    /** The map carries its quantity only in words (see the report to the lead): read the dimension from them. */
    private static Dimension dimensionOf(String quantity) {
        String q = quantity.toLowerCase(java.util.Locale.ROOT);
        if (q.contains("efficiency")) {
            return Dimension.FRACTION;
        }
        if (q.contains("voltage")) {
            return Dimension.VOLTAGE;
        }
        if (q.contains("power")) {
            return Dimension.POWER;
        }
        if (q.contains("current")) {
            return Dimension.CURRENT;
        }
        return Dimension.DIMENSIONLESS;
    }

    private static List<Curve> curves(List<Series> series) {
        return series.stream().map(s -> new Curve(s.title(), s.x(), s.y())).toList();
    }
}
