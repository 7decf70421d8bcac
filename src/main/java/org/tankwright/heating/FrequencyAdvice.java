package org.tankwright.heating;

import org.tankwright.provenance.Provenance;
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

    /** Lower edge of the plate band, t/δ: below it the slab reflection's e^{−2t/δ} lets a noticeable share of the field through. */
    public static final double PLATE_LOW_RATIO = 2.0;
    /** Upper edge of the plate band, t/δ: the bar band's radius/δ (4 … 8 diameters), since a plate is heated from one face. */
    public static final double PLATE_HIGH_RATIO = 4.0;

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
        return band(diameter, resistivity, muR, chosenFrequency, LOW_RATIO, HIGH_RATIO,
                new Provenance("diameter of several reference depths", "common practice", true,
                        List.of("band d/δ = " + LOW_RATIO + " … " + HIGH_RATIO + " for through-heating")));
    }

    /** Where the chosen frequency puts size/δ against the band [low, high] of size/δ. */
    private static FrequencyAdvice band(double size, double resistivity, double muR, double chosenFrequency, double lowRatio,
                                        double highRatio, Provenance provenance) {
        double low = ReferenceDepth.frequencyFor(resistivity, muR, size / lowRatio);
        double high = ReferenceDepth.frequencyFor(resistivity, muR, size / highRatio);
        double ratio = size / ReferenceDepth.of(resistivity, chosenFrequency, muR);
        Verdict v = ratio < lowRatio ? Verdict.BELOW_BAND : ratio > highRatio ? Verdict.ABOVE_BAND : Verdict.IN_BAND;
        return new FrequencyAdvice(size, resistivity, muR, low, high, chosenFrequency, ratio, v, provenance);
    }

    /**
     * Advice for a plate of thickness t (m) heated from one face: thickness from {@value #PLATE_LOW_RATIO} to
     * {@value #PLATE_HIGH_RATIO} reference depths (ours, by analogy with the bar band). The record's
     * {@code diameter} and {@code diameterOverDepth} then hold the thickness and t/δ.
     */
    public static FrequencyAdvice forPlate(double thickness, double resistivity, double muR, double chosenFrequency) {
        HeatingInputs.positive("plate thickness", thickness, "m");
        return band(thickness, resistivity, muR, chosenFrequency, PLATE_LOW_RATIO, PLATE_HIGH_RATIO,
                new Provenance("plate thickness of a few reference depths", "ours: slab transmission e^{−2t/δ} for the lower"
                        + " edge, the bar band's radius for the upper", true,
                        List.of("band t/δ = " + PLATE_LOW_RATIO + " … " + PLATE_HIGH_RATIO + " for a plate heated from one face")));
    }

    /** Advice at an operating point (its resistivity, µr and resonant frequency). */
    public static FrequencyAdvice forPoint(OperatingPoint p, double diameter) {
        return forBar(diameter, p.load().resistivity(), p.load().muR(), p.resonantFrequency());
    }
}
