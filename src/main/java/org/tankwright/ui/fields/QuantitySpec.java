package org.tankwright.ui.fields;

import org.tankwright.design.Field;
import org.tankwright.design.RecordCodec;
import org.tankwright.units.Dimension;

/**
 * What a quantity field accepts: its name in messages, dimension, range, whether it may be left
 * empty (absent: the engine chooses or tunes it) and whether it must be a whole number.
 */
public record QuantitySpec(String label, Dimension dimension, double min, double max, boolean minExclusive,
                           String range, String meaning, boolean optional, boolean integer) {

    /** The spec a design field's {@link Field} description gives. */
    public static QuantitySpec of(String label, Field f, Class<?> type) {
        boolean integer = type == int.class || type == Integer.class || type == long.class || type == Long.class;
        boolean optional = !type.isPrimitive() && !f.required();
        return new QuantitySpec(label, f.dim(), f.min(), f.max(), f.minExclusive(), RecordCodec.range(f), f.doc(),
                optional, integer);
    }

    /** Null when {@code v} is allowed, else what is wrong. */
    public String check(double v) {
        if (integer && v != Math.rint(v)) {
            return "must be a whole number";
        }
        boolean low = minExclusive ? v <= min : v < min;
        if (low || v > max) {
            return "is out of range; allowed " + range;
        }
        return null;
    }
}
