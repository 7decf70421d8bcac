package org.tankwright.heating;

import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.FlatSpiral;
import org.tankwright.magnetics.PolygonSpiral;
import org.tankwright.magnetics.Ring;
import org.tankwright.magnetics.SingleLoop;

/**
 * A flat work coil as the plate model needs it: concentric rings carrying the coil current in series
 * (one per turn of a flat spiral), each at its radius and at its height above the winding's face
 * toward the plate, with the coil's empty inductance and its own series resistance.
 *
 * @param radii           ring radii, m (each &gt; 0)
 * @param lifts           height of each ring's current above the winding's face toward the plate, m (≥ 0)
 * @param outerRadius     outer radius of the winding at the conductor's edge, m
 * @param emptyInductance L0, H: inductance with no workpiece (from the coil model)
 * @param resistance      R_coil, Ω: the coil's own AC series resistance at the operating frequency
 */
public record FlatWorkCoil(double[] radii, double[] lifts, double outerRadius, double emptyInductance,
                           double resistance) {
    public FlatWorkCoil {
        if (radii == null || lifts == null || radii.length == 0 || radii.length != lifts.length) {
            throw new IllegalArgumentException("a flat work coil needs one height for each of its rings (at least one ring)");
        }
        radii = radii.clone();
        lifts = lifts.clone();
        for (int i = 0; i < radii.length; i++) {
            HeatingInputs.positive("ring radius", radii[i], "m");
            HeatingInputs.nonNegative("ring height above the winding face", lifts[i], "m");
        }
        HeatingInputs.positive("coil outer radius", outerRadius, "m");
        HeatingInputs.positive("empty coil inductance", emptyInductance, "H");
        HeatingInputs.nonNegative("coil resistance", resistance, "Ω");
    }

    /**
     * The rings of a flat round coil (spiral or loop: its own ring filaments), or of a regular-polygon spiral with each
     * turn replaced by the ring of equal enclosed area, radius = apothem·√(n·tan(π/n)/π) (ours; the error this makes
     * over a plate is measured in PlateLoadTest). Heights are taken from the winding's face toward the plate (its
     * lowest surface).
     *
     * @throws IllegalArgumentException for any other kind of coil
     */
    public static FlatWorkCoil of(CoilGeometry g, double emptyInductance, double resistance) {
        double[] radii;
        double[] lifts;
        if (g instanceof FlatSpiral || g instanceof SingleLoop) {
            java.util.List<Filament> f = g.filaments();
            radii = new double[f.size()];
            lifts = new double[f.size()];
            for (int i = 0; i < radii.length; i++) {
                Ring ring = (Ring) f.get(i);
                radii[i] = ring.radius();
                lifts[i] = ring.z() - g.zMin();
            }
        } else if (g instanceof PolygonSpiral p) {
            g.requireValid();
            double n = p.sides();
            double scale = Math.sqrt(n * Math.tan(Math.PI / n) / Math.PI);
            radii = new double[p.turns()];
            lifts = new double[p.turns()];
            for (int i = 0; i < radii.length; i++) {
                radii[i] = p.apothem(i) * scale;
                lifts[i] = -g.zMin();
            }
        } else {
            throw new IllegalArgumentException("a " + g.kind() + " is not a flat work coil (spiral, loop or polygon spiral)");
        }
        return new FlatWorkCoil(radii, lifts, g.outerRadius(), emptyInductance, resistance);
    }

    /** Whether {@link #of} can make rings of this coil. */
    public static boolean flat(CoilGeometry g) {
        return g instanceof FlatSpiral || g instanceof SingleLoop || g instanceof PolygonSpiral;
    }

    /** Whether {@link #of} replaces polygon turns by rings of equal area for this coil. */
    public static boolean equalAreaRings(CoilGeometry g) {
        return g instanceof PolygonSpiral;
    }

    @Override
    public double[] radii() {
        return radii.clone();
    }

    @Override
    public double[] lifts() {
        return lifts.clone();
    }

    /** Number of rings (turns). */
    public int rings() {
        return radii.length;
    }
}
