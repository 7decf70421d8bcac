package org.tankwright.magnetics;

import org.tankwright.units.Constants;

/**
 * Closed-form inductance formulas of the trade, each with its source. SI units in and out; the
 * inch-and-microhenry formulas of Wheeler are converted exactly (1 in = 0.0254 m).
 */
public final class InductanceFormulas {
    /** Wheeler's formulas in µH with lengths in inches become H with lengths in m by this factor (1e-6/0.0254). */
    private static final double WHEELER = 1e-6 / 0.0254;

    private InductanceFormulas() {
    }

    /**
     * Wheeler single-layer: L[µH] = R²N²/(9R + 10ℓ), R mean radius and ℓ length in inches
     * (Wheeler, Proc. IRE 16(10), 1928). Stated accuracy 1 % for ℓ &gt; 0.8 R.
     */
    public static double wheelerSingleLayer(double radius, double length, int turns) {
        return WHEELER * radius * radius * turns * (double) turns / (9 * radius + 10 * length);
    }

    /**
     * Wheeler multilayer: L[µH] = 0.8 a²N²/(6a + 9b + 10c), a mean radius, b winding length, c winding
     * depth, inches (Wheeler 1928). Stated accuracy 1 % when the three denominator terms are about equal.
     */
    public static double wheelerMultilayer(double meanRadius, double length, double depth, int turns) {
        return WHEELER * 0.8 * meanRadius * meanRadius * turns * (double) turns
                / (6 * meanRadius + 9 * length + 10 * depth);
    }

    /**
     * Wheeler flat spiral: L[µH] = a²N²/(8a + 11c), a mean radius, c radial width of the winding, inches
     * (Wheeler 1928). Stated accuracy about 5 % for c &gt; 0.2 a.
     */
    public static double wheelerFlatSpiral(double meanRadius, double width, int turns) {
        return WHEELER * meanRadius * meanRadius * turns * (double) turns / (8 * meanRadius + 11 * width);
    }

    /**
     * Nagaoka's coefficient K_N(D/ℓ) of a current sheet of diameter D and length ℓ, exact in complete
     * elliptic integrals: with k² = D²/(D² + ℓ²), k' = √(1 − k²),
     * K_N = 4/(3π k') [ (k'²/k²)(K(k) − E(k)) + E(k) − k ] (Nagaoka 1909; Grover 1946, ch. 16).
     * Tends to 1 for a long coil.
     */
    public static double nagaoka(double diameterOverLength) {
        if (!(diameterOverLength > 0) || Double.isInfinite(diameterOverLength)) {
            throw new IllegalArgumentException("diameter/length = " + diameterOverLength + ": must be finite and > 0");
        }
        double u2 = diameterOverLength * diameterOverLength;
        double m = u2 / (1 + u2);
        double k = Math.sqrt(m);
        double kp2 = 1 / (1 + u2);
        double kp = Math.sqrt(kp2);
        if (m < 1e-6) {
            // long coil: K_N = 1 − 4u/(3π) + u²/8 − ... (Grover 1946 series); use 3 terms
            double u = diameterOverLength;
            return 1 - 4 * u / (3 * Math.PI) + u2 / 8;
        }
        double kk = Elliptic.k(m);
        double ee = Elliptic.e(m);
        return 4 / (3 * Math.PI * kp) * (kp2 / m * (kk - ee) + ee - k);
    }

    /** Lorenz current sheet: L = K_N µ0 π R² N²/ℓ (R mean radius, ℓ = N × pitch). */
    public static double currentSheet(double radius, double length, int turns) {
        return nagaoka(2 * radius / length) * Constants.MU0 * Math.PI * radius * radius * turns * (double) turns / length;
    }

    /**
     * Rosa's round-wire correction ΔL = µ0 R N (A + B): L(real coil) = L(current sheet) − ΔL
     * (Rosa, Bull. Bureau of Standards 2, 1906/7; Rosa &amp; Grover 1912). A = 5/4 − ln(2p/d) for round wire
     * of bare diameter d at pitch p with uniform current; B from the geometric mean distances of the sheet's
     * strips, see {@link #rosaB(int)}. Assumes pitch ≪ radius.
     */
    public static double rosaCorrection(double radius, double pitch, double wireDiameter, int turns) {
        double a = 1.25 - Math.log(2 * pitch / wireDiameter);
        return Constants.MU0 * radius * turns * (a + rosaB(turns));
    }

    /**
     * Rosa's B(N): the mutual-inductance part of the correction, B = (2/N) Σ_{k=1}^{N−1} (N − k) ln(k p/g_k),
     * g_k the GMD of two strips of width p whose centres are k p apart (derived here from Grover's strip GMD).
     * B(2) = 0.1137, B(∞) = ln 2π − 3/2. O(N).
     */
    public static double rosaB(int turns) {
        double sum = 0;
        for (int k = 1; k < turns; k++) {
            sum += (turns - k) * stripGmdLog(k);
        }
        return 2 * sum / turns;
    }

    /** ln(k/γ_k), γ_k = g_k/p: exact for small k, series 1/(12k²) + 1/(60k⁴) + 1/(168k⁶) above. */
    private static double stripGmdLog(int k) {
        if (k >= 6) {
            double i2 = 1.0 / ((double) k * k);
            return i2 * (1.0 / 12 + i2 * (1.0 / 60 + i2 / 168));
        }
        double kp = k + 1;
        double km = k - 1;
        double lnGamma = 0.5 * (kp * kp * Math.log(kp) + (km > 0 ? km * km * Math.log(km) : 0) - 2.0 * k * k * Math.log(k))
                - 1.5;
        return Math.log(k) - lnGamma;
    }

    /** Mohan's layout shapes and their fitted coefficients (Mohan et al., IEEE JSSC 34(10), 1999, Tables 1 and 2). */
    public enum MohanShape {
        /** Square. */
        SQUARE(2.34, 2.75, 1.27, 2.07, 0.18, 0.13),
        /** Hexagon. */
        HEXAGON(2.33, 3.82, 1.09, 2.23, 0.00, 0.17),
        /** Octagon. */
        OCTAGON(2.25, 3.55, 1.07, 2.29, 0.00, 0.19),
        /** Circle (current-sheet only). */
        CIRCLE(Double.NaN, Double.NaN, 1.00, 2.46, 0.00, 0.20);

        final double k1;
        final double k2;
        final double c1;
        final double c2;
        final double c3;
        final double c4;

        MohanShape(double k1, double k2, double c1, double c2, double c3, double c4) {
            this.k1 = k1;
            this.k2 = k2;
            this.c1 = c1;
            this.c2 = c2;
            this.c3 = c3;
            this.c4 = c4;
        }

        /** Square, hexagon or octagon by its number of sides. */
        public static MohanShape ofSides(int sides) {
            return switch (sides) {
                case 4 -> SQUARE;
                case 6 -> HEXAGON;
                case 8 -> OCTAGON;
                default -> throw new IllegalArgumentException("sides = " + sides + ": Mohan's tables cover 4, 6 and 8");
            };
        }
    }

    /** Fill ratio ρ = (d_out − d_in)/(d_out + d_in). */
    public static double fillRatio(double outer, double inner) {
        return (outer - inner) / (outer + inner);
    }

    /**
     * Mohan's modified Wheeler formula L = K1 µ0 n² d_avg/(1 + K2 ρ), d_avg = (d_out + d_in)/2
     * (Mohan 1999, eq. 1). Not defined for the circle.
     */
    public static double mohanWheeler(MohanShape shape, int turns, double outer, double inner) {
        double rho = fillRatio(outer, inner);
        return shape.k1 * Constants.MU0 * turns * (double) turns * 0.5 * (outer + inner) / (1 + shape.k2 * rho);
    }

    /** Mohan's current-sheet formula L = µ0 n² d_avg c1/2 (ln(c2/ρ) + c3 ρ + c4 ρ²) (Mohan 1999, eq. 2). */
    public static double mohanCurrentSheet(MohanShape shape, int turns, double outer, double inner) {
        double rho = fillRatio(outer, inner);
        return Constants.MU0 * turns * (double) turns * 0.5 * (outer + inner) * shape.c1 / 2
                * (Math.log(shape.c2 / rho) + shape.c3 * rho + shape.c4 * rho * rho);
    }
}
