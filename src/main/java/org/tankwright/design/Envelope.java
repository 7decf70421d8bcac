package org.tankwright.design;

import org.tankwright.units.Dimension;

/** The operating envelope: the ranges of placement, load, frequency and temperature the design must survive. */
public record Envelope(
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "smallest axial distance between the windings") Double distanceMin,
        @Field(dim = Dimension.LENGTH, min = 0, minExclusive = true, doc = "largest axial distance between the windings") Double distanceMax,
        @Field(dim = Dimension.LENGTH, min = 0, doc = "largest lateral offset") Double offsetMax,
        @Field(dim = Dimension.RESISTANCE, min = 0, minExclusive = true, doc = "smallest load resistance") Double loadMin,
        @Field(dim = Dimension.RESISTANCE, min = 0, minExclusive = true, doc = "largest load resistance") Double loadMax,
        @Field(dim = Dimension.FREQUENCY, min = 0, minExclusive = true, doc = "lowest drive frequency") Double frequencyMin,
        @Field(dim = Dimension.FREQUENCY, min = 0, minExclusive = true, doc = "highest drive frequency") Double frequencyMax,
        @Field(dim = Dimension.TEMPERATURE, min = -60, max = 400, doc = "coldest coil temperature") Double temperatureMin,
        @Field(dim = Dimension.TEMPERATURE, min = -60, max = 400, doc = "hottest coil temperature") Double temperatureMax,
        @Field(doc = "whether the receiver may be removed while the source runs (default true for links)") Boolean receiverRemovable)
        implements Checked {

    @Override
    public void check(Problems p, String path) {
        order(p, path, "distance", distanceMin, distanceMax);
        order(p, path, "load", loadMin, loadMax);
        order(p, path, "frequency", frequencyMin, frequencyMax);
        order(p, path, "temperature", temperatureMin, temperatureMax);
    }

    private static void order(Problems p, String path, String what, Double min, Double max) {
        if (min != null && max != null && min > max) {
            p.add(path + "." + what + "_max", max, "must not be below the " + what + " minimum (" + min + ")");
        }
    }
}
