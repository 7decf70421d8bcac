package org.tankwright.charts;

import org.jfree.chart.JFreeChart;

/**
 * A figure ready to show, or the reason there is none: a plot is never shown empty.
 *
 * @param title      what it shows
 * @param chart      the chart, or null when not computed
 * @param notShown   why there is no chart (null when there is one)
 */
public record Figure(String title, JFreeChart chart, String notShown) {

    /** A figure with a chart. */
    public static Figure of(String title, JFreeChart chart) {
        return new Figure(title, chart, null);
    }

    /** No chart, and why: "not computed for this design: ...". */
    public static Figure missing(String title, String why) {
        return new Figure(title, null, why);
    }

    public boolean present() {
        return chart != null;
    }
}
