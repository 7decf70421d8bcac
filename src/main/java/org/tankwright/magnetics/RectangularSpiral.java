package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.materials.Checks;
import org.tankwright.materials.Conductor;

/**
 * Planar rectangular spiral (how vehicle and robot pads are wound): outer and inner width (along x)
 * and height (along y) at the conductor's edges. Turns evenly spaced, pitch = ((outerWidth −
 * innerWidth)/2 − w)/(turns − 1); the inner height must leave the same band. Each turn is a closed
 * rectangle of four straight segments; z = 0 is the winding's mean plane.
 */
public record RectangularSpiral(double outerWidth, double outerHeight, double innerWidth, double innerHeight,
        int turns, Conductor conductor) implements CoilGeometry {

    /** Radial pitch between turns, m (0 for a single turn). */
    public double pitch() {
        return turns > 1 ? (0.5 * (outerWidth - innerWidth) - conductor.footprintWidth()) / (turns - 1) : 0.0;
    }

    /** Half width (to the conductor's centre line) of turn i counted from outside, m. */
    public double halfWidth(int i) {
        return 0.5 * outerWidth - 0.5 * conductor.footprintWidth() - i * pitch();
    }

    /** Half height (to the conductor's centre line) of turn i counted from outside, m. */
    public double halfHeight(int i) {
        return 0.5 * outerHeight - 0.5 * conductor.footprintWidth() - i * pitch();
    }

    @Override
    public String kind() {
        return "rect-spiral";
    }

    @Override
    public List<String> problems() {
        List<String> p = GeometryChecks.start(turns, 1, conductor);
        GeometryChecks.positive(p, "width (outer)", outerWidth);
        GeometryChecks.positive(p, "height (outer)", outerHeight);
        GeometryChecks.positive(p, "inner width", innerWidth);
        GeometryChecks.positive(p, "inner height", innerHeight);
        if (p.isEmpty()) {
            PlanarChecks.fit(p, "width", outerWidth, innerWidth, turns, conductor);
        }
        if (p.isEmpty()) {
            double expected = outerHeight - (outerWidth - innerWidth);
            if (Math.abs(innerHeight - expected) > 1e-3 * outerHeight) {
                p.add(Checks.fmt("inner height", innerHeight) + ": with evenly spaced turns it must be outer height - "
                        + "(outer width - inner width) = " + Checks.m(expected));
            }
        }
        return p;
    }

    @Override
    public List<Filament> filaments() {
        requireValid();
        List<Filament> f = new ArrayList<>(turns * 4);
        double a = conductor.equivalentRadius();
        for (int i = 0; i < turns; i++) {
            double hx = halfWidth(i);
            double hy = halfHeight(i);
            Polygons.addClosed(f, new double[] {hx, -hx, -hx, hx}, new double[] {hy, hy, -hy, -hy}, a);
        }
        return List.copyOf(f);
    }

    @Override
    public double outerRadius() {
        return 0.5 * Math.hypot(outerWidth, outerHeight);
    }

    @Override
    public double wireLength() {
        double sum = 0;
        for (int i = 0; i < turns; i++) {
            sum += 4 * (halfWidth(i) + halfHeight(i));
        }
        return sum;
    }

    @Override
    public double turnPitch() {
        return pitch();
    }
}
