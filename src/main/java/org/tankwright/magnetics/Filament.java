package org.tankwright.magnetics;

/**
 * One current path of the filament model: a circular ring with its axis along z, or a straight
 * segment. Every coil is decomposed into filaments that carry the coil current in series; self
 * and mutual inductance, fields and coupling are sums over them.
 */
public sealed interface Filament permits Ring, Segment {
    /** Radius of the real conductor this filament stands for, in metres (for self terms). */
    double wireRadius();

    /** The same filament moved by (dx, dy, dz). */
    Filament translated(double dx, double dy, double dz);

    /** The mirror image in the plane z = z0 (current direction mirrored accordingly). */
    Filament mirroredZ(double z0);
}
