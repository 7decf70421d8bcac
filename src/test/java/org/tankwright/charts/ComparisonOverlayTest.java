package org.tankwright.charts;

import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Presets;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Another design's frequency curves can be overlaid on a result's plots for comparison. */
class ComparisonOverlayTest {
    private static int seriesCount(JFreeChart chart) {
        int n = 0;
        for (int i = 0; i < chart.getXYPlot().getDatasetCount(); i++) {
            if (chart.getXYPlot().getDataset(i) != null) {
                n += chart.getXYPlot().getDataset(i).getSeriesCount();
            }
        }
        return n;
    }

    @Test
    void comparedDesignAddsItsNamedCurvesToTheFrequencyPlots() throws Exception {
        AnalysisResult a = Analysis.run(Presets.demo());
        AnalysisResult b = Analysis.run(Presets.load("implant-sensor-link"));
        List<Figure> alone = ResultFigures.all(a, ChartStyle.paper());
        List<Figure> both = ResultFigures.all(a, b, ChartStyle.paper());
        JFreeChart one = alone.get(0).chart();
        JFreeChart two = both.get(0).chart();
        assertEquals(2 * seriesCount(one), seriesCount(two), "the impedance plot carries both designs' curves");
        boolean named = false;
        for (int i = 0; i < two.getXYPlot().getDatasetCount(); i++) {
            var ds = two.getXYPlot().getDataset(i);
            for (int s = 0; ds != null && s < ds.getSeriesCount(); s++) {
                named |= String.valueOf(ds.getSeriesKey(s)).endsWith(b.design().name());
            }
        }
        assertTrue(named, "the compared curves are named after the other design");
        assertEquals(alone.size(), both.size());
    }
}
