package org.tankwright.design;

import org.tankwright.units.Dimension;

/** How capacitor banks are chosen for the tuned values. */
public record CapacitorSettings(
        @Field(doc = "parts catalogue file (relative to the design file); the bundled demo catalogue when absent") String catalogue,
        @Field(dim = Dimension.FRACTION, min = 0, max = 0.5, def = "2%", doc = "largest allowed deviation of a bank from its target capacitance") double maxDeviation,
        @Field(doc = "whether to choose banks from the catalogue (default true)") Boolean synthesize) {
}
