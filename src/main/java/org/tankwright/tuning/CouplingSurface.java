package org.tankwright.tuning;

/**
 * A coupling range over two axes, e.g. s = gap from its smallest to its largest value and
 * t = lateral offset from zero to its largest value, both in [0, 1]: a state (M, L1, L2) for
 * each pair. A caller with a coupling model passes a function; a builder with measurements passes
 * a table via {@link #table}.
 */
@FunctionalInterface
public interface CouplingSurface {
    CouplingPoint at(double s, double t);

    /**
     * Bilinear interpolation through a table of states: {@code points[i][j]} at s = i/(rows−1),
     * t = j/(columns−1). Rows must have equal length.
     */
    static CouplingSurface table(CouplingPoint[][] points) {
        int rows = points.length;
        if (rows == 0 || points[0].length == 0) {
            throw new IllegalArgumentException("a coupling table needs at least one point");
        }
        int cols = points[0].length;
        CouplingPoint[][] p = new CouplingPoint[rows][];
        for (int i = 0; i < rows; i++) {
            if (points[i].length != cols) {
                throw new IllegalArgumentException("coupling table row " + i + " has " + points[i].length
                        + " points; every row needs " + cols);
            }
            p[i] = points[i].clone();
        }
        return (s, t) -> {
            double x = rows == 1 ? 0 : Math.max(0, Math.min(1, s)) * (rows - 1);
            double y = cols == 1 ? 0 : Math.max(0, Math.min(1, t)) * (cols - 1);
            int i = Math.min((int) Math.floor(x), Math.max(0, rows - 2));
            int j = Math.min((int) Math.floor(y), Math.max(0, cols - 2));
            double a = rows == 1 ? 0 : x - i;
            double b = cols == 1 ? 0 : y - j;
            int i1 = Math.min(i + 1, rows - 1);
            int j1 = Math.min(j + 1, cols - 1);
            double w00 = (1 - a) * (1 - b);
            double w10 = a * (1 - b);
            double w01 = (1 - a) * b;
            double w11 = a * b;
            CouplingPoint q00 = p[i][j];
            CouplingPoint q10 = p[i1][j];
            CouplingPoint q01 = p[i][j1];
            CouplingPoint q11 = p[i1][j1];
            return new CouplingPoint(w00 * q00.m() + w10 * q10.m() + w01 * q01.m() + w11 * q11.m(),
                    w00 * q00.l1() + w10 * q10.l1() + w01 * q01.l1() + w11 * q11.l1(),
                    w00 * q00.l2() + w10 * q10.l2() + w01 * q01.l2() + w11 * q11.l2());
        };
    }
}
