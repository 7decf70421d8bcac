package org.tankwright.circuit;

import java.util.Objects;

/**
 * A two-terminal element between nodes {@code a} and {@code b} (node 0 is the reference).
 * Voltage is V(a) − V(b); current flows from a to b through the element (passive convention).
 *
 * <p>An {@link Kind#IMPEDANCE} element is a series R–L–C: Z = r + jωl + 1/(jωc), with
 * {@code c = +∞} meaning no capacitance (a coil, a resistor). A {@link Kind#VOLTAGE_SOURCE} adds a
 * source EMF {@code value} (rms, phase 0) with a series resistance {@code r}, positive terminal at a.
 * A {@link Kind#CURRENT_SOURCE} drives {@code value} (rms) out of terminal a into the network.
 * An {@link Kind#OPEN} element carries no current (an open circuit whose voltage is reported); so
 * does an impedance with {@code r = +∞}.
 */
public record Element(String name, Kind kind, int a, int b, double r, double l, double c, double value) {

    /** What an element's constitutive equation is. */
    public enum Kind { IMPEDANCE, VOLTAGE_SOURCE, CURRENT_SOURCE, OPEN }

    /** Capacitance meaning "no capacitor in this branch" (a short for the 1/(jωC) term). */
    public static final double NO_CAPACITOR = Double.POSITIVE_INFINITY;

    public Element {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        if (a < 0 || b < 0 || a == b) {
            throw new IllegalArgumentException("element " + name + ": nodes " + a + ", " + b
                    + " must be two different non-negative node numbers");
        }
        if (!(r >= 0) || (Double.isInfinite(r) && kind != Kind.IMPEDANCE)) {
            throw new IllegalArgumentException("element " + name + ": resistance " + r
                    + " Ω must be ≥ 0 (+∞, an open circuit, only for an impedance)");
        }
        requireNonNegative(name, "inductance", l);
        if (!(c > 0)) {
            throw new IllegalArgumentException("element " + name + ": capacitance " + c + " F must be positive (or +∞ for none)");
        }
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("element " + name + ": source value " + value + " must be finite");
        }
    }

    private static void requireNonNegative(String name, String what, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException("element " + name + ": " + what + " " + v + " must be finite and ≥ 0");
        }
    }

    public static Element resistor(String name, int a, int b, double r) {
        return new Element(name, Kind.IMPEDANCE, a, b, r, 0, NO_CAPACITOR, 0);
    }

    /** A coil: inductance in series with its AC resistance. */
    public static Element coil(String name, int a, int b, double l, double r) {
        return new Element(name, Kind.IMPEDANCE, a, b, r, l, NO_CAPACITOR, 0);
    }

    /** A capacitor (bank) with its ESR and ESL. */
    public static Element capacitor(String name, int a, int b, double c, double esr, double esl) {
        return new Element(name, Kind.IMPEDANCE, a, b, esr, esl, c, 0);
    }

    /** A sine voltage source: rms EMF, positive terminal {@code plus}, with a series source resistance. */
    public static Element voltageSource(String name, int plus, int minus, double emfRms, double rs) {
        return new Element(name, Kind.VOLTAGE_SOURCE, plus, minus, rs, 0, NO_CAPACITOR, emfRms);
    }

    /** A current source driving {@code iRms} out of terminal {@code out} into the network. */
    public static Element currentSource(String name, int out, int back, double iRms) {
        return new Element(name, Kind.CURRENT_SOURCE, out, back, 0, 0, NO_CAPACITOR, iRms);
    }

    /** An open circuit between two nodes (no current; its voltage is solved). */
    public static Element open(String name, int a, int b) {
        return new Element(name, Kind.OPEN, a, b, 0, 0, NO_CAPACITOR, 0);
    }

    public Element withResistance(double newR) {
        return new Element(name, kind, a, b, newR, l, c, value);
    }

    public Element withCapacitance(double newC) {
        return new Element(name, kind, a, b, r, l, newC, value);
    }

    public Element withValue(double newValue) {
        return new Element(name, kind, a, b, r, l, c, newValue);
    }

    public boolean isSource() {
        return kind == Kind.VOLTAGE_SOURCE || kind == Kind.CURRENT_SOURCE;
    }
}
