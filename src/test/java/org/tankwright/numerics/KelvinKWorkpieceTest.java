package org.tankwright.numerics;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** ker/kei and K0, K1 of complex argument x·e^{πi/4}, checked against independent references. */
class KelvinKWorkpieceTest {

    /** K_n(z) = ∫_0^∞ e^{−z cosh t} cosh(n t) dt for Re z &gt; 0 (A&amp;S 9.6.24), by the trapezoid rule. */
    private static Complex integralK(int n, double x) {
        Complex z = new Complex(x * Math.sqrt(0.5), x * Math.sqrt(0.5));
        double h = 0.002;
        Complex sum = Complex.ZERO;
        for (int i = 0; ; i++) {
            double t = i * h;
            double w = (i == 0 ? 0.5 : 1.0) * Math.cosh(n * t);
            Complex term = z.multiply(-Math.cosh(t)).exp().multiply(w);
            sum = sum.add(term);
            if (term.abs() < 1e-22 && t > 1) {
                break;
            }
        }
        return sum.multiply(h);
    }

    @Test
    void tableValuesAtOne() {
        // Abramowitz & Stegun Table 9.12 (x = 1): ker 1 = 0.2867062, kei 1 = −0.4949946 (from memory)
        assertEquals(0.2867062, KelvinK.ker(1.0), 2e-7, "A&S Table 9.12 ker(1)");
        assertEquals(-0.4949946, KelvinK.kei(1.0), 2e-7, "A&S Table 9.12 kei(1)");
    }

    @Test
    void matchesTheIntegralAtAFiftyTimesFinerStep() {
        for (double x : new double[] {0.3, 1.0, 3.0, 7.5, 19.9, 20.1, 35.0}) {
            Complex k0 = KelvinK.k0(x);
            Complex k1 = KelvinK.k1(x);
            Complex r0 = integralK(0, x);
            Complex r1 = integralK(1, x);
            double env0 = r0.abs();
            double env1 = r1.abs();
            assertEquals(r0.getReal(), k0.getReal(), 1e-9 * env0, "A&S 9.6.24 K0 real at x=" + x);
            assertEquals(r0.getImaginary(), k0.getImaginary(), 1e-9 * env0, "A&S 9.6.24 K0 imag at x=" + x);
            assertEquals(r1.getReal(), k1.getReal(), 1e-9 * env1, "A&S 9.6.24 K1 real at x=" + x);
            assertEquals(r1.getImaginary(), k1.getImaginary(), 1e-9 * env1, "A&S 9.6.24 K1 imag at x=" + x);
        }
    }

    @Test
    void wronskianWithIndependentI0AndI1() {
        // I0(z)K1(z) + I1(z)K0(z) = 1/z (A&S 9.6.15), with I0, I1 from Kelvin (ascending/Hankel series, separate code).
        for (double x : new double[] {1e-3, 0.05, 0.7, 2.0, 6.0, 12.0, 19.9, 20.1, 40.0, 300.0, 5000.0, 1e5}) {
            Kelvin.Values i = Kelvin.scaledValues(x);
            KelvinK.Values k = KelvinK.scaledValues(x);
            Complex e = new Complex(Math.sqrt(0.5), -Math.sqrt(0.5)); // e^{−iπ/4}
            Complex i0 = new Complex(i.ber(), i.bei());
            Complex i1 = new Complex(i.berPrime(), i.beiPrime()).multiply(e);
            Complex k0 = new Complex(k.ker(), k.kei());
            Complex k1 = new Complex(k.kerPrime(), k.keiPrime()).multiply(e).negate(); // K1 = −e^{−iπ/4}(ker' + i kei')
            Complex w = i0.multiply(k1).add(i1.multiply(k0));
            Complex expected = new Complex(Math.sqrt(0.5), -Math.sqrt(0.5)).divide(x);
            assertEquals(expected.getReal(), w.getReal(), 1e-11 / x, "A&S 9.6.15 Wronskian at x=" + x);
            assertEquals(expected.getImaginary(), w.getImaginary(), 1e-11 / x, "A&S 9.6.15 Wronskian at x=" + x);
        }
    }

    @Test
    void refusesNonPositiveArgument() {
        assertThrows(IllegalArgumentException.class, () -> KelvinK.values(0.0));
        assertThrows(IllegalArgumentException.class, () -> KelvinK.scaledValues(Double.NaN));
    }
}
