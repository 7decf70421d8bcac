package org.tankwright.magnetics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;

/**
 * Cross-checks of the coil model against R. G. Medhurst, "H.F. resistance and self-capacitance of single-layer
 * solenoids", Wireless Engineer 24, pp. 35–43 and 80–92 (1947): his measured resistance ratio ψ = R_coil /
 * R_straight-wire (fully developed skin effect) against length/diameter and wire diameter/pitch, and his
 * self-capacitance C = H·D. The tables live in {@link MedhurstResistance}; the agreement measured here is
 * stated in docs/models.md.
 */
class MedhurstCrossCheckTest {
    /** Copper wire of 1 mm at 10 MHz: radius 24 skin depths (δ = 20.9 µm), fully developed skin effect. */
    private static final Conductor WIRE = Conductor.RoundWire.bare(1e-3, ConductorMaterial.COPPER);
    private static final double F = 10e6;
    /** Turns per test coil: Medhurst's coils had some 30–50 turns. */
    private static final int TURNS = 40;

    /** ψ of our model: 1 + proximity/skin, i.e. R_ac / R_straight-wire. */
    private static double ours(double lengthOverDiameter, double diameterOverPitch, int turns) {
        double pitch = 1e-3 / diameterOverPitch * (1 + 1e-9);
        SingleLayerSolenoid s = new SingleLayerSolenoid(turns * pitch / lengthOverDiameter, turns, pitch, WIRE);
        CoilModel m = CoilModel.of(s);
        return 1 + m.resistanceProximity(F, 20) / m.resistanceSkin(F, 20);
    }

    /**
     * Our skin + proximity model at Medhurst's grid points (Medhurst 1947 table), 40-turn coils of 1 mm copper
     * wire at 10 MHz. Regions: short (ℓ/D ≤ 1) / long (ℓ/D ≥ 2) × spaced (pitch ≥ 2.5 d) / medium (1.43–2 d) /
     * close (≤ 1.25 d). Measured (mean |error|, worst): short spaced 2.8 %, −7.0 %; short medium 11.6 %,
     * −19.3 %; short close 37.8 %, −52.6 %; long spaced 6.2 %, −15.4 %; long medium 7.7 %, −16.6 %; long close
     * 5.4 %, −13.5 %. The bounds below sit just above these. The big miss is real and stated: the field at a
     * wire's centre stands for the field across it, which fails when neighbours are within about a wire
     * diameter (the neighbours' field varies across the wire and their eddy currents screen it); in short
     * close-wound coils ours is low by up to half. The point ℓ/D = 10, d/p = 0.7 is left out (copies of the table
     * disagree).
     */
    @Test
    void proximityModelAgainstMedhurstsMeasuredTable() {
        double[][] sum = new double[2][3];
        double[][] worst = new double[2][3];
        int[][] count = new int[2][3];
        double[] rows = MedhurstResistance.LENGTH_OVER_DIAMETER;
        double[] cols = MedhurstResistance.DIAMETER_OVER_PITCH;
        for (int i = 0; i < rows.length; i++) {
            for (int j = 0; j < cols.length; j++) {
                if (rows[i] == 10 && cols[j] == 0.7) {
                    continue;
                }
                double e = ours(rows[i], cols[j], TURNS) / MedhurstResistance.RATIO[i][j] - 1;
                int r = rows[i] <= 1 ? 0 : 1;
                int c = cols[j] <= 0.4 ? 0 : cols[j] <= 0.7 ? 1 : 2;
                sum[r][c] += Math.abs(e);
                count[r][c]++;
                if (Math.abs(e) > Math.abs(worst[r][c])) {
                    worst[r][c] = e;
                }
                if (r == 0 && c == 2) {
                    assertTrue(e < 0, "short close-wound coils: ours is below Medhurst at ℓ/D " + rows[i] + ", d/p " + cols[j]);
                }
            }
        }
        double[][] meanBound = {{0.04, 0.14, 0.42}, {0.08, 0.10, 0.07}};
        double[][] worstBound = {{0.09, 0.22, 0.56}, {0.18, 0.19, 0.16}};
        String[] rn = {"short", "long"};
        String[] cn = {"spaced", "medium", "close"};
        for (int r = 0; r < 2; r++) {
            for (int c = 0; c < 3; c++) {
                String region = rn[r] + " " + cn[c];
                assertTrue(count[r][c] >= 14, region + " points " + count[r][c]);
                assertTrue(sum[r][c] / count[r][c] < meanBound[r][c], region + " mean |error| " + sum[r][c] / count[r][c]);
                assertTrue(Math.abs(worst[r][c]) < worstBound[r][c], region + " worst " + worst[r][c]);
            }
        }
    }

    /**
     * Widely spaced turns (pitch 10 wire diameters): Medhurst's ψ is 1.02–1.04 over the whole length range; ours
     * agrees within 3 % at any number of turns (the proximity term is then a small uniform-field correction).
     */
    @Test
    void widelySpacedTurnsAgreeAtAnyTurnCount() {
        double[] rows = MedhurstResistance.LENGTH_OVER_DIAMETER;
        for (int n : new int[] {30, 100, 300}) {
            for (int i = 0; i < rows.length; i++) {
                double table = MedhurstResistance.RATIO[i][9];
                assertEquals(table, ours(rows[i], 0.1, n), 0.03 * table, "N " + n + ", ℓ/D " + rows[i]);
            }
        }
    }

    /** The interpolation returns the table at its points, ψ → 1 for far-apart turns and clamps outside the grid. */
    @Test
    void tableInterpolation() {
        double[] rows = MedhurstResistance.LENGTH_OVER_DIAMETER;
        double[] cols = MedhurstResistance.DIAMETER_OVER_PITCH;
        for (int i = 0; i < rows.length; i++) {
            for (int j = 0; j < cols.length; j++) {
                assertEquals(MedhurstResistance.RATIO[i][j], MedhurstResistance.ratio(rows[i], cols[j]), 1e-12);
            }
        }
        assertEquals(1.0, MedhurstResistance.ratio(3, 0), 1e-12, "no proximity effect for far-apart turns");
        assertEquals(0.5 * (1.74 + 1.50), MedhurstResistance.ratio(2, 0.45), 1e-12, "linear in d/p");
        assertEquals(0.5 * (1.74 + 1.78), MedhurstResistance.ratio(3, 0.5), 1e-12, "linear in ℓ/D");
        assertEquals(MedhurstResistance.ratio(10, 1), MedhurstResistance.ratio(40, 1), 1e-12, "clamped above ℓ/D 10");
    }

    private static ResistanceEstimate byName(List<ResistanceEstimate> all, String name) {
        return all.stream().filter(e -> e.name().equals(name)).findFirst().orElseThrow(() -> new AssertionError(name));
    }

    /** The estimate shown to the user: ψ × the straight wire's skin resistance, with its validity verdict. */
    @Test
    void estimateAndVerdict() {
        SingleLayerSolenoid s = new SingleLayerSolenoid(40e-3, 40, 2e-3, WIRE); // ℓ/D = 2, d/p = 0.5: ψ = 1.74
        CoilModel m = CoilModel.of(s);
        List<ResistanceEstimate> all = m.resistanceModels(F, 20);
        assertEquals(SurfaceCurrentResistance.NAME, all.get(0).name(), "the chosen model comes first");
        assertEquals(m.resistanceAc(F, 20), all.get(0).resistanceAc(), 0);
        assertEquals(m.resistanceFilamentProximity(F, 20), byName(all, CoilModel.OURS).resistanceAc(), 0);
        ResistanceEstimate med = byName(all, MedhurstResistance.NAME);
        assertEquals(1.74 * m.resistanceSkin(F, 20), med.resistanceAc(), 1e-12);
        assertTrue(med.valid(), med.note());
        // 100 kHz: δ = 0.209 mm, wire radius only 2.4 skin depths: skin effect not developed
        assertFalse(byName(m.resistanceModels(100e3, 20), MedhurstResistance.NAME).valid());
        // ℓ/D = 0.1 lies outside the measured grid
        assertFalse(byName(CoilModel.of(new SingleLayerSolenoid(800e-3, 40, 2e-3, WIRE)).resistanceModels(F, 20),
                MedhurstResistance.NAME).valid());
        // litz gets neither Medhurst nor surface-current estimate; multilayer coils get no Medhurst estimate
        Conductor litz = new Conductor.Litz(100, 0.1e-3, 1.25e-3, ConductorMaterial.COPPER);
        assertEquals(1, CoilModel.of(new SingleLayerSolenoid(40e-3, 40, 2e-3, litz)).resistanceModels(F, 20).size());
        assertNull(MedhurstResistance.estimate(new SingleLayerSolenoid(40e-3, 40, 2e-3, litz), 1, 1e-5));
        assertTrue(CoilModel.of(MultilayerSolenoid.closeWound(20e-3, 60, 3, WIRE)).resistanceModels(F, 20).stream()
                .noneMatch(e -> e.name().equals(MedhurstResistance.NAME)));
    }

    /** A close-wound short coil at thin skin depth, where the two disagree by more than 20 %, carries a caution. */
    @Test
    void disagreementIsShownAsACaution() {
        SingleLayerSolenoid s = new SingleLayerSolenoid(200e-3, 40, 1.0e-3 * (1 + 1e-9), WIRE); // ℓ/D = 0.2
        CoilResult r = CoilModel.analyse(s, new OperatingPoint(1e6, 20, 0.1));
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("medhurst-table")), r.warnings().toString());
        SingleLayerSolenoid spaced = new SingleLayerSolenoid(40e-3, 40, 4e-3, WIRE);
        CoilResult ok = CoilModel.analyse(spaced, new OperatingPoint(F, 20, 0.1));
        assertTrue(ok.warnings().stream().noneMatch(w -> w.contains("medhurst-table")), ok.warnings().toString());
    }

    /**
     * Self-capacitance against Medhurst's C = H·D (pF with D in cm), H for ℓ/D = 1.0 … 5.0: 0.46, 0.47, 0.50,
     * 0.56, 0.61, 0.67, 0.72, 0.77, 0.81 (Medhurst 1947, as quoted in the Tesla-coil mailing-list archive at
     * pupman.com, June 1996). Our charged-ring model (60 turns of 1 mm wire on a 100 mm diameter) is lower:
     * measured ratio ours/Medhurst 0.82 at ℓ/D = 1 falling to 0.72 at ℓ/D = 5 (mean |error| 21 %, worst −28 %).
     * Medhurst wound his coils on solid polystyrene rods (ε_r ≈ 2.5) with one end earthed near a ground
     * plane; ours has ε = ε0 and no ground plane, both of which lower C. The bounds hold that: every point
     * 0.65–0.90 of Medhurst's, and C rises with ℓ/D above 1.5 as his does.
     */
    @Test
    void selfCapacitanceAgainstMedhurstsH() {
        double[] lengthOverDiameter = {1, 1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5};
        double[] h = {0.46, 0.47, 0.50, 0.56, 0.61, 0.67, 0.72, 0.77, 0.81};
        double d = 0.1;
        double sum = 0;
        double previous = 0;
        for (int i = 0; i < h.length; i++) {
            SingleLayerSolenoid s = SingleLayerSolenoid.ofLength(d, 60, lengthOverDiameter[i] * d, WIRE);
            double ours = CoilModel.of(s).selfCapacitance();
            double medhurst = h[i] * 1e-12 * (100 * d);
            double ratio = ours / medhurst;
            assertTrue(ratio > 0.65 && ratio < 0.90, "ℓ/D " + lengthOverDiameter[i] + ": ours/Medhurst " + ratio);
            assertTrue(ours > previous, "C rises with length at ℓ/D " + lengthOverDiameter[i]);
            previous = ours;
            sum += Math.abs(ratio - 1);
        }
        assertTrue(sum / h.length < 0.25, "mean |error| " + sum / h.length);
    }
}
