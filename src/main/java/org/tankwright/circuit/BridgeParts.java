package org.tankwright.circuit;

/**
 * The switch parameters the zero-voltage-switching margin needs, as the user enters them: the
 * output capacitance of one switch (Coss, F) and the dead time (s). Zeros mean "not given".
 */
public record BridgeParts(double coss, double deadTime) {
    public static final BridgeParts NONE = new BridgeParts(0, 0);

    public BridgeParts {
        if (!(coss >= 0) || Double.isInfinite(coss)) {
            throw new IllegalArgumentException("Coss " + coss + " F must be finite and ≥ 0");
        }
        if (!(deadTime >= 0) || Double.isInfinite(deadTime)) {
            throw new IllegalArgumentException("dead time " + deadTime + " s must be finite and ≥ 0");
        }
    }

    public boolean given() {
        return coss > 0 && deadTime > 0;
    }

    /**
     * The current a switch node needs at turn-off to swing its two output capacitances across the
     * bus within the dead time: 2·Coss·Vdc/t_dead (constant-current charge, common practice).
     */
    public double zvsCurrent(double vdc) {
        return given() ? 2 * coss * vdc / deadTime : 0;
    }
}
