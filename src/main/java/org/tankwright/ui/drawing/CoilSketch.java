package org.tankwright.ui.drawing;

import java.util.List;

/**
 * The geometry the coil drawing needs, in metres, taken from a design. The drawing shows what
 * it is given; it computes no physics.
 *
 * @param coils the coils, each at its own place
 * @param gap   the axial distance between the first two coils' facing surfaces, or NaN
 * @param offset the lateral offset of the second coil from the first, or NaN
 */
public record CoilSketch(List<Coil> coils, double gap, double offset) {

    /** How the turns are laid: flat (a spiral in a plane) or along the axis (a helix). */
    public enum Winding { SPIRAL, HELIX }

    /**
     * One coil: its turns' radii from inner to outer (spiral) or one radius repeated (helix),
     * the wire diameter, the axial pitch (helix), where it sits, and an optional ferrite plate.
     *
     * @param label   short name shown beside it ("primary")
     * @param winding spiral or helix
     * @param innerRadius radius of the innermost turn (to the wire centre)
     * @param outerRadius radius of the outermost turn (to the wire centre); equals inner for a helix
     * @param turns   number of turns (may be fractional)
     * @param wireDiameter outer diameter of the wire
     * @param length  axial length of a helix (0 for a spiral)
     * @param x       lateral position of the axis
     * @param z       axial position of the face nearest the other coil
     * @param facingUp true when the coil's windings extend downward from z (the lower coil)
     * @param ferrite the ferrite plate behind the coil, or null
     */
    public record Coil(String label, Winding winding, double innerRadius, double outerRadius, double turns,
                       double wireDiameter, double length, double x, double z, boolean facingUp, Ferrite ferrite) { }

    /** A ferrite plate (or disc) behind a coil: its radius (half-width), thickness and distance behind the windings. */
    public record Ferrite(double radius, double thickness, double spacing) { }
}
