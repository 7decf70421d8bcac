package org.tankwright.design;

import org.tankwright.design.Enums.DesignKind;
import org.tankwright.design.Enums.SourceKind;
import org.tankwright.design.Enums.Topology;
import org.tankwright.units.Dimension;

/**
 * A whole design, immutable. A user's edit makes a new Design; undo is a list of them.
 * A {@code link} has a primary and a secondary coil, a placement and a load; a {@code tank} has
 * one coil and a series or parallel capacitor; a {@code heater} has a work coil and a workpiece.
 */
public record Design(
        @Field(required = true, doc = "the design's name") String name,
        @Field(doc = "who would start from this design and what it is for") String description,
        @Field(required = true, doc = "link, tank or heater") DesignKind kind,
        @Field(dim = Dimension.FREQUENCY, min = 1, max = 1e9, required = true, doc = "the design (drive) frequency") Double frequency,
        @Field(required = true, doc = "the primary coil (the tank coil or the heater's work coil)") Coil primary,
        @Field(doc = "the secondary coil of a link") Coil secondary,
        @Field(doc = "where the secondary sits (links)") Placement placement,
        @Field(required = true, doc = "the compensation topology and capacitors") Compensation compensation,
        @Field(required = true, doc = "what drives the primary") Source source,
        @Field(doc = "what the secondary feeds (links)") Load load,
        @Field(doc = "the heated bar or plate (heaters)") Workpiece workpiece,
        @Field(doc = "how capacitor banks are chosen") CapacitorSettings capacitors,
        @Field(doc = "the operating envelope") Envelope envelope,
        @Field(doc = "the tolerance study") Tolerances tolerances,
        @Field(doc = "safety screening settings") Safety safety) implements Checked {

    @Override
    public void check(Problems p, String path) {
        if (kind == null || compensation == null || compensation.topology() == null) {
            return;
        }
        Topology t = compensation.topology();
        switch (kind) {
            case LINK -> {
                if (t.singleTank()) {
                    p.add(path + ".compensation.topology", t.token(), "a link needs SS, SP, PS or PP");
                }
                if (secondary == null) {
                    p.add(path + ".secondary", null, "a link needs a secondary coil");
                }
                if (placement == null) {
                    p.add(path + ".placement", null, "a link needs a placement (distance or measured coupling)");
                }
                if (load == null) {
                    p.add(path + ".load", null, "a link needs a load");
                }
            }
            case TANK, HEATER -> {
                if (!t.singleTank()) {
                    p.add(path + ".compensation.topology", t.token(), "a " + Token.of(kind) + " needs series or parallel");
                }
                if (kind == DesignKind.HEATER && workpiece == null) {
                    p.add(path + ".workpiece", null, "a heater needs a workpiece");
                }
            }
        }
        if (source != null && source.kind() == SourceKind.CURRENT && t != Topology.PARALLEL
                && t != Topology.PS && t != Topology.PP) {
            p.add(path + ".source.kind", "current", "a current-fed source drives a parallel tank (parallel, PS or PP)");
        }
    }

    /** Whether this design has a secondary side (a link). */
    public boolean isLink() {
        return kind == DesignKind.LINK;
    }

    /** A copy with a new name. */
    public Design withName(String n) {
        return new Design(n, description, kind, frequency, primary, secondary, placement, compensation, source, load,
                workpiece, capacitors, envelope, tolerances, safety);
    }
}
