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
