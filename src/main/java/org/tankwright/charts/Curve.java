package org.tankwright.charts;

/**
 * One named line of a figure: x and y values of equal length (SI). Points whose y is not
 * finite are left out of the drawing, never drawn as zero.
 */
public record Curve(String name, double[] x, double[] y) {
    public Curve {
        if (x.length != y.length) {
            throw new IllegalArgumentException("curve '" + name + "': " + x.length + " x values but " + y.length + " y values");
        }
    }
}
