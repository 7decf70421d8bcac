package org.tankwright.magnetics;

import java.util.List;
import org.tankwright.materials.Conductor;

/**
 * The shape of one coil and what it is wound from. Every coil is centred on the z axis; each kind
 * says in its javadoc where z = 0 lies. All lengths in metres.
 *
 * <p>Call {@link #problems()} first: it is empty for a buildable coil and otherwise names each bad
 * field, its value and what is allowed. The other methods assume a valid coil and throw
 * {@link IllegalStateException} from {@link #filaments()} otherwise.
 */
public sealed interface CoilGeometry
        permits SingleLayerSolenoid, MultilayerSolenoid, FlatSpiral, PolygonSpiral, RectangularSpiral, SingleLoop {

    /** Short name of the kind: solenoid, multilayer, spiral, square-spiral, hex-spiral, octagon-spiral, rect-spiral, loop. */
    String kind();

    /** Total number of turns. */
    int turns();

    /** The conductor the coil is wound from. */
    Conductor conductor();

    /** Empty when valid; otherwise one message per problem (field, value, what is allowed). */
    List<String> problems();

    /** True when {@link #problems()} is empty. */
    default boolean isValid() {
        return problems().isEmpty();
    }

    /**
     * The coil as filaments carrying the coil current in series: one coaxial {@link Ring} per turn at
     * the conductor's centre for round coils, closed straight {@link Segment} polygons for polygonal
     * spirals (one closed polygon per turn; the short step between turns is neglected).
     */
    List<Filament> filaments();

    /** Lowest z of any conductor surface, m (every kind is symmetric about z = 0). */
    default double zMin() {
        return -zMax();
    }

    /** Highest z of any conductor surface, m; for the flat kinds half the conductor's height. */
    default double zMax() {
        return 0.5 * conductor().footprintHeight();
    }

    /** Largest distance of any conductor surface from the z axis, m. */
    double outerRadius();

    /** Extent of the conductor surfaces along x, m (round kinds: the outer diameter). */
    default double outerWidth() {
        return 2 * outerRadius();
    }

    /** Extent of the conductor surfaces along y, m (round kinds: the outer diameter). */
    default double outerHeight() {
        return 2 * outerRadius();
    }

    /** Centre-to-centre distance of neighbouring turns, m: axial for solenoids, radial for spirals, 0 for one turn. */
    double turnPitch();

    /** Length of conductor in the winding (leads excluded), m. */
    double wireLength();

    /** Throws when the geometry has problems; used before building filaments. */
    default void requireValid() {
        List<String> p = problems();
        if (!p.isEmpty()) {
            throw new IllegalStateException(String.join("; ", p));
        }
    }
}
