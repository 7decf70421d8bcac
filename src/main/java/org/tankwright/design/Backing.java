package org.tankwright.design;

import org.tankwright.design.Enums.BackingKind;
import org.tankwright.units.Dimension;

/** A ferrite plate or a conductive shield behind a coil, parallel to its winding plane. */
public record Backing(
        @Field(required = true, doc = "ferrite (a magnetic plate) or shield (a conductive plate)") BackingKind kind,
        @Field(dim = Dimension.PERMEABILITY, min = 1, doc = "relative permeability of the ferrite") Double muR,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, required = true, doc = "plate thickness") Double thickness,
        @Field(dim = Dimension.LENGTH, min = 0, required = true,
                doc = "gap from the back of the winding's conductor to the plate's face (spacer thickness)") Double distance,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true,
                doc = "plate size across (square or round); should exceed the coil") Double size,
        @Field(dim = Dimension.RESISTIVITY, min = 0, minExclusive = true,
                doc = "resistivity of a shield (default aluminium)") Double resistivity,
        @Field(min = -1, max = 1,
                doc = "image coefficient measured on the real pad; overrides the computed (µr−1)/(µr+1) or −1") Double imageCoefficient)
        implements Checked {

    @Override
    public void check(Problems p, String path) {
        if (kind == BackingKind.FERRITE && muR == null) {
            p.add(path + ".mu_r", null, "a ferrite plate needs its relative permeability (e.g. 1000 to 3000 for power ferrite)");
        }
    }
}
