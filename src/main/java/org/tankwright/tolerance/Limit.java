package org.tankwright.tolerance;

/** Accepted range of one outcome; use ±infinity for an open side. */
public record Limit(String outcome, double min, double max) {
    public Limit {
        if (outcome == null || outcome.isBlank()) {
            throw new IllegalArgumentException("limit needs an outcome name");
        }
        if (Double.isNaN(min) || Double.isNaN(max) || !(min <= max)) {
            throw new IllegalArgumentException("limit on " + outcome + ": min = " + min + ", max = " + max
                    + ": need min ≤ max (use infinity for an open side)");
        }
    }

    public boolean accepts(double v) {
        return v >= min && v <= max;
    }
}
