package org.tankwright.magnetics;

import java.util.Locale;
import org.tankwright.materials.Conductor;

/**
 * Medhurst's measured HF resistance of single-layer solenoids as a second resistance model (a cross-check
 * of ours): the ratio ψ = R_coil / R_straight of a solenoid's resistance to that of the same wire straight at
 * the same frequency, with fully developed skin effect, tabulated against length/diameter ℓ/D and wire
 * diameter/pitch d/p (R. G. Medhurst, "H.F. resistance and self-capacitance of single-layer solenoids",
 * Wireless Engineer 24, pp. 35–43 and 80–92, 1947; measured on coils of some 30–50 turns). The estimate is
 * R = R_dc · F(x) · ψ, F the exact skin ratio of the straight wire.
 *
 * <p>Interpolation: bilinear in (ℓ/D, d/p) between the tabulated points; ψ = 1 at d/p = 0 (turns far apart
 * have no proximity loss). Outside ℓ/D 0.2–10 the nearest row is used and the verdict is "not valid".
 */
final class MedhurstResistance {
    /** Model name in results. */
    static final String NAME = "medhurst-table";
    static final String SOURCE = "Medhurst, Wireless Engineer 24 (1947): measured R_coil/R_straight-wire against "
            + "length/diameter and wire diameter/pitch, bilinear interpolation; times the straight wire's exact skin "
            + "resistance";
    /** Smallest wire radius / skin depth for which the table applies (skin effect developed; see docs/models.md). */
    static final double MIN_RADIUS_OVER_DELTA = 5;

    /** Rows: length/diameter. */
    static final double[] LENGTH_OVER_DIAMETER = {0.2, 0.4, 0.6, 0.8, 1, 2, 4, 6, 8, 10};
    /** Columns: wire diameter/pitch (Medhurst's d/s), descending from close-wound; pitch/diameter 1 … 10. */
    static final double[] DIAMETER_OVER_PITCH = {1.0, 0.9, 0.8, 0.7, 0.6, 0.5, 0.4, 0.3, 0.2, 0.1};
    /**
     * ψ(ℓ/D, d/p), Medhurst 1947, as reproduced in public copies of his table (the copies agree on every entry but one: ℓ/D = 10,
     * d/p = 0.7 reads 2.27 in most and 2.37 in one; 2.37 is used here as it continues the column smoothly
     * between 2.34 at ℓ/D = 8 and the long-coil values; the test leaves that point out).
     */
    static final double[][] RATIO = {
        {5.45, 3.84, 2.83, 2.20, 1.77, 1.48, 1.29, 1.19, 1.08, 1.02},
        {5.65, 3.99, 2.97, 2.28, 1.83, 1.54, 1.33, 1.21, 1.08, 1.03},
        {5.80, 4.11, 3.10, 2.38, 1.89, 1.60, 1.38, 1.22, 1.10, 1.03},
        {5.80, 4.17, 3.20, 2.44, 1.92, 1.64, 1.42, 1.23, 1.10, 1.03},
        {5.55, 4.10, 3.17, 2.47, 1.94, 1.67, 1.45, 1.24, 1.10, 1.03},
        {4.10, 3.36, 2.74, 2.32, 1.98, 1.74, 1.50, 1.28, 1.13, 1.04},
        {3.54, 3.05, 2.60, 2.27, 2.01, 1.78, 1.54, 1.32, 1.15, 1.04},
        {3.31, 2.92, 2.60, 2.29, 2.03, 1.80, 1.56, 1.34, 1.16, 1.04},
        {3.20, 2.90, 2.62, 2.34, 2.08, 1.81, 1.57, 1.34, 1.165, 1.04},
        {3.23, 2.93, 2.65, 2.37, 2.10, 1.83, 1.58, 1.35, 1.17, 1.04},
    };

    private MedhurstResistance() {
    }

    /** ψ by bilinear interpolation; ℓ/D is clamped to the table's rows, d/p to 0..1. */
    static double ratio(double lengthOverDiameter, double diameterOverPitch) {
        double[] rows = LENGTH_OVER_DIAMETER;
        double x = Math.max(rows[0], Math.min(rows[rows.length - 1], lengthOverDiameter));
        int i = 0;
        while (i < rows.length - 2 && x > rows[i + 1]) {
            i++;
        }
        double t = (x - rows[i]) / (rows[i + 1] - rows[i]);
        double y = Math.max(0, Math.min(1, diameterOverPitch));
        return (1 - t) * inRow(RATIO[i], y) + t * inRow(RATIO[i + 1], y);
    }

    /** Linear in d/p along one row, with ψ = 1 at d/p = 0. */
    private static double inRow(double[] row, double y) {
        double[] cols = DIAMETER_OVER_PITCH;
        if (y <= cols[cols.length - 1]) {
            return 1 + (row[cols.length - 1] - 1) * y / cols[cols.length - 1];
        }
        int j = 0;
        while (j < cols.length - 2 && y < cols[j + 1]) {
            j++;
        }
        double s = (cols[j] - y) / (cols[j] - cols[j + 1]);
        return (1 - s) * row[j] + s * row[j + 1];
    }

    /**
     * The estimate for a single-layer solenoid of solid round wire or tube (the tube as a solid conductor of
     * its outer diameter, which holds when the wall is several skin depths), or null for other conductors.
     *
     * @param skinResistance the straight wire's AC resistance R_dc·F(x), Ω (a tube: the solid conductor of its outer diameter)
     * @param delta          skin depth, m
     */
    static ResistanceEstimate estimate(SingleLayerSolenoid s, double skinResistance, double delta) {
        Conductor c = s.conductor();
        double d;
        if (c instanceof Conductor.RoundWire w) {
            d = w.diameter();
        } else if (c instanceof Conductor.Tube t) {
            d = t.outerDiameter();
        } else {
            return null;
        }
        double ld = s.length() / s.meanDiameter();
        double dp = d / s.pitch();
        double radiusOverDelta = 0.5 * d / delta;
        boolean inGrid = ld >= LENGTH_OVER_DIAMETER[0] && ld <= LENGTH_OVER_DIAMETER[LENGTH_OVER_DIAMETER.length - 1];
        boolean developed = radiusOverDelta >= MIN_RADIUS_OVER_DELTA;
        boolean wallOk = !(c instanceof Conductor.Tube t) || t.wall() >= 3 * delta;
        String note = String.format(Locale.ROOT, "measured grid length/diameter 0.2–10 (here %.3g), wire diameter/pitch "
                + "0.1–1, below 0.1 toward no proximity effect (here %.3g); needs developed skin effect, wire radius ≥ %.0f skin depths (here %.3g)%s",
                ld, dp, MIN_RADIUS_OVER_DELTA, radiusOverDelta,
                c instanceof Conductor.Tube ? "; tube taken as a solid conductor (wall ≥ 3 skin depths)" : "");
        return new ResistanceEstimate(NAME, skinResistance * ratio(ld, dp), SOURCE, inGrid && developed && wallOk, note);
    }
}
