package org.tankwright.heating;

import org.tankwright.provenance.Provenance;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;
import org.tankwright.units.Constants;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.util.ArrayList;
import java.util.List;

/**
 * A flat work coil over a conducting, possibly magnetic plate: the coil as coaxial rings of radii
 * r_i at heights h_i above the plate surface, the plate a layer of thickness t (conductivity σ,
 * relative permeability µr) idealised as infinite in radius, with air on both sides. The impedance
 * change of the coil is the classical integral solution (Dodd &amp; Deeds, J. Appl. Phys. 39, 1968):
 * <pre>
 * ΔZ = jωπµ0 ∫₀^∞ S(α)² Γ(α) dα,   S(α) = Σ_i r_i J1(α r_i) e^{−α h_i}
 * α1 = √(α² + jωµ0µrσ),  r = (µr α − α1)/(µr α + α1),  Γ = r (1 − e^{−2α1 t})/(1 − r² e^{−2α1 t})
 * </pre>
 * (the ring sum inside the integrand makes N² ring pairs one integral). Γ → −1 for a perfect conductor
 * (ΔL = −M of the coil and its mirror image) and Γ = (µr−1)/(µr+1) for a non-conducting permeable
 * half-space (the magnetostatic image). Loaded L = L0 + Im ΔZ/ω, work resistance Re ΔZ. The
 * tangential field at the plate surface under ring j, from the same spectrum, is
 * H_ρ(r_j) = −(I/2) ∫ α J1(α r_j) S(α) (1 − Γ(α)) dα.
 *
 * <p>Quadrature (ours): 8-point Gauss–Legendre on uniform panels of width min(π/(2 r_max), 1/(2 h_min))
 * up to α = 40/h_min, the first panel split geometrically toward α = 0 so that the slow scales of Γ
 * (a thin sheet's ωµ0σt/2, a magnetic plate's |α1|/µr) are resolved whatever their size; S(α) and the
 * J1(α r_j) are tabulated once per coil and plate position, so each new µr, σ or f costs one pass over
 * the nodes.
 */
public final class PlateLoad {
    private static final int ORDER = 8;
    private static final int GRADING = 24;
    private static final double DECAY = 30; // e^-30 < 1e-13: the field integrand α·e^(−αh) is below 1e-11 of its peak there
    private static final int MAX_PANELS = 40000;
    private static final double SQRT2 = Math.sqrt(2.0);
    private static final double MU_MAX = 1e6;
    private static final double[] GX = new double[ORDER];
    private static final double[] GW = new double[ORDER];
    /** Plate overhang beyond the coil, in ring heights, below which the infinite-plate idealisation is doubtful. */
    public static final double OVERHANG_HEIGHTS = 3.0;
    static final String MODEL = "flat coil over a plate: coaxial rings over a conducting layer (spectral integral)";
    static final String SOURCE = "Dodd & Deeds, J. Appl. Phys. 39 (1968), coil above a conducting layer; "
            + "quadrature and µr(H) rule ours (docs/models.md, plate heating)";

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(ORDER);
        for (int i = 0; i < ORDER; i++) {
            GX[i] = rule.getPoint(i);
            GW[i] = rule.getWeight(i);
        }
    }

    private final double[] radii;
    private final double[] heights;
    private final double[] k;
    private final double[] w;
    private final double[] s;
    /** w_q·α_q·J1(α_q r_j)·S(α_q) for ring j at node q: the surface field's integrand without Γ. */
    private final double[][] fieldWeights;

    private PlateLoad(double[] radii, double[] heights) {
        this.radii = radii.clone();
        this.heights = heights.clone();
        double rMax = 0;
        double hMin = Double.POSITIVE_INFINITY;
        for (int i = 0; i < radii.length; i++) {
            HeatingInputs.positive("ring radius", radii[i], "m");
            HeatingInputs.positive("ring height above the plate", heights[i], "m");
            rMax = Math.max(rMax, radii[i]);
            hMin = Math.min(hMin, heights[i]);
        }
        double width = Math.min(Math.PI / (2 * rMax), 0.5 / hMin);
        int panels = (int) Math.min(MAX_PANELS, Math.ceil(DECAY / hMin / width));
        int n = (GRADING + 1 + panels - 1) * ORDER;
        k = new double[n];
        w = new double[n];
        int idx = 0;
        // first panel [0, width] split into [0, width/2^G], …, [width/4, width/2], [width/2, width]
        for (int p = GRADING; p >= 0; p--) {
            double lo = p == GRADING ? 0 : width * Math.pow(0.5, p + 1);
            double hi = width * Math.pow(0.5, p);
            idx = panel(lo, hi, idx);
        }
        for (int p = 1; p < panels; p++) {
            idx = panel(p * width, (p + 1) * width, idx);
        }
        s = new double[n];
        double[][] j1 = new double[radii.length][n];
        for (int i = 0; i < radii.length; i++) {
            for (int q = 0; q < n; q++) {
                double v = BesselJ1.of(k[q] * radii[i]);
                j1[i][q] = v;
                s[q] += radii[i] * v * Math.exp(-k[q] * heights[i]);
            }
        }
        fieldWeights = new double[radii.length][n];
        for (int i = 0; i < radii.length; i++) {
            for (int q = 0; q < n; q++) {
                fieldWeights[i][q] = w[q] * k[q] * j1[i][q] * s[q];
            }
        }
    }

    private int panel(double lo, double hi, int idx) {
        for (int i = 0; i < ORDER; i++) {
            k[idx] = 0.5 * (lo + hi) + 0.5 * (hi - lo) * GX[i];
            w[idx++] = 0.5 * (hi - lo) * GW[i];
        }
        return idx;
    }

    /** Rings of radii r_i (m) at heights h_i (m, &gt; 0) above the plate surface. */
    public static PlateLoad rings(double[] radii, double[] heights) {
        if (radii == null || heights == null || radii.length == 0 || radii.length != heights.length) {
            throw new IllegalArgumentException("the plate model needs one height for each ring (at least one ring)");
        }
        return new PlateLoad(radii, heights);
    }

    /** The coil's rings at the plate's gap: h_i = gap + the ring's height above the winding face. */
    public static PlateLoad of(FlatWorkCoil coil, PlateGeometry plate) {
        double[] lifts = coil.lifts();
        double[] h = new double[lifts.length];
        for (int i = 0; i < h.length; i++) {
            h[i] = plate.gap() + lifts[i];
        }
        return new PlateLoad(coil.radii(), h);
    }

    /** Number of quadrature nodes (for the benchmark and the docs). */
    public int nodes() {
        return k.length;
    }

    /**
     * ΔZ per unit current, Ω, at angular frequency ω for a plate of conductivity σ (S/m; 0 for a
     * non-conductor, +∞ for a perfect conductor), relative permeability µr and thickness t (m;
     * +∞ for a half-space).
     */
    public Complex impedanceChange(double omega, double conductivity, double muR, double thickness) {
        return impedanceChange(omega, reflection(omega, conductivity, muR, thickness));
    }

    /** ΔZ per unit current, Ω, from Γ(α) already computed at every node. */
    private Complex impedanceChange(double omega, double[] g) {
        int nodes = k.length;
        double re = 0;
        double im = 0;
        for (int q = 0; q < k.length; q++) {
            double f = w[q] * s[q] * s[q];
            re += f * g[q];
            im += f * g[nodes + q];
        }
        // jωπµ0·(re + j·im)
        double c = omega * Math.PI * Constants.MU0;
        return new Complex(-c * im, c * re);
    }

    /**
     * Magnitude of the radial (tangential) field at the plate surface under each ring, A/m per ampere,
     * from H_ρ(r_j) = −(1/2) ∫ α J1(α r_j) S(α)(1 − Γ(α)) dα.
     */
    public double[] surfaceFields(double omega, double conductivity, double muR, double thickness) {
        return fields(reflection(omega, conductivity, muR, thickness));
    }

    /** The largest of {@link #surfaceFields}, A/m per ampere. */
    public double peakSurfaceField(double omega, double conductivity, double muR, double thickness) {
        double m = 0;
        for (double v : surfaceFields(omega, conductivity, muR, thickness)) {
            m = Math.max(m, v);
        }
        return m;
    }

    private double[] fields(double[] g) {
        return fields(g, 0, radii.length - 1);
    }

    /** The surface field under rings lo..hi (index 0 is ring lo). */
    private double[] fields(double[] g, int lo, int hi) {
        int nodes = k.length;
        double[] out = new double[hi - lo + 1];
        for (int j = lo; j <= hi; j++) {
            double re = 0;
            double im = 0;
            double[] ff = fieldWeights[j];
            for (int q = 0; q < k.length; q++) {
                double f = ff[q];
                re += f * (1 - g[q]);
                im -= f * g[nodes + q];
            }
            out[j - lo] = 0.5 * Math.hypot(re, im);
        }
        return out;
    }

    /** Γ(α) at every node: the real parts, then the imaginary parts. */
    private double[] reflection(double omega, double conductivity, double muR, double thickness) {
        if (!(omega > 0) || Double.isInfinite(omega)) {
            throw new IllegalArgumentException("angular frequency " + omega + " rad/s must be a finite number above zero");
        }
        if (!(conductivity >= 0)) {
            throw new IllegalArgumentException("plate conductivity " + conductivity + " S/m must be zero or more");
        }
        HeatingInputs.atLeastOne("plate relative permeability", muR);
        if (!(thickness > 0)) {
            throw new IllegalArgumentException("plate thickness " + thickness + " m must be above zero");
        }
        int nodes = k.length;
        double[] g = new double[2 * nodes]; // real parts, then imaginary parts
        if (Double.isInfinite(conductivity)) {
            for (int q = 0; q < k.length; q++) {
                g[q] = -1;
            }
            return g;
        }
        double kk = omega * Constants.MU0 * muR * conductivity; // imaginary part of α1²
        boolean halfSpace = Double.isInfinite(thickness);
        int n = k.length;
        double[] rootRe = new double[n];
        double[] rootIm = new double[n];
        // First the half-space reflection at every node, in a loop without branches (the compiler can
        // run it on several nodes at once); then the slab's second face where it still shows.
        for (int q = 0; q < n; q++) {
            double a = k[q];
            // α1 = √(a² + j·kk), principal root (real part > 0)
            double x = a * a;
            double mod = Math.sqrt(x * x + kk * kk); // no overflow: x ≤ 1e12, kk ≤ 1e20 for any plate and frequency here
            double ar = Math.sqrt(0.5 * (mod + x));
            double ai = kk / (2 * ar); // 0 when kk = 0 (ar > 0 since a > 0)
            // r = (µ a − α1)/(µ a + α1)
            double nr = muR * a - ar;
            double dr = muR * a + ar;
            double dd = dr * dr + ai * ai;
            g[q] = (nr * dr - ai * ai) / dd;          // (nr − j ai)(dr − j ai)/|dr + j ai|²
            g[nodes + q] = (-ai * dr - nr * ai) / dd;
            rootRe[q] = ar;
            rootIm[q] = ai;
        }
        if (halfSpace) {
            return g;
        }
        for (int q = 0; q < n; q++) {
            double ar = rootRe[q];
            // e = exp(−2 α1 t); below e^-40 < 1e-17 the slab is a half-space to double precision
            if (2 * ar * thickness > 40) {
                continue;
            }
            double ai = rootIm[q];
            double rr = g[q];
            double ri = g[nodes + q];
            double mag = Math.exp(-2 * ar * thickness);
            double er = mag * Math.cos(-2 * ai * thickness);
            double ei = mag * Math.sin(-2 * ai * thickness);
            // numerator r(1 − e), denominator 1 − r² e
            double oneMinusEr = 1 - er;
            double numR = rr * oneMinusEr + ri * ei;
            double numI = ri * oneMinusEr - rr * ei;
            double r2r = rr * rr - ri * ri;
            double r2i = 2 * rr * ri;
            double denR = 1 - (r2r * er - r2i * ei);
            double denI = -(r2r * ei + r2i * er);
            double den = denR * denR + denI * denI;
            g[q] = (numR * denR + numI * denI) / den;
            g[nodes + q] = (numI * denR - numR * denI) / den;
        }
        return g;
    }

    /**
     * The coil over its plate at a frequency and rms coil current, µr made consistent with the surface
     * field: the representative field is the rms tangential field at the plate surface at the ring radius
     * where it is largest (µr from the B–H curve at its peak, √2 times the rms), as for a bar's surface field.
     */
    public LoadedPlateCoil load(FlatWorkCoil coil, PlateGeometry plate, WorkpieceMedium medium, double frequency,
                                double coilCurrent) {
        return load(coil, plate, medium, frequency, coilCurrent, Double.NaN);
    }

    /**
     * As {@link #load(FlatWorkCoil, PlateGeometry, WorkpieceMedium, double, double)}, with the µr of a
     * nearby solution ({@code muHint}, NaN for none) to start the iteration from: the root is bracketed
     * around it first (widened until the sign changes), which saves evaluations when an outer
     * iteration calls again with a slightly different current or frequency. The result is the same root.
     */
    public LoadedPlateCoil load(FlatWorkCoil coil, PlateGeometry plate, WorkpieceMedium medium, double frequency,
                                double coilCurrent, double muHint) {
        HeatingInputs.positive("frequency", frequency, "Hz");
        HeatingInputs.nonNegative("coil current", coilCurrent, "A");
        double omega = 2 * Math.PI * frequency;
        double rho = medium.resistivity();
        double sigma = 1 / rho;
        double t = plate.thickness();
        double mu;
        int[] count = new int[1];
        double[] g;
        double peak;
        if (medium.fieldDependent()) {
            // The iteration needs only the largest field: look at the few rings around where it lies
            // (from a first full look), then check at the root that it has not moved out of them.
            int n = radii.length;
            double start = muHint >= 1 && muHint <= MU_MAX ? muHint : 1.0;
            double[] g0 = reflection(omega, sigma, start, t);
            int j = argMax(fields(g0, 0, n - 1));
            int lo = Math.max(0, j - 2);
            int hi = Math.min(n - 1, j + 2);
            Reflections known = new Reflections(Math.log(start), g0);
            mu = solveMu(medium, omega, sigma, t, coilCurrent, muHint, lo, hi, count, known);
            g = reflection(omega, sigma, mu, t);
            double[] all = fields(g, 0, n - 1);
            int jf = argMax(all);
            if (jf < lo || jf > hi) {
                mu = solveMu(medium, omega, sigma, t, coilCurrent, muHint, 0, n - 1, count, known);
                g = reflection(omega, sigma, mu, t);
                all = fields(g, 0, n - 1);
                jf = argMax(all);
            }
            peak = all[jf];
        } else {
            mu = medium.relativePermeability(SQRT2 * coilCurrent * peakSurfaceField(omega, sigma, 1.0, t));
            g = reflection(omega, sigma, mu, t);
            peak = 0;
            for (double v : fields(g)) {
                peak = Math.max(peak, v);
            }
        }
        int evaluations = count[0];
        Complex dz = impedanceChange(omega, g); // Γ at the final µr, computed above
        double delta = ReferenceDepth.of(rho, frequency, mu);
        return new LoadedPlateCoil(frequency, coilCurrent, coil.emptyInductance(),
                coil.emptyInductance() + dz.getImaginary() / omega, dz.getReal(), coil.resistance(), peak * coilCurrent,
                mu, rho, delta, t, evaluations, provenance(coil, plate, medium, delta));
    }

    /**
     * µr made consistent with the largest surface field under rings lo..hi: the root of
     * h(ln µ) = ln µ − ln µr(√2·I·H(µ)), from the hint by the secant method when one is given, else (or
     * when that fails) by Brent's method over the whole range, where h(0) ≤ 0 < h(ln MU_MAX).
     */
    private double solveMu(WorkpieceMedium medium, double omega, double sigma, double t, double coilCurrent,
                           double muHint, int lo, int hi, int[] count, Reflections known) {
        UnivariateFunction h = lnMu -> {
            count[0]++;
            double[] g = lnMu == known.lnMu() ? known.gamma() : reflection(omega, sigma, Math.exp(lnMu), t);
            double[] f = fields(g, lo, hi);
            double field = coilCurrent * f[argMax(f)];
            return lnMu - Math.log(medium.relativePermeability(SQRT2 * field));
        };
        double lnMu = Double.NaN;
        if (muHint >= 1 && muHint <= MU_MAX) {
            lnMu = secantFrom(h, Math.log(muHint), Math.log(MU_MAX));
        }
        if (Double.isNaN(lnMu)) {
            lnMu = new BrentSolver(1e-12, 1e-10).solve(200, h, 0.0, Math.log(MU_MAX));
        }
        return Math.exp(lnMu);
    }

    /** Γ already computed at one ln µ (the start of the iteration), so that it is not computed twice. */
    private record Reflections(double lnMu, double[] gamma) {
    }

    private static int argMax(double[] v) {
        int j = 0;
        for (int i = 1; i < v.length; i++) {
            if (v[i] > v[j]) {
                j = i;
            }
        }
        return j;
    }

    /**
     * The root of {@code h} by the secant method from {@code x0} (and x0 + 0.002), to 1e-10 in ln µ as
     * Brent's method is asked for; NaN when it leaves [0, max] or has not converged in a few steps
     * (the caller then brackets the whole range).
     */
    private static double secantFrom(UnivariateFunction h, double x0, double max) {
        double xa = x0;
        double fa = h.value(xa);
        double xb = Math.min(max, x0 + 0.002);
        if (xb == xa) {
            xb = x0 - 0.002;
        }
        double fb = h.value(xb);
        for (int i = 0; i < 8; i++) {
            if (fb == fa) {
                return Double.NaN;
            }
            double xc = xb - fb * (xb - xa) / (fb - fa);
            if (!(xc >= 0 && xc <= max)) {
                return Double.NaN;
            }
            if (Math.abs(xc - xb) <= 1e-10) {
                return xc;
            }
            xa = xb;
            fa = fb;
            xb = xc;
            fb = h.value(xb);
        }
        return Double.NaN;
    }

    /** One-shot convenience: builds the table and loads the coil. */
    public static LoadedPlateCoil onPlate(FlatWorkCoil coil, PlateGeometry plate, WorkpieceMedium medium,
                                          double frequency, double coilCurrent) {
        return of(coil, plate).load(coil, plate, medium, frequency, coilCurrent);
    }

    private Provenance provenance(FlatWorkCoil coil, PlateGeometry plate, WorkpieceMedium medium, double delta) {
        List<String> notes = new ArrayList<>();
        boolean valid = true;
        double hMax = 0;
        for (double h : heights) {
            hMax = Math.max(hMax, h);
        }
        double overhang = plate.radius() - coil.outerRadius();
        notes.add("plate idealised as infinite in radius and uniform (µr and ρ at their surface values); each turn a"
                + " ring at its conductor's centre");
        if (overhang < OVERHANG_HEIGHTS * hMax) {
            valid = false;
            notes.add("the plate extends only " + Quantities.format(overhang, Dimension.LENGTH, 3) + " beyond the coil,"
                    + " less than " + (int) OVERHANG_HEIGHTS + " ring heights (" + Quantities.format(OVERHANG_HEIGHTS * hMax,
                    Dimension.LENGTH, 3) + "): the infinite-plate model overstates the load; the edge heats differently");
        }
        String range = medium.rangeWarning();
        if (range != null) {
            valid = false;
            notes.add(range);
        }
        if (medium.fieldDependent()) {
            notes.add("µr from the material's B–H curve at the peak tangential field on the plate surface (under the"
                    + " turn where it is largest), one µr for the whole plate (linear theory)");
        }
        if (plate.thickness() < 2 * delta) {
            notes.add("plate thinner than two reference depths (" + Quantities.format(delta, Dimension.LENGTH, 3)
                    + "): part of the field passes through it, so less power per ampere");
        }
        return new Provenance(MODEL, SOURCE, valid, notes);
    }
}
