package org.tankwright.design;

import org.tankwright.design.Enums.Topology;
import org.tankwright.units.Dimension;

/** How the coils are tuned: topology, optional fixed capacitors, and the input phase the tuning aims at. */
public record Compensation(
        @Field(required = true, doc = "SS, SP, PS, PP for a link; series or parallel for a single tank") Topology topology,
        @Field(dim = Dimension.CAPACITANCE, min = 0, minExclusive = true,
                doc = "fixed primary (or tank) capacitance; tuned automatically when absent") Double c1,
        @Field(dim = Dimension.CAPACITANCE, min = 0, minExclusive = true,
                doc = "fixed secondary capacitance; tuned automatically when absent") Double c2,
        @Field(dim = Dimension.ANGLE, min = -89, max = 89,
                doc = "input phase the primary tuning aims at; positive is inductive (zero-voltage switching)") Double targetPhase) {
}
