package org.tankwright.magnetics;

import org.tankwright.materials.Conductor;
import org.tankwright.numerics.Kelvin;
import org.tankwright.units.Constants;

/**
 * Eddy-current losses of one conductor: skin effect from its own current and proximity loss from an
 * external AC field. Per unit length, time-averaged, with peak phasors.
 *
 * <p>Round wire, exact (Bessel functions of complex argument through the Kelvin functions, argument
 * x = √2·a/δ): skin R/R0 = {@link Kelvin#skinResistanceRatio(double)}; proximity loss in a uniform
 * transverse field of peak strength H: P' = φ(x)·H²/σ with
 * φ(x) = 2π Re[i ū I1(u) conj(I1'(u))]/|I0(u)|², u = x e^{iπ/4}. This is the solution of the diffusion
 * equation for a cylinder in a transverse field, the round-conductor proximity term of Ferreira
 * (IEEE Trans. Power Electronics 9(1), 1994), derived here; limits π x⁴/8 (low frequency) and
 * 2π a/δ (high frequency). Skin and proximity losses add (orthogonality, Ferreira 1994).
 */
public final class WireLoss {
    private static final double INV_SQRT2 = Math.sqrt(0.5);

    private WireLoss() {
    }

    /** Skin depth δ = √(ρ/(π f µ0 µr)) with µr = 1, m. */
    public static double skinDepth(double resistivity, double frequency) {
        return Math.sqrt(resistivity / (Math.PI * frequency * Constants.MU0));
    }

    /** Round-wire proximity factor φ(x) = P'σ/H² (see class comment), x = √2·a/δ. */
    public static double proximityFactor(double x) {
        if (x < 1e-3) {
            return Math.PI / 8 * x * x * x * x;
        }
        Kelvin.Values v = Kelvin.scaledValues(x);
        // Z0 = I0(u) = ber + i bei; Z1 = I1(u) = e^{-iπ/4}(ber' + i bei')
        double z0r = v.ber();
        double z0i = v.bei();
        double z1r = INV_SQRT2 * (v.berPrime() + v.beiPrime());
        double z1i = INV_SQRT2 * (v.beiPrime() - v.berPrime());
        // u = x e^{iπ/4}; I1'(u) = I0(u) − I1(u)/u
        double ur = x * INV_SQRT2;
        double ui = x * INV_SQRT2;
        double uu = x * x;
        double qr = (z1r * ur + z1i * ui) / uu; // Z1/u = Z1 ū/|u|²
        double qi = (z1i * ur - z1r * ui) / uu;
        double dr = z0r - qr;
        double di = z0i - qi;
        // w = i ū Z1 conj(D)
        double ar = ur * z1r + ui * z1i; // ū Z1 real: (ur − i ui)(z1r + i z1i)
        double ai = ur * z1i - ui * z1r;
        double br = ar * dr + ai * di; // (ū Z1) conj(D)
        double bi = ai * dr - ar * di;
        double re = -bi; // i·(br + i bi) real part
        return 2 * Math.PI * re / (z0r * z0r + z0i * z0i);
    }

    /**
     * Skin-effect resistance ratio R/R_dc of an isolated conductor at the given skin depth. Round wire and
     * litz strands: exact Bessel. Tube: thin-wall slab with the current on the outer face,
     * R/R_dc = (t/δ) Re[(1+i) coth((1+i) t/δ)] (curvature neglected). Trace: current in a depth δ on both
     * faces, R/R_dc = t/(2δ(1 − e^{−t/2δ})) (our approximation; edges neglected).
     */
    public static double skinRatio(Conductor c, double delta) {
        if (c instanceof Conductor.RoundWire w) {
            return Kelvin.skinResistanceRatio(Math.sqrt(2) * 0.5 * w.diameter() / delta);
        }
        if (c instanceof Conductor.Litz l) {
            return Kelvin.skinResistanceRatio(Math.sqrt(2) * 0.5 * l.strandDiameter() / delta);
        }
        if (c instanceof Conductor.Tube t) {
            double y = t.wall() / delta;
            return y * cothRealPart(y);
        }
        Conductor.Trace tr = (Conductor.Trace) c;
        double y = tr.thickness() / (2 * delta);
        return y < 1e-8 ? 1.0 : y / (-Math.expm1(-y));
    }

    /** Re[(1+i) coth((1+i) y)] = (sinh 2y + sin 2y)/(cosh 2y − cos 2y). */
    private static double cothRealPart(double y) {
        if (y < 1e-3) {
            return 1 / y; // low-frequency limit: ratio → 1
        }
        if (y > 20) {
            return 1.0;
        }
        return (Math.sinh(2 * y) + Math.sin(2 * y)) / (Math.cosh(2 * y) - Math.cos(2 * y));
    }

    /**
     * Proximity resistance per metre of conductor per unit of squared field per squared ampere:
     * R'_prox = factor · h², h the peak field per peak ampere (A/m per A) the conductor sees from the
     * rest of the coil. Returns the factor 2·n·φ(x)/σ (n strands for litz, 1 otherwise), in Ω·m.
     * Round wire and tube: φ of the outer radius (a tube with a wall of a few δ screens like a solid bar).
     * Trace: φ of the round conductor with the same low-frequency eddy loss in a field normal to the
     * board, a⁴ = t w³/(3π); the caller passes only the field component normal to the board.
     */
    public static double proximityCoefficient(Conductor c, double resistivity, double delta) {
        double n = 1;
        double a;
        if (c instanceof Conductor.RoundWire w) {
            a = 0.5 * w.diameter();
        } else if (c instanceof Conductor.Litz l) {
            a = 0.5 * l.strandDiameter();
            n = l.strands();
        } else if (c instanceof Conductor.Tube t) {
            a = 0.5 * t.outerDiameter();
        } else {
            Conductor.Trace tr = (Conductor.Trace) c;
            a = Math.pow(tr.thickness() * Math.pow(tr.width(), 3) / (3 * Math.PI), 0.25);
        }
        return 2 * n * proximityFactor(Math.sqrt(2) * a / delta) * resistivity;
    }

    /**
     * Litz bundle's own field: with the current spread evenly over the bundle radius b the mean squared
     * peak field per peak ampere is 1/(8π² b²) (Ampère's law, H = I r/(2π b²)); the strand-level model of
     * Bartoli et al. (PESC 1996) sums the strands' proximity loss in it. 0 for other conductors.
     */
    public static double internalFieldSquared(Conductor c) {
        if (c instanceof Conductor.Litz l) {
            double b = 0.5 * l.bundleDiameter();
            return 1 / (8 * Math.PI * Math.PI * b * b);
        }
        return 0;
    }
}
