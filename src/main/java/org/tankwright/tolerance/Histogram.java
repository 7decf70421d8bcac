package org.tankwright.tolerance;

/** Equal-width bins from {@code min} to {@code max}; the last bin includes {@code max}. */
public record Histogram(double min, double max, int[] counts) {
    public double binWidth() {
        return counts.length == 0 ? 0 : (max - min) / counts.length;
    }

    /** Lower edge of bin i. */
    public double lowerEdge(int i) {
        return min + i * binWidth();
    }

    static Histogram of(double[] sorted, int n, int bins) {
        int[] counts = new int[n == 0 ? 0 : bins];
        if (n == 0) {
            return new Histogram(0, 0, counts);
        }
        double lo = sorted[0];
        double hi = sorted[n - 1];
        if (hi == lo) {
            counts = new int[]{n};
            return new Histogram(lo, hi, counts);
        }
        double scale = bins / (hi - lo);
        for (int i = 0; i < n; i++) {
            counts[Math.min(bins - 1, (int) ((sorted[i] - lo) * scale))]++;
        }
        return new Histogram(lo, hi, counts);
    }
}
