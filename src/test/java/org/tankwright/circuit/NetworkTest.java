package org.tankwright.circuit;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The network as data: bad values are refused with the field, the value and what is allowed; a new topology is data. */
class NetworkTest {

    @Test
    void badValuesNameTheFieldAndTheLimit() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new LinkValues(10e-6, 10e-6, 11e-6, 0.1, 0.1));
        assertTrue(e.getMessage().contains("M = 1.1E-5") && e.getMessage().contains("√(L1·L2)"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Element.capacitor("C9", 1, 0, -1e-9, 0, 0));
        assertTrue(e.getMessage().contains("C9") && e.getMessage().contains("must be positive"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Source.fullBridge(400, 1.5));
        assertTrue(e.getMessage().contains("duty 1.5"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new Network(3,
                List.of(Element.resistor("R", 1, 0, 1), Element.resistor("R", 2, 0, 1)), List.of()));
        assertTrue(e.getMessage().contains("used twice"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Topology.parse("LCL"));
        assertTrue(e.getMessage().contains("allowed: SS, SP, PS, PP, series, parallel"));
    }

    @Test
    void aTopologyBuiltByHandSolvesLikeTheBuiltIn() {
        // an SS link written element by element gives the same input impedance as Topologies.link
        double f = 85e3;
        double w = 2 * Math.PI * f;
        LinkValues v = LinkValues.fromCoupling(100e-6, 70e-6, 0.2, 0.1, 0.08);
        double c1 = 1 / (w * w * v.l1());
        double c2 = 1 / (w * w * v.l2());
        Network.Builder b = Network.builder();
        int in = b.node();
        int mid = b.node();
        int top = b.node();
        int out = b.node();
        b.add(Element.voltageSource("source", in, 0, 50, 0));
        b.add(Element.capacitor("C1", in, mid, c1, 0, 0));
        b.add(Element.coil("L1", mid, 0, v.l1(), v.r1()));
        b.add(Element.coil("L2", top, 0, v.l2(), v.r2()));
        b.add(Element.capacitor("C2", top, out, c2, 0, 0));
        b.add(Element.resistor("load", out, 0, 9));
        b.couple("L1", "L2", v.m());
        PhasorSolver byHand = new PhasorSolver(b.build());
        PhasorSolver builtIn = new PhasorSolver(Topologies.link(Topology.SS, v, CapacitorSpec.ideal(c1),
                CapacitorSpec.ideal(c2), Source.sine(50), 9));
        byHand.solve(f);
        builtIn.solve(f);
        double[] z1 = new double[2];
        double[] z2 = new double[2];
        byHand.inputImpedance(0, z1);
        builtIn.inputImpedance(0, z2);
        assertEquals(z2[0], z1[0], 1e-12 * Math.abs(z2[0]));
        assertEquals(z2[1], z1[1], 1e-9);
        // and the reflected resistance of a tuned SS link is ω²M²/(R2 + RL) (Wang, Covic & Stielau 2004)
        assertEquals(v.r1() + w * w * v.m() * v.m() / (v.r2() + 9), z1[0], 1e-9 * z1[0]);
    }
}
