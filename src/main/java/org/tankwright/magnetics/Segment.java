package org.tankwright.magnetics;

/** A straight filament from (x0, y0, z0) to (x1, y1, z1); positive current flows from start to end. */
public record Segment(double x0, double y0, double z0, double x1, double y1, double z1, double wireRadius)
        implements Filament {

    /** Length in metres. */
    public double length() {
        return Math.sqrt((x1 - x0) * (x1 - x0) + (y1 - y0) * (y1 - y0) + (z1 - z0) * (z1 - z0));
    }

    @Override
    public Segment translated(double dx, double dy, double dz) {
        return new Segment(x0 + dx, y0 + dy, z0 + dz, x1 + dx, y1 + dy, z1 + dz, wireRadius);
    }

    @Override
    public Segment mirroredZ(double z0m) {
        return new Segment(x0, y0, 2 * z0m - z0, x1, y1, 2 * z0m - z1, wireRadius);
    }
}
