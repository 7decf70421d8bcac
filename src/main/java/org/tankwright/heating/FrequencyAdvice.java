package org.tankwright.heating;

import java.util.List;

/**
 * Where a frequency stands against the common-practice band for through-heating a round bar:
 * diameter from {@value #LOW_RATIO} to {@value #HIGH_RATIO} reference depths. Below the band the
 * bar is nearly transparent to the field and takes little power for the coil current (poor coil
 * efficiency); above it the heat is made in a thin surface layer and must soak inward by conduction
 * (right for surface hardening, slower for through-heating). Common practice, not a law.
 *
 * @param diameter          m
 * @param resistivity       Ω·m used
 * @param muR               µr used
 * @param lowFrequency      Hz where d = {@value #LOW_RATIO}·δ
 * @param highFrequency     Hz where d = {@value #HIGH_RATIO}·δ
 * @param chosenFrequency   Hz
 * @param diameterOverDepth d/δ at the chosen frequency
 * @param verdict           where the chosen frequency stands
 * @param provenance        rule and source
 */
public record FrequencyAdvice(double diameter, double resistivity, double muR, double lowFrequency,
                              double highFrequency, double chosenFrequency, double diameterOverDepth,
                              Verdict verdict, Provenance provenance) {
    /** Lower edge of the band, d/δ (common practice). */
    public static final double LOW_RATIO = 4.0;
    /** Upper edge of the band for through-heating, d/δ (common practice). */
    public static final double HIGH_RATIO = 8.0;

    /** Where the chosen frequency stands. */
    public enum Verdict {
        /** d/δ below the band: little power per ampere, poor coil efficiency. */
        BELOW_BAND,
        /** Inside the band. */
        IN_BAND,
        /** d/δ above the band: surface heating; through-heating relies on conduction. */
        ABOVE_BAND
    }

    /** Advice for a bar of diameter d (m) at resistivity ρ (Ω·m), µr and the chosen frequency (Hz). */
    public static FrequencyAdvice forBar(double diameter, double resistivity, double muR, double chosenFrequency) {
        HeatingInputs.positive("workpiece diameter", diameter, "m");
        double low = ReferenceDepth.frequencyFor(resistivity, muR, diameter / LOW_RATIO);
        double high = ReferenceDepth.frequencyFor(resistivity, muR, diameter / HIGH_RATIO);
        double ratio = diameter / ReferenceDepth.of(resistivity, chosenFrequency, muR);
        Verdict v = ratio < LOW_RATIO ? Verdict.BELOW_BAND : ratio > HIGH_RATIO ? Verdict.ABOVE_BAND : Verdict.IN_BAND;
        return new FrequencyAdvice(diameter, resistivity, muR, low, high, chosenFrequency, ratio, v,
                new Provenance("diameter of several reference depths", "common practice", true,
                        List.of("band d/δ = " + LOW_RATIO + " … " + HIGH_RATIO + " for through-heating")));
    }

    /** Advice at an operating point (its resistivity, µr and resonant frequency). */
    public static FrequencyAdvice forPoint(OperatingPoint p, double diameter) {
        return forBar(diameter, p.load().resistivity(), p.load().muR(), p.resonantFrequency());
    }
}
