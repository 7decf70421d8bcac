package org.tankwright.coupling;

import org.tankwright.bench.NeumannReference;
import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Segment;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CouplingSweepTest {

    @Test
    void nullOffsetIsWhereTheDirectNeumannIntegralChangesSign() {
        // Two equal loops, 20 mm apart: M changes sign at some lateral offset (MODELS.md §2). The root must
        // bracket a sign change of Neumann's double integral computed directly.
        List<Filament> loop = TestCoils.spiral(1, 0.1, 0.001, 0.001);
        CoupledCoils link = new CoupledCoils(TestCoils.coil("a", loop, null), TestCoils.coil("b", loop, null));
        OptionalDouble root = CouplingSweep.nullOffset(link, 0.018, 0, 0.5);
        assertTrue(root.isPresent());
        double x = root.getAsDouble();
        double d = link.distanceForGap(0.018);
        assertTrue(NeumannReference.rings(0.1, 0.1, d, x - 1e-5, 1200) > 0, "M > 0 just inside the null");
        assertTrue(NeumannReference.rings(0.1, 0.1, d, x + 1e-5, 1200) < 0, "M < 0 just beyond the null");
        assertTrue(CouplingSweep.nullOffset(link, 0.018, 0, 0.5 * x).isEmpty(), "no null short of it");
    }

    @Test
    void rangeSearchFindsInteriorExtremesNotOnlyCorners() {
        // Envelope whose offset range passes the null: the most negative k lies at an interior offset.
        List<Filament> a = TestCoils.spiral(4, 0.06, 0.006, 0.001);
        CoupledCoils link = new CoupledCoils(TestCoils.coil("a", a, null), TestCoils.coil("b", a, null));
        CouplingRange range = CouplingSweep.range(link, 0.01, 0.05, 0.3);
        double bruteMin = Double.POSITIVE_INFINITY;
        double bruteMax = Double.NEGATIVE_INFINITY;
        for (double g : CouplingSweep.linspace(0.01, 0.05, 41)) {
            for (double o : CouplingSweep.linspace(0, 0.3, 121)) {
                double k = link.atGap(g, o, 0).k();
                bruteMin = Math.min(bruteMin, k);
                bruteMax = Math.max(bruteMax, k);
            }
        }
        assertTrue(range.lowest().k() <= bruteMin + 1e-6, "lowest " + range.lowest().k() + " vs fine grid " + bruteMin);
        assertEquals(bruteMax, range.highest().k(), 1e-9, "largest k at the smallest gap, aligned");
        assertTrue(range.lowest().offset() > 0 && range.lowest().offset() < 0.3, "interior offset");
        assertTrue(range.containsNull());
        assertEquals(0, range.smallestMagnitude(), 0);
        assertEquals(Math.max(-range.lowest().k(), range.highest().k()), range.largestMagnitude(), 0);
        CouplingRange near = CouplingSweep.range(link, 0.01, 0.05, 0.02);
        assertTrue(!near.containsNull() && near.smallestMagnitude() == near.lowest().k(), "no null: smallest |k| = lowest k");
    }

    @Test
    void rangeOfSquareCoilsSearchesDirections() {
        // Square coils are not axisymmetric: offsets along the diagonal and along a side differ
        List<Filament> sq = square(0.1, 0.001);
        CoupledCoils link = new CoupledCoils(new CoupledCoils.Coil("a", sq, 0.5e-6, null), new CoupledCoils.Coil("b", sq, 0.5e-6, null));
        assertTrue(!link.axisymmetric());
        CouplingRange range = CouplingSweep.range(link, 0.02, 0.02, 0.12);
        for (double ang = 0; ang < Math.PI; ang += Math.PI / 36) {
            for (double o : CouplingSweep.linspace(0, 0.12, 25)) {
                double k = link.atGap(0.02, o * Math.cos(ang), o * Math.sin(ang)).k();
                assertTrue(k >= range.lowest().k() - 1e-6 && k <= range.highest().k() + 1e-12, "k " + k + " at " + o + ", " + ang);
            }
        }
    }

    static List<Filament> square(double side, double wire) {
        double h = side / 2;
        double[][] p = {{-h, -h}, {h, -h}, {h, h}, {-h, h}, {-h, -h}};
        List<Filament> out = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            out.add(new Segment(p[i][0], p[i][1], 0, p[i + 1][0], p[i + 1][1], 0, wire));
        }
        return out;
    }

    @Test
    void sweepsReportGapAndOffset() {
        List<Filament> a = TestCoils.spiral(3, 0.05, 0.005, 0.001);
        CoupledCoils link = new CoupledCoils(TestCoils.coil("a", a, null), TestCoils.coil("b", a, null));
        List<CouplingResult> g = CouplingSweep.overGap(link, CouplingSweep.linspace(0.01, 0.1, 5), 0, 0);
        for (int i = 1; i < g.size(); i++) {
            assertTrue(g.get(i).k() < g.get(i - 1).k(), "aligned coupling falls with the gap");
        }
        List<CouplingResult> o = CouplingSweep.overOffset(link, 0.02, CouplingSweep.linspace(0, 0.05, 3), Math.PI / 2);
        assertEquals(0.05, o.get(2).offsetY(), 1e-15);
        CouplingResult[][] map = CouplingSweep.map(link, new double[] {0.01, 0.02}, new double[] {0, 0.03});
        assertEquals(link.atGap(0.02, 0.03, 0).mutual(), map[1][1].mutual(), 0);
    }
}
