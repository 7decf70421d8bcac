package org.tankwright.heating;

/**
 * A round workpiece: a solid bar ({@code innerDiameter} 0) or a tube, of a length, its centre at
 * an axial offset from the work coil's centre (0 = centred).
 *
 * @param outerDiameter m
 * @param innerDiameter m, 0 for a solid bar
 * @param length        m
 * @param axialOffset   m, distance of the bar's centre from the coil's centre along the axis
 */
public record BarGeometry(double outerDiameter, double innerDiameter, double length, double axialOffset) {
    public BarGeometry {
        HeatingInputs.positive("workpiece diameter", outerDiameter, "m");
        HeatingInputs.nonNegative("workpiece bore diameter", innerDiameter, "m");
        if (innerDiameter >= outerDiameter) {
            throw new IllegalArgumentException("workpiece bore diameter " + innerDiameter + " m must be smaller than its"
                    + " outer diameter " + outerDiameter + " m");
        }
        HeatingInputs.positive("workpiece length", length, "m");
        HeatingInputs.finite("workpiece axial offset", axialOffset, "m");
    }

    /** A solid bar centred in the coil. */
    public static BarGeometry solid(double diameter, double length) {
        return new BarGeometry(diameter, 0.0, length, 0.0);
    }

    /** A tube centred in the coil. */
    public static BarGeometry tube(double outerDiameter, double innerDiameter, double length) {
        return new BarGeometry(outerDiameter, innerDiameter, length, 0.0);
    }

    public double outerRadius() {
        return 0.5 * outerDiameter;
    }

    public double innerRadius() {
        return 0.5 * innerDiameter;
    }

    /** Metal volume in m³. */
    public double volume() {
        return Math.PI * (outerRadius() * outerRadius() - innerRadius() * innerRadius()) * length;
    }

    /** Mass in kg for a density in kg/m³. */
    public double mass(double density) {
        return volume() * density;
    }

    /** Outer surface in m² (mantle and two end faces; a tube's bore is not counted: its air is still). */
    public double outerSurface() {
        double r = outerRadius();
        double c = innerRadius();
        return 2 * Math.PI * r * length + 2 * Math.PI * (r * r - c * c);
    }

    /** The length of bar inside a coil of length {@code coilLength} centred at 0. */
    public double lengthInside(double coilLength) {
        double lo = Math.max(axialOffset - 0.5 * length, -0.5 * coilLength);
        double hi = Math.min(axialOffset + 0.5 * length, 0.5 * coilLength);
        return Math.max(0.0, hi - lo);
    }
}
