package org.tankwright.coupling;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.IntStream;

/**
 * Sweeps of a link's coupling against gap and lateral offset, the coupling null, and the coupling
 * range over a misalignment envelope.
 */
public final class CouplingSweep {
    private CouplingSweep() {
    }

    /** M, k, L_a, L_b at each gap (conductor to conductor) with b offset by (dx, dy). */
    public static List<CouplingResult> overGap(CoupledCoils link, double[] gaps, double dx, double dy) {
        List<CouplingResult> out = new ArrayList<>(gaps.length);
        for (double g : gaps) {
            out.add(link.atGap(g, dx, dy));
        }
        return out;
    }

    /** M, k, L_a, L_b at each offset along the direction {@code angle} (radians from x) at one gap. */
    public static List<CouplingResult> overOffset(CoupledCoils link, double gap, double[] offsets, double angle) {
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        List<CouplingResult> out = new ArrayList<>(offsets.length);
        for (double o : offsets) {
            out.add(link.atGap(gap, o * c, o * s));
        }
        return out;
    }

    /**
     * A gap × offset map (offset along x), computed in parallel on the common pool: result[i][j] is
     * the coupling at gaps[i], offsets[j].
     */
    public static CouplingResult[][] map(CoupledCoils link, double[] gaps, double[] offsets) {
        CouplingResult[][] out = new CouplingResult[gaps.length][offsets.length];
        IntStream.range(0, gaps.length * offsets.length).parallel().forEach(idx -> {
            int i = idx / offsets.length;
            int j = idx % offsets.length;
            out[i][j] = link.atGap(gaps[i], offsets[j], 0);
        });
        return out;
    }

    /** n values evenly spaced from lo to hi inclusive (one value when n = 1). */
    public static double[] linspace(double lo, double hi, int n) {
        if (n < 1) {
            throw new IllegalArgumentException("number of sweep points must be ≥ 1, got " + n);
        }
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = n == 1 ? lo : lo + (hi - lo) * i / (n - 1);
        }
        return v;
    }

    /**
     * The smallest lateral offset (along {@code angle}) at which M changes sign, searched up to
     * {@code maxOffset}: M is scanned on a step of 1/64 of the coils' radius sum to bracket the first
     * sign change, then the root is refined by Brent's method to 1e-7 of the radius sum.
     * Empty when M keeps its sign up to maxOffset.
     */
    public static OptionalDouble nullOffset(CoupledCoils link, double gap, double angle, double maxOffset) {
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        double scale = link.radiusSum();
        double step = scale / 64;
        double prevX = 0;
        double prevM = link.atGap(gap, 0, 0).mutual();
        for (double x = step; x <= maxOffset + 1e-12 * scale; x = Math.min(x + step, maxOffset + step)) {
            double xx = Math.min(x, maxOffset);
            double m = link.atGap(gap, xx * c, xx * s).mutual();
            if (m == 0) {
                return OptionalDouble.of(xx);
            }
            if (Math.signum(m) != Math.signum(prevM)) {
                BrentSolver solver = new BrentSolver(1e-7 * scale);
                double root = solver.solve(200, o -> link.atGap(gap, o * c, o * s).mutual(), prevX, xx);
                return OptionalDouble.of(root);
            }
            prevX = xx;
            prevM = m;
            if (xx >= maxOffset) {
                break;
            }
        }
        return OptionalDouble.empty();
    }

    /**
     * The extremes of k a link sees over its misalignment envelope: gap in [gapMin, gapMax] and lateral
     * offset of magnitude up to offsetMax in any direction. The envelope's interior is searched, not
     * only its corners: a grid (gap × offset × direction; one direction for round centred coils), then
     * a compass search from the best grid point of each extreme, kept inside the envelope.
     */
    public static CouplingRange range(CoupledCoils link, double gapMin, double gapMax, double offsetMax) {
        if (!(gapMin >= 0 && gapMax >= gapMin && offsetMax >= 0) || !Double.isFinite(gapMax + offsetMax)) {
            throw new IllegalArgumentException(String.format(
                    "envelope must have 0 ≤ gap min ≤ gap max and offset max ≥ 0, got gap %g..%g m, offset %g m", gapMin, gapMax, offsetMax));
        }
        int ng = gapMax > gapMin ? 7 : 1;
        int no = offsetMax > 0 ? 9 : 1;
        int na = link.axisymmetric() || offsetMax == 0 ? 1 : 8;
        double[] gaps = linspace(gapMin, gapMax, ng);
        double[] offs = linspace(0, offsetMax, no);
        int total = ng * no * na;
        CouplingResult[] grid = new CouplingResult[total];
        IntStream.range(0, total).parallel().forEach(idx -> {
            int i = idx / (no * na);
            int j = (idx / na) % no;
            int t = idx % na;
            double ang = Math.PI * t / na; // directions over a half turn; the other half by symmetry of offsets ±
            grid[idx] = link.atGap(gaps[i], offs[j] * Math.cos(ang), offs[j] * Math.sin(ang));
        });
        CouplingResult lo = grid[0];
        CouplingResult hi = grid[0];
        for (CouplingResult r : grid) {
            if (r.k() < lo.k()) {
                lo = r;
            }
            if (r.k() > hi.k()) {
                hi = r;
            }
        }
        double[] box = {gapMin, gapMax, offsetMax};
        CouplingResult min = refine(link, lo, box, -1, ng, no, na);
        CouplingResult max = refine(link, hi, box, +1, ng, no, na);
        return new CouplingRange(gapMin, gapMax, offsetMax, min, max, total);
    }

    /** Compass search on (gap, offset radius, direction) that improves sign·k and stays in the envelope. */
    private static CouplingResult refine(CoupledCoils link, CouplingResult start, double[] box, int sign, int ng, int no, int na) {
        double[] x = {start.gap(), start.offset(), Math.atan2(start.offsetY(), start.offsetX())};
        double[] step = {(box[1] - box[0]) / Math.max(1, ng - 1) / 2, box[2] / Math.max(1, no - 1) / 2, Math.PI / na / 2};
        double[] floor = {1e-6 * (box[1] - box[0]), 1e-6 * box[2], 1e-6};
        CouplingResult best = start;
        for (int iter = 0; iter < 200; iter++) {
            boolean moved = false;
            for (int d = 0; d < 3; d++) {
                if (step[d] <= floor[d] || (d == 2 && (na == 1 || x[1] == 0))) {
                    continue;
                }
                for (int dir = -1; dir <= 1; dir += 2) {
                    double[] y = x.clone();
                    y[d] += dir * step[d];
                    y[0] = Math.max(box[0], Math.min(box[1], y[0]));
                    y[1] = Math.max(0, Math.min(box[2], y[1]));
                    CouplingResult r = link.atGap(y[0], y[1] * Math.cos(y[2]), y[1] * Math.sin(y[2]));
                    if (sign * r.k() > sign * best.k()) {
                        best = r;
                        x = y;
                        moved = true;
                        break;
                    }
                }
            }
            if (!moved) {
                boolean any = false;
                for (int d = 0; d < 3; d++) {
                    step[d] *= 0.5;
                    any |= step[d] > floor[d];
                }
                if (!any) {
                    break;
                }
            }
        }
        return best;
    }
}
