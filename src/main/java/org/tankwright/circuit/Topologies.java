package org.tankwright.circuit;

/**
 * Builds the standard networks as data on {@link Network}. Element names are fixed so every
 * face and test can find them: {@link #SOURCE}, {@link #C1}, {@link #L1}, {@link #L2},
 * {@link #C2}, {@link #LOAD} (a single tank has SOURCE, C1, L1). Node 0 is the common reference of
 * both sides; the secondary is isolated, so no current flows through that shared node.
 */
public final class Topologies {
    public static final String SOURCE = "source";
    public static final String C1 = "C1";
    public static final String L1 = "L1";
    public static final String L2 = "L2";
    public static final String C2 = "C2";
    public static final String LOAD = "load";

    private Topologies() {
    }

    /**
     * A single series or parallel tank: coil L with series resistance R, capacitor C1, driven
     * by the source (a voltage source with its series resistance, or a current source).
     */
    public static Network tank(Topology topology, double l, double r, CapacitorSpec c, Source source) {
        if (topology.isLink()) {
            throw new IllegalArgumentException("tank() builds series or parallel tanks, not " + topology);
        }
        Network.Builder nb = Network.builder();
        int in = nb.node();
        nb.add(sourceElement(source, in));
        addPrimary(nb, topology.primarySeries(), in, l, r, c);
        return nb.build();
    }

    /** A two-coil link (SS, SP, PS, PP) with an AC load resistance {@code rLoad} (+∞ = open). */
    public static Network link(Topology topology, LinkValues v, CapacitorSpec c1, CapacitorSpec c2,
                               Source source, double rLoad) {
        if (!topology.isLink()) {
            throw new IllegalArgumentException("link() builds SS, SP, PS or PP, not " + topology);
        }
        Network.Builder nb = Network.builder();
        int in = nb.node();
        nb.add(sourceElement(source, in));
        addPrimary(nb, topology.primarySeries(), in, v.l1(), v.r1(), c1);
        addSecondary(nb, topology.secondarySeries(), v.l2(), v.r2(), c2, rLoad);
        nb.couple(L1, L2, v.m());
        return nb.build();
    }

    /**
     * An LCC-compensated primary (series inductor Lf from the source, shunt capacitor Cf, then C1
     * in series with L1) with a series- or parallel-tuned secondary: an example of a topology added
     * as data. Extra elements are named "Lf" and "Cf".
     */
    public static Network lccLink(boolean secondarySeries, LinkValues v, double lf, double rf, CapacitorSpec cf,
                                  CapacitorSpec c1, CapacitorSpec c2, Source source, double rLoad) {
        Network.Builder nb = Network.builder();
        int in = nb.node();
        int mid = nb.node();
        nb.add(sourceElement(source, in));
        nb.add(Element.coil("Lf", in, mid, lf, rf));
        nb.add(Element.capacitor("Cf", mid, 0, cf.c(), cf.esr(), cf.esl()));
        addPrimary(nb, true, mid, v.l1(), v.r1(), c1);
        addSecondary(nb, secondarySeries, v.l2(), v.r2(), c2, rLoad);
        nb.couple(L1, L2, v.m());
        return nb.build();
    }

    private static Element sourceElement(Source s, int node) {
        return s.isCurrentFed()
                ? Element.currentSource(SOURCE, node, 0, s.fundamentalRms())
                : Element.voltageSource(SOURCE, node, 0, s.fundamentalRms(), s.resistance());
    }

    private static void addPrimary(Network.Builder nb, boolean series, int in, double l, double r, CapacitorSpec c) {
        if (series) {
            int mid = nb.node();
            nb.add(Element.capacitor(C1, in, mid, c.c(), c.esr(), c.esl()));
            nb.add(Element.coil(L1, mid, 0, l, r));
        } else {
            nb.add(Element.capacitor(C1, in, 0, c.c(), c.esr(), c.esl()));
            nb.add(Element.coil(L1, in, 0, l, r));
        }
    }

    private static void addSecondary(Network.Builder nb, boolean series, double l, double r, CapacitorSpec c,
                                     double rLoad) {
        int top = nb.node();
        nb.add(Element.coil(L2, top, 0, l, r));
        if (series) {
            int out = nb.node();
            nb.add(Element.capacitor(C2, top, out, c.c(), c.esr(), c.esl()));
            nb.add(loadElement(out, rLoad));
        } else {
            nb.add(Element.capacitor(C2, top, 0, c.c(), c.esr(), c.esl()));
            nb.add(loadElement(top, rLoad));
        }
    }

    private static Element loadElement(int node, double rLoad) {
        if (!(rLoad >= 0)) {
            throw new IllegalArgumentException("load resistance " + rLoad + " Ω must be ≥ 0 (0 = short, ∞ = open)");
        }
        return Element.resistor(LOAD, node, 0, rLoad);
    }
}
