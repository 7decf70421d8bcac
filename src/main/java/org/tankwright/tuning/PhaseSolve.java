package org.tankwright.tuning;

/**
 * The result of moving C1 alone to a target input phase: the capacitance, the phase reached,
 * and whether the target was reached (if not, {@code c1} is the value closest to it).
 */
public record PhaseSolve(double c1, double phaseDeg, double targetDeg, boolean reached, String note) {
}
