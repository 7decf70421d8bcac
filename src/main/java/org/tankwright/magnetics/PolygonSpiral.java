package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.materials.Conductor;

/**
 * Planar regular-polygon spiral (square, hexagonal or octagonal; PCB trace or wound wire):
 * {@code turns} turns between the outer and inner sizes measured across flats at the conductor's
 * edges. Turns are evenly spaced, pitch = ((outer − inner)/2 − w)/(turns − 1). Each turn is modelled
 * as a closed polygon of straight segments with one flat facing +x; z = 0 is the winding's mean plane.
 */
public record PolygonSpiral(int sides, double outerAcrossFlats, double innerAcrossFlats, int turns,
        Conductor conductor) implements CoilGeometry {

    /** Radial pitch between turns, m (0 for a single turn). */
    public double pitch() {
        return turns > 1 ? (0.5 * (outerAcrossFlats - innerAcrossFlats) - conductor.footprintWidth()) / (turns - 1)
                : 0.0;
    }

    /** Apothem (centre to the conductor's centre line, across flats / 2) of turn i counted from outside, m. */
    public double apothem(int i) {
        return 0.5 * outerAcrossFlats - 0.5 * conductor.footprintWidth() - i * pitch();
    }

    @Override
    public String kind() {
        return switch (sides) {
            case 4 -> "square-spiral";
            case 6 -> "hex-spiral";
            case 8 -> "octagon-spiral";
            default -> "polygon-spiral";
        };
    }

    @Override
    public List<String> problems() {
        List<String> p = GeometryChecks.start(turns, 1, conductor);
        if (sides != 4 && sides != 6 && sides != 8) {
            p.add("sides = " + sides + ": allowed are 4 (square), 6 (hexagon) and 8 (octagon)");
        }
        GeometryChecks.positive(p, "diameter (outer, across flats)", outerAcrossFlats);
        GeometryChecks.positive(p, "inner diameter (across flats)", innerAcrossFlats);
        if (p.isEmpty()) {
            PlanarChecks.fit(p, "diameter", outerAcrossFlats, innerAcrossFlats, turns, conductor);
        }
        return p;
    }

    @Override
    public List<Filament> filaments() {
        requireValid();
        List<Filament> f = new ArrayList<>(turns * sides);
        double a = conductor.equivalentRadius();
        for (int i = 0; i < turns; i++) {
            double r = apothem(i) / Math.cos(Math.PI / sides);
            double[] xs = new double[sides];
            double[] ys = new double[sides];
            for (int k = 0; k < sides; k++) {
                double th = Math.PI / sides + 2 * Math.PI * k / sides;
                xs[k] = r * Math.cos(th);
                ys[k] = r * Math.sin(th);
            }
            Polygons.addClosed(f, xs, ys, a);
        }
        return List.copyOf(f);
    }

    @Override
    public double outerRadius() {
        return 0.5 * outerAcrossFlats / Math.cos(Math.PI / sides);
    }

    @Override
    public double outerWidth() {
        return outerAcrossFlats;
    }

    /** Along y: across flats for the square and octagon, across corners for the hexagon. */
    @Override
    public double outerHeight() {
        return sides == 6 ? 2 * outerRadius() : outerAcrossFlats;
    }

    /** Sum of the polygon perimeters at the conductor's centre line. */
    @Override
    public double wireLength() {
        double sum = 0;
        for (int i = 0; i < turns; i++) {
            sum += 2 * sides * apothem(i) * Math.tan(Math.PI / sides);
        }
        return sum;
    }

    @Override
    public double turnPitch() {
        return pitch();
    }
}
