package org.tankwright.design;

import org.tankwright.design.Enums.CoilShape;
import org.tankwright.units.Dimension;

/**
 * One coil: its geometry and conductor, or (shape {@code measured}) just its measured values.
 * Conventions: solenoid and loop {@code diameter} is the mean diameter to the wire's centre;
 * multilayer {@code diameter} is the former's diameter; spiral {@code diameter} and
 * {@code inner_diameter} are outer and inner sizes at the conductor's edges (polygons across flats);
 * rect-spiral uses {@code width}/{@code height} and {@code inner_width}/{@code inner_height}.
 */
public record Coil(
        @Field(doc = "a name for this coil") String label,
        @Field(required = true, doc = "solenoid, multilayer, spiral, square-spiral, hex-spiral, octagon-spiral, rect-spiral, loop or measured") CoilShape shape,
        @Field(min = 0, minExclusive = true, max = 100000, doc = "total number of turns") Double turns,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "diameter (see the shape's convention)") Double diameter,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "inner diameter of a spiral") Double innerDiameter,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "outer width of a rectangular spiral") Double width,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "outer height of a rectangular spiral") Double height,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "inner width of a rectangular spiral") Double innerWidth,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "inner height of a rectangular spiral") Double innerHeight,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "winding length of a solenoid (turns × pitch)") Double length,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "turn-to-turn pitch of a solenoid") Double pitch,
        @Field(min = 1, max = 1000, doc = "number of layers of a multilayer solenoid") Integer layers,
        @Field(doc = "the conductor") Wire wire,
        @Field(dim = Dimension.TEMPERATURE, min = -60, max = 400, def = "20",
                doc = "winding temperature for resistance") double temperature,
        @Field(doc = "ferrite plate or shield behind the coil") Backing backing,
        @Field(dim = Dimension.INDUCTANCE, min = 0, minExclusive = true,
                doc = "measured inductance; required for a measured coil, overrides the model otherwise") Double inductance,
        @Field(dim = Dimension.RESISTANCE, min = 0, minExclusive = true,
                doc = "measured series AC resistance at the operating frequency; overrides the model") Double resistance)
        implements Checked {

    @Override
    public void check(Problems p, String path) {
        if (shape == null) {
            return;
        }
        if (shape == CoilShape.MEASURED) {
            if (inductance == null) {
                p.add(path + ".inductance_H", null, "a measured coil needs its inductance");
            }
            if (resistance == null) {
                p.add(path + ".resistance_ohm", null, "a measured coil needs its series AC resistance");
            }
            return;
        }
        if (turns == null) {
            p.add(path + ".turns", null, "a " + Token.of(shape) + " needs its number of turns");
        }
        if (wire == null) {
            p.add(path + ".wire", null, "a " + Token.of(shape) + " needs its wire");
        }
        switch (shape) {
            case RECT_SPIRAL -> {
                require(p, path, "width_m", width);
                require(p, path, "height_m", height);
                require(p, path, "inner_width_m", innerWidth);
                require(p, path, "inner_height_m", innerHeight);
                if (width != null && innerWidth != null && innerWidth >= width) {
                    p.add(path + ".inner_width_m", innerWidth, "must be smaller than width_m (" + width + ")");
                }
                if (height != null && innerHeight != null && innerHeight >= height) {
                    p.add(path + ".inner_height_m", innerHeight, "must be smaller than height_m (" + height + ")");
                }
            }
            case SPIRAL, SQUARE_SPIRAL, HEX_SPIRAL, OCTAGON_SPIRAL -> {
                require(p, path, "diameter_m", diameter);
                require(p, path, "inner_diameter_m", innerDiameter);
                if (diameter != null && innerDiameter != null && innerDiameter >= diameter) {
                    p.add(path + ".inner_diameter_m", innerDiameter, "must be smaller than diameter_m (" + diameter + ")");
                }
            }
            case SOLENOID -> {
                require(p, path, "diameter_m", diameter);
                if (length == null && pitch == null) {
                    p.add(path + ".length_m", null, "a solenoid needs its length or its pitch");
                }
            }
            case MULTILAYER -> {
                require(p, path, "diameter_m", diameter);
                require(p, path, "layers", layers);
            }
            case LOOP -> require(p, path, "diameter_m", diameter);
            default -> {
            }
        }
    }

    private static void require(Problems p, String path, String key, Object v) {
        if (v == null) {
            p.add(path + "." + key, null, "is required for this shape");
        }
    }

    /** The same coil with a new turns count (for editors and studies). */
    public Coil withTurns(double t) {
        return new Coil(label, shape, t, diameter, innerDiameter, width, height, innerWidth, innerHeight, length,
                pitch, layers, wire, temperature, backing, inductance, resistance);
    }
}
