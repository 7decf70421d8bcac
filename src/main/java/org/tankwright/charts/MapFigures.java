package org.tankwright.charts;

import java.awt.Color;
import java.awt.Paint;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.statistics.HistogramDataset;
import org.jfree.data.statistics.HistogramType;
import org.jfree.data.xy.DefaultXYZDataset;
import org.tankwright.units.Dimension;

/** A quantity mapped over two variables (the operating envelope), and histograms (tolerance studies). */
public final class MapFigures {

    private MapFigures() {
    }

    /**
     * A colour map of {@code z[i][j]} over {@code x[i]} × {@code y[j]} (evenly spaced grids),
     * with a colour legend; cells whose value is not finite are left blank.
     */
    public static JFreeChart map(String title, String xLabel, Dimension xDim, double[] x, String yLabel, Dimension yDim,
                                 double[] y, String zLabel, Dimension zDim, double[][] z, ChartStyle style) {
        int n = x.length * y.length;
        double[][] series = new double[3][n];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        int k = 0;
        for (int i = 0; i < x.length; i++) {
            for (int j = 0; j < y.length; j++) {
                series[0][k] = x[i];
                series[1][k] = y[j];
                series[2][k] = z[i][j];
                if (Double.isFinite(z[i][j])) {
                    lo = Math.min(lo, z[i][j]);
                    hi = Math.max(hi, z[i][j]);
                }
                k++;
            }
        }
        if (!(lo < hi)) {
            hi = lo + Math.max(1e-12, Math.abs(lo) * 1e-3);
        }
        DefaultXYZDataset ds = new DefaultXYZDataset();
        ds.addSeries(zLabel, series);
        XYBlockRenderer r = new XYBlockRenderer();
        r.setBlockWidth(step(x));
        r.setBlockHeight(step(y));
        Ramp ramp = new Ramp(lo, hi, style);
        r.setPaintScale(ramp);
        XYPlot plot = new XYPlot(ds, XYFigures.axis(xLabel, xDim, false), XYFigures.axis(yLabel, yDim, false), r);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        JFreeChart chart = XYFigures.finish(title, plot, false, style);
        NumberAxis scaleAxis = (NumberAxis) XYFigures.axis(zLabel, zDim, false);
        scaleAxis.setRange(lo, hi);
        PaintScaleLegend legend = new PaintScaleLegend(ramp, scaleAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setBackgroundPaint(style.background());
        legend.setMargin(4, 4, 4, 4);
        legend.setStripWidth(12);
        scaleAxis.setLabelPaint(style.foreground());
        scaleAxis.setTickLabelPaint(style.foreground());
        scaleAxis.setLabelFont(style.font());
        scaleAxis.setTickLabelFont(style.font());
        chart.addSubtitle(legend);
        return chart;
    }

    /** A histogram of {@code values} in {@code bins} bins (counts). */
    public static JFreeChart histogram(String title, String xLabel, Dimension xDim, double[] values, int bins, ChartStyle style) {
        HistogramDataset ds = new HistogramDataset();
        ds.setType(HistogramType.FREQUENCY);
        double[] finite = java.util.Arrays.stream(values).filter(Double::isFinite).toArray();
        ds.addSeries(xLabel, finite, Math.max(1, bins));
        XYBarRenderer r = new XYBarRenderer(0.05);
        r.setBarPainter(new StandardXYBarPainter());
        r.setShadowVisible(false);
        NumberAxis count = new NumberAxis("count");
        count.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        XYPlot plot = new XYPlot(ds, XYFigures.axis(xLabel, xDim, false), count, r);
        JFreeChart chart = XYFigures.finish(title, plot, false, style);
        r.setSeriesPaint(0, style.seriesColor(0));
        return chart;
    }

    private static double step(double[] grid) {
        return grid.length > 1 ? Math.abs(grid[1] - grid[0]) : 1.0;
    }

    /** From the series' first colour (low) to its second (high), through the background's opposite. */
    private record Ramp(double lo, double hi, ChartStyle style) implements PaintScale {
        @Override
        public double getLowerBound() {
            return lo;
        }

        @Override
        public double getUpperBound() {
            return hi;
        }

        @Override
        public Paint getPaint(double value) {
            if (!Double.isFinite(value)) {
                return new Color(0, 0, 0, 0);
            }
            double t = (value - lo) / (hi - lo);
            Color mid = XYFigures.blend(style.background(), style.foreground(), 0.35);
            return t < 0.5
                    ? XYFigures.blend(style.seriesColor(0), mid, t * 2)
                    : XYFigures.blend(mid, style.seriesColor(1), (t - 0.5) * 2);
        }
    }
}
