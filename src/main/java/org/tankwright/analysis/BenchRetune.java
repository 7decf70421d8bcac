package org.tankwright.analysis;

/**
 * Bench re-tune arithmetic for one tank: a tank that resonates at {@code fMeasured} with
 * capacitance {@code c} has L = 1/((2π·fMeasured)²·C), so the capacitance that brings it to
 * {@code fDesign} is C·(fMeasured/fDesign)² (from f = 1/(2π√(LC)), Thomson's formula).
 */
public final class BenchRetune {
    private BenchRetune() {
    }

    /** The capacitance that moves a tank measured at {@code fMeasured} with {@code c} to {@code fDesign}, F. */
    public static double capacitanceNeeded(double c, double fDesign, double fMeasured) {
        if (!(c > 0) || !(fDesign > 0) || !(fMeasured > 0)) {
            throw new IllegalArgumentException("re-tune needs a positive capacitance and frequencies, got C = " + c
                    + " F, f_design = " + fDesign + " Hz, f_measured = " + fMeasured + " Hz");
        }
        double ratio = fMeasured / fDesign;
        return c * ratio * ratio;
    }

    /** The inductance a tank measured at {@code fMeasured} with {@code c} has, 1/(ω²C), H. */
    public static double inductanceAsBuilt(double c, double fMeasured) {
        double w = 2 * Math.PI * fMeasured;
        return 1 / (w * w * c);
    }

    /**
     * The part to put in series with {@code c} to lower it to {@code needed} (< c):
     * C·C_needed/(C − C_needed), F.
     */
    public static double seriesTrim(double c, double needed) {
        if (!(needed < c)) {
            throw new IllegalArgumentException("a series trim lowers the capacitance: " + needed + " F is not below " + c + " F");
        }
        return c * needed / (c - needed);
    }
}
