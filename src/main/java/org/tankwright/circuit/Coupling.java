package org.tankwright.circuit;

/**
 * A mutual inductance {@code m} between two inductive elements (by index in the network). The
 * dot convention: positive m when currents entering both elements' terminal a aid each other.
 */
public record Coupling(int first, int second, double m) {
    public Coupling {
        if (first == second || first < 0 || second < 0) {
            throw new IllegalArgumentException("coupling needs two different elements, got " + first + " and " + second);
        }
        if (!Double.isFinite(m)) {
            throw new IllegalArgumentException("mutual inductance " + m + " H must be finite");
        }
    }
}
