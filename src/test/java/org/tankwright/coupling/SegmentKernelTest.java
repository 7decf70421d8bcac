package org.tankwright.coupling;

import org.tankwright.bench.NeumannReference;
import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Ring;
import org.tankwright.magnetics.Segment;
import org.tankwright.units.Constants;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;

class SegmentKernelTest {

    private static Segment seg(double... c) {
        return new Segment(c[0], c[1], c[2], c[3], c[4], c[5], 0.0005);
    }

    @Test
    void parallelSkewAndCoplanarMatchNumericalNeumann() {
        double[][][] cases = {
                {{0, 0, 0, 0.1, 0, 0}, {0, 0.02, 0, 0.1, 0.02, 0}},          // parallel, side by side
                {{0, 0, 0, 0.1, 0, 0}, {0.15, 0.03, 0.01, 0.05, 0.03, 0.01}},  // antiparallel, staggered
                {{0, 0, 0, 0.1, 0, 0}, {0.12, 0, 0, 0.3, 0, 0}},               // collinear, apart
                {{0, 0, 0, 0.1, 0, 0}, {0.05, 0.02, 0, 0.1, 0.08, 0}},         // coplanar, 50° apart
                {{0, 0, 0, 0.1, 0, 0}, {0.02, -0.05, 0.03, 0.07, 0.06, 0.05}}, // skew
                {{0, 0, 0, 0.1, 0, 0}, {0.1, 0.01, 0, 0.2, 0.05, 0}},          // coplanar, near a common corner
        };
        for (double[][] c : cases) {
            double m = SegmentKernel.mutual(seg(c[0]), seg(c[1]));
            double ref = NeumannReference.segments(c[0], c[1], 24);
            assertEquals(ref, m, 1e-9 * Math.abs(ref), "numerical Neumann double integral");
            double back = SegmentKernel.mutual(seg(c[1]), seg(c[0]));
            assertEquals(m, back, 1e-12 * Math.abs(m), "M12 = M21");
        }
    }

    @Test
    void perpendicularFilamentsDoNotCouple() {
        // Neumann: dl1·dl2 = 0 (common practice)
        assertEquals(0, SegmentKernel.mutual(seg(0, 0, 0, 0.1, 0, 0), seg(0.05, 0.01, 0, 0.05, 0.2, 0)), 0);
    }

    @Test
    void parallelFilamentsOfEqualLengthMatchGroverClosedForm() {
        // Grover (1946) ch. 5, two equal parallel filaments of length l at distance d, ends opposite:
        // M = (µ0/2π) l [ln(l/d + √(1 + l²/d²)) − √(1 + d²/l²) + d/l]
        double l = 0.2;
        double d = 0.03;
        double grover = Constants.MU0 / (2 * Math.PI) * l
                * (Math.log(l / d + Math.sqrt(1 + l * l / (d * d))) - Math.sqrt(1 + d * d / (l * l)) + d / l);
        assertEquals(grover, SegmentKernel.mutual(seg(0, 0, 0, l, 0, 0), seg(0, d, 0, l, d, 0)), 1e-14 * grover);
    }

    @Test
    void polygonOfSegmentsApproachesRing() {
        // A ring and a fine polygon inscribed in the same circle couple almost alike with a second ring;
        // the ring–segment quadrature and the ring–ring kernel must agree in that limit (common practice)
        double r = 0.1;
        int n = 720;
        List<Filament> polygon = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double a0 = 2 * Math.PI * i / n;
            double a1 = 2 * Math.PI * (i + 1) / n;
            polygon.add(new Segment(r * Math.cos(a0), r * Math.sin(a0), 0, r * Math.cos(a1), r * Math.sin(a1), 0, 0.001));
        }
        List<Filament> other = List.of(new Ring(0.04, 0.02, 0.05, 0.08, 0.001));
        double viaSegments = FilamentMutual.mutual(polygon, other);
        double viaRing = FilamentMutual.mutual(List.of(new Ring(0, 0, 0, r, 0.001)), other);
        // an inscribed 720-gon has area smaller by about (2π/n)²/6 relative
        assertEquals(viaRing, viaSegments, 2e-5 * Math.abs(viaRing), "720-gon vs ring");
        assertEquals(viaSegments, FilamentMutual.mutual(other, polygon), 1e-10 * Math.abs(viaSegments), "M12 = M21");
    }

    @Test
    void segmentFieldMatchesRingFieldForFinePolygon() {
        double r = 0.1;
        int n = 2000;
        Random rnd = new Random(7);
        List<Filament> polygon = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double a0 = 2 * Math.PI * i / n;
            double a1 = 2 * Math.PI * (i + 1) / n;
            polygon.add(new Segment(r * Math.cos(a0), r * Math.sin(a0), 0, r * Math.cos(a1), r * Math.sin(a1), 0, 0.001));
        }
        FilamentSet poly = FilamentSet.of(polygon);
        FilamentSet ring = FilamentSet.of(List.of(new Ring(0, 0, 0, r, 0.001)));
        double[] bp = new double[3];
        double[] br = new double[3];
        for (int t = 0; t < 5; t++) {
            double x = rnd.nextDouble() * 0.2 - 0.1;
            double y = rnd.nextDouble() * 0.2 - 0.1;
            double z = 0.02 + rnd.nextDouble() * 0.1;
            poly.fluxDensity(x, y, z, bp);
            ring.fluxDensity(x, y, z, br);
            double mag = Math.sqrt(br[0] * br[0] + br[1] * br[1] + br[2] * br[2]);
            for (int c = 0; c < 3; c++) {
                assertEquals(br[c], bp[c], 1e-5 * mag, "Biot–Savart segment sum vs ring closed form");
            }
        }
        // on the axis: B = µ0 R² / (2 (R² + z²)^{3/2}) per ampere (textbook closed form)
        ring.fluxDensity(0, 0, 0.05, br);
        assertEquals(Constants.MU0 * r * r / (2 * Math.pow(r * r + 0.0025, 1.5)), br[2], 1e-15);
    }
}
