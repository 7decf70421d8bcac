package org.tankwright.design;

import org.tankwright.design.Enums.ConductorMaterial;
import org.tankwright.design.Enums.WireKind;
import org.tankwright.units.Dimension;

/** The conductor a coil is wound with. Which values are needed depends on {@code kind}. */
public record Wire(
        @Field(def = "round", doc = "round (solid wire), litz, tube (copper tube) or trace (PCB)") WireKind kind,
        @Field(def = "copper", doc = "copper or aluminium") ConductorMaterial material,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true,
                doc = "bare conductor diameter (round); tube outer diameter (tube)") Double diameter,
        @Field(min = 0, max = 60, doc = "American Wire Gauge number instead of a diameter (round)") Integer awg,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true,
                doc = "outer diameter over insulation (round) or over the bundle (litz)") Double outerDiameter,
        @Field(min = 1, doc = "number of strands (litz)") Integer strands,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "strand diameter (litz)") Double strandDiameter,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "wall thickness (tube)") Double wall,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "trace width (trace)") Double width,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true,
                doc = "copper thickness (trace); 35 µm is 1 oz copper") Double thickness) implements Checked {

    @Override
    public void check(Problems p, String path) {
        WireKind k = kind == null ? WireKind.ROUND : kind;
        switch (k) {
            case ROUND -> {
                if (diameter == null && awg == null) {
                    p.add(path + ".diameter_m", null, "a round wire needs a bare diameter or an awg number");
                }
            }
            case LITZ -> {
                if (strands == null) {
                    p.add(path + ".strands", null, "a litz wire needs its strand count");
                }
                if (strandDiameter == null) {
                    p.add(path + ".strand_diameter_m", null, "a litz wire needs its strand diameter");
                }
            }
            case TUBE -> {
                if (diameter == null) {
                    p.add(path + ".diameter_m", null, "a tube needs its outer diameter");
                }
                if (wall == null) {
                    p.add(path + ".wall_m", null, "a tube needs its wall thickness");
                } else if (diameter != null && 2 * wall > diameter) {
                    p.add(path + ".wall_m", wall, "the wall must be at most half the outer diameter (" + diameter + " m)");
                }
            }
            case TRACE -> {
                if (width == null) {
                    p.add(path + ".width_m", null, "a PCB trace needs its width");
                }
                if (thickness == null) {
                    p.add(path + ".thickness_m", null, "a PCB trace needs its copper thickness (35 µm = 1 oz)");
                }
            }
        }
        if (outerDiameter != null && diameter != null && outerDiameter < diameter && k != WireKind.TUBE) {
            p.add(path + ".outer_diameter_m", outerDiameter, "the outer diameter must be at least the bare diameter (" + diameter + " m)");
        }
    }
}
