package org.tankwright.analysis;

import org.tankwright.units.Dimension;

/**
 * A data series for plots and CSV: y against x, with units, and an optional marked point (the
 * operating point). Arrays are owned by the series and must not be changed.
 *
 * @param id      a stable identifier, used as CSV file name and plot key ({@code impedance-vs-frequency})
 * @param title   what the series shows
 * @param xLabel  the x quantity's name
 * @param xDim    the x quantity's dimension
 * @param yLabel  the y quantity's name
 * @param yDim    the y quantity's dimension
 * @param x       x values (SI)
 * @param y       y values (SI)
 * @param markerX the x of the operating point, or NaN when none
 */
public record Series(String id, String title, String xLabel, Dimension xDim, String yLabel, Dimension yDim,
                     double[] x, double[] y, double markerX) {
    public Series {
        if (x.length != y.length) {
            throw new IllegalArgumentException("series " + id + ": x and y differ in length");
        }
    }

    /** Number of points. */
    public int size() {
        return x.length;
    }
}
