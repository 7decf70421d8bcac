package org.tankwright.circuit;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Data series from a sweep, ready for plots and CSV: one x axis and named y series of equal
 * length (SI values; names carry their unit as a suffix, e.g. {@code phase_deg}).
 */
public record SweepSeries(String xName, double[] x, Map<String, double[]> series) {
    public SweepSeries {
        series = Collections.unmodifiableMap(new LinkedHashMap<>(series));
    }

    public double[] get(String name) {
        double[] y = series.get(name);
        if (y == null) {
            throw new IllegalArgumentException("no series named " + name + "; have " + series.keySet());
        }
        return y;
    }

    /** Comma-separated values with a header row. */
    public String toCsv() {
        StringBuilder sb = new StringBuilder(xName);
        for (String k : series.keySet()) {
            sb.append(',').append(k);
        }
        sb.append('\n');
        for (int i = 0; i < x.length; i++) {
            sb.append(x[i]);
            for (double[] y : series.values()) {
                sb.append(',').append(y[i]);
            }
            sb.append('\n');
        }
        return sb.toString();
    }
}
