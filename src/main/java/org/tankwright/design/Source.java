package org.tankwright.design;

import org.tankwright.design.Enums.SourceKind;
import org.tankwright.units.Dimension;

/** What drives the primary, described by its fundamental. */
public record Source(
        @Field(required = true, doc = "sine, full-bridge, half-bridge or current (a current-fed inverter)") SourceKind kind,
        @Field(dim = Dimension.VOLTAGE, min = 0, minExclusive = true, doc = "rms voltage of a sine source") Double vrms,
        @Field(dim = Dimension.VOLTAGE, min = 0, minExclusive = true, doc = "DC bus voltage of a bridge") Double vdc,
        @Field(dim = Dimension.FRACTION, min = 0, max = 1, minExclusive = true, def = "1",
                doc = "phase-shift duty: fraction of each half-period in which the bridge output is non-zero") double duty,
        @Field(dim = Dimension.CURRENT, min = 0, minExclusive = true, doc = "rms current of a current-fed source") Double irms,
        @Field(dim = Dimension.RESISTANCE, min = 0, def = "0", doc = "source (bridge or generator) series resistance") double resistance,
        @Field(doc = "true when the DC bus comes from the mains") Boolean mainsDerived,
        @Field(doc = "true when the mains-derived bus is galvanically isolated from the mains") Boolean isolated,
        @Field(dim = Dimension.CAPACITANCE, min = 0, doc = "output capacitance of one switch, for the zero-voltage-switching margin") Double coss,
        @Field(dim = Dimension.TIME, min = 0, doc = "bridge dead time, for the zero-voltage-switching margin") Double deadTime)
        implements Checked {

    @Override
    public void check(Problems p, String path) {
        if (kind == null) {
            return;
        }
        switch (kind) {
            case SINE -> {
                if (vrms == null) {
                    p.add(path + ".vrms_V", null, "a sine source needs its rms voltage");
                }
            }
            case FULL_BRIDGE, HALF_BRIDGE -> {
                if (vdc == null) {
                    p.add(path + ".vdc_V", null, "a bridge needs its DC bus voltage");
                }
            }
            case CURRENT -> {
                if (irms == null) {
                    p.add(path + ".irms_A", null, "a current-fed source needs its rms current");
                }
            }
        }
    }
}
