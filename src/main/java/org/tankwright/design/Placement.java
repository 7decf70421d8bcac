package org.tankwright.design;

import org.tankwright.units.Dimension;

/**
 * Where the secondary coil sits relative to the primary: parallel axes, the axial distance
 * between the two windings' mean planes and the lateral offset of the secondary's axis in the
 * primary's frame. Measured M or k, when given, override the coupling model.
 */
public record Placement(
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true,
                doc = "axial distance between the mean planes of the two windings") Double distance,
        @Field(dim = Dimension.LENGTH, def = "0", doc = "lateral offset of the secondary along x") double offsetX,
        @Field(dim = Dimension.LENGTH, def = "0", doc = "lateral offset of the secondary along y") double offsetY,
        @Field(dim = Dimension.INDUCTANCE, doc = "measured mutual inductance; overrides the coupling model") Double mutual,
        @Field(min = -1, max = 1, doc = "measured coupling coefficient; overrides the coupling model") Double k)
        implements Checked {

    @Override
    public void check(Problems p, String path) {
        if (distance == null && mutual == null && k == null) {
            p.add(path + ".distance_m", null, "give the distance between the coils, or a measured mutual_H or k");
        }
        if (k != null && Math.abs(k) >= 1) {
            p.add(path + ".k", k, "must satisfy |k| < 1");
        }
    }
}
