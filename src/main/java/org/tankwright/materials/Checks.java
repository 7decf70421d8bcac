package org.tankwright.materials;

import java.util.List;
import java.util.Locale;

/** Shared wording of input checks: every message names the field, the value and what is allowed. */
public final class Checks {
    private Checks() {
    }

    /** Adds a message when {@code value} is not a finite number greater than zero (NaN included). */
    public static void positive(List<String> problems, String field, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            problems.add(fmt(field, value) + ": must be a finite length greater than 0");
        }
    }

    /** "field = 1.5 mm" with the value in engineering-friendly millimetres (or the raw value if not finite). */
    public static String fmt(String field, double metres) {
        return field + " = " + m(metres);
    }

    /** A length for a message: mm below 1 m, else m; NaN and infinities spelled out. */
    public static String m(double metres) {
        if (Double.isNaN(metres)) {
            return "NaN";
        }
        if (Double.isInfinite(metres)) {
            return metres > 0 ? "infinity" : "-infinity";
        }
        if (Math.abs(metres) < 1.0) {
            return String.format(Locale.ROOT, "%.4g mm", metres * 1e3);
        }
        return String.format(Locale.ROOT, "%.4g m", metres);
    }
}
