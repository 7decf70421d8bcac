package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.materials.Conductor;

/**
 * Flat circular spiral (pancake): {@code turns} turns between the outer diameter {@code outerDiameter}
 * and the inner diameter {@code innerDiameter}, both at the conductor's edges as a caliper measures
 * them. Turns are evenly spaced: pitch = ((outer − inner)/2 − w)/(turns − 1), w the conductor width.
 * Modelled as concentric rings; z = 0 is the winding's mean plane.
 */
public record FlatSpiral(double outerDiameter, double innerDiameter, int turns, Conductor conductor)
        implements CoilGeometry {

    /** Radial pitch between turns, m (0 for a single turn). */
    public double pitch() {
        return turns > 1 ? (0.5 * (outerDiameter - innerDiameter) - conductor.footprintWidth()) / (turns - 1) : 0.0;
    }

    /** Radius of turn i's conductor centre, counted from the outside, m. */
    public double turnRadius(int i) {
        return 0.5 * outerDiameter - 0.5 * conductor.footprintWidth() - i * pitch();
    }

    /** Mean diameter (outer + inner)/2, m. */
    public double meanDiameter() {
        return 0.5 * (outerDiameter + innerDiameter);
    }

    @Override
    public String kind() {
        return "spiral";
    }

    @Override
    public List<String> problems() {
        List<String> p = GeometryChecks.start(turns, 1, conductor);
        GeometryChecks.positive(p, "diameter (outer)", outerDiameter);
        GeometryChecks.positive(p, "inner diameter", innerDiameter);
        if (p.isEmpty()) {
            PlanarChecks.fit(p, "diameter", outerDiameter, innerDiameter, turns, conductor);
        }
        return p;
    }

    @Override
    public List<Filament> filaments() {
        requireValid();
        List<Filament> f = new ArrayList<>(turns);
        double a = conductor.equivalentRadius();
        for (int i = 0; i < turns; i++) {
            f.add(new Ring(0, 0, 0, turnRadius(i), a));
        }
        return List.copyOf(f);
    }

    @Override
    public double outerRadius() {
        return 0.5 * outerDiameter;
    }

    /** Sum of the ring circumferences (the Archimedean spiral differs by far less than 0.1 %). */
    @Override
    public double wireLength() {
        double sum = 0;
        for (int i = 0; i < turns; i++) {
            sum += 2 * Math.PI * turnRadius(i);
        }
        return sum;
    }

    @Override
    public double turnPitch() {
        return pitch();
    }
}
