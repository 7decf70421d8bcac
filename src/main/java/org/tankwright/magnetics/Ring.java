package org.tankwright.magnetics;

/**
 * A circular filament of radius {@code radius} centred at (x, y, z) with its axis parallel to z.
 * Positive current runs counter-clockwise seen from +z.
 */
public record Ring(double x, double y, double z, double radius, double wireRadius) implements Filament {
    @Override
    public Ring translated(double dx, double dy, double dz) {
        return new Ring(x + dx, y + dy, z + dz, radius, wireRadius);
    }

    @Override
    public Ring mirroredZ(double z0) {
        // A ring mirrored in a plane normal to its axis keeps its sense of rotation seen from +z.
        return new Ring(x, y, 2 * z0 - z, radius, wireRadius);
    }
}
