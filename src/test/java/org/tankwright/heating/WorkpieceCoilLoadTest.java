package org.tankwright.heating;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;
import org.tankwright.units.Constants;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The workpiece inside a work coil: long-coil limits, the sign of the inductance change, the µr iteration. */
class WorkpieceCoilLoadTest {
    private static final WorkpieceMaterial STEEL = WorkpieceMaterials.builtIn().require("carbon-steel");

    /** A coil whose L0 is exactly the long-solenoid value µ0N²πb²/l: no return-path reluctance. */
    private static WorkCoil idealLongCoil(double turns, double length, double innerDiameter) {
        double b = innerDiameter / 2;
        return new WorkCoil(turns, length, innerDiameter, Constants.MU0 * turns * turns * Math.PI * b * b / length, 0.01);
    }

    @Test
    void nagaokaCoefficientMatchesItsTable() {
        // Nagaoka's coefficient (Nagaoka 1909; tables in Grover, Inductance Calculations; from memory):
        // K = 0.6884 for diameter = length, 0.8181 for diameter/length = 0.5, 0.5255 for diameter/length = 2
        assertEquals(0.6884, WorkCoil.nagaoka(1.0), 1e-4);
        assertEquals(0.8181, WorkCoil.nagaoka(0.5), 1e-4);
        assertEquals(0.5255, WorkCoil.nagaoka(2.0), 1e-4);
        // long coil: K ≈ 1 − 8b/(3πl) (series of the same formula)
        assertEquals(1 - 4 * 0.001 / (3 * Math.PI), WorkCoil.nagaoka(0.001), 1e-6);
    }

    @Test
    void longCoilGivesTheBarSolutionAtNIOverL() {
        // long-solenoid limit: surface field N·I/l, Z = jωN²µ0·[π(b² − a²) + πa²µr·F]/l (derived in docs/models.md)
        WorkCoil coil = idealLongCoil(40, 0.5, 0.03);
        BarGeometry bar = BarGeometry.solid(0.02, 0.5);
        double f = 20e3;
        double i = 100;
        WorkpieceMedium hot = new WorkpieceMedium.Fixed(1.1e-6, 1);
        LoadedWorkCoil r = WorkpieceLoad.inCoil(coil, bar, hot, f, i);
        assertEquals(40 * i / 0.5, r.surfaceField(), 1e-9 * r.surfaceField());
        BarResponse alone = AxialFieldBar.solve(0.01, 0, 1.1e-6, 1, f, 40 * i / 0.5);
        assertEquals(alone.powerPerLength() * 0.5, r.workPower(), 1e-9 * r.workPower());
        double delta = ReferenceDepth.of(1.1e-6, f, 1);
        Complex flux = AxialFieldBar.fluxFactor(0.01, 0, delta, 1);
        double omega = 2 * Math.PI * f;
        double expectedL = Constants.MU0 * 1600 / 0.5 * (Math.PI * (0.015 * 0.015 - 1e-4) + Math.PI * 1e-4 * flux.getReal());
        assertEquals(expectedL, r.loadedInductance(), 1e-9 * expectedL);
        double expectedR = omega * Constants.MU0 * 1600 / 0.5 * Math.PI * 1e-4 * -flux.getImaginary();
        assertEquals(expectedR, r.workResistance(), 1e-9 * expectedR);
        // the Nagaoka coil of the same size is within 2 % (a 3 % short-coil correction)
        LoadedWorkCoil n = WorkpieceLoad.inCoil(WorkCoil.withNagaokaInductance(40, 0.5, 0.03, 0.01), bar, hot, f, i);
        assertEquals(1.0, n.workResistance() / r.workResistance(), 0.06);
    }

    @Test
    void workPowerIsTheBarPowerOverTheHeatedLength() {
        WorkCoil coil = WorkCoil.withNagaokaInductance(8, 0.08, 0.04, 0.004);
        BarGeometry bar = new BarGeometry(0.02, 0.008, 0.06, 0.03);
        LoadedWorkCoil r = WorkpieceLoad.inCoil(coil, bar, new WorkpieceMedium.OfMaterial(STEEL, 20), 30e3, 300);
        assertEquals(0.04, r.heatedLength(), 1e-12, "overlap of an offset bar with the coil");
        assertEquals(r.bar().powerPerLength() * r.heatedLength(), r.workPower(), 1e-9 * r.workPower());
        assertEquals(r.workResistance() / (r.workResistance() + 0.004), r.efficiency(), 1e-12);
    }

    @Test
    void emptyCoilIsRecoveredWithAVanishingBar() {
        WorkCoil coil = WorkCoil.withNagaokaInductance(8, 0.08, 0.04, 0.004);
        LoadedWorkCoil r = WorkpieceLoad.inCoil(coil, BarGeometry.solid(1e-5, 0.08),
                new WorkpieceMedium.Fixed(1e-6, 1), 50e3, 10);
        assertEquals(coil.emptyInductance(), r.loadedInductance(), 1e-6 * coil.emptyInductance());
        assertTrue(r.workResistance() < 1e-12);
    }

    @Test
    void inductanceChangeSignFollowsMuRTimesDepthOverRadius() {
        // long coil, a ≫ δ: ΔL ∝ µr·Re F − 1 ≈ µr·δ/a − 1: negative for a non-magnetic bar, positive when µr·δ/a > 1
        WorkCoil coil = idealLongCoil(20, 0.3, 0.03);
        BarGeometry bar = BarGeometry.solid(0.02, 0.3);
        double f = 1e3;
        LoadedWorkCoil copperLike = WorkpieceLoad.inCoil(coil, bar, new WorkpieceMedium.Fixed(1e-7, 1), f, 10);
        assertTrue(copperLike.inductanceChange() < 0, "non-magnetic bar pushes flux out");
        WorkpieceMedium magnetic = new WorkpieceMedium.Fixed(2e-7, 200);
        double delta = ReferenceDepth.of(2e-7, f, 200);
        assertTrue(200 * delta / 0.01 > 1.5, "case has µr·δ/a > 1");
        LoadedWorkCoil steelLike = WorkpieceLoad.inCoil(coil, bar, magnetic, f, 10);
        assertTrue(steelLike.inductanceChange() > 0, "magnetic bar with µr·δ/a > 1 pulls flux in");
        // same material at 1 MHz: µr·δ/a ≈ 0.3 < 1 and the change turns negative
        LoadedWorkCoil fast = WorkpieceLoad.inCoil(coil, bar, magnetic, 1e6, 10);
        assertTrue(fast.inductanceChange() < 0, "µr·δ/a < 1 at high frequency");
    }

    @Test
    void largerGapMeansSmallerRelativeInductanceChange() {
        BarGeometry bar = BarGeometry.solid(0.02, 0.1);
        WorkpieceMedium hot = new WorkpieceMedium.Fixed(1.15e-6, 1);
        double previous = Double.MAX_VALUE;
        for (double dc : new double[] {0.024, 0.03, 0.04, 0.06}) {
            WorkCoil coil = WorkCoil.withNagaokaInductance(8, 0.1, dc, 0.005);
            LoadedWorkCoil r = WorkpieceLoad.inCoil(coil, bar, hot, 30e3, 200);
            double rel = -r.inductanceChange() / r.emptyInductance();
            assertTrue(rel > 0 && rel < previous, "|ΔL|/L0 shrinks as the gap grows, coil Ø " + dc);
            previous = rel;
        }
    }

    @Test
    void muIterationConvergesToTheCurveAtTheSurfaceField() {
        WorkCoil coil = WorkCoil.withNagaokaInductance(8, 0.08, 0.04, 0.004);
        BarGeometry bar = BarGeometry.solid(0.02, 0.08);
        for (double current : new double[] {100, 300, 900}) {
            LoadedWorkCoil r = WorkpieceLoad.inCoil(coil, bar, new WorkpieceMedium.OfMaterial(STEEL, 20), 10e3, current);
            double fromCurve = STEEL.relativePermeability(Math.sqrt(2) * r.surfaceField(), 20);
            assertEquals(fromCurve, r.muR(), 1e-6 * fromCurve, "µr agrees with the B–H curve at its own surface field");
            assertTrue(r.muIterations() > 0 && r.muIterations() < 60);
            // the surface field lies below N·I/l for this short coil and the work takes a share of the ampere-turns
            assertTrue(r.surfaceField() < 8 * current / 0.08);
            if (r.surfaceField() >= 1e4 && r.surfaceField() <= 1e5) {
                assertTrue(r.muR() >= 10 && r.muR() < 110, "µr tens at 10⁴–10⁵ A/m: " + r.muR());
            }
        }
    }

    @Test
    void refusesAWorkpieceThatDoesNotFit() {
        WorkCoil coil = WorkCoil.withNagaokaInductance(8, 0.08, 0.04, 0.004);
        WorkpieceMedium m = new WorkpieceMedium.Fixed(1e-6, 1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> WorkpieceLoad.inCoil(coil, BarGeometry.solid(0.05, 0.1), m, 1e4, 10));
        assertTrue(e.getMessage().contains("workpiece diameter"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> WorkpieceLoad.inCoil(coil, new BarGeometry(0.02, 0, 0.02, 0.5), m, 1e4, 10));
    }
}
