package org.tankwright.coupling;

import org.tankwright.provenance.Provenance;

/**
 * The coupling of two coils at one placement.
 *
 * @param gap         conductor surface to conductor surface along the axis, metres
 * @param distance    axial distance between the two windings' mean planes, metres
 * @param offsetX     lateral offset of coil b's axis in coil a's frame, x, metres
 * @param offsetY     lateral offset, y, metres
 * @param mutual      mutual inductance M in henries (positive when both currents run counter-clockwise seen from +z)
 * @param k           coupling factor M/√(L_a L_b), signed
 * @param inductanceA self-inductance of coil a in place (with the plates' images), henries
 * @param inductanceB self-inductance of coil b in place, henries
 * @param provenance  models, sources and validity
 */
public record CouplingResult(double gap, double distance, double offsetX, double offsetY, double mutual, double k,
                             double inductanceA, double inductanceB, Provenance provenance) {
    /** Magnitude of the lateral offset, metres. */
    public double offset() {
        return Math.hypot(offsetX, offsetY);
    }
}
