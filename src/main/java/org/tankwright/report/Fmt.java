package org.tankwright.report;

import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/**
 * How the sheet prints numbers: through the one formatter, with a no-break space between a
 * number and its unit so a line never separates them. Build values (L, C, f) carry
 * {@value #BUILD} significant digits, everything else {@value #READING}.
 */
final class Fmt {
    static final int BUILD = 4;
    static final int READING = 3;
    static final char NBSP = '\u00A0';

    private Fmt() {
    }

    /** A build value: {@value #BUILD} significant digits. */
    static String build(double v, Dimension d) {
        return q(v, d, BUILD);
    }

    /** A reading or stress: {@value #READING} significant digits. */
    static String reading(double v, Dimension d) {
        return q(v, d, READING);
    }

    static String q(double v, Dimension d, int sig) {
        if (d == Dimension.VOLTAGE_RATE && has(v)) {
            return inPreferred(v, d, "V/\u00B5s", sig);
        }
        if (d == Dimension.VOLUME_FLOW && has(v)) {
            return inPreferred(v, d, "L/min", sig);
        }
        return Quantities.format(v, d, sig).replace(' ', NBSP);
    }

    /** A value of a dimension without SI prefixes, in the bench's usual unit (one of the dimension's own spellings). */
    private static String inPreferred(double v, Dimension d, String unit, int sig) {
        return Quantities.number(v / d.units().get(unit), sig) + NBSP + unit;
    }

    /** A fraction as a percentage with {@value #READING} significant digits. */
    static String percent(double fraction) {
        return q(fraction, Dimension.FRACTION, READING);
    }

    /** A plain number ({@code sig} digits). */
    static String number(double v, int sig) {
        return Quantities.number(v, sig);
    }

    /** Whether a value is there to print. */
    static boolean has(double v) {
        return Double.isFinite(v);
    }

    /** A Finding's unit symbol as a dimension, or null when it is not one of ours. */
    static Dimension dimensionOfSymbol(String unit) {
        if (unit == null || unit.isEmpty()) {
            return null;
        }
        for (Dimension d : Dimension.values()) {
            if (d.symbol().equals(unit) || d.keySuffix().equals(unit)) {
                return d;
            }
        }
        return null;
    }

    /** A value in a Finding's own unit, through the formatter when the unit is one of ours. */
    static String inUnit(double v, String unit) {
        if (!has(v)) {
            return "";
        }
        Dimension d = dimensionOfSymbol(unit);
        if (d != null) {
            return reading(v, d);
        }
        String n = Quantities.number(v, READING);
        return unit == null || unit.isEmpty() ? n : n + NBSP + unit;
    }
}
