package org.tankwright.circuit;

/** A capacitor bank as the network sees it: capacitance with its ESR and ESL (SI). */
public record CapacitorSpec(double c, double esr, double esl) {
    public CapacitorSpec {
        if (!(c > 0) || Double.isInfinite(c)) {
            throw new IllegalArgumentException("capacitance " + c + " F must be positive and finite");
        }
        if (!(esr >= 0) || Double.isInfinite(esr)) {
            throw new IllegalArgumentException("capacitor ESR " + esr + " Ω must be finite and ≥ 0");
        }
        if (!(esl >= 0) || Double.isInfinite(esl)) {
            throw new IllegalArgumentException("capacitor ESL " + esl + " H must be finite and ≥ 0");
        }
    }

    /** An ideal capacitor. */
    public static CapacitorSpec ideal(double c) {
        return new CapacitorSpec(c, 0, 0);
    }

    public CapacitorSpec withC(double newC) {
        return new CapacitorSpec(newC, esr, esl);
    }
}
