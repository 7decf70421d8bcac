package org.tankwright.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/** Line figures over a shared x axis, with engineering-unit ticks and an optional marked point. */
public final class XYFigures {

    private XYFigures() {
    }

    /** An axis for quantity {@code dim}, logarithmic (ticks on round values, see {@link DecadeLogAxis}) when asked; ticks through the one formatter. */
    public static ValueAxis axis(String label, Dimension dim, boolean log) {
        if (log) {
            return new DecadeLogAxis(label, dim);
        }
        NumberAxis a = new NumberAxis(label);
        a.setNumberFormatOverride(new EngineeringFormat(dim, 3));
        a.setAutoRangeIncludesZero(false);
        return a;
    }

    /** A line figure: {@code curves} against x, the operating point {@code markX} drawn as a labelled line (NaN: none). */
    public static JFreeChart lines(String title, String xLabel, Dimension xDim, boolean logX, String yLabel, Dimension yDim,
                                   List<Curve> curves, double markX, String markLabel, ChartStyle style) {
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(axis(xLabel, xDim, logX));
        plot.setRangeAxis(axis(yLabel, yDim, false));
        plot.setDataset(0, dataset(curves));
        plot.setRenderer(0, renderer());
        mark(plot, markX, markLabel, xDim, style);
        return finish(title, plot, curves.size() > 1, style);
    }

    /**
     * Two quantities on one x axis, each with its own y axis (left and right), e.g. impedance
     * magnitude and phase.
     */
    public static JFreeChart twoAxes(String title, String xLabel, Dimension xDim, boolean logX,
                                     String leftLabel, Dimension leftDim, List<Curve> left,
                                     String rightLabel, Dimension rightDim, List<Curve> right,
                                     double markX, String markLabel, ChartStyle style) {
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(axis(xLabel, xDim, logX));
        plot.setRangeAxis(0, axis(leftLabel, leftDim, false));
        plot.setRangeAxis(1, axis(rightLabel, rightDim, false));
        plot.setDataset(0, dataset(left));
        plot.setDataset(1, dataset(right));
        plot.mapDatasetToRangeAxis(1, 1);
        plot.setRenderer(0, renderer());
        XYLineAndShapeRenderer r1 = renderer();
        plot.setRenderer(1, r1);
        mark(plot, markX, markLabel, xDim, style);
        JFreeChart chart = finish(title, plot, true, style);
        for (int s = 0; s < right.size(); s++) {
            r1.setSeriesStroke(s, new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f));
        }
        return chart;
    }

    static XYSeriesCollection dataset(List<Curve> curves) {
        XYSeriesCollection ds = new XYSeriesCollection();
        for (Curve c : curves) {
            XYSeries s = new XYSeries(c.name(), false, true);
            for (int i = 0; i < c.x().length; i++) {
                if (Double.isFinite(c.x()[i]) && Double.isFinite(c.y()[i])) {
                    s.add(c.x()[i], c.y()[i], false);
                }
            }
            ds.addSeries(s);
        }
        return ds;
    }

    private static XYLineAndShapeRenderer renderer() {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDefaultToolTipGenerator(null);
        r.setDrawSeriesLineAsPath(true); // one path per curve, not a line per pair of points: sweeps have thousands
        return r;
    }

    private static void mark(XYPlot plot, double x, String label, Dimension xDim, ChartStyle style) {
        if (!Double.isFinite(x)) {
            return;
        }
        ValueMarker m = new ValueMarker(x);
        m.setPaint(style.marker());
        m.setStroke(new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {3f, 3f}, 0f));
        m.setLabel((label == null ? "" : label + " ") + Quantities.format(x, xDim, 4));
        m.setLabelPaint(style.marker());
        m.setLabelFont(style.font().deriveFont(Font.BOLD));
        m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
        plot.addDomainMarker(m);
    }

    static JFreeChart finish(String title, XYPlot plot, boolean legend, ChartStyle style) {
        JFreeChart chart = new JFreeChart(title, style.font(), plot, legend);
        style.apply(chart);
        return chart;
    }

    /** A colour between {@code a} and {@code b}, {@code t} in [0, 1]. */
    static Color blend(Color a, Color b, double t) {
        double u = Math.max(0, Math.min(1, t));
        return new Color((int) Math.round(a.getRed() + (b.getRed() - a.getRed()) * u),
                (int) Math.round(a.getGreen() + (b.getGreen() - a.getGreen()) * u),
                (int) Math.round(a.getBlue() + (b.getBlue() - a.getBlue()) * u));
    }
}
