package org.tankwright.coupling;

import org.tankwright.provenance.Provenance;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.tankwright.magnetics.Filament;
import org.tankwright.units.Constants;

import java.util.ArrayList;
import java.util.List;

/**
 * Eddy-current loss of a metal shield behind a coil, as a resistance added in series with the coil.
 *
 * <p>A good conductor thicker than a few skin depths δ = √(ρ/(πfµ0µr)) absorbs, per unit area, the
 * power R_s·|H_t|² (rms), R_s = ρ/δ its surface resistance (Jackson, <i>Classical Electrodynamics</i>,
 * §8.1; Ramo, Whinnery &amp; Van Duzer, <i>Fields and Waves</i>, surface impedance). The tangential field
 * at its surface is taken from the image solution (perfect conductor: twice the coil's own
 * tangential field), so the added resistance is
 * <pre>ΔR = R_s ∫_plane |2 H_t,coil|² dA / I²</pre>
 * Approximations, stated in the result: the plate is an infinite plane; only this coil's own field
 * is counted (the other coil's field at the shield and the other plate are ignored); the current
 * distribution is that of a perfect conductor (valid when δ is small against the coil-to-plate
 * distance); plates thinner than about 3δ lose differently (warning). The integral runs over
 * Gauss–Legendre panels of the coil-to-plate distance across the coil and geometric panels beyond.
 */
public final class ShieldLoss {
    private static final int ORDER = 8;
    private static final double[] GX = new double[ORDER];
    private static final double[] GW = new double[ORDER];

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(ORDER);
        for (int i = 0; i < ORDER; i++) {
            GX[i] = rule.getPoint(i);
            GW[i] = rule.getWeight(i);
        }
    }

    /**
     * The added resistance and how it was obtained.
     *
     * @param resistance        Ω added in series with the coil
     * @param surfaceResistance R_s of the plate, Ω per square
     * @param skinDepth         δ of the plate at the frequency, m
     */
    public record Result(double resistance, double surfaceResistance, double skinDepth, Provenance provenance) {
    }

    private ShieldLoss() {
    }

    /**
     * Added resistance of a metal plate whose surface is the plane z = planeZ in the coil's frame, at
     * {@code frequency} Hz; all filaments must lie on one side of the plane.
     */
    public static Result addedResistance(List<? extends Filament> coil, double planeZ, BackingPlate plate, double frequency) {
        return addedResistance(FilamentSet.of(coil), planeZ, plate, frequency);
    }

    static Result addedResistance(FilamentSet set, double planeZ, BackingPlate plate, double frequency) {
        if (plate.material() != BackingPlate.Material.METAL) {
            throw new IllegalArgumentException("shield loss applies to metal plates; a ferrite plate's loss is not modelled here");
        }
        if (!(frequency > 0) || Double.isInfinite(frequency)) {
            throw new IllegalArgumentException("frequency must be > 0 for the shield loss, got " + frequency + " Hz");
        }
        double h = distanceToPlane(set, planeZ);
        double delta = Math.sqrt(plate.resistivity() / (Math.PI * frequency * Constants.MU0 * plate.relativePermeability()));
        double rs = plate.resistivity() / delta;
        double outer = set.outerRadius();
        double integral = set.axisymmetric() ? radialIntegral(set, planeZ, h, outer) : planeIntegral(set, planeZ, h);
        double resistance = rs * 4 / (Constants.MU0 * Constants.MU0) * integral;
        List<String> notes = new ArrayList<>();
        notes.add("infinite plate; this coil's own field only; perfect-conductor current distribution");
        boolean valid = true;
        if (plate.thickness() < 3 * delta) {
            notes.add(String.format("plate %.3g m thick is under 3 skin depths (δ = %.3g m): loss and image coefficient are uncertain",
                    plate.thickness(), delta));
            valid = false;
        }
        if (delta > 0.2 * h) {
            notes.add(String.format("skin depth %.3g m is not small against the coil-to-plate distance %.3g m", delta, h));
            valid = false;
        }
        return new Result(resistance, rs, delta, new Provenance("surface-resistance shield loss (image field)",
                "Jackson, Classical Electrodynamics §8.1; image method", valid, notes));
    }

    private static double distanceToPlane(FilamentSet s, double z0) {
        double min = Double.POSITIVE_INFINITY;
        int side = 0;
        for (double z : s.rz) {
            min = Math.min(min, Math.abs(z - z0));
            side |= z > z0 ? 1 : 2;
        }
        for (int i = 0; i < s.sw.length; i++) {
            for (int e = 0; e < 2; e++) {
                double z = s.s[6 * i + 2 + 3 * e];
                min = Math.min(min, Math.abs(z - z0));
                side |= z > z0 ? 1 : 2;
            }
        }
        if (side == 3 || !(min > 0)) {
            throw new IllegalArgumentException("the shield plane must lie clear of the winding, on one side of it");
        }
        return min;
    }

    /** Panel edges: uniform panels of width ≤ step over [lo, hi], then geometric panels out to far. */
    private static List<Double> edges(double lo, double hi, double step, double far) {
        List<Double> e = new ArrayList<>();
        int n = Math.max(1, (int) Math.ceil((hi - lo) / step));
        for (int i = 0; i <= n; i++) {
            e.add(lo + (hi - lo) * i / n);
        }
        double w = (hi - lo) / n;
        double x = hi;
        while (x < far) {
            w *= 1.5;
            x += w;
            e.add(x);
        }
        return e;
    }

    private static double radialIntegral(FilamentSet s, double z0, double h, double outer) {
        double step = Math.min(h, outer / 10);
        List<Double> e = edges(0, outer + 6 * h, step, 1000 * (outer + h));
        double[] b = new double[3];
        double sum = 0;
        for (int p = 0; p + 1 < e.size(); p++) {
            double a = e.get(p);
            double c = e.get(p + 1);
            for (int i = 0; i < ORDER; i++) {
                double rho = 0.5 * (a + c) + 0.5 * (c - a) * GX[i];
                s.fluxDensity(rho, 0, z0, b);
                sum += 0.5 * (c - a) * GW[i] * 2 * Math.PI * rho * (b[0] * b[0] + b[1] * b[1]);
            }
        }
        return sum;
    }

    private static double planeIntegral(FilamentSet s, double z0, double h) {
        double[] box = bounds(s);
        double step = 2 * h;
        double size = Math.max(box[1] - box[0], box[3] - box[2]) + h;
        double[] xs = nodes(box[0] - 4 * h, box[1] + 4 * h, step, 300 * size);
        double[] ys = nodes(box[2] - 4 * h, box[3] + 4 * h, step, 300 * size);
        double[] b = new double[3];
        double sum = 0;
        int n = xs.length / 2;
        int m = ys.length / 2;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < m; j++) {
                s.fluxDensity(xs[2 * i], ys[2 * j], z0, b);
                sum += xs[2 * i + 1] * ys[2 * j + 1] * (b[0] * b[0] + b[1] * b[1]);
            }
        }
        return sum;
    }

    /** Nodes and weights (interleaved) over (−∞..∞) ≈ [lo − far, hi + far]: uniform across [lo, hi], geometric outside. */
    private static double[] nodes(double lo, double hi, double step, double far) {
        List<Double> right = edges(lo, hi, step, hi + far);
        List<Double> all = new ArrayList<>();
        // mirror the geometric growth to the left of lo
        int uniform = Math.max(1, (int) Math.ceil((hi - lo) / step));
        double w = (hi - lo) / uniform;
        List<Double> left = new ArrayList<>();
        double x = lo;
        while (x > lo - far) {
            w *= 1.5;
            x -= w;
            left.add(0, x);
        }
        all.addAll(left);
        all.addAll(right);
        double[] out = new double[2 * ORDER * (all.size() - 1)];
        int k = 0;
        for (int p = 0; p + 1 < all.size(); p++) {
            double a = all.get(p);
            double c = all.get(p + 1);
            for (int i = 0; i < ORDER; i++) {
                out[k++] = 0.5 * (a + c) + 0.5 * (c - a) * GX[i];
                out[k++] = 0.5 * (c - a) * GW[i];
            }
        }
        return out;
    }

    private static double[] bounds(FilamentSet s) {
        double[] b = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (int i = 0; i < s.rr.length; i++) {
            b[0] = Math.min(b[0], s.rx[i] - s.rr[i]);
            b[1] = Math.max(b[1], s.rx[i] + s.rr[i]);
            b[2] = Math.min(b[2], s.ry[i] - s.rr[i]);
            b[3] = Math.max(b[3], s.ry[i] + s.rr[i]);
        }
        for (int i = 0; i < s.sw.length; i++) {
            for (int e = 0; e < 2; e++) {
                b[0] = Math.min(b[0], s.s[6 * i + 3 * e]);
                b[1] = Math.max(b[1], s.s[6 * i + 3 * e]);
                b[2] = Math.min(b[2], s.s[6 * i + 1 + 3 * e]);
                b[3] = Math.max(b[3], s.s[6 * i + 1 + 3 * e]);
            }
        }
        return b;
    }
}
