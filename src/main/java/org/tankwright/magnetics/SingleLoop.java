package org.tankwright.magnetics;

import java.util.List;
import org.tankwright.materials.Checks;
import org.tankwright.materials.Conductor;

/** A single round loop of mean diameter {@code meanDiameter} (to the conductor's centre); z = 0 is its plane. */
public record SingleLoop(double meanDiameter, Conductor conductor) implements CoilGeometry {

    @Override
    public String kind() {
        return "loop";
    }

    @Override
    public int turns() {
        return 1;
    }

    /** Mean radius, m. */
    public double meanRadius() {
        return 0.5 * meanDiameter;
    }

    @Override
    public List<String> problems() {
        List<String> p = GeometryChecks.start(1, 1, conductor);
        GeometryChecks.positive(p, "diameter", meanDiameter);
        if (p.isEmpty() && meanDiameter <= conductor.footprintWidth()) {
            p.add(Checks.fmt("diameter", meanDiameter) + ": the mean diameter must exceed the wire's outer size "
                    + Checks.m(conductor.footprintWidth()));
        }
        return p;
    }

    @Override
    public List<Filament> filaments() {
        requireValid();
        return List.of(new Ring(0, 0, 0, meanRadius(), conductor.equivalentRadius()));
    }

    @Override
    public double outerRadius() {
        return meanRadius() + 0.5 * conductor.footprintWidth();
    }

    @Override
    public double wireLength() {
        return Math.PI * meanDiameter;
    }

    @Override
    public double turnPitch() {
        return 0.0;
    }
}
