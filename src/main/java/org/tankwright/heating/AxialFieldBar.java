package org.tankwright.heating;

import org.tankwright.provenance.Provenance;
import org.apache.commons.math3.complex.Complex;
import org.tankwright.numerics.Kelvin;
import org.tankwright.numerics.KelvinK;
import org.tankwright.units.Constants;

import java.util.ArrayList;
import java.util.List;

/**
 * The exact eddy-current solution for an infinitely long round bar, solid or hollow, of uniform
 * resistivity ρ and relative permeability µr, in a uniform sinusoidal axial field of rms strength
 * H0 at its outer surface.
 *
 * <p>Inside the metal H_z obeys H'' + H'/r = k²H with k = (1 + j)/δ, so H = A·I0(kr) + B·K0(kr)
 * (modified Bessel functions of complex argument, i.e. Kelvin functions: I0(x·e^{jπ/4}) = ber x +
 * j bei x). A solid bar has B = 0; in a tube's bore (radius c) the field is uniform and Faraday's law
 * at r = c gives ρ·H'(c) = jω·µ0·c·H(c)/2. The complex power entering per metre is
 * S' = 2π·a·ρ·H0·H'(a) = jω·H0·Φ, Φ = µ0·µr·π·a²·H0·F, with the flux factor
 * F = 2·H'(a)/(k²·a·H(a)) — for a solid bar F = 2·I1(ka)/(ka·I0(ka)). Power P' = Re S' =
 * ω·µ0·µr·π·a²·H0²·(−Im F). Limits: F → (1 − j)·δ/a for a ≫ δ, so P' → 2π·a·H0²·ρ/δ; F → 1 − j·x²/8
 * (x = √2·a/δ) for a ≪ δ, so P' → π·ω²·µ²·H0²·a⁴/(8ρ). Sources: the classical solution, e.g.
 * Lammeraner &amp; Štafl, <i>Eddy Currents</i> (1966), and Davies, <i>Conduction and Induction
 * Heating</i> (1990), cylinder in a longitudinal field (from memory); both limits re-derived here.
 */
public final class AxialFieldBar {
    private static final double SQRT2 = Math.sqrt(2.0);
    private static final Complex E_MINUS_J_PI_4 = new Complex(Math.sqrt(0.5), -Math.sqrt(0.5));
    private static final Complex E_PLUS_J_PI_4 = new Complex(Math.sqrt(0.5), Math.sqrt(0.5));
    private static final String MODEL = "round bar in a uniform axial field, exact Bessel (Kelvin-function) solution";
    private static final String SOURCE = "classical eddy-current solution (Lammeraner & Štafl 1966; Davies 1990), "
            + "limits derived in docs/models.md";

    private AxialFieldBar() {
    }

    /**
     * Solves one bar.
     *
     * @param outerRadius  a, m
     * @param innerRadius  c, m (0 for a solid bar)
     * @param resistivity  ρ, Ω·m
     * @param muR          µr (≥ 1), held fixed through the bar
     * @param frequency    Hz
     * @param surfaceField rms axial field at r = a, A/m
     */
    public static BarResponse solve(double outerRadius, double innerRadius, double resistivity, double muR,
                                    double frequency, double surfaceField) {
        HeatingInputs.positive("workpiece radius", outerRadius, "m");
        HeatingInputs.nonNegative("workpiece bore radius", innerRadius, "m");
        if (innerRadius >= outerRadius) {
            throw new IllegalArgumentException("workpiece bore radius " + innerRadius + " m must be below the outer radius "
                    + outerRadius + " m");
        }
        HeatingInputs.nonNegative("surface field", surfaceField, "A/m");
        double delta = ReferenceDepth.of(resistivity, frequency, muR);
        Complex f = fluxFactor(outerRadius, innerRadius, delta, muR);
        double omega = 2 * Math.PI * frequency;
        double a = outerRadius;
        double h2 = surfaceField * surfaceField;
        double scale = omega * Constants.MU0 * muR * Math.PI * a * a * h2;
        double power = -scale * f.getImaginary();
        double reactive = scale * f.getReal();
        double thin = 2 * Math.PI * a * h2 * resistivity / delta;
        double low = lowFrequencyPower(a, innerRadius, resistivity, muR, omega, surfaceField);
        List<String> notes = new ArrayList<>();
        notes.add("uniform field along an infinitely long bar; end effects and field non-uniformity are not in this model");
        notes.add("µr and ρ uniform through the bar (the surface values)");
        return new BarResponse(frequency, resistivity, muR, surfaceField, delta, a / delta, f.getReal(),
                f.getImaginary(), power, reactive, thin, low, new Provenance(MODEL, SOURCE, true, notes));
    }

    /**
     * The flux factor F = Φ/(µ0·µr·π·a²·H0) of a bar of outer radius a, bore c (0 = solid), reference
     * depth δ and relative permeability µr (µr matters only for a tube: the bore's flux is µ0's).
     */
    public static Complex fluxFactor(double a, double c, double delta, double muR) {
        double xa = SQRT2 * a / delta;
        if (c <= 0) {
            return solidFactor(xa);
        }
        double xc = SQRT2 * c / delta;
        Kelvin.Values ia = Kelvin.scaledValues(xa);
        Kelvin.Values ic = Kelvin.scaledValues(xc);
        KelvinK.Values ka = KelvinK.scaledValues(xa);
        KelvinK.Values kc = KelvinK.scaledValues(xc);
        Complex zc = E_PLUS_J_PI_4.multiply(xc);
        Complex beta = zc.divide(2 * muR);
        // scaled I0, I1, K0, K1 (I by e^{−x/√2}, K by e^{+x/√2})
        Complex i0c = new Complex(ic.ber(), ic.bei());
        Complex i1c = new Complex(ic.berPrime(), ic.beiPrime()).multiply(E_MINUS_J_PI_4);
        Complex k0c = new Complex(kc.ker(), kc.kei());
        Complex k1c = new Complex(kc.kerPrime(), kc.keiPrime()).multiply(E_MINUS_J_PI_4).negate();
        Complex i0a = new Complex(ia.ber(), ia.bei());
        Complex i1a = new Complex(ia.berPrime(), ia.beiPrime()).multiply(E_MINUS_J_PI_4);
        Complex k0a = new Complex(ka.ker(), ka.kei());
        Complex k1a = new Complex(ka.kerPrime(), ka.keiPrime()).multiply(E_MINUS_J_PI_4).negate();
        // B/A = e^{√2·xc}·q; the wall's attenuation e^{−√2(xa − xc)} keeps every term finite
        Complex q = i1c.subtract(beta.multiply(i0c)).divide(k1c.add(beta.multiply(k0c)));
        double damp = Math.exp(-SQRT2 * (xa - xc));
        Complex qd = q.multiply(damp);
        Complex ratio = i1a.subtract(qd.multiply(k1a)).divide(i0a.add(qd.multiply(k0a)));
        Complex za = E_PLUS_J_PI_4.multiply(xa);
        return ratio.multiply(2.0).divide(za);
    }

    private static Complex solidFactor(double x) {
        if (x < 1e-3) {
            double x2 = x * x;
            return new Complex(1.0 - x2 * x2 / 48.0, -x2 / 8.0);
        }
        Kelvin.Values v = Kelvin.scaledValues(x);
        // F = 2·I1(z)/(z·I0(z)) = −(2j/x)·(ber' + j bei')/(ber + j bei)
        Complex r = new Complex(v.berPrime(), v.beiPrime()).divide(new Complex(v.ber(), v.bei()));
        return new Complex(2.0 * r.getImaginary() / x, -2.0 * r.getReal() / x);
    }

    /**
     * The low-frequency power per metre (a ≪ δ): with E·2πr = −jω·Φ(r) and Φ(r) = π·H0·(µ0·c² + µ·(r² − c²)),
     * P' = (π/2)·σ·ω²·H0²·[µ²(a⁴ − c⁴)/4 + µ·g·(a² − c²) + g²·ln(a/c)], g = (µ0 − µ)·c²; for c = 0 this is
     * π·ω²·µ²·H0²·a⁴/(8ρ). Derived here (Faraday's law, field undisturbed by the eddy currents).
     */
    public static double lowFrequencyPower(double a, double c, double resistivity, double muR, double omega,
                                           double surfaceField) {
        double mu = Constants.MU0 * muR;
        double bracket = mu * mu * (Math.pow(a, 4) - Math.pow(c, 4)) / 4.0;
        if (c > 0) {
            double g = (Constants.MU0 - mu) * c * c;
            bracket += mu * g * (a * a - c * c) + g * g * Math.log(a / c);
        }
        return 0.5 * Math.PI / resistivity * omega * omega * surfaceField * surfaceField * bracket;
    }
}
