package org.tankwright.design;

import org.tankwright.units.Dimension;

/** The tolerance study: spreads of the parts and the limits a good build must meet. */
public record Tolerances(
        @Field(dim = Dimension.FRACTION, min = 0, max = 0.5, def = "5%", doc = "capacitor tolerance (± fraction)") double capacitance,
        @Field(dim = Dimension.FRACTION, min = 0, max = 0.5, def = "3%", doc = "inductance tolerance (± fraction)") double inductance,
        @Field(dim = Dimension.FRACTION, min = 0, max = 0.5, def = "5%", doc = "coupling tolerance (± fraction)") double coupling,
        @Field(dim = Dimension.FRACTION, min = 0, max = 0.9, def = "10%", doc = "load tolerance (± fraction)") double load,
        @Field(dim = Dimension.TEMPERATURE, min = 0, max = 200, def = "30", doc = "capacitor temperature swing for drift (± °C)") double temperatureSwing,
        @Field(min = 10, max = 1000000, def = "2000", doc = "number of Monte Carlo samples") int samples,
        @Field(def = "1", doc = "random seed, for repeatable studies") long seed,
        @Field(dim = Dimension.FRACTION, min = 0, max = 1, def = "3%", doc = "allowed resonant-frequency deviation") double frequencyLimit,
        @Field(dim = Dimension.FRACTION, min = 0, max = 1, def = "20%", doc = "allowed output-power deviation") double powerLimit) {
}
