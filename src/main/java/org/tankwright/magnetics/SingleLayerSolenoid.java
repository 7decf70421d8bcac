package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.materials.Checks;
import org.tankwright.materials.Conductor;

/**
 * Single-layer helical solenoid: {@code turns} turns of mean diameter {@code meanDiameter} (to the
 * conductor's centre) at axial {@code pitch}. The current-sheet length is turns × pitch. z = 0 is
 * the middle of the winding length; turn i sits at z = (i − (N − 1)/2)·pitch.
 */
public record SingleLayerSolenoid(double meanDiameter, int turns, double pitch, Conductor conductor)
        implements CoilGeometry {

    /** A solenoid given its current-sheet length (pitch = length / turns). */
    public static SingleLayerSolenoid ofLength(double meanDiameter, int turns, double length, Conductor conductor) {
        return new SingleLayerSolenoid(meanDiameter, turns, turns > 0 ? length / turns : Double.NaN, conductor);
    }

    /** Current-sheet length turns × pitch, m. */
    public double length() {
        return turns * pitch;
    }

    /** Mean radius, m. */
    public double meanRadius() {
        return 0.5 * meanDiameter;
    }

    @Override
    public String kind() {
        return "solenoid";
    }

    @Override
    public List<String> problems() {
        List<String> p = GeometryChecks.start(turns, 1, conductor);
        GeometryChecks.noTrace(p, conductor, "solenoid");
        GeometryChecks.positive(p, "diameter", meanDiameter);
        GeometryChecks.positive(p, "pitch", pitch);
        if (p.isEmpty()) {
            GeometryChecks.pitchFits(p, pitch, conductor, "length / turns");
            if (meanDiameter <= conductor.footprintWidth()) {
                p.add(Checks.fmt("diameter", meanDiameter) + ": the mean diameter must exceed the wire's outer size "
                        + Checks.m(conductor.footprintWidth()) + " (it is measured to the wire's centre)");
            }
        }
        return p;
    }

    @Override
    public List<Filament> filaments() {
        requireValid();
        List<Filament> f = new ArrayList<>(turns);
        double a = conductor.equivalentRadius();
        for (int i = 0; i < turns; i++) {
            f.add(new Ring(0, 0, (i - 0.5 * (turns - 1)) * pitch, meanRadius(), a));
        }
        return List.copyOf(f);
    }

    @Override
    public double zMax() {
        return 0.5 * (turns - 1) * pitch + 0.5 * conductor.footprintHeight();
    }

    @Override
    public double outerRadius() {
        return meanRadius() + 0.5 * conductor.footprintWidth();
    }

    /** Helix length N·√((πD)² + p²). */
    @Override
    public double wireLength() {
        return turns * Math.hypot(Math.PI * meanDiameter, pitch);
    }

    @Override
    public double turnPitch() {
        return pitch;
    }
}
