package org.tankwright.charts;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/**
 * A logarithmic axis whose labelled ticks fall on round values, labelled in engineering units
 * without trailing zeros ("70 kHz", "200 kHz", "1.5 MHz"): first the powers of ten (every one,
 * or every second, third… decade on a wide axis), then as many of these sets as fit without
 * crowding the labels, each set whole or not at all: 2 and 5 (the 1-2-5 sequence), the other
 * leading digits 3, 4, 6, 7, 8, 9, then 1.5 and 2.5. An axis too narrow for two of those gets steps
 * of 0.01 to 0.5 of the leading digit. The leading digits 1…9 of each decade that carry no label are minor ticks.
 */
final class DecadeLogAxis extends LogAxis {

    private static final long serialVersionUID = 1L;

    /** Leading digits added after the powers of ten, a set at a time, as long as the labels fit. */
    private static final double[][] TIERS = {{2, 5}, {3, 4, 6, 7, 8, 9}, {1.5, 2.5}};
    private static final double[] DIGITS = {1, 2, 3, 4, 5, 6, 7, 8, 9};
    private static final int[] DECADE_STRIDES = {1, 2, 3, 5, 10, 20, 50, 100};

    private final Dimension dimension;
    /** Labels already made: the axis lays its ticks out several times per drawing. */
    private final transient java.util.Map<Double, String> labels = new java.util.HashMap<>();

    DecadeLogAxis(String label, Dimension dimension) {
        super(label);
        this.dimension = dimension;
        setNumberFormatOverride(new EngineeringFormat(dimension, 3));
        setSmallestValue(1e-30);
        setMinorTickMarksVisible(true);
    }

    /** A tick label: the value in engineering units, trailing zeros of the number dropped. */
    String label(double value) {
        return labels.computeIfAbsent(value, v -> trim(Quantities.format(v, dimension, 3)));
    }

    static String trim(String s) {
        return s.replaceFirst("^(-?\\d+)\\.0+(?=\\D|$)", "$1").replaceFirst("^(-?\\d+\\.\\d*?[1-9])0+(?=\\D|$)", "$1");
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    protected List refreshTicksHorizontal(Graphics2D g2, Rectangle2D dataArea, RectangleEdge edge) {
        TextAnchor anchor = edge == RectangleEdge.TOP ? TextAnchor.BOTTOM_CENTER : TextAnchor.TOP_CENTER;
        return ticks(g2, dataArea.getWidth(), true, anchor);
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    protected List refreshTicksVertical(Graphics2D g2, Rectangle2D dataArea, RectangleEdge edge) {
        TextAnchor anchor = edge == RectangleEdge.RIGHT ? TextAnchor.CENTER_LEFT : TextAnchor.CENTER_RIGHT;
        return ticks(g2, dataArea.getHeight(), false, anchor);
    }

    private List<NumberTick> ticks(Graphics2D g2, double pixels, boolean horizontal, TextAnchor anchor) {
        double lo = getLowerBound();
        double hi = getUpperBound();
        List<NumberTick> out = new ArrayList<>();
        if (!(lo > 0) || !(hi > lo) || !(pixels > 0)) {
            return out;
        }
        double decades = Math.log10(hi / lo);
        FontMetrics fm = g2.getFontMetrics(getTickLabelFont() != null ? getTickLabelFont() : new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        double pxPerDecade = pixels / decades;
        List<Double> chosen = List.of();
        for (int stride : DECADE_STRIDES) {
            List<Double> powers = values(lo, hi, new double[] {1}, stride);
            if (fits(powers, fm, pxPerDecade, horizontal)) {
                chosen = powers;
                if (stride == 1) {
                    for (double[] tier : TIERS) {
                        List<Double> more = new ArrayList<>(chosen);
                        more.addAll(values(lo, hi, tier, 1));
                        more.sort(null);
                        if (fits(more, fm, pxPerDecade, horizontal)) {
                            chosen = more;
                        }
                    }
                }
                break;
            }
        }
        if (chosen.size() < 2) { // a narrow axis: steps of 0.01 to 0.5 of the leading digit, the densest that fits
            for (double step : new double[] {0.01, 0.02, 0.05, 0.1, 0.2, 0.5}) {
                List<Double> fine = values(lo, hi, steps(step), 1);
                if (fine.size() >= 2 && fits(fine, fm, pxPerDecade, horizontal)) {
                    chosen = fine;
                    break;
                }
            }
        }
        if (chosen.isEmpty()) {
            chosen = List.of(lo, hi);
        }
        for (double v : values(lo, hi, DIGITS, 1)) {
            if (!chosen.contains(v)) {
                out.add(new NumberTick(TickType.MINOR, v, "", anchor, anchor, 0.0));
            }
        }
        for (double v : chosen) {
            out.add(new NumberTick(TickType.MAJOR, v, label(v), anchor, anchor, 0.0));
        }
        return out;
    }

    /** The leading digits 1, 1 + step, … below 10. */
    private static double[] steps(double step) {
        int n = (int) Math.round(9 / step);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = Math.round((1 + i * step) * 100) / 100.0;
        }
        return out;
    }

    /** Whether labels at {@code values} (ascending) keep a clear gap of one line height at {@code pxPerDecade}. */
    private boolean fits(List<Double> values, FontMetrics fm, double pxPerDecade, boolean horizontal) {
        for (int i = 1; i < values.size(); i++) {
            double need = horizontal
                    ? (fm.stringWidth(label(values.get(i))) + fm.stringWidth(label(values.get(i - 1)))) / 2.0 + fm.getHeight()
                    : 1.8 * fm.getHeight();
            if (Math.log10(values.get(i) / values.get(i - 1)) * pxPerDecade < need) {
                return false;
            }
        }
        return true;
    }

    /** The values m × 10^e within [lo, hi] for each leading digit m, every {@code stride}-th decade. */
    private static List<Double> values(double lo, double hi, double[] mantissas, int stride) {
        List<Double> out = new ArrayList<>();
        int e0 = (int) Math.floor(Math.log10(lo));
        int e1 = (int) Math.ceil(Math.log10(hi));
        for (int e = e0; e <= e1; e++) {
            if (Math.floorMod(e, stride) != 0) {
                continue;
            }
            double p = Math.pow(10, e);
            for (double m : mantissas) {
                double v = Double.parseDouble(String.format(java.util.Locale.ROOT, "%.6e", m * p)); // 7e-9, not 7.000000000000001e-9
                if (v >= lo * (1 - 1e-12) && v <= hi * (1 + 1e-12)) {
                    out.add(v);
                }
            }
        }
        return out;
    }
}
