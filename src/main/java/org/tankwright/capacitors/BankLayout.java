package org.tankwright.capacitors;

/**
 * The shape of a bank: {@code parallel} strings of {@code series} identical parts, plus at most
 * one trim part across the bank or in series with it.
 */
public record BankLayout(CapacitorPart part, int series, int parallel, CapacitorPart trim, TrimPosition trimPosition) {
    public BankLayout {
        if (part == null) {
            throw new IllegalArgumentException("bank layout needs a part");
        }
        if (series < 1 || parallel < 1) {
            throw new IllegalArgumentException("bank layout: series = " + series + ", parallel = " + parallel
                    + ": both must be at least 1");
        }
        if ((trim == null) != (trimPosition == null)) {
            throw new IllegalArgumentException("bank layout: a trim part needs a position and a position needs a trim part");
        }
    }

    /** A bank without trim. */
    public static BankLayout of(CapacitorPart part, int series, int parallel) {
        return new BankLayout(part, series, parallel, null, null);
    }

    /**
     * The same bank written the way a builder reads it: a "trim" of the main part itself is one
     * more string or one more part in the string (1 × m plus X across = 1 × (m+1)), and with a
     * single main part the larger contributor is called the main part (across: the larger
     * capacitance; in series: the smaller one), so the trim is always the small correction.
     */
    public BankLayout canonical() {
        if (trim == null) {
            return this;
        }
        boolean same = trim.id().equals(part.id());
        if (same && trimPosition == TrimPosition.PARALLEL && series == 1) {
            return of(part, 1, parallel + 1);
        }
        if (same && trimPosition == TrimPosition.SERIES && parallel == 1) {
            return of(part, series + 1, 1);
        }
        if (series == 1 && parallel == 1 && !same) {
            boolean trimDominates = trimPosition == TrimPosition.PARALLEL
                    ? trim.capacitance() > part.capacitance() : trim.capacitance() < part.capacitance();
            if (trimDominates) {
                return new BankLayout(trim, 1, 1, part, trimPosition);
            }
        }
        return this;
    }

    public int partCount() {
        return series * parallel + (trim == null ? 0 : 1);
    }

    /** Capacitance of the main array alone: parallel·C/series. */
    public double mainCapacitance() {
        return parallel * part.capacitance() / series;
    }

    /** Nominal capacitance of the whole bank (catalogue values, ESL not included). */
    public double capacitance() {
        double cm = mainCapacitance();
        if (trim == null) {
            return cm;
        }
        double ct = trim.capacitance();
        return trimPosition == TrimPosition.PARALLEL ? cm + ct : cm * ct / (cm + ct);
    }

    /** What goes where, in words: "3 in series × 2 in parallel of X, plus Y in parallel". */
    public String describe() {
        String s = series + " in series × " + parallel + " in parallel of " + part.id();
        return trim == null ? s : s + ", plus " + trim.id() + " in " + trimPosition.key() + " with the bank";
    }
}
