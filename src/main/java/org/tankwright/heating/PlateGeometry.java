package org.tankwright.heating;

/**
 * A round flat plate (disc) below a flat work coil, coaxial with it.
 *
 * @param diameter  plate diameter, m
 * @param thickness plate thickness, m
 * @param gap       distance from the winding's face toward the plate to the plate's surface, m
 */
public record PlateGeometry(double diameter, double thickness, double gap) {
    public PlateGeometry {
        HeatingInputs.positive("plate diameter", diameter, "m");
        HeatingInputs.positive("plate thickness", thickness, "m");
        HeatingInputs.positive("gap between coil and plate", gap, "m");
    }

    /** Plate radius, m. */
    public double radius() {
        return 0.5 * diameter;
    }

    /** Volume π·(d/2)²·t, m³. */
    public double volume() {
        return Math.PI * radius() * radius() * thickness;
    }

    /** Mass at the given density (kg/m³), kg. */
    public double mass(double density) {
        return volume() * HeatingInputs.positive("density", density, "kg/m³");
    }
}
