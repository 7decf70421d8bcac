package org.tankwright.materials;

import java.util.Arrays;

/**
 * A property of a workpiece material tabulated against one variable (temperature in °C for
 * resistivity and specific heat), read by piecewise-linear interpolation between the points and
 * held constant beyond the ends; {@link #covers} tells whether a value lies inside the table.
 *
 * @param xs     strictly increasing abscissae
 * @param ys     values at {@code xs}, all finite
 * @param source where the values come from ("from memory" when recalled, not looked up)
 */
public record WorkpieceCurve(double[] xs, double[] ys, String source) {

    public WorkpieceCurve {
        if (xs == null || ys == null || xs.length == 0 || xs.length != ys.length) {
            throw new IllegalArgumentException("a material table needs as many values as points, at least one; got "
                    + (xs == null ? "none" : xs.length) + " points and " + (ys == null ? "none" : ys.length) + " values");
        }
        xs = xs.clone();
        ys = ys.clone();
        for (int i = 0; i < xs.length; i++) {
            if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[i])) {
                throw new IllegalArgumentException("a material table point must be a finite number; point " + i
                        + " is (" + xs[i] + ", " + ys[i] + ")");
            }
            if (i > 0 && xs[i] <= xs[i - 1]) {
                throw new IllegalArgumentException("a material table must have strictly increasing points; "
                        + xs[i] + " follows " + xs[i - 1]);
            }
        }
        source = source == null ? "" : source;
    }

    /** A one-point table: the same value everywhere. */
    public static WorkpieceCurve constant(double value, String source) {
        return new WorkpieceCurve(new double[] {0.0}, new double[] {value}, source);
    }

    /** Builds a table from alternating pairs {@code x0, y0, x1, y1, ...}, each y multiplied by {@code scale}. */
    public static WorkpieceCurve pairs(double scale, String source, double... xy) {
        if (xy.length % 2 != 0) {
            throw new IllegalArgumentException("a material table needs (point, value) pairs; got " + xy.length + " numbers");
        }
        double[] x = new double[xy.length / 2];
        double[] y = new double[xy.length / 2];
        for (int i = 0; i < x.length; i++) {
            x[i] = xy[2 * i];
            y[i] = xy[2 * i + 1] * scale;
        }
        return new WorkpieceCurve(x, y, source);
    }

    /** The interpolated value at {@code x}; the end value beyond either end. */
    public double valueAt(double x) {
        int n = xs.length;
        if (x <= xs[0]) {
            return ys[0];
        }
        if (x >= xs[n - 1]) {
            return ys[n - 1];
        }
        int i = Arrays.binarySearch(xs, x);
        if (i >= 0) {
            return ys[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = (x - xs[lo]) / (xs[hi] - xs[lo]);
        return ys[lo] + t * (ys[hi] - ys[lo]);
    }

    /** Whether {@code x} lies within the tabulated range (a one-point table covers only its point). */
    public boolean covers(double x) {
        return x >= xs[0] && x <= xs[xs.length - 1];
    }

    /** The first tabulated abscissa. */
    public double first() {
        return xs[0];
    }

    /** The last tabulated abscissa. */
    public double last() {
        return xs[xs.length - 1];
    }

    @Override
    public double[] xs() {
        return xs.clone();
    }

    @Override
    public double[] ys() {
        return ys.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WorkpieceCurve c && Arrays.equals(xs, c.xs) && Arrays.equals(ys, c.ys)
                && source.equals(c.source);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(xs) + Arrays.hashCode(ys)) + source.hashCode();
    }

    @Override
    public String toString() {
        return "WorkpieceCurve" + Arrays.toString(xs) + "→" + Arrays.toString(ys) + " (" + source + ")";
    }
}
