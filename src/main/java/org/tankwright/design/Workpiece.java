package org.tankwright.design;

import org.tankwright.units.Dimension;

/** The round bar an induction heater heats, inside its work coil. */
public record Workpiece(
        @Field(required = true, doc = "material name from the materials table (e.g. carbon-steel)") String material,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, required = true, doc = "outer diameter of the bar") Double diameter,
        @Field(dim = Dimension.LENGTH, min = 0, def = "0", doc = "bore of a hollow bar; 0 for a solid bar") double innerDiameter,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, required = true, doc = "length of the bar") Double length,
        @Field(dim = Dimension.TEMPERATURE, min = -50, max = 3000, def = "20", doc = "temperature of the cold operating point") double temperatureCold,
        @Field(dim = Dimension.TEMPERATURE, min = -50, max = 3000, def = "900", doc = "temperature of the hot operating point") double temperatureHot,
        @Field(dim = Dimension.FRACTION, min = 0, max = 0.95, def = "0.2",
                doc = "share of the heating power lost to radiation and convection (allowance for the heating-time estimate)") double lossAllowance,
        @Field(dim = Dimension.TEMPERATURE, min = 1, max = 80, def = "10",
                doc = "allowed coolant temperature rise through the work coil") double coolantRise) implements Checked {

    @Override
    public void check(Problems p, String path) {
        if (diameter != null && innerDiameter >= diameter) {
            p.add(path + ".inner_diameter_m", innerDiameter, "must be smaller than diameter_m (" + diameter + ")");
        }
        if (temperatureHot <= temperatureCold) {
            p.add(path + ".temperature_hot_degC", temperatureHot, "must be above temperature_cold_degC (" + temperatureCold + ")");
        }
    }
}
