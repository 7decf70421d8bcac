package org.tankwright.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Font;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.Presets;
import org.tankwright.units.Dimension;

/** The figure builders: what they draw from the series they are given, and what they say when there is none. */
class FiguresTest {

    private static final ChartStyle DARK = new ChartStyle(new Color(0x2b2b2b), new Color(0xdddddd), new Color(0x555555),
            new Color(0xff6b6b), List.of(new Color(0x6cb4ff), new Color(0xff9a5c)), new Font(Font.SANS_SERIF, Font.PLAIN, 12));

    @Test
    void aResultWithoutSeriesGivesReasonsNeverEmptyPlots() {
        List<Figure> figures = ResultFigures.all(Analysis.run(Presets.demo()), ChartStyle.paper());
        assertEquals(ResultFigures.TITLES.size(), figures.size());
        for (Figure f : figures) {
            assertFalse(f.present() && f.chart().getXYPlot().getDataset() == null, f.title() + " is an empty plot");
            if (!f.present()) {
                assertTrue(f.notShown().startsWith("Not computed") || f.notShown().startsWith("Not applicable"), f.notShown());
            }
        }
    }

    @Test
    void lineFigureSkipsNonFinitePointsMarksTheOperatingPointAndTicksInEngineeringUnits() {
        double[] f = {50e3, 100e3, 150e3, 200e3};
        double[] v = {10, Double.NaN, 30, 40};
        JFreeChart chart = XYFigures.lines("C1 voltage", "frequency", Dimension.FREQUENCY, false, "voltage", Dimension.VOLTAGE,
                List.of(new Curve("C1", f, v)), 100e3, "operating", DARK);
        XYPlot plot = chart.getXYPlot();
        assertEquals(3, plot.getDataset().getItemCount(0), "the NaN point is left out, not drawn as zero");
        assertEquals(1, plot.getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).size());
        ValueAxis x = plot.getDomainAxis();
        assertEquals("100 kHz", ((org.jfree.chart.axis.NumberAxis) x).getNumberFormatOverride().format(100e3));
        assertEquals(DARK.background(), chart.getBackgroundPaint(), "charts take the window's colours (dark mode is whole)");
        assertEquals(DARK.foreground(), x.getTickLabelPaint());
        assertEquals(DARK.seriesColor(0), plot.getRenderer().getSeriesPaint(0));
    }

    @Test
    void twoAxesMapsTheSecondQuantityToTheRightAxis() {
        double[] f = {1, 2, 3};
        JFreeChart chart = XYFigures.twoAxes("Z", "frequency", Dimension.FREQUENCY, true, "|Z|", Dimension.RESISTANCE,
                List.of(new Curve("|Z|", f, new double[] {3, 2, 3})), "phase", Dimension.ANGLE,
                List.of(new Curve("phase", f, new double[] {-40, 0, 40})), 2, "operating", ChartStyle.paper());
        XYPlot plot = chart.getXYPlot();
        assertEquals(2, plot.getRangeAxisCount());
        assertEquals(plot.getRangeAxis(1), plot.getRangeAxisForDataset(1));
        assertTrue(plot.getDomainAxis() instanceof org.jfree.chart.axis.LogAxis);
    }

    @Test
    void mapAndHistogramAreBuiltAndExportAsSvgAndPng(@TempDir Path dir) throws Exception {
        double[] x = {0, 0.005, 0.01};
        double[] y = {0.003, 0.006};
        double[][] z = {{0.9, 0.8}, {0.85, Double.NaN}, {0.7, 0.6}};
        JFreeChart map = MapFigures.map("efficiency", "offset", Dimension.LENGTH, x, "distance", Dimension.LENGTH, y,
                "efficiency", Dimension.FRACTION, z, ChartStyle.paper());
        assertNotNull(map.getXYPlot().getDataset());
        assertEquals(6, map.getXYPlot().getDataset().getItemCount(0));
        JFreeChart hist = MapFigures.histogram("f0 spread", "frequency", Dimension.FREQUENCY, new double[] {1, 2, 2, 3, Double.NaN}, 3,
                ChartStyle.paper());
        assertEquals(3, hist.getXYPlot().getDataset().getItemCount(0));
        String svg = ChartExport.svg(map, 400, 300);
        assertTrue(svg.startsWith("<svg") || svg.contains("<svg"), "an SVG document");
        Path png = dir.resolve("map.png");
        ChartExport.writePng(hist, png, 400, 300);
        byte[] head = Files.readAllBytes(png);
        assertEquals((byte) 0x89, head[0]);
        assertEquals('P', head[1], "a PNG file");
    }
}
