package org.tankwright.circuit;

import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Energy balance in every solve (conservation of energy; Tellegen's theorem): the power the source
 * delivers equals the sum of every element's I²R loss plus the load power, over seeded random
 * valid networks of every topology, source kind and load kind.
 */
class EnergyBalanceTest {
    private static final Topology[] KINDS = Topology.values();

    @Test
    void sourcePowerEqualsLossesPlusLoadOverRandomNetworks() {
        Random rnd = new Random(20260412L);
        int checked = 0;
        for (int trial = 0; trial < 600; trial++) {
            double f = logUniform(rnd, 1e3, 5e6);
            double w = 2 * Math.PI * f;
            double l1 = logUniform(rnd, 1e-6, 1e-3);
            double l2 = logUniform(rnd, 1e-6, 1e-3);
            double k = rnd.nextDouble() * 0.9;
            LinkValues v = LinkValues.fromCoupling(l1, l2, k, logUniform(rnd, 1e-4, 2), logUniform(rnd, 1e-4, 2));
            CapacitorSpec c1 = new CapacitorSpec(1 / (w * w * l1) * logUniform(rnd, 0.5, 2), logUniform(rnd, 1e-5, 0.1),
                    rnd.nextBoolean() ? 0 : logUniform(rnd, 1e-10, 1e-7));
            CapacitorSpec c2 = new CapacitorSpec(1 / (w * w * l2) * logUniform(rnd, 0.5, 2), logUniform(rnd, 1e-5, 0.1),
                    rnd.nextBoolean() ? 0 : logUniform(rnd, 1e-10, 1e-7));
            Topology t = KINDS[rnd.nextInt(KINDS.length)];
            Source src = randomSource(rnd);
            Load load = randomLoad(rnd);
            Network net;
            boolean lcc = t.isLink() && rnd.nextInt(5) == 0;
            if (!t.isLink()) {
                net = Topologies.tank(t, l1, v.r1(), c1, src);
            } else if (lcc) {
                net = Topologies.lccLink(t.secondarySeries(), v, l1 / 4, 0.01, CapacitorSpec.ideal(4 / (w * w * l1)),
                        c1, c2, src, 1);
            } else {
                net = Topologies.link(t, v, c1, c2, src, 1);
            }
            OperatingPoint op = OperatingPoint.solve(net, t, src, load, f, BridgeParts.NONE);
            double losses = 0;
            for (ElementStress e : op.elements()) {
                losses += e.loss();
            }
            double scale = Math.max(Math.abs(op.pSource()), 1e-300);
            assertEquals(op.pSource(), losses, 1e-9 * scale, "trial " + trial + " " + t + (lcc ? " LCC" : "") + " " + src.kind()
                    + " " + load);
            double expected = op.losses() - lossOf(op, Topologies.SOURCE) + (t.isLink() ? op.pOut() : 0);
            assertEquals(op.pIn(), expected, 1e-9 * scale, "terminal power = element losses + load, trial " + trial);
            assertTrue(op.efficiency() >= 0 && op.efficiency() <= 1 + 1e-12, "efficiency in [0, 1]");
            checked++;
        }
        assertEquals(600, checked);
    }

    private static double lossOf(OperatingPoint op, String name) {
        return op.stress(name).loss();
    }

    private static Source randomSource(Random rnd) {
        return switch (rnd.nextInt(4)) {
            case 0 -> Source.sine(logUniform(rnd, 1, 1000)).withResistance(rnd.nextBoolean() ? 0 : logUniform(rnd, 1e-3, 10));
            case 1 -> Source.fullBridge(logUniform(rnd, 10, 800), 0.1 + 0.9 * rnd.nextDouble());
            case 2 -> Source.halfBridge(logUniform(rnd, 10, 800)).withResistance(logUniform(rnd, 1e-3, 1));
            default -> Source.current(logUniform(rnd, 0.1, 50));
        };
    }

    private static Load randomLoad(Random rnd) {
        return switch (rnd.nextInt(4)) {
            case 0 -> new Load.Resistor(logUniform(rnd, 1e-2, 1e3));
            case 1 -> new Load.Rectifier(Load.Filter.CAPACITIVE, logUniform(rnd, 1e-1, 1e3));
            case 2 -> new Load.Rectifier(Load.Filter.INDUCTIVE, logUniform(rnd, 1e-1, 1e3));
            default -> new Load.Battery(logUniform(rnd, 1, 400));
        };
    }

    private static double logUniform(Random rnd, double a, double b) {
        return a * Math.pow(b / a, rnd.nextDouble());
    }
}
