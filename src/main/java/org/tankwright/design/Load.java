package org.tankwright.design;

import org.tankwright.design.Enums.LoadKind;
import org.tankwright.units.Dimension;

/** What the secondary feeds. */
public record Load(
        @Field(required = true, doc = "resistor (AC ohms at the secondary), rectifier-cap, rectifier-ind (DC ohms behind a bridge rectifier) or battery") LoadKind kind,
        @Field(dim = Dimension.RESISTANCE, min = 0, minExclusive = true,
                doc = "load resistance: AC ohms for a resistor, DC ohms behind a rectifier") Double resistance,
        @Field(dim = Dimension.VOLTAGE, min = 0, minExclusive = true, doc = "battery charge voltage") Double batteryVoltage,
        @Field(dim = Dimension.POWER, min = 0, minExclusive = true,
                doc = "output power the control holds over the envelope (optional)") Double targetPower) implements Checked {

    @Override
    public void check(Problems p, String path) {
        if (kind == null) {
            return;
        }
        if (kind == LoadKind.BATTERY && batteryVoltage == null) {
            p.add(path + ".battery_voltage_V", null, "a battery load needs its charge voltage");
        }
        if (kind != LoadKind.BATTERY && resistance == null) {
            p.add(path + ".resistance_ohm", null, "a " + Token.of(kind) + " load needs its resistance");
        }
    }
}
