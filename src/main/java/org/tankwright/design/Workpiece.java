package org.tankwright.design;

import org.tankwright.design.Enums.WorkpieceShape;
import org.tankwright.units.Dimension;

/**
 * What an induction heater heats: a round bar inside its solenoid work coil, or a flat round plate
 * (disc) below a flat spiral work coil, coaxial with it.
 */
public record Workpiece(
        @Field(def = "bar", doc = "bar (round bar inside a solenoid) or plate (disc below a flat spiral)") WorkpieceShape shape,
        @Field(required = true, doc = "material name from the materials table (e.g. carbon-steel)") String material,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, required = true,
                doc = "outer diameter of the bar, or diameter of the plate") Double diameter,
        @Field(dim = Dimension.LENGTH, min = 0, def = "0", doc = "bore of a hollow bar; 0 for a solid bar (bars only)") double innerDiameter,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "length of the bar (required for a bar)") Double length,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, max = 1,
                doc = "thickness of the plate (required for a plate)") Double thickness,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, max = 1,
                doc = "distance from the coil conductor's face to the plate surface (required for a plate)") Double gap,
        @Field(dim = Dimension.TEMPERATURE, min = -50, max = 3000, def = "20", doc = "temperature of the cold operating point") double temperatureCold,
        @Field(dim = Dimension.TEMPERATURE, min = -50, max = 3000, def = "900", doc = "temperature of the hot operating point") double temperatureHot,
        @Field(dim = Dimension.FRACTION, min = 0, max = 0.95, def = "0.2",
                doc = "share of the heating power lost to radiation and convection (allowance for the heating-time estimate)") double lossAllowance,
        @Field(dim = Dimension.TEMPERATURE, min = 1, max = 80, def = "10",
                doc = "allowed coolant temperature rise through the work coil") double coolantRise) implements Checked {

    /** A round bar (the shape of files written before plates existed). */
    public static Workpiece bar(String material, Double diameter, double innerDiameter, Double length,
                                double temperatureCold, double temperatureHot, double lossAllowance, double coolantRise) {
        return new Workpiece(WorkpieceShape.BAR, material, diameter, innerDiameter, length, null, null, temperatureCold,
                temperatureHot, lossAllowance, coolantRise);
    }

    /** Whether this workpiece is a plate below a flat coil (otherwise a bar inside a solenoid). */
    public boolean isPlate() {
        return shape == WorkpieceShape.PLATE;
    }

    @Override
    public void check(Problems p, String path) {
        if (isPlate()) {
            if (thickness == null) {
                p.add(path + ".thickness_m", null, "a plate needs its thickness (a length above 0)");
            }
            if (gap == null) {
                p.add(path + ".gap_m", null, "a plate needs its gap from the coil conductor's face (a length above 0)");
            }
            if (innerDiameter != 0) {
                p.add(path + ".inner_diameter_m", innerDiameter, "applies to a bar only; a plate is solid (leave it out or 0)");
            }
            if (length != null) {
                p.add(path + ".length_m", length, "applies to a bar only; a plate has diameter_m and thickness_m");
            }
        } else {
            if (length == null) {
                p.add(path + ".length_m", null, "a bar needs its length (a length above 0)");
            }
            if (diameter != null && innerDiameter >= diameter) {
                p.add(path + ".inner_diameter_m", innerDiameter, "must be smaller than diameter_m (" + diameter + ")");
            }
            if (thickness != null) {
                p.add(path + ".thickness_m", thickness, "applies to a plate only (shape plate)");
            }
            if (gap != null) {
                p.add(path + ".gap_m", gap, "applies to a plate only (shape plate); a bar sits inside its coil");
            }
        }
        if (temperatureHot <= temperatureCold) {
            p.add(path + ".temperature_hot_degC", temperatureHot, "must be above temperature_cold_degC (" + temperatureCold + ")");
        }
    }
}
