package org.tankwright.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A table for the sheet: headers, relative column widths, rows of text, and which columns hold
 * numbers (right-aligned).
 */
final class Table {
    private final String[] headers;
    private final float[] weights;
    private final boolean[] numeric;
    private final List<String[]> rows = new ArrayList<>();

    Table(String[] headers, float[] weights, boolean... numeric) {
        if (headers.length != weights.length) {
            throw new IllegalArgumentException(headers.length + " headers but " + weights.length + " widths");
        }
        this.headers = headers;
        this.weights = weights;
        this.numeric = numeric;
    }

    /** Adds a row (missing cells are blank). */
    Table row(String... cells) {
        rows.add(cells);
        return this;
    }

    boolean isEmpty() {
        return rows.isEmpty();
    }

    String[] headers() {
        return headers;
    }

    List<String[]> rows() {
        return rows;
    }

    boolean rightAligned(int column) {
        return column < numeric.length && numeric[column];
    }

    /** Column widths that share {@code total} points in proportion to the weights. */
    float[] columnWidths(float total) {
        float sum = 0;
        for (float w : weights) {
            sum += w;
        }
        float[] out = new float[weights.length];
        for (int i = 0; i < weights.length; i++) {
            out[i] = total * weights[i] / sum;
        }
        return out;
    }
}
