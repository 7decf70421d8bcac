package org.tankwright.coupling;

import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;
import org.tankwright.magnetics.Filament;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SpectralLinkTest {

    @Test
    void besselFunctionsMatchCommonsMath() {
        for (double x = 0; x < 400; x += 0.37) {
            assertEquals(BesselJ.value(0, x), Bessel.j0(x), 2e-11, "J0 vs Commons Math BesselJ at " + x);
            assertEquals(BesselJ.value(1, x), Bessel.j1(x), 2e-11, "J1 vs Commons Math BesselJ at " + x);
        }
    }

    private static void assertSame(CoupledCoils spectral, CoupledCoils pairs, double gap, double off, double tol) {
        CouplingResult s = spectral.atGap(gap, off, 0);
        CouplingResult p = pairs.atGap(gap, off, 0);
        String where = " at gap " + gap + ", offset " + off;
        assertEquals(p.mutual(), s.mutual(), tol * Math.abs(p.mutual()) + 1e-6 * tol * Math.abs(s.inductanceA()), "M" + where);
        assertEquals(p.inductanceA(), s.inductanceA(), tol * p.inductanceA(), "L_a" + where);
        assertEquals(p.inductanceB(), s.inductanceB(), tol * p.inductanceB(), "L_b" + where);
    }

    @Test
    void spectralFormAgreesWithRingPairSumsInAir() {
        // Two independent routes to the same Neumann integral: Hankel transform vs offset-ring single integrals
        List<Filament> a = TestCoils.spiral(10, 0.04, 0.005, 0.0008);
        List<Filament> b = TestCoils.solenoid(6, 0.06, 0.003, 0.0006);
        CoupledCoils.Coil ca = TestCoils.coil("a", a, null);
        CoupledCoils.Coil cb = TestCoils.coil("b", b, null);
        CoupledCoils fast = new CoupledCoils(ca, cb);
        CoupledCoils slow = new CoupledCoils(ca, cb, false);
        assertTrue(fast.at(0.05, 0, 0).provenance().model().startsWith("spectral"));
        for (double gap : new double[] {0.002, 0.02, 0.2}) {
            for (double off : new double[] {0, 0.03, 0.09, 0.3}) {
                assertSame(fast, slow, gap, off, 1e-7);
            }
        }
    }

    @Test
    void closedFormImageSumAgreesWithImageSeries() {
        // With a fixed (measured) coefficient both routes sum the same images: the spectral one in closed
        // form 1/(1 − Γ_AΓ_B e^{−2kL}), the other image by image (Smythe §7.18 images, repeated)
        List<Filament> a = TestCoils.spiral(5, 0.05, 0.006, 0.001);
        BackingPlate ferrite = BackingPlate.ferrite(3000, 0.005, 0.003).withMeasuredCoefficient(0.95);
        BackingPlate metal = BackingPlate.metal(2.8e-8, 0.002, 0.01);
        for (BackingPlate pb : new BackingPlate[] {ferrite, metal, null}) {
            CoupledCoils.Coil ca = TestCoils.coil("a", a, ferrite);
            CoupledCoils.Coil cb = TestCoils.coil("b", a, pb);
            CoupledCoils fast = new CoupledCoils(ca, cb);
            CoupledCoils slow = new CoupledCoils(ca, cb, false);
            assertSame(fast, slow, 0.04, 0.02, 2e-6);
            assertSame(fast, slow, 0.15, 0.1, 2e-6);
        }
    }

    @Test
    void thickFerriteSlabTendsToTheHalfSpaceImage() {
        // Γ(k) → (µr−1)/(µr+1) for kt ≫ 1 (slab reflection, thick limit)
        List<Filament> a = TestCoils.spiral(5, 0.05, 0.006, 0.001);
        BackingPlate thick = BackingPlate.ferrite(1000, 5.0, 0.003);
        BackingPlate halfSpace = thick.withMeasuredCoefficient(thick.halfSpaceCoefficient());
        CoupledCoils slab = new CoupledCoils(TestCoils.coil("a", a, thick), TestCoils.coil("b", a, null));
        CoupledCoils half = new CoupledCoils(TestCoils.coil("a", a, halfSpace), TestCoils.coil("b", a, null));
        CouplingResult r1 = slab.atGap(0.03, 0.01, 0);
        CouplingResult r2 = half.atGap(0.03, 0.01, 0);
        assertEquals(r2.inductanceA(), r1.inductanceA(), 1e-5 * r2.inductanceA());
        assertEquals(r2.mutual(), r1.mutual(), 1e-5 * r2.mutual());
        // a thin tile reflects less than the half-space
        CoupledCoils thin = new CoupledCoils(TestCoils.coil("a", a, BackingPlate.ferrite(1000, 0.0005, 0.003)), TestCoils.coil("b", a, null));
        assertTrue(thin.atGap(0.03, 0.01, 0).inductanceA() < r1.inductanceA());
    }
}
