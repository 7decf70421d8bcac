package org.tankwright.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.List;
import javax.swing.UIManager;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;

/**
 * Colours and fonts of a figure. JFreeChart ignores the look and feel, so the window builds a
 * style from the current look ({@link #fromLookAndFeel()}) and the printed sheet uses
 * {@link #paper()}.
 */
public record ChartStyle(Color background, Color foreground, Color grid, Color marker, List<Color> series, Font font) {

    /** Series colours: a palette chosen to stay distinct on light and dark grounds and for common colour-vision deficiencies. */
    private static final List<Color> LIGHT_SERIES = List.of(
            new Color(0x1f5fa8), new Color(0xc8541b), new Color(0x2e8b57), new Color(0x8e44ad), new Color(0x9a7b00));
    private static final List<Color> DARK_SERIES = List.of(
            new Color(0x6cb4ff), new Color(0xff9a5c), new Color(0x6fd39b), new Color(0xd09bf0), new Color(0xe8c84a));

    /** White paper, black ink: for the exported sheet. */
    public static ChartStyle paper() {
        return new ChartStyle(Color.WHITE, Color.BLACK, new Color(0xd0d0d0), new Color(0xb00020), LIGHT_SERIES,
                new Font(Font.SANS_SERIF, Font.PLAIN, 11));
    }

    /** Colours taken from the installed look and feel, so a dark window gets dark charts. */
    public static ChartStyle fromLookAndFeel() {
        Color bg = orElse(UIManager.getColor("Panel.background"), Color.WHITE);
        Color fg = orElse(UIManager.getColor("Label.foreground"), Color.BLACK);
        Color grid = orElse(UIManager.getColor("Component.borderColor"), Color.LIGHT_GRAY);
        boolean dark = luminance(bg) < 0.45;
        Color marker = dark ? new Color(0xff6b6b) : new Color(0xb00020);
        Font f = orElse(UIManager.getFont("Label.font"), new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        return new ChartStyle(bg, fg, grid, marker, dark ? DARK_SERIES : LIGHT_SERIES, f);
    }

    /** Colour of series {@code i} (cycles). */
    public Color seriesColor(int i) {
        return series.get(Math.floorMod(i, series.size()));
    }

    /** Applies this style to every part of {@code chart} that JFreeChart colours by itself. */
    public void apply(JFreeChart chart) {
        chart.setBackgroundPaint(background);
        chart.setAntiAlias(true);
        TextTitle title = chart.getTitle();
        if (title != null) {
            title.setPaint(foreground);
            title.setFont(font.deriveFont(Font.BOLD, font.getSize2D() + 1f));
        }
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof LegendTitle legend) {
                legend.setBackgroundPaint(background);
                legend.setItemPaint(foreground);
                legend.setItemFont(font);
            } else if (chart.getSubtitle(i) instanceof TextTitle t) {
                t.setPaint(foreground);
                t.setFont(font);
            }
        }
        if (chart.getPlot() instanceof XYPlot plot) {
            plot.setBackgroundPaint(background);
            plot.setDomainGridlinePaint(grid);
            plot.setRangeGridlinePaint(grid);
            plot.setOutlinePaint(grid);
            for (int a = 0; a < plot.getDomainAxisCount(); a++) {
                axis(plot.getDomainAxis(a));
            }
            for (int a = 0; a < plot.getRangeAxisCount(); a++) {
                axis(plot.getRangeAxis(a));
            }
            int colour = 0;
            for (int r = 0; r < plot.getRendererCount(); r++) {
                XYItemRenderer renderer = plot.getRenderer(r);
                if (renderer == null || plot.getDataset(r) == null) {
                    continue;
                }
                for (int s = 0; s < plot.getDataset(r).getSeriesCount(); s++) {
                    renderer.setSeriesPaint(s, seriesColor(colour++));
                    renderer.setSeriesStroke(s, new BasicStroke(1.8f));
                }
            }
        }
    }

    private void axis(Axis axis) {
        if (axis == null) {
            return;
        }
        axis.setLabelPaint(foreground);
        axis.setTickLabelPaint(foreground);
        axis.setAxisLinePaint(grid);
        axis.setTickMarkPaint(grid);
        axis.setLabelFont(font);
        axis.setTickLabelFont(font.deriveFont(font.getSize2D() - 1f));
    }

    private static double luminance(Color c) {
        return (0.2126 * c.getRed() + 0.7152 * c.getGreen() + 0.0722 * c.getBlue()) / 255.0;
    }

    private static <T> T orElse(T value, T fallback) {
        return value != null ? value : fallback;
    }
}
