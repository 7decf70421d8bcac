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
    private static final double DECAY = 40;
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
    private final double[][] j1;

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
        j1 = new double[radii.length][n];
        for (int i = 0; i < radii.length; i++) {
            for (int q = 0; q < n; q++) {
                double v = BesselJ1.of(k[q] * radii[i]);
                j1[i][q] = v;
                s[q] += radii[i] * v * Math.exp(-k[q] * heights[i]);
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
        double[] g = reflection(omega, conductivity, muR, thickness);
        double re = 0;
        double im = 0;
        for (int q = 0; q < k.length; q++) {
            double f = w[q] * s[q] * s[q];
            re += f * g[2 * q];
            im += f * g[2 * q + 1];
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
        double[] out = new double[radii.length];
        for (int j = 0; j < radii.length; j++) {
            double re = 0;
            double im = 0;
            double[] jj = j1[j];
            for (int q = 0; q < k.length; q++) {
                double f = w[q] * k[q] * jj[q] * s[q];
                re += f * (1 - g[2 * q]);
                im -= f * g[2 * q + 1];
            }
            out[j] = 0.5 * Math.hypot(re, im);
        }
        return out;
    }

    /** Γ(α) at every node, interleaved (re, im). */
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
        double[] g = new double[2 * k.length];
        if (Double.isInfinite(conductivity)) {
            for (int q = 0; q < k.length; q++) {
                g[2 * q] = -1;
            }
            return g;
        }
        double kk = omega * Constants.MU0 * muR * conductivity; // imaginary part of α1²
        boolean halfSpace = Double.isInfinite(thickness);
        for (int q = 0; q < k.length; q++) {
            double a = k[q];
            // α1 = √(a² + j·kk), principal root (real part > 0)
            double x = a * a;
            double mod = Math.sqrt(x * x + kk * kk); // no overflow: x ≤ 1e12, kk ≤ 1e20 for any plate and frequency here
            double ar = Math.sqrt(0.5 * (mod + x));
            double ai = kk == 0 ? 0 : kk / (2 * ar);
            // r = (µ a − α1)/(µ a + α1)
            double nr = muR * a - ar;
            double dr = muR * a + ar;
            double dd = dr * dr + ai * ai;
            double rr = (nr * dr - ai * ai) / dd;          // (nr − j ai)(dr − j ai)/|dr + j ai|²
            double ri = (-ai * dr - nr * ai) / dd;
            // e = exp(−2 α1 t); below 1e-17 the slab is a half-space to double precision
            double mag = halfSpace ? 0 : Math.exp(-2 * ar * thickness);
            if (mag < 1e-17) {
                g[2 * q] = rr;
                g[2 * q + 1] = ri;
                continue;
            }
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
            g[2 * q] = (numR * denR + numI * denI) / den;
            g[2 * q + 1] = (numI * denR - numR * denI) / den;
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
        HeatingInputs.positive("frequency", frequency, "Hz");
        HeatingInputs.nonNegative("coil current", coilCurrent, "A");
        double omega = 2 * Math.PI * frequency;
        double rho = medium.resistivity();
        double sigma = 1 / rho;
        double t = plate.thickness();
        double mu;
        int evaluations = 0;
        if (medium.fieldDependent()) {
            int[] count = new int[1];
            UnivariateFunction h = lnMu -> {
                count[0]++;
                double field = coilCurrent * peakSurfaceField(omega, sigma, Math.exp(lnMu), t);
                return lnMu - Math.log(medium.relativePermeability(SQRT2 * field));
            };
            mu = Math.exp(new BrentSolver(1e-12, 1e-10).solve(200, h, 0.0, Math.log(MU_MAX)));
            evaluations = count[0];
        } else {
            mu = medium.relativePermeability(SQRT2 * coilCurrent * peakSurfaceField(omega, sigma, 1.0, t));
        }
        double[] g = reflection(omega, sigma, mu, t);
        double peak = 0;
        for (double v : fields(g)) {
            peak = Math.max(peak, v);
        }
        Complex dz = impedanceChange(omega, sigma, mu, t);
        double delta = ReferenceDepth.of(rho, frequency, mu);
        return new LoadedPlateCoil(frequency, coilCurrent, coil.emptyInductance(),
                coil.emptyInductance() + dz.getImaginary() / omega, dz.getReal(), coil.resistance(), peak * coilCurrent,
                mu, rho, delta, t, evaluations, provenance(coil, plate, medium, delta));
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
