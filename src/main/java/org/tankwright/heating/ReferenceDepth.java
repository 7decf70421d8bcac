package org.tankwright.heating;

import org.tankwright.units.Constants;

/**
 * Reference (skin) depth δ = √(2ρ/(ω·µ0·µr)): the depth at which an induced current density in a
 * thick conductor falls to 1/e of its surface value; the same formula as δ = 503·√(ρ/(µr·f)) m of
 * the induction-heating handbooks (503.3 = 1/√(π·µ0)).
 */
public final class ReferenceDepth {
    private ReferenceDepth() {
    }

    /** δ in metres for resistivity ρ (Ω·m), frequency f (Hz) and relative permeability µr. */
    public static double of(double resistivity, double frequency, double muR) {
        HeatingInputs.positive("resistivity", resistivity, "Ω·m");
        HeatingInputs.positive("frequency", frequency, "Hz");
        HeatingInputs.atLeastOne("relative permeability", muR);
        return Math.sqrt(resistivity / (Math.PI * frequency * Constants.MU0 * muR));
    }

    /** The frequency (Hz) at which the reference depth equals {@code depth} (m). */
    public static double frequencyFor(double resistivity, double muR, double depth) {
        HeatingInputs.positive("resistivity", resistivity, "Ω·m");
        HeatingInputs.atLeastOne("relative permeability", muR);
        HeatingInputs.positive("reference depth", depth, "m");
        return resistivity / (Math.PI * Constants.MU0 * muR * depth * depth);
    }
}
