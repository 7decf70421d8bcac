package org.tankwright.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.junit.jupiter.api.Test;
import org.tankwright.units.Dimension;

/** Log-axis labels fall on round values (1-2-5 and the other leading digits, common practice) and never crowd. */
class DecadeLogAxisTest {

    private static final double[] ROUND = {1, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 8, 9};

    @Test
    void aSweepFromHalfToTwiceTheFrequencyIsLabelledOnRoundValues() {
        List<Double> wide = labelled(65e3, 260e3, 1200);
        List<Double> narrow = labelled(65e3, 260e3, 400);
        for (List<Double> ticks : List.of(wide, narrow)) {
            assertTrue(ticks.size() >= 2, "at least two labels: " + ticks);
            for (double v : ticks) {
                assertTrue(isRound(v), v + " is a round value (leading digit among 1, 1.5, 2, 2.5, 3 … 9)");
            }
        }
        assertTrue(wide.contains(100e3) && wide.contains(200e3), "the power of ten and the 2 of the 1-2-5 sequence: " + wide);
        assertTrue(wide.size() >= narrow.size(), "a wider axis carries at least as many labels");
    }

    @Test
    void manyDecadesGetPowersOfTen() {
        List<Double> ticks = labelled(10, 1e9, 300);
        for (double v : ticks) {
            double e = Math.log10(v);
            assertEquals(Math.rint(e), e, 1e-9, v + " is a power of ten");
        }
        assertTrue(ticks.size() >= 2);
    }

    @Test
    void aNarrowRangeStillGetsTwoRoundLabels() {
        List<Double> ticks = labelled(121e3, 139e3, 800);
        assertTrue(ticks.size() >= 2, "two or more labels within 121 to 139 kHz: " + ticks);
        for (double v : ticks) {
            double m = v / Math.pow(10, Math.floor(Math.log10(v)));
            assertEquals(Math.rint(m * 100), m * 100, 1e-9, v + " has a leading digit in steps of 0.01");
            assertTrue(v > 121e3 && v < 139e3, v + " is a round value inside the range, not an end of it");
        }
    }

    @Test
    void labelsDropTrailingZeros() {
        DecadeLogAxis a = new DecadeLogAxis("f", Dimension.FREQUENCY);
        assertEquals("70 kHz", a.label(70e3));
        assertEquals("1.5 MHz", a.label(1.5e6));
        assertEquals("250 kHz", a.label(250e3));
        assertEquals("10 Hz", DecadeLogAxis.trim("10.0 Hz"));
        assertEquals("12.5 µH", DecadeLogAxis.trim("12.50 µH"));
    }

    private static boolean isRound(double v) {
        double m = v / Math.pow(10, Math.floor(Math.log10(v) + 1e-12));
        for (double r : ROUND) {
            if (Math.abs(m - r) < 1e-9) {
                return true;
            }
        }
        return false;
    }

    @SuppressWarnings("unchecked")
    private static List<Double> labelled(double lo, double hi, int pixels) {
        DecadeLogAxis a = new DecadeLogAxis("frequency", Dimension.FREQUENCY);
        a.setRange(lo, hi);
        Graphics2D g = new BufferedImage(10, 10, BufferedImage.TYPE_INT_RGB).createGraphics();
        try {
            List<NumberTick> ticks = a.refreshTicks(g, new org.jfree.chart.axis.AxisState(), new Rectangle2D.Double(0, 0, pixels, 200),
                    RectangleEdge.BOTTOM);
            List<Double> out = new ArrayList<>();
            for (NumberTick t : ticks) {
                if (t.getTickType() == TickType.MAJOR) {
                    out.add(t.getValue());
                }
            }
            return out;
        } finally {
            g.dispose();
        }
    }
}
