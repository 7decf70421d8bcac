package org.tankwright.report;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.BankReport;
import org.tankwright.analysis.CoilReport;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.SourceKind;
import org.tankwright.design.Enums.Topology;

import java.util.ArrayList;
import java.util.List;

/**
 * The tuned network as a list of named two-terminal parts between numbered nodes (0 is the
 * reference), read once from a result: the one place the schematic and the netlist take their
 * element values from. Each inductor's first node is its dotted (start) terminal; a negative
 * coupling is expressed by turning the secondary coil around, so {@link #coupling()} is never
 * negative.
 *
 * @param topology  the compensation topology
 * @param frequency the operating frequency, Hz
 * @param parts     sources, resistors, capacitors and inductors, primary side first
 * @param coupling  |k| between L1 and L2, NaN for a single tank
 * @param mutual    |M|, H, NaN for a single tank
 * @param reversed  whether L2 was turned around because k was negative
 * @param heater    whether the primary carries a workpiece (RW, at the cold point)
 */
public record TunedNetwork(Topology topology, double frequency, List<Part> parts, double coupling, double mutual,
                           boolean reversed, boolean heater) {

    /** Kinds of parts, with their SPICE letter. */
    public enum Kind {
        VOLTAGE_SOURCE('V'), CURRENT_SOURCE('I'), RESISTOR('R'), CAPACITOR('C'), INDUCTOR('L');

        private final char letter;

        Kind(char letter) {
            this.letter = letter;
        }

        public char letter() {
            return letter;
        }
    }

    /**
     * One part.
     *
     * @param name  its name by role ({@code V1}, {@code C1}, {@code RC1} the bank's ESR, {@code L1},
     *              {@code R1} the coil's resistance, {@code RL} the load, {@code RS} the source resistance,
     *              {@code RW} the workpiece reflected into the work coil)
     * @param kind  what it is
     * @param a     first node
     * @param b     second node
     * @param value SI value (rms for a source)
     * @param role  what it is, in words
     */
    public record Part(String name, Kind kind, int a, int b, double value, String role) {
    }

    /** The part named {@code name}, or null. */
    public Part part(String name) {
        for (Part p : parts) {
            if (p.name().equals(name)) {
                return p;
            }
        }
        return null;
    }

    /** Whether there is a secondary side. */
    public boolean isLink() {
        return !topology.singleTank();
    }

    /** Reads the tuned network of a result (its network section must be present). */
    public static TunedNetwork of(AnalysisResult r) {
        NetworkReport n = r.network();
        if (n == null) {
            throw new IllegalArgumentException("the result has no tuned network");
        }
        Design d = r.design();
        Topology t = d.compensation().topology();
        List<Part> parts = new ArrayList<>();
        boolean parallel1 = t == Topology.PARALLEL || t == Topology.PS || t == Topology.PP;
        // primary: source between node 1 and ground
        if (d.source().kind() == SourceKind.CURRENT) {
            parts.add(new Part("I1", Kind.CURRENT_SOURCE, 0, 1, n.sourceCurrent(), "current source (fundamental, rms)"));
        } else {
            parts.add(new Part("V1", Kind.VOLTAGE_SOURCE, 1, 0, n.sourceVoltage(), "source (fundamental, rms)"));
        }
        int top = 1;
        if (d.source().resistance() > 0) {
            parts.add(new Part("RS", Kind.RESISTOR, 1, 2, d.source().resistance(), "source resistance"));
            top = 2;
        }
        boolean heater = r.heater() != null;
        CoilReport c1 = r.coils().isEmpty() ? null : r.coils().get(0);
        double l1 = heater ? r.heater().cold().inductance()
                : r.coupling() != null && Double.isFinite(r.coupling().l1()) ? r.coupling().l1()
                : c1 == null ? Double.NaN : c1.inductance();
        double r1 = c1 == null ? Double.NaN : c1.resistanceAc();
        BankReport b1 = bank(r, "C1");
        double cap1 = b1 != null ? b1.capacitance() : n.c1();
        int next = 10;
        if (parallel1) {
            // capacitor branch and coil branch, both from the top node to ground
            next = capacitor(parts, "C1", b1, cap1, top, 0, next, "primary capacitor bank");
            next = coil(parts, "1", l1, r1, heater ? r.heater().cold().workResistance() : Double.NaN, top, 0, next);
        } else {
            int mid = next++;
            next = capacitor(parts, "C1", b1, cap1, top, mid, next, "primary capacitor bank");
            next = coil(parts, "1", l1, r1, heater ? r.heater().cold().workResistance() : Double.NaN, mid, 0, next);
        }
        double k = Double.NaN;
        double m = Double.NaN;
        boolean reversed = false;
        if (!t.singleTank() && r.coupling() != null && r.coils().size() > 1) {
            CoilReport c2 = r.coils().get(1);
            double l2 = Double.isFinite(r.coupling().l2()) ? r.coupling().l2() : c2.inductance();
            k = Math.abs(r.coupling().k());
            m = Math.abs(r.coupling().mutual());
            reversed = r.coupling().k() < 0;
            BankReport b2 = bank(r, "C2");
            double cap2 = b2 != null ? b2.capacitance() : n.c2();
            int out = 20;
            boolean parallel2 = t == Topology.SP || t == Topology.PP;
            // the coil from node 21 (its start) to ground, through R2 to the output node 20
            parts.add(new Part("L2", Kind.INDUCTOR, reversed ? 0 : 21, reversed ? 21 : 0, l2, "secondary coil"));
            if (parallel2) {
                parts.add(new Part("R2", Kind.RESISTOR, out, 21, c2.resistanceAc(), "secondary coil AC resistance"));
                capacitor(parts, "C2", b2, cap2, out, 0, 22, "secondary capacitor bank");
                parts.add(new Part("RL", Kind.RESISTOR, out, 0, n.loadAc(), "load (AC equivalent)"));
            } else {
                parts.add(new Part("R2", Kind.RESISTOR, 21, 22, c2.resistanceAc(), "secondary coil AC resistance"));
                capacitor(parts, "C2", b2, cap2, 22, out, 23, "secondary capacitor bank");
                parts.add(new Part("RL", Kind.RESISTOR, out, 0, n.loadAc(), "load (AC equivalent)"));
            }
        }
        return new TunedNetwork(t, n.frequency(), List.copyOf(parts), k, m, reversed, heater);
    }

    /** Adds a capacitor from {@code a} to {@code b}, with its ESR in series when known; returns the next free node. */
    private static int capacitor(List<Part> parts, String name, BankReport bank, double c, int a, int b, int free,
                                 String role) {
        if (bank != null && Double.isFinite(bank.esr()) && bank.esr() > 0) {
            parts.add(new Part(name, Kind.CAPACITOR, a, free, c, role));
            parts.add(new Part("R" + name, Kind.RESISTOR, free, b, bank.esr(), name + " bank ESR"));
            return free + 1;
        }
        parts.add(new Part(name, Kind.CAPACITOR, a, b, c, role));
        return free;
    }

    /** Adds coil {@code index} from {@code a} (start) to {@code b} with its resistance (and a workpiece) in series. */
    private static int coil(List<Part> parts, String index, double l, double r, double work, int a, int b, int free) {
        int n = free;
        parts.add(new Part("L" + index, Kind.INDUCTOR, a, n, l, Double.isFinite(work) ? "work coil (loaded, cold)" : "primary coil"));
        int at = n++;
        if (Double.isFinite(work)) {
            parts.add(new Part("RW", Kind.RESISTOR, at, n, work, "workpiece reflected into the coil (cold)"));
            at = n++;
        }
        parts.add(new Part("R" + index, Kind.RESISTOR, at, b, r, "coil AC resistance"));
        return n;
    }

    private static BankReport bank(AnalysisResult r, String id) {
        for (BankReport b : r.banks()) {
            if (id.equals(b.id())) {
                return b;
            }
        }
        return null;
    }
}
