package org.tankwright.magnetics;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.tankwright.materials.Conductor;
import org.tankwright.numerics.Kelvin;
import org.tankwright.units.Constants;

/**
 * Thin-skin AC resistance of an axisymmetric coil of round wire or tube, from the surface currents of its
 * turns (ours). Each turn is a ring of circular cross-section (radius a, centre (r_i, z_i)); in the thin-skin
 * limit the metal is field-free and its surface a flux surface, so the current lies in a sheet on the surface
 * and the flux linkage 2π r A_φ is the same at every point of one turn's surface.
 *
 * <p>Method (a boundary-element solution of that flux condition): each cross-section's circumference is cut
 * into M equal arcs, each a ring filament carrying an unknown current I_k. The flux at filament k is
 * Σ_l M_kl I_l with Maxwell's coaxial-ring kernel ({@link MutualKernels#coaxialRings}); for arcs close to each
 * other the kernel's logarithm is replaced by its mean over both arcs (the geometric mean distance, Grover
 * 1946), and an arc's own term is the thin ring µ0 r (ln(8r/g) − 2) at its own GMD g. Unknowns: the filament
 * currents and one flux per turn; equations: equal flux over each turn's filaments and the turn's total
 * current (1 A per turn in series). The currents of a z-mirror-symmetric coil are mirror-symmetric, which
 * halves the unknowns; the symmetric positive-definite system is solved by Cholesky.
 *
 * <p>Loss: P = R_s Σ_k |K_k|² · 2π r_k w_k with K_k = I_k/w_k the surface current density on arc k of width
 * w_k = 2πa/M and R_s = ρ/δ the surface resistance, so R = R_s·G with the geometry factor
 * G = Σ_k I_k² 2π r_k / w_k (frequency-independent). The inductance Σ_i Ψ_i of the same solution is the coil's
 * high-frequency (full skin effect) inductance.
 *
 * <p>Finite skin depth: G splits into the isolated wires' part G0 = Σ_i r_i/a (a uniform sheet on each turn)
 * and the rest (proximity, from the other turns' field and the ring's curvature). Each part is corrected by the
 * exact ratio of the isolated round conductor at the same a/δ: the skin part by R_Bessel/R_surface =
 * F(x)·2δ/a (F the exact Bessel ratio, x = √2a/δ), the proximity part by φ(x)/(2πa/δ), the exact
 * finite-δ over thin-skin loss of a round conductor in a uniform transverse field (Ferreira 1994, see
 * {@link WireLoss#proximityFactor}). Both tend to 1 as a/δ grows; with turns far apart the result then equals
 * the skin + uniform-field proximity model at any a/δ.
 */
public final class SurfaceCurrentResistance {
    /** Model name in results. */
    public static final String NAME = "surface-current";
    /** Source text for results. */
    public static final String SOURCE = "ours: thin-skin surface-current rings (each turn's surface a flux surface; "
            + "boundary-element solution with Maxwell's ring kernel and GMD near terms, Grover 1946), loss R_s·Σ|K|²·area, "
            + "each part corrected by the isolated round conductor's exact skin and proximity ratios";
    /** Smallest wire radius / skin depth for which the model is chosen (docs/models.md, measured). */
    public static final double MIN_RADIUS_OVER_DELTA = 3;
    /**
     * Smallest metal gap between turns / skin depth: the field squeezed between neighbouring turns must not
     * reach through their skin layers (the thin-skin loss grows without bound as the gap closes).
     */
    public static final double MIN_GAP_OVER_DELTA = 2;
    /** Gaps below this fraction of the wire radius count as touching turns (not solved). */
    static final double TOUCHING = 1e-3;
    /** Smallest tube wall / skin depth for which a tube is a solid surface. */
    public static final double MIN_WALL_OVER_DELTA = 3;
    /** Fewest and most arcs per cross-section. */
    static final int MIN_ARCS = 16;
    static final int MAX_ARCS = 40;
    /** Largest number of unknown currents solved (after the mirror symmetry). */
    static final int MAX_UNKNOWNS = 1200;
    /** Gauss-Legendre points per arc for the near-field log average. */
    private static final int NEAR_POINTS = 8;
    /** Arcs whose centres are closer than this many arc widths get the near-field average. */
    private static final double NEAR_WIDTHS = 3;

    private SurfaceCurrentResistance() {
    }

    /**
     * The solution for a set of coaxial turns.
     *
     * @param factor     G = Σ I_k² 2π r_k / w_k: thin-skin resistance over R_s (dimensionless)
     * @param isolated   G0 = Σ_i c_i² r_i / a: the same turns each alone (uniform sheet)
     * @param inductance Σ_i c_i Ψ_i, the thin-skin (high-frequency) inductance for turn currents c_i, H
     * @param arcs       arcs per cross-section used
     * @param gap        smallest distance between the metal surfaces of two turns, m (infinite for one turn)
     */
    public record Solution(double factor, double isolated, double inductance, int arcs, double gap) {
        /** Thin-skin resistance ratio to the isolated turns, G/G0. */
        public double ratio() {
            return factor / isolated;
        }
    }

    /**
     * Solves the surface currents of coaxial turns of round section radius {@code a}, centres (r[i], z[i]),
     * carrying total currents {@code current[i]} (1 for turns in series; −1 reverses a turn), with
     * {@code arcs} arcs per section (a multiple of 2, at least 8).
     *
     * @throws IllegalArgumentException when sections overlap or the input is not usable
     */
    public static Solution solve(double[] r, double[] z, double a, double[] current, int arcs) {
        int n = r.length;
        if (n == 0 || z.length != n || current.length != n || !(a > 0) || arcs < 8 || arcs % 2 != 0) {
            throw new IllegalArgumentException("surface-current solve: need matching turn arrays, a > 0 and an even "
                    + "number of arcs ≥ 8");
        }
        double gap = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            if (!(r[i] > a)) {
                throw new IllegalArgumentException("surface-current solve: turn " + i + " radius " + r[i]
                        + " m must exceed the wire radius " + a + " m");
            }
            for (int j = 0; j < i; j++) {
                double d = Math.hypot(r[i] - r[j], z[i] - z[j]);
                if (d < 2 * a * (1 + TOUCHING)) {
                    throw new IllegalArgumentException("surface-current solve: turns " + j + " and " + i
                            + " touch or overlap");
                }
                gap = Math.min(gap, d - 2 * a);
            }
        }
        return new Solver(r, z, a, current, arcs, gap).run();
    }

    /** True for the coils this model treats: round wire or tube wound as a solenoid, multilayer, flat spiral or loop. */
    static boolean treats(CoilGeometry g) {
        return !Double.isNaN(radius(g.conductor())) && !(g instanceof PolygonSpiral) && !(g instanceof RectangularSpiral);
    }

    /** Number of arcs for turns whose smallest surface gap is {@code gap}: finer for close turns. */
    static int arcsFor(double a, double gap, int turns) {
        double want = gap <= 0 ? MAX_ARCS : Math.PI * a / gap;
        int m = (int) Math.ceil(Math.max(MIN_ARCS, Math.min(MAX_ARCS, want)) / 4) * 4;
        while (m > MIN_ARCS && turns * m / 2 > MAX_UNKNOWNS) {
            m -= 4;
        }
        return m;
    }

    /** Outer radius of a round conductor's metal, or NaN for conductors this model does not treat. */
    static double radius(Conductor c) {
        if (c instanceof Conductor.RoundWire w) {
            return 0.5 * w.diameter();
        }
        if (c instanceof Conductor.Tube t) {
            return 0.5 * t.outerDiameter();
        }
        return Double.NaN;
    }

    /**
     * The thin-skin solution of a coil, or null when the model does not apply to it (litz, traces, polygon
     * spirals) or the coil has too many turns for the solve.
     */
    static Solution of(CoilGeometry g) {
        if (!treats(g)) {
            return null;
        }
        double a = radius(g.conductor());
        var filaments = g.filaments();
        int n = filaments.size();
        if (n * MIN_ARCS / 2 > MAX_UNKNOWNS) {
            return null;
        }
        double[] r = new double[n];
        double[] z = new double[n];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            Ring ring = (Ring) filaments.get(i);
            r[i] = ring.radius();
            z[i] = ring.z();
            c[i] = 1;
        }
        double gap = Double.MAX_VALUE;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < i; j++) {
                gap = Math.min(gap, Math.hypot(r[i] - r[j], z[i] - z[j]) - 2 * a);
            }
        }
        if (gap < TOUCHING * 2 * a) {
            return null;
        }
        try {
            return solve(r, z, a, c, arcsFor(a, gap, n));
        } catch (IllegalStateException e) {
            return null; // not positive definite: turns too close for the arcs (not met in the tests)
        }
    }

    /**
     * AC resistance from a thin-skin solution at a skin depth: R_s[G0·F(x)·2δ/a + (G − G0)·φ(x)/(2πa/δ)].
     */
    static double resistance(Solution s, double a, double resistivity, double delta) {
        double x = Math.sqrt(2) * a / delta;
        double skin = Kelvin.skinResistanceRatio(x) * 2 * delta / a;
        double proximity = WireLoss.proximityFactor(x) / (2 * Math.PI * a / delta);
        return resistivity / delta * (s.isolated() * skin + (s.factor() - s.isolated()) * proximity);
    }

    /** The isolated turns' part of {@link #resistance}: R_s·G0·F(x)·2δ/a, Ω (the skin part of the split shown). */
    static double skinPart(Solution s, double a, double resistivity, double delta) {
        return resistivity / delta * s.isolated() * Kelvin.skinResistanceRatio(Math.sqrt(2) * a / delta) * 2 * delta / a;
    }

    /**
     * The model's estimate at a skin depth, with its verdict; null when the coil is not one it treats.
     *
     * @param s the coil's thin-skin solution (null when none)
     */
    static ResistanceEstimate estimate(CoilGeometry g, Solution s, double resistivity, double delta) {
        if (!treats(g)) {
            return null;
        }
        Conductor c = g.conductor();
        double a = radius(c);
        if (s == null) {
            return new ResistanceEstimate(NAME, Double.NaN, SOURCE, false, g.turns() * MIN_ARCS / 2 > MAX_UNKNOWNS
                    ? String.format(Locale.ROOT, "not computed: %d turns exceed the solve's size (%d unknown currents "
                            + "at %d arcs per turn)", g.turns(), MAX_UNKNOWNS, MIN_ARCS)
                    : "not computed: neighbouring turns touch (no gap between their metal surfaces)");
        }
        double aOverDelta = a / delta;
        String note = String.format(Locale.ROOT, "valid for wire radius ≥ %.0f skin depths (here %.3g), gap between "
                + "turns ≥ %.0f skin depths (here %s)%s; thin-skin ratio to isolated turns %.3g, %d arcs per turn; "
                + "high-frequency inductance %s",
                MIN_RADIUS_OVER_DELTA, aOverDelta, MIN_GAP_OVER_DELTA,
                Double.isInfinite(s.gap()) ? "one turn" : String.format(Locale.ROOT, "%.3g", s.gap() / delta),
                c instanceof Conductor.Tube t ? String.format(Locale.ROOT, ", tube wall ≥ %.0f skin depths (here %.3g)",
                        MIN_WALL_OVER_DELTA, t.wall() / delta) : "",
                s.ratio(), s.arcs(), org.tankwright.units.Quantities.format(s.inductance(), org.tankwright.units.Dimension.INDUCTANCE, 4));
        return new ResistanceEstimate(NAME, resistance(s, a, resistivity, delta), SOURCE, valid(c, s, delta), note);
    }

    /** True when a solved coil lies inside the model's validity at skin depth {@code delta}. */
    static boolean valid(Conductor c, Solution s, double delta) {
        return s != null && radius(c) >= MIN_RADIUS_OVER_DELTA * delta && s.gap() >= MIN_GAP_OVER_DELTA * delta
                && (!(c instanceof Conductor.Tube t) || t.wall() >= MIN_WALL_OVER_DELTA * delta);
    }

    /** One solve: filaments, the mirror reduction, the system and its solution. */
    private static final class Solver {
        private final double[] r;
        private final double[] z;
        private final double a;
        private final double[] current;
        private final int m;
        private final double width;
        /** Mean of ln(distance/a) between arcs k apart on one section, and ln(chord/a) between their centres. */
        private final double[] sameMean;
        private final double[] sameCentre;
        private final Map<BlockKey, double[]> blocks = new HashMap<>();

        private final double gap;

        Solver(double[] r, double[] z, double a, double[] current, int m, double gap) {
            this.gap = gap;
            this.r = r;
            this.z = z;
            this.a = a;
            this.current = current;
            this.m = m;
            double step = 2 * Math.PI / m;
            this.width = a * step;
            this.sameMean = new double[m / 2 + 1];
            this.sameCentre = new double[m / 2 + 1];
            for (int k = 0; k <= m / 2; k++) {
                sameMean[k] = meanLogOnCircle(k, step);
                sameCentre[k] = k == 0 ? 0 : Math.log(2 * Math.sin(0.5 * k * step));
            }
        }

        Solution run() {
            int n = r.length;
            int[] mirror = mirrorTurns();
            // representative turns: all when not symmetric; else i ≤ mirror(i)
            boolean sym = mirror != null;
            int[] repTurn = new int[n];
            int reps = 0;
            for (int i = 0; i < n; i++) {
                if (!sym || i <= mirror[i]) {
                    repTurn[reps++] = i;
                }
            }
            // unknowns: (turn, arc) pairs; a self-mirrored turn keeps the arcs of its upper half (sin θ > 0)
            int[] unTurn = new int[reps * m];
            int[] unArc = new int[reps * m];
            int[] unRep = new int[reps * m];
            int count = 0;
            for (int t = 0; t < reps; t++) {
                int i = repTurn[t];
                boolean self = sym && mirror[i] == i;
                for (int k = 0; k < (self ? m / 2 : m); k++) {
                    unTurn[count] = i;
                    unArc[count] = k;
                    unRep[count] = t;
                    count++;
                }
            }
            int[] offset = new int[reps + 1];
            for (int t = 0; t < reps; t++) {
                int i = repTurn[t];
                offset[t + 1] = offset[t] + (sym && mirror[i] == i ? m / 2 : m);
            }
            double[] mat = new double[count * count];
            for (int s = 0; s < reps; s++) {
                int i = repTurn[s];
                for (int t = 0; t <= s; t++) {
                    int j = repTurn[t];
                    double[] direct = block(i, j);
                    double[] mirrored = sym ? block(i, mirror[j]) : null;
                    for (int k = 0; k < offset[s + 1] - offset[s]; k++) {
                        int p = offset[s] + k;
                        for (int l = 0; l < offset[t + 1] - offset[t]; l++) {
                            int q = offset[t] + l;
                            double v = direct[k * m + l];
                            if (mirrored != null) {
                                v += mirrored[k * m + mirrorArc(l)];
                            }
                            mat[p * count + q] = v;
                            mat[q * count + p] = v;
                        }
                    }
                }
            }
            if (!cholesky(mat, count)) {
                throw new IllegalStateException("surface-current system is not positive definite");
            }
            // X = A⁻¹ B, B the indicator of each representative turn
            double[][] x = new double[reps][];
            for (int t = 0; t < reps; t++) {
                double[] b = new double[count];
                for (int p = 0; p < count; p++) {
                    b[p] = unRep[p] == t ? 1 : 0;
                }
                choleskySolve(mat, count, b);
                x[t] = b;
            }
            // flux per representative turn from the current constraints
            double[] cm = new double[reps * reps];
            double[] target = new double[reps];
            for (int s = 0; s < reps; s++) {
                int i = repTurn[s];
                target[s] = current[i] * (sym && mirror[i] == i ? 0.5 : 1);
                for (int t = 0; t < reps; t++) {
                    double sum = 0;
                    for (int p = 0; p < count; p++) {
                        if (unRep[p] == s) {
                            sum += x[t][p];
                        }
                    }
                    cm[s * reps + t] = sum;
                }
            }
            double[] flux = gauss(cm, target, reps);
            double factor = 0;
            for (int p = 0; p < count; p++) {
                double ip = 0;
                for (int t = 0; t < reps; t++) {
                    ip += x[t][p] * flux[t];
                }
                factor += ip * ip * 2 * Math.PI * arcRadius(unTurn[p], unArc[p]) / width;
            }
            double inductance = 0;
            double isolated = 0;
            for (int t = 0; t < reps; t++) {
                int i = repTurn[t];
                inductance += (sym && mirror[i] != i ? 2 : 1) * current[i] * flux[t];
            }
            for (int i = 0; i < n; i++) {
                isolated += current[i] * current[i] * r[i] / a;
            }
            return new Solution(sym ? 2 * factor : factor, isolated, inductance, m, gap);
        }

        /** Turn each turn maps to under z → −z, or null when the coil is not mirror-symmetric. */
        private int[] mirrorTurns() {
            int n = r.length;
            int[] mirror = new int[n];
            double tol = 1e-9 * a;
            for (int i = 0; i < n; i++) {
                mirror[i] = -1;
                for (int j = 0; j < n; j++) {
                    if (Math.abs(r[j] - r[i]) < tol && Math.abs(z[j] + z[i]) < tol && current[j] == current[i]) {
                        mirror[i] = j;
                        break;
                    }
                }
                if (mirror[i] < 0) {
                    return null;
                }
            }
            return mirror;
        }

        /** Arc k sits at angle (k + ½)·2π/M from the outward radial direction; its mirror is M − 1 − k. */
        private int mirrorArc(int k) {
            return m - 1 - k;
        }

        private double angle(int k) {
            return (k + 0.5) * 2 * Math.PI / m;
        }

        private double arcRadius(int i, int k) {
            return r[i] + a * Math.cos(angle(k));
        }

        private double arcZ(int i, int k) {
            return z[i] + a * Math.sin(angle(k));
        }

        /**
         * The M×M block of kernel values between the arcs of turns i and j (row: arc of i). It depends only on
         * r_i, r_j and z_i − z_j, so a uniform column of turns computes each separation once.
         */
        private double[] block(int i, int j) {
            BlockKey key = key(i, j);
            double[] b = blocks.get(key);
            if (b == null) {
                b = i == j ? selfBlock(i) : pairBlock(i, j);
                blocks.put(key, b);
            }
            return b;
        }

        /** Block key: the two radii and the separation, on a grid of 1e-9 wire radii. */
        private record BlockKey(long r1, long r2, long dz) {
        }

        private BlockKey key(int i, int j) {
            double unit = 1e-9 * a;
            return new BlockKey(Math.round(r[i] / unit), Math.round(r[j] / unit), Math.round((z[i] - z[j]) / unit));
        }

        private double[] selfBlock(int i) {
            double[] b = new double[m * m];
            for (int k = 0; k < m; k++) {
                double rk = arcRadius(i, k);
                b[k * m + k] = Constants.MU0 * rk * (Math.log(8 * rk / a) - sameMean[0] - 2);
                for (int l = 0; l < k; l++) {
                    double rl = arcRadius(i, l);
                    int sep = Math.min(k - l, m - (k - l));
                    double v = ring(rk, rl, arcZ(i, k) - arcZ(i, l))
                            + Constants.MU0 * Math.sqrt(rk * rl) * (sameCentre[sep] - sameMean[sep]);
                    b[k * m + l] = v;
                    b[l * m + k] = v;
                }
            }
            return b;
        }

        private double[] pairBlock(int i, int j) {
            double[] b = new double[m * m];
            double near = NEAR_WIDTHS * width;
            for (int k = 0; k < m; k++) {
                double rk = arcRadius(i, k);
                double zk = arcZ(i, k);
                for (int l = 0; l < m; l++) {
                    double rl = arcRadius(j, l);
                    double zl = arcZ(j, l);
                    double v = ring(rk, rl, zk - zl);
                    double d = Math.hypot(rk - rl, zk - zl);
                    if (d < near) {
                        v += Constants.MU0 * Math.sqrt(rk * rl) * (Math.log(d) - meanLogBetween(i, k, j, l, d));
                    }
                    b[k * m + l] = v;
                }
            }
            return b;
        }

        /**
         * Mean of ln(distance) between arc k of turn i and arc l of turn j: Gauss-Legendre on both arcs, each cut
         * into sub-arcs no longer than about the arcs' distance so that the near-singular logarithm is resolved.
         */
        private double meanLogBetween(int i, int k, int j, int l, double d) {
            int parts = (int) Math.min(4, Math.ceil(width / Math.max(d, 1e-6 * width)));
            double sub = 2 * Math.PI / m / parts;
            double sum = 0;
            for (int pi = 0; pi < parts; pi++) {
                double c1 = angle(k) - Math.PI / m + (pi + 0.5) * sub;
                for (int p = 0; p < NEAR_POINTS; p++) {
                    double t1 = c1 + 0.5 * sub * GL_X[p];
                    double x1 = r[i] + a * Math.cos(t1);
                    double y1 = z[i] + a * Math.sin(t1);
                    for (int qi = 0; qi < parts; qi++) {
                        double c2 = angle(l) - Math.PI / m + (qi + 0.5) * sub;
                        for (int q = 0; q < NEAR_POINTS; q++) {
                            double t2 = c2 + 0.5 * sub * GL_X[q];
                            double dx = x1 - r[j] - a * Math.cos(t2);
                            double dy = y1 - z[j] - a * Math.sin(t2);
                            sum += GL_W[p] * GL_W[q] * 0.5 * Math.log(dx * dx + dy * dy);
                        }
                    }
                }
            }
            return sum / (4.0 * parts * parts);
        }
    }

    /**
     * Mean of ln(chord/a) between two arcs of angular width Δ whose centres are k·Δ apart on one circle:
     * (1/Δ²)∫∫ ln(2 sin(|α − β|/2)) dα dβ = (1/Δ²)∫ (Δ − |u − kΔ|) ln(2 sin(|u|/2)) du over |u − kΔ| < Δ.
     * The logarithmic singularity at u = 0 (k = 0, 1) is taken analytically: ln(2 sin(u/2)) = ln u +
     * ln(sin(u/2)/(u/2)), the second part smooth.
     */
    static double meanLogOnCircle(int k, double step) {
        double sum = 0;
        // integrate over u in [kΔ − Δ, kΔ + Δ] with weight (Δ − |u − kΔ|); split at kΔ (weight kink) and at 0
        double[][] pieces = {{k * step - step, k * step}, {k * step, k * step + step}};
        for (double[] piece : pieces) {
            double lo = piece[0];
            double hi = piece[1];
            if (lo < 0 && hi > 0) {
                sum += weightedLog(lo, 0, k, step) + weightedLog(0, hi, k, step);
            } else {
                sum += weightedLog(lo, hi, k, step);
            }
        }
        return sum / (step * step);
    }

    /** ∫ from lo to hi of (Δ − |u − kΔ|)·ln(2 sin(|u|/2)) du, lo and hi on one side of 0 and of kΔ. */
    private static double weightedLog(double lo, double hi, int k, double step) {
        // smooth part by Gauss-Legendre; ln|u| part by Gauss-Legendre after the substitution u = sign·s², which
        // removes the endpoint singularity at u = 0
        double sum = 0;
        double mid = 0.5 * (lo + hi);
        double half = 0.5 * (hi - lo);
        for (int p = 0; p < GL_X.length; p++) {
            double u = mid + half * GL_X[p];
            double au = Math.abs(u);
            double w = step - Math.abs(u - k * step);
            double smooth = au < 1e-12 ? 0 : Math.log(Math.sin(0.5 * au) / (0.5 * au));
            sum += GL_W[p] * half * w * smooth;
        }
        // ∫ w(u) ln|u| du; with u = lo + t(hi − lo) near whichever end is 0, use s = √|u| substitution
        double a0 = Math.abs(lo) < Math.abs(hi) ? lo : hi; // end nearer 0
        double a1 = a0 == lo ? hi : lo;
        double sign = Math.signum(a1 - a0);
        double len = Math.abs(a1 - a0);
        double root = Math.sqrt(len);
        double part = 0;
        for (int p = 0; p < GL_X.length; p++) {
            double s = 0.5 * root * (1 + GL_X[p]);
            double u = a0 + sign * s * s;
            double w = step - Math.abs(u - k * step);
            double au = Math.abs(u);
            part += GL_W[p] * 0.5 * root * 2 * s * w * (au == 0 ? 0 : Math.log(au));
        }
        return sum + part;
    }

    /** Maxwell's coaxial-ring mutual inductance with K and E from one arithmetic-geometric mean. */
    static double ring(double r1, double r2, double d) {
        double m = 4.0 * r1 * r2 / ((r1 + r2) * (r1 + r2) + d * d);
        if (m < 1e-3) {
            return MutualKernels.coaxialRings(r1, r2, d);
        }
        double[] ke = new double[2];
        Elliptic.kAndE(m, ke);
        double kk = ke[0];
        double ee = ke[1];
        double k = Math.sqrt(m);
        return Constants.MU0 * Math.sqrt(r1 * r2) * ((2.0 / k - k) * kk - 2.0 / k * ee);
    }

    /** In-place Cholesky (lower triangle) of a symmetric n×n row-major matrix; false when not positive definite. */
    static boolean cholesky(double[] a, int n) {
        for (int j = 0; j < n; j++) {
            int rj = j * n;
            double d = a[rj + j];
            for (int k = 0; k < j; k++) {
                d -= a[rj + k] * a[rj + k];
            }
            if (!(d > 0)) {
                return false;
            }
            d = Math.sqrt(d);
            a[rj + j] = d;
            for (int i = j + 1; i < n; i++) {
                int ri = i * n;
                double s = a[ri + j];
                for (int k = 0; k < j; k++) {
                    s -= a[ri + k] * a[rj + k];
                }
                a[ri + j] = s / d;
            }
        }
        return true;
    }

    /** Solves L Lᵀ x = b in place with the factor from {@link #cholesky}. */
    static void choleskySolve(double[] l, int n, double[] b) {
        for (int i = 0; i < n; i++) {
            double s = b[i];
            int ri = i * n;
            for (int k = 0; k < i; k++) {
                s -= l[ri + k] * b[k];
            }
            b[i] = s / l[ri + i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = b[i];
            for (int k = i + 1; k < n; k++) {
                s -= l[k * n + i] * b[k];
            }
            b[i] = s / l[i * n + i];
        }
    }

    /** Gaussian elimination with partial pivoting of a small dense system (row-major), returns x. */
    static double[] gauss(double[] a, double[] b, int n) {
        double[] x = b.clone();
        double[] m = a.clone();
        for (int c = 0; c < n; c++) {
            int piv = c;
            for (int i = c + 1; i < n; i++) {
                if (Math.abs(m[i * n + c]) > Math.abs(m[piv * n + c])) {
                    piv = i;
                }
            }
            if (piv != c) {
                for (int k = 0; k < n; k++) {
                    double t = m[c * n + k];
                    m[c * n + k] = m[piv * n + k];
                    m[piv * n + k] = t;
                }
                double t = x[c];
                x[c] = x[piv];
                x[piv] = t;
            }
            for (int i = c + 1; i < n; i++) {
                double f = m[i * n + c] / m[c * n + c];
                if (f != 0) {
                    for (int k = c; k < n; k++) {
                        m[i * n + k] -= f * m[c * n + k];
                    }
                    x[i] -= f * x[c];
                }
            }
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            for (int k = i + 1; k < n; k++) {
                s -= m[i * n + k] * x[k];
            }
            x[i] = s / m[i * n + i];
        }
        return x;
    }

    private static final double[] GL_X = MutualKernels.GL_X;
    private static final double[] GL_W = MutualKernels.GL_W;
}
