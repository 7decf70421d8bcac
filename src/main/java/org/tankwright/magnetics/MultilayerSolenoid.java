package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.materials.Checks;
import org.tankwright.materials.Conductor;

/**
 * Multilayer solenoid wound on a former of diameter {@code formerDiameter}: {@code turns} turns in
 * {@code layers} layers, ⌈turns/layers⌉ turns per layer (the last layer takes the remainder) at axial
 * {@code pitch}; layers are stacked radially at the conductor's outer size. z = 0 is the middle of the
 * winding length; each layer's turns are centred on it.
 */
public record MultilayerSolenoid(double formerDiameter, int turns, int layers, double pitch, Conductor conductor)
        implements CoilGeometry {

    /** Close-wound: the axial pitch equals the conductor's outer size. */
    public static MultilayerSolenoid closeWound(double formerDiameter, int turns, int layers, Conductor conductor) {
        return new MultilayerSolenoid(formerDiameter, turns, layers,
                conductor == null ? Double.NaN : conductor.footprintWidth(), conductor);
    }

    /** Turns in a full layer. */
    public int turnsPerLayer() {
        return layers < 1 ? 0 : (turns + layers - 1) / layers;
    }

    /** Winding length (turns per layer × pitch), m. */
    public double windingLength() {
        return turnsPerLayer() * pitch;
    }

    /** Radial depth of the winding (layers × conductor height), m. */
    public double windingDepth() {
        return layers * conductor.footprintHeight();
    }

    /** Mean radius of the winding, m. */
    public double meanRadius() {
        return 0.5 * formerDiameter + 0.5 * windingDepth();
    }

    /** Radius of layer j's conductor centres, m. */
    public double layerRadius(int j) {
        return 0.5 * formerDiameter + (j + 0.5) * conductor.footprintHeight();
    }

    /** Turns in layer j. */
    public int turnsInLayer(int j) {
        int per = turnsPerLayer();
        return Math.max(0, Math.min(per, turns - j * per));
    }

    /** Axial position of turn i of layer j (each layer's turns centred on z = 0), m. */
    public double turnZ(int j, int i) {
        return (i - 0.5 * (turnsInLayer(j) - 1)) * pitch;
    }

    @Override
    public String kind() {
        return "multilayer";
    }

    @Override
    public List<String> problems() {
        List<String> p = GeometryChecks.start(turns, 1, conductor);
        GeometryChecks.noTrace(p, conductor, "multilayer solenoid");
        GeometryChecks.positive(p, "diameter (former)", formerDiameter);
        GeometryChecks.positive(p, "pitch", pitch);
        if (layers < 1) {
            p.add("layers = " + layers + ": must be a whole number of at least 1");
        } else if (turns >= 1 && layers > turns) {
            p.add("layers = " + layers + ": cannot exceed turns = " + turns);
        } else if (turns >= 1 && turnsInLayer(layers - 1) < 1) {
            p.add("layers = " + layers + ": " + turns + " turns at " + turnsPerLayer()
                    + " per layer leave the last layer empty; use " + ((turns + turnsPerLayer() - 1) / turnsPerLayer())
                    + " layers");
        }
        if (p.isEmpty()) {
            GeometryChecks.pitchFits(p, pitch, conductor, "axial pitch");
        }
        return p;
    }

    @Override
    public List<Filament> filaments() {
        requireValid();
        List<Filament> f = new ArrayList<>(turns);
        double a = conductor.equivalentRadius();
        for (int j = 0; j < layers; j++) {
            int n = turnsInLayer(j);
            for (int i = 0; i < n; i++) {
                f.add(new Ring(0, 0, turnZ(j, i), layerRadius(j), a));
            }
        }
        return List.copyOf(f);
    }

    @Override
    public double zMax() {
        return 0.5 * (turnsPerLayer() - 1) * pitch + 0.5 * conductor.footprintWidth();
    }

    @Override
    public double outerRadius() {
        return 0.5 * formerDiameter + windingDepth();
    }

    @Override
    public double wireLength() {
        double sum = 0;
        for (int j = 0; j < layers; j++) {
            sum += turnsInLayer(j) * Math.hypot(2 * Math.PI * layerRadius(j), pitch);
        }
        return sum;
    }

    /** Human-readable note of the build, e.g. for tables. */
    public String build() {
        return layers + " layers x " + turnsPerLayer() + " turns, depth " + Checks.m(windingDepth());
    }

    @Override
    public double turnPitch() {
        return pitch;
    }
}
