package org.tankwright.ui.drawing;

import java.util.List;

/**
 * The geometry the coil drawing needs, in metres, read from a design. The drawing shows what it
 * is given and computes no physics. The primary's mean winding plane is at z = 0; z grows
 * towards the secondary.
 *
 * @param coils     the coils to draw (a measured coil has no geometry and is left out)
 * @param distance  axial distance between the first two coils' mean planes, or NaN
 * @param offset    lateral offset of the second coil along x, or NaN
 * @param workpiece the heated bar inside a work coil, or null
 */
public record CoilSketch(List<Coil> coils, double distance, double offset, Bar workpiece) {

    /** How the turns are laid: flat in a plane (spiral, loop) or along the axis (solenoid). */
    public enum Winding { FLAT, AXIAL }

    /**
     * One coil.
     *
     * @param label        its name
     * @param winding      flat or axial
     * @param sides        outline of a turn seen from above: 0 round, 4 square, 6 hexagon, 8 octagon
     * @param aspect       height / width of the outermost rectangular turn (1 otherwise)
     * @param innerAspect  height / width of the innermost rectangular turn (1 otherwise)
     * @param innerRadius  radius of the innermost turn at the wire's centre (across flats for polygons)
     * @param outerRadius  radius of the outermost turn at the wire's centre
     * @param turns        number of turns
     * @param layers       layers of an axial winding (1 for a single layer)
     * @param wireDiameter outer diameter of the conductor
     * @param length       axial length of an axial winding (0 for a flat one)
     * @param x            lateral position of the axis (along x)
     * @param y            lateral position of the axis (along y; shown in the top view only)
     * @param z            axial position of the mean winding plane
     * @param backBelow    true when the backing sits below (−z) the winding
     * @param backing      the ferrite plate or shield behind, or null
     */
    public record Coil(String label, Winding winding, int sides, double aspect, double innerAspect, double innerRadius, double outerRadius,
                       double turns, int layers, double wireDiameter, double length, double x, double y, double z,
                       boolean backBelow, Plate backing) { }

    /**
     * A plate behind a coil.
     *
     * @param halfSize  half its size across
     * @param thickness its thickness
     * @param distance  from the winding's mean plane to the plate's face
     * @param magnetic  true for ferrite, false for a conductive shield
     */
    public record Plate(double halfSize, double thickness, double distance, boolean magnetic) { }

    /** A round bar on the coil's axis, centred on the primary's mean plane. */
    public record Bar(double radius, double innerRadius, double length) { }
}
