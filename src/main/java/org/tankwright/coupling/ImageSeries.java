package org.tankwright.coupling;

/**
 * The images of a source between two parallel mirror planes: plate A at z = zA below, plate B at
 * z = zB above (L = zB − zA), coefficients ηA, ηB (0 when a plate is absent). A source filament
 * at height z has images (Smythe §7.18 applied repeatedly; the method of images for parallel planes):
 * <pre>
 *   2zA − z − 2nL   weight ηA^(n+1) ηB^n   (mirrored)     n ≥ 0
 *   2zB − z + 2nL   weight ηB^(n+1) ηA^n   (mirrored)     n ≥ 0
 *   z ± 2nL         weight (ηA ηB)^n       (translated)   n ≥ 1
 * </pre>
 * A term is evaluated by the caller for (mirror, shift) where the image of a source point at local
 * height z_loc lies at (mirror ? −z_loc : z_loc) + shift. The series is summed order by order until an
 * order adds less than 1e-9 of the total, or, once the images are far (2nL above ten coil radii),
 * the rest is added from a three-term multipole fit to the last three orders (see {@link #tail}).
 */
final class ImageSeries {
    /** Orders beyond which the series is cut (with its tail estimate) and reported as truncated. */
    static final int MAX_ORDER = 300;

    /** One image: returns its contribution with the weight applied (the caller may also accumulate vectors). */
    interface Term {
        double value(boolean mirror, double shift, double weight);
    }

    /** The sum of all image terms, and how it ended. */
    record Sum(double value, int orders, boolean truncated) {
    }

    private ImageSeries() {
    }

    /**
     * Sums the images of a source whose local frame sits at z0 (its local heights are measured from z0).
     *
     * @param direct    the term without images (used only as the scale of the stopping test)
     * @param radiusSum sum of the two coils' outer radii (sets where the dipole tail begins)
     */
    static Sum sum(double zA, double etaA, double zB, double etaB, double z0, double direct, double radiusSum, Term t) {
        return sum(zA, etaA, zB, etaB, z0, direct, radiusSum, false, t);
    }

    /**
     * As {@link #sum(double, double, double, double, double, double, double, Term)}; {@code selfImages} when
     * the source sums with its own images (a coil's self term): its two translated images of an order then
     * contribute alike, M(a, a + s) = M(a − s, a) = M(a, a − s), and only one is evaluated.
     */
    static Sum sum(double zA, double etaA, double zB, double etaB, double z0, double direct, double radiusSum,
                   boolean selfImages, Term t) {
        double total = 0;
        if (etaA != 0) {
            total += t.value(true, 2 * zA - z0, etaA);
        }
        if (etaB != 0) {
            total += t.value(true, 2 * zB - z0, etaB);
        }
        double w2 = etaA * etaB;
        if (w2 == 0) {
            return new Sum(total, 0, false);
        }
        double l = zB - zA;
        double w = 1;
        double[] last = new double[3]; // the last three orders divided by (ηAηB)^n
        int n = 1;
        for (; n <= MAX_ORDER; n++) {
            w *= w2;
            double order = t.value(true, 2 * zA - z0 - 2 * n * l, etaA * w)
                    + t.value(true, 2 * zB - z0 + 2 * n * l, etaB * w)
                    + (selfImages ? 2 * t.value(false, z0 + 2 * n * l, w)
                    : t.value(false, z0 + 2 * n * l, w) + t.value(false, z0 - 2 * n * l, w));
            total += order;
            last[0] = last[1];
            last[1] = last[2];
            last[2] = order / w;
            if (Math.abs(order) <= 1e-9 * Math.abs(direct + total)) {
                return new Sum(total, n, false);
            }
            if (n >= 3 && 2 * n * l >= 10 * radiusSum) {
                return new Sum(total + tail(last, n, w2), n, false);
            }
        }
        n = MAX_ORDER;
        return new Sum(total + tail(last, n, w2), n, true);
    }

    /**
     * Far orders follow the multipole expansion c_n = (ηAηB)^n (α/n³ + β/n⁴ + γ/n⁵); α, β, γ are fitted
     * to the last three orders and the rest of the series is summed from the fit.
     */
    private static double tail(double[] last, int n, double w2) {
        double[][] m = new double[3][4];
        for (int r = 0; r < 3; r++) {
            double j = n - 2 + r;
            m[r][0] = 1 / (j * j * j);
            m[r][1] = m[r][0] / j;
            m[r][2] = m[r][1] / j;
            m[r][3] = last[r];
        }
        double[] c = solve3(m);
        double sum = 0;
        double w = Math.pow(w2, n);
        for (int j = n + 1; j < n + 1000000; j++) {
            w *= w2;
            double term = w * (c[0] / ((double) j * j * j) + c[1] / ((double) j * j * j * j) + c[2] / Math.pow(j, 5));
            sum += term;
            if (Math.abs(term) < 1e-13 * Math.abs(sum) || w == 0) {
                break;
            }
        }
        return sum;
    }

    private static double[] solve3(double[][] m) {
        for (int col = 0; col < 3; col++) {
            int piv = col;
            for (int r = col + 1; r < 3; r++) {
                if (Math.abs(m[r][col]) > Math.abs(m[piv][col])) {
                    piv = r;
                }
            }
            double[] t = m[col];
            m[col] = m[piv];
            m[piv] = t;
            for (int r = 0; r < 3; r++) {
                if (r != col) {
                    double f = m[r][col] / m[col][col];
                    for (int c = col; c < 4; c++) {
                        m[r][c] -= f * m[col][c];
                    }
                }
            }
        }
        return new double[] {m[0][3] / m[0][0], m[1][3] / m[1][1], m[2][3] / m[2][2]};
    }
}
