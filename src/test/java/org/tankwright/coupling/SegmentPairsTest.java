package org.tankwright.coupling;

import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Segment;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The compiled segment pairs against the plain sum of {@link SegmentKernel} over every pair of
 * filaments (Neumann's integral pair by pair). The merges rest on Neumann's M = (µ0/4π)∬dl1·dl2/r
 * being unchanged by a rigid motion or a reflection of both filaments together, and on Grover's
 * parallel-filament formula being symmetric in the two filaments (common practice).
 */
class SegmentPairsTest {

    private static double plainSum(List<Filament> a, List<Filament> b, double dx, double dy, double dz) {
        double sum = 0;
        for (Filament fa : a) {
            for (Filament fb : b) {
                Segment sa = (Segment) fa;
                Segment sb = (Segment) fb;
                sum += SegmentKernel.mutual(sa, new Segment(sb.x0() + dx, sb.y0() + dy, sb.z0() + dz,
                        sb.x1() + dx, sb.y1() + dy, sb.z1() + dz, sb.wireRadius()));
            }
        }
        return sum;
    }

    private static List<Filament> rectangle(int turns, double w, double h, double pitch, double wire) {
        List<Filament> out = new ArrayList<>();
        for (int t = 0; t < turns; t++) {
            double hx = w / 2 - t * pitch;
            double hy = h / 2 - t * pitch;
            double[][] p = {{hx, hy}, {-hx, hy}, {-hx, -hy}, {hx, -hy}, {hx, hy}};
            for (int i = 0; i < 4; i++) {
                out.add(new Segment(p[i][0], p[i][1], 0, p[i + 1][0], p[i + 1][1], 0, wire));
            }
        }
        return out;
    }

    private static List<Filament> hexagon(int turns, double r, double pitch, double z, double wire) {
        List<Filament> out = new ArrayList<>();
        for (int t = 0; t < turns; t++) {
            double rr = r - t * pitch;
            for (int i = 0; i < 6; i++) {
                double a0 = Math.PI / 3 * i;
                double a1 = Math.PI / 3 * (i + 1);
                out.add(new Segment(rr * Math.cos(a0), rr * Math.sin(a0), z, rr * Math.cos(a1), rr * Math.sin(a1), z, wire));
            }
        }
        return out;
    }

    @Test
    void rectangularSpiralWithItselfAlongItsAxisMatchesEveryPair() {
        List<Filament> a = rectangle(6, 0.6, 0.45, 0.025, 0.003);
        FilamentSet set = FilamentSet.of(a);
        SegmentPairs axial = SegmentPairs.axial(set, set);
        SegmentPairs general = SegmentPairs.general(set, set);
        assertTrue(axial.size() * 6 < a.size() * a.size(), "symmetric pairs merged: " + axial.size() + " kernel calls");
        SegmentKernel ws = new SegmentKernel();
        for (double dz : new double[] {0, 0.0145, -0.17, 0.35, -2.4, 7.0}) {
            double plain = plainSum(a, a, 0, 0, dz);
            assertEquals(plain, axial.mutual(0, 0, dz, ws), 1e-12 * Math.abs(plain), "axial form at dz = " + dz);
            assertEquals(plain, general.mutual(0, 0, dz, ws), 1e-12 * Math.abs(plain), "general form at dz = " + dz);
        }
    }

    @Test
    void twoDifferentCoilsMatchEveryPairAtAnyPlacement() {
        List<Filament> a = rectangle(6, 0.6, 0.45, 0.025, 0.003);
        List<Filament> b = rectangle(3, 0.45, 0.35, 0.03, 0.003);
        FilamentSet sa = FilamentSet.of(a);
        FilamentSet sb = FilamentSet.of(b);
        SegmentPairs axial = SegmentPairs.axial(sa, sb);
        SegmentPairs general = SegmentPairs.general(sa, sb);
        SegmentKernel ws = new SegmentKernel();
        for (double dz : new double[] {0.16, -0.4, 3.0}) {
            double plain = plainSum(a, b, 0, 0, dz);
            assertEquals(plain, axial.mutual(0, 0, dz, ws), 1e-12 * Math.abs(plain), "coaxial at dz = " + dz);
        }
        Random rnd = new Random(7);
        for (int i = 0; i < 10; i++) {
            double dx = (rnd.nextDouble() - 0.5) * 0.4;
            double dy = (rnd.nextDouble() - 0.5) * 0.4;
            double dz = 0.05 + rnd.nextDouble() * 0.3;
            double plain = plainSum(a, b, dx, dy, dz);
            assertEquals(plain, general.mutual(dx, dy, dz, ws), 1e-12 * Math.abs(plain) + 1e-22, "offset placement " + i);
        }
    }

    @Test
    void obliqueFilamentsOfHexagonsAreMergedByRotationAndStillMatch() {
        // hexagons: turns at 60° to one another go through the quadrature; 6-fold symmetry merges them
        List<Filament> a = hexagon(3, 0.05, 0.006, 0, 0.0005);
        List<Filament> b = hexagon(2, 0.04, 0.006, 0, 0.0005);
        FilamentSet sa = FilamentSet.of(a);
        FilamentSet sb = FilamentSet.of(b);
        SegmentPairs axial = SegmentPairs.axial(sa, sb);
        assertTrue(axial.size() * 5 < a.size() * b.size(), "rotations merged: " + axial.size() + " kernel calls");
        SegmentKernel ws = new SegmentKernel();
        for (double dz : new double[] {0.004, 0.03, -0.2}) {
            double plain = plainSum(a, b, 0, 0, dz);
            assertEquals(plain, axial.mutual(0, 0, dz, ws), 1e-9 * Math.abs(plain), "quadrature tolerance, dz = " + dz);
        }
    }

    @Test
    void aCoilWithATiltedFilamentHasNoAxialForm() {
        List<Filament> a = List.of(new Segment(0, 0, 0, 0.1, 0, 0.01, 0.001));
        FilamentSet set = FilamentSet.of(a);
        assertNull(SegmentPairs.axial(set, set), "a tilted filament's pairs change under rotation about z with the height");
        double plain = plainSum(a, a, 0, 0, 0.05);
        assertEquals(plain, SegmentPairs.general(set, set).mutual(0, 0, 0.05, new SegmentKernel()), 1e-13 * Math.abs(plain));
    }
}
