package org.tankwright.heating;

/** Input checks shared by the heating models: each failure names the field, the value and what is allowed. */
final class HeatingInputs {
    private HeatingInputs() {
    }

    static double positive(String field, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " " + value + " " + unit + " must be a finite number above zero");
        }
        return value;
    }

    static double nonNegative(String field, double value, String unit) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " " + value + " " + unit + " must be a finite number, zero or more");
        }
        return value;
    }

    static double atLeastOne(String field, double value) {
        if (!(value >= 1) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " " + value + " must be a finite number, 1 or more");
        }
        return value;
    }

    static double finite(String field, double value, String unit) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " " + value + " " + unit + " must be a finite number");
        }
        return value;
    }

    static double fraction(String field, double value) {
        if (!(value >= 0 && value < 1)) {
            throw new IllegalArgumentException(field + " " + value + " must lie in [0, 1)");
        }
        return value;
    }
}
