package org.tankwright.heating;

import org.tankwright.magnetics.Elliptic;
import org.tankwright.units.Constants;

/**
 * A work coil as the workpiece model needs it: a solenoid of {@code turns} over {@code length}
 * whose current flows on its inner face at radius {@code innerDiameter/2} (the face toward the
 * work, where the current crowds), its empty inductance and its own series resistance.
 *
 * @param turns            N
 * @param length           winding length, m
 * @param innerDiameter    inner diameter of the winding, m
 * @param emptyInductance  L0, H: inductance with no workpiece (from the coil model or a measurement)
 * @param resistance       R_coil, Ω: the coil's own AC series resistance at the operating frequency
 */
public record WorkCoil(double turns, double length, double innerDiameter, double emptyInductance,
                       double resistance) {
    public WorkCoil {
        HeatingInputs.positive("coil turns", turns, "");
        HeatingInputs.positive("coil length", length, "m");
        HeatingInputs.positive("coil inner diameter", innerDiameter, "m");
        HeatingInputs.positive("empty coil inductance", emptyInductance, "H");
        HeatingInputs.nonNegative("coil resistance", resistance, "Ω");
    }

    /** A coil whose empty inductance is the current-sheet value K_N·µ0·N²·π·b²/l (Nagaoka). */
    public static WorkCoil withNagaokaInductance(double turns, double length, double innerDiameter,
                                                 double resistance) {
        HeatingInputs.positive("coil length", length, "m");
        HeatingInputs.positive("coil inner diameter", innerDiameter, "m");
        double b = 0.5 * innerDiameter;
        double l0 = nagaoka(innerDiameter / length) * Constants.MU0 * turns * turns * Math.PI * b * b / length;
        return new WorkCoil(turns, length, innerDiameter, l0, resistance);
    }

    /**
     * Nagaoka's coefficient of a uniform current sheet of diameter d and length l:
     * K = 4/(3π·k')·[(k'²/k²)(K(k) − E(k)) + E(k) − k], k² = d²/(d² + l²), k'² = 1 − k²
     * (Nagaoka 1909; form as in Grover, <i>Inductance Calculations</i>, from memory). K → 1 for a long coil.
     */
    public static double nagaoka(double diameterOverLength) {
        HeatingInputs.positive("coil diameter/length", diameterOverLength, "");
        double m = diameterOverLength * diameterOverLength / (1 + diameterOverLength * diameterOverLength);
        double k = Math.sqrt(m);
        double kp = Math.sqrt(1 - m);
        if (k < 1e-4) {
            return 1 - 4 * k / (3 * Math.PI) + m / 8; // series for a long coil
        }
        double bigK = Elliptic.k(m);
        double bigE = Elliptic.e(m);
        return 4 / (3 * Math.PI * kp) * ((kp * kp / m) * (bigK - bigE) + bigE - k);
    }

    /** The inner (current-sheet) radius b. */
    public double innerRadius() {
        return 0.5 * innerDiameter;
    }

    /** Reluctance of the bore of an ideal long coil, l/(µ0·π·b²), 1/H. */
    public double boreReluctance() {
        double b = innerRadius();
        return length / (Constants.MU0 * Math.PI * b * b);
    }

    /**
     * Reluctance of the return path outside the coil, N²/L0 − l/(µ0·π·b²), 1/H, held fixed when a
     * workpiece enters; zero when the given L0 is at or above the long-coil value.
     */
    public double returnReluctance() {
        return Math.max(0.0, turns * turns / emptyInductance - boreReluctance());
    }
}
