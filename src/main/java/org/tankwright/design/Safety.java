package org.tankwright.design;

import org.tankwright.design.Enums.ExposureSet;
import org.tankwright.design.Enums.Population;
import org.tankwright.units.Dimension;

/** Settings of the safety screening. */
public record Safety(
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true,
                doc = "distance from the coils' centre at which the field is screened (default: 0.2 m for a pad, 0.7 m for a heater)") Double fieldDistance,
        @Field(def = "icnirp-2010", doc = "reference levels: icnirp-2010, icnirp-1998 or icnirp-2020") ExposureSet exposure,
        @Field(def = "public", doc = "public or worker") Population population) {
}
