package org.tankwright.coupling;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Ring;
import org.tankwright.units.Constants;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CoupledCoilsTest {

    @Test
    void farFieldOfTwoMultiturnCoilsApproachesDipole() {
        // M -> µ0 π N1 N2 R1² R2² / (2 d³) for coaxial coils far apart (MODELS.md §2; magnetic dipoles, common practice)
        List<Filament> a = TestCoils.solenoid(5, 0.04, 0.003, 0.0005);
        List<Filament> b = TestCoils.solenoid(3, 0.025, 0.003, 0.0005);
        CoupledCoils link = new CoupledCoils(TestCoils.coil("a", a, null), TestCoils.coil("b", b, null));
        double d = 4.0;
        double dipole = Constants.MU0 * Math.PI * 5 * 3 * Math.pow(0.04, 2) * Math.pow(0.025, 2) / (2 * d * d * d);
        assertEquals(dipole, link.at(d, 0, 0).mutual(), 1e-3 * dipole, "dipole limit");
    }

    @Test
    void reciprocityWithPlatesOnBothSides() {
        // M12 = M21 (Neumann's formula is symmetric): compute the link upside down, b as the lower coil
        List<Filament> a = TestCoils.spiral(6, 0.05, 0.006, 0.001);
        List<Filament> b = TestCoils.solenoid(4, 0.04, 0.004, 0.0008);
        BackingPlate pa = BackingPlate.ferrite(2000, 0.005, 0.002);
        BackingPlate pb = BackingPlate.metal(2.8e-8, 0.002, 0.004);
        CoupledCoils up = new CoupledCoils(TestCoils.coil("a", a, pa), TestCoils.coil("b", b, pb));
        CoupledCoils down = new CoupledCoils(TestCoils.coil("b", mirror(b), pb), TestCoils.coil("a", mirror(a), pa));
        CouplingResult r1 = up.atGap(0.03, 0.02, -0.01);
        CouplingResult r2 = down.atGap(0.03, -0.02, 0.01);
        assertEquals(r1.mutual(), r2.mutual(), 1e-7 * Math.abs(r1.mutual()), "M12 = M21 with images");
        assertEquals(r1.inductanceA(), r2.inductanceB(), 1e-7 * r1.inductanceA(), "L_a the same either way");
        assertEquals(r1.inductanceB(), r2.inductanceA(), 1e-7 * r1.inductanceB(), "L_b the same either way");
    }

    private static List<Filament> mirror(List<Filament> f) {
        List<Filament> out = new ArrayList<>();
        for (Filament x : f) {
            out.add(x.mirroredZ(0));
        }
        return out;
    }

    @Test
    void couplingFactorStaysBelowOneForRandomPlacements() {
        // |k| < 1 for every physically valid placement (passivity of the inductance matrix; MODELS.md §2)
        Random rnd = new Random(20261202L);
        for (int trial = 0; trial < 60; trial++) {
            List<Filament> a = randomCoil(rnd);
            List<Filament> b = randomCoil(rnd);
            BackingPlate pa = randomPlate(rnd);
            BackingPlate pb = randomPlate(rnd);
            // every third placement through the filament-pair sums and image series instead of the spectral form
            CoupledCoils link = new CoupledCoils(TestCoils.coil("a", a, pa), TestCoils.coil("b", b, pb), trial % 3 != 0);
            double gap = 0.0005 + rnd.nextDouble() * 0.1;
            double off = rnd.nextDouble() * 0.2;
            double ang = rnd.nextDouble() * 2 * Math.PI;
            CouplingResult r = link.atGap(gap, off * Math.cos(ang), off * Math.sin(ang));
            assertTrue(Math.abs(r.k()) < 1, "trial " + trial + ": k = " + r.k());
            assertTrue(r.inductanceA() > 0 && r.inductanceB() > 0, "trial " + trial);
            assertTrue(Double.isFinite(r.mutual()), "trial " + trial);
        }
    }

    private static List<Filament> randomCoil(Random rnd) {
        double wire = 0.0003 + rnd.nextDouble() * 0.001;
        int turns = 1 + rnd.nextInt(8);
        double r0 = 0.01 + rnd.nextDouble() * 0.1;
        double pitch = 2 * wire + rnd.nextDouble() * 0.004;
        return switch (rnd.nextInt(3)) {
            case 0 -> TestCoils.spiral(turns, r0, pitch, wire);
            case 1 -> TestCoils.solenoid(turns, r0, pitch, wire);
            default -> TestCoils.squareSpiral(Math.min(turns, 4), 2 * r0 + 2 * turns * pitch, pitch, wire);
        };
    }

    private static BackingPlate randomPlate(Random rnd) {
        return switch (rnd.nextInt(3)) {
            case 0 -> null;
            case 1 -> BackingPlate.ferrite(10 + rnd.nextDouble() * 3000, 0.001 + rnd.nextDouble() * 0.01, rnd.nextDouble() * 0.01);
            default -> BackingPlate.metal(1.7e-8, 0.002, 0.001 + rnd.nextDouble() * 0.02);
        };
    }

    @Test
    void ferriteRaisesAndMetalLowersInductanceAndTheyMoveWithTheGap() {
        List<Filament> a = TestCoils.spiral(8, 0.05, 0.005, 0.001);
        CoupledCoils.Coil bare = TestCoils.coil("b", a, null);
        CoupledCoils withFerrite = new CoupledCoils(TestCoils.coil("a", a, BackingPlate.ferrite(2000, 0.01, 0.002)), bare);
        CoupledCoils withMetal = new CoupledCoils(TestCoils.coil("a", a, BackingPlate.metal(2.8e-8, 0.003, 0.002)), bare);
        double l0 = bare.selfInductance();
        CouplingResult near = withFerrite.atGap(0.01, 0, 0);
        CouplingResult far = withFerrite.atGap(0.1, 0, 0);
        assertTrue(near.inductanceA() > l0, "ferrite behind a coil raises its inductance (common practice)");
        assertTrue(near.inductanceB() > far.inductanceB(), "b's inductance rises as it nears a's ferrite");
        assertEquals(l0, far.inductanceB(), 0.05 * l0, "far from the plate b keeps about its free inductance");
        assertTrue(withMetal.atGap(0.01, 0, 0).inductanceA() < l0, "a metal shield lowers the inductance (common practice)");
        assertTrue(near.provenance().model().contains("image"));
    }

    @Test
    void imageFieldMeetsTheInterfaceConditions() {
        // Boundary conditions at a plate surface (Jackson, Classical Electrodynamics, §5.9): B_n continuous and
        // H_t continuous. With the image solution the field inside the ferrite is the source's own field scaled,
        // so on the air side µr·B_t/B_n must equal the free source's B_t/B_n; at a perfect conductor B_n = 0.
        List<Filament> a = List.of(new Ring(0, 0, 0, 0.05, 0.001));
        double spacing = 0.01 - 0.001; // plate surface 10 mm below the ring's centre line
        double mur = 50;
        CoupledCoils ferrite = new CoupledCoils(TestCoils.coil("a", a, BackingPlate.ferrite(mur, 10, spacing)),
                TestCoils.coil("b", TestCoils.spiral(1, 0.03, 0.001, 0.001), null));
        CoupledCoils metal = new CoupledCoils(TestCoils.coil("a", a, BackingPlate.metal(1.7e-8, 10, spacing)),
                TestCoils.coil("b", TestCoils.spiral(1, 0.03, 0.001, 0.001), null));
        FilamentSet free = FilamentSet.of(a);
        double z = -0.01; // on the plate surface, air side
        double[] src = new double[3];
        for (double x : new double[] {0.02, 0.045, 0.07}) {
            free.fluxDensity(x, 0.01, z, src);
            PhasorFlux f = ferrite.field(1.0, 0, 0, Complex.ONE, Complex.ZERO, x, 0.01, z);
            double bt = Math.hypot(f.bx().getReal(), f.by().getReal());
            double btSrc = Math.hypot(src[0], src[1]);
            assertEquals(btSrc / src[2], mur * bt / f.bz().getReal(), 1e-6 * Math.abs(btSrc / src[2]), "refraction at x=" + x);
            assertEquals(src[2] * 2 * mur / (mur + 1), f.bz().getReal(), 1e-6 * Math.abs(src[2]), "B_n = (1+η) B_n,source");
            PhasorFlux g = metal.field(1.0, 0, 0, Complex.ONE, Complex.ZERO, x, 0.01, z);
            assertEquals(0, g.bz().getReal(), 1e-6 * Math.abs(src[2]), "B_n = 0 at a perfect conductor");
        }
        assertThrows(IllegalArgumentException.class, () -> ferrite.field(1.0, 0, 0, Complex.ONE, Complex.ZERO, 0, 0, -0.02));
    }

    @Test
    void phasorFieldOfTwoCoilsInQuadrature() {
        // Two equal coaxial loops, currents 90° apart: on the axis midway both fields are along z with equal
        // magnitude, so |Bz| = √2 · B_one (superposition of rms phasors, common practice)
        List<Filament> loop = List.of(new Ring(0, 0, 0, 0.05, 0.001));
        CoupledCoils link = new CoupledCoils(TestCoils.coil("a", loop, null), TestCoils.coil("b", loop, null));
        PhasorFlux f = link.field(0.04, 0, 0, new Complex(2, 0), new Complex(0, 2), 0, 0, 0.02);
        double one = 2 * Constants.MU0 * 0.05 * 0.05 / (2 * Math.pow(0.05 * 0.05 + 0.02 * 0.02, 1.5));
        assertEquals(Math.sqrt(2) * one, f.bRms(), 1e-12 * one);
        assertEquals(0, f.bx().abs(), 1e-18);
    }

    @Test
    void overlappingCoilsAreRefused() {
        List<Filament> a = TestCoils.spiral(2, 0.05, 0.005, 0.001);
        CoupledCoils link = new CoupledCoils(TestCoils.coil("a", a, null), TestCoils.coil("b", a, null));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> link.atGap(-0.001, 0, 0));
        assertTrue(e.getMessage().contains("gap"));
        assertEquals(0.002, link.distanceForGap(0), 1e-15, "distance = gap + wire diameter for flat spirals");
        CouplingResult r = link.atGap(0.01, 0, 0);
        assertTrue(r.provenance().valid() && r.provenance().notes().isEmpty(), "air coils: no caveats");
    }
}
