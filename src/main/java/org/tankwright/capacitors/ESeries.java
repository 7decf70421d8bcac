package org.tankwright.capacitors;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Preferred-number series E6 … E192 of IEC 60063.
 *
 * <p>E6, E12 and E24 are tables: they keep the historical values (2.7, 3.0, 3.3, 3.6, 3.9, 4.3,
 * 4.7, 8.2) that differ from {@code 10^(i/N)} rounded to two figures. E48, E96 and E192 are
 * {@code 10^(i/N)} rounded to three figures, with the one place where the standard departs from
 * that rule: E192 holds 9.20 where the rounding gives 9.19.
 */
public enum ESeries {
    E6(6), E12(12), E24(24), E48(48), E96(96), E192(192);

    /** IEC 60063 E24 (E12 and E6 are every 2nd and 4th value). Held apart so it exists before the constants. */
    private static final class Table {
        static final double[] E24 = {
                1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
                3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};
    }

    private final int count;
    private final double[] mantissas;

    ESeries(int count) {
        this.count = count;
        this.mantissas = build(count);
    }

    private static double[] build(int n) {
        double[] v = new double[n];
        if (n <= 24) {
            int step = 24 / n; // E12 and E6 are every 2nd / 4th value of E24
            for (int i = 0; i < n; i++) {
                v[i] = Table.E24[i * step];
            }
            return v;
        }
        for (int i = 0; i < n; i++) {
            v[i] = Math.round(Math.pow(10.0, i / (double) n) * 100.0) / 100.0;
        }
        if (n == 192) {
            v[185] = 9.20; // IEC 60063: 9.20, not the rounded 9.19
        }
        return v;
    }

    /** Number of values per decade. */
    public int count() {
        return count;
    }

    /** The values of one decade in [1, 10), ascending (a copy). */
    public double[] mantissas() {
        return mantissas.clone();
    }

    /** Every series value in [min, max] (any decade), ascending. */
    public List<Double> valuesBetween(double min, double max) {
        if (!(min > 0) || !(max >= min) || !Double.isFinite(max)) {
            throw new IllegalArgumentException("E-series range must satisfy 0 < min ≤ max, got min = "
                    + min + ", max = " + max);
        }
        List<Double> out = new ArrayList<>();
        int d0 = (int) Math.floor(Math.log10(min)) - 1;
        int d1 = (int) Math.floor(Math.log10(max)) + 1;
        for (int d = d0; d <= d1; d++) {
            double scale = Math.pow(10.0, d);
            for (double m : mantissas) {
                double value = Double.parseDouble(String.format(Locale.ROOT, "%.3fe%d", m, d)); // exact decimal
                if (value >= min * (1 - 1e-12) && value <= max * (1 + 1e-12)) {
                    out.add(value);
                }
            }
            if (scale > max * 10) {
                break;
            }
        }
        return out;
    }

    /** The series value nearest to {@code value} on a logarithmic scale. */
    public double nearest(double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be a positive finite number, got " + value);
        }
        int d = (int) Math.floor(Math.log10(value));
        double best = Double.NaN;
        double bestDist = Double.POSITIVE_INFINITY;
        for (int dd = d - 1; dd <= d + 1; dd++) {
            for (double m : mantissas) {
                double c = m * Math.pow(10.0, dd);
                double dist = Math.abs(Math.log(c / value));
                if (dist < bestDist) {
                    bestDist = dist;
                    best = c;
                }
            }
        }
        return best;
    }

    /** Parses "E24", "e96" ...; the message names the value and the series allowed. */
    public static ESeries parse(String text) {
        for (ESeries s : values()) {
            if (s.name().equalsIgnoreCase(text == null ? "" : text.trim())) {
                return s;
            }
        }
        throw new IllegalArgumentException("E-series '" + text + "' is not known; allowed: "
                + Arrays.toString(values()));
    }
}
