package org.tankwright.heating;

/**
 * A flat work coil as the plate model needs it: concentric rings carrying the coil current in series
 * (one per turn of a flat spiral), each at its radius and at its height above the winding's face
 * toward the plate, with the coil's empty inductance and its own series resistance.
 *
 * @param radii           ring radii, m (each &gt; 0)
 * @param lifts           height of each ring's current above the winding's face toward the plate, m (≥ 0)
 * @param outerRadius     outer radius of the winding at the conductor's edge, m
 * @param emptyInductance L0, H: inductance with no workpiece (from the coil model)
 * @param resistance      R_coil, Ω: the coil's own AC series resistance at the operating frequency
 */
public record FlatWorkCoil(double[] radii, double[] lifts, double outerRadius, double emptyInductance,
                           double resistance) {
    public FlatWorkCoil {
        if (radii == null || lifts == null || radii.length == 0 || radii.length != lifts.length) {
            throw new IllegalArgumentException("a flat work coil needs one height for each of its rings (at least one ring)");
        }
        radii = radii.clone();
        lifts = lifts.clone();
        for (int i = 0; i < radii.length; i++) {
            HeatingInputs.positive("ring radius", radii[i], "m");
            HeatingInputs.nonNegative("ring height above the winding face", lifts[i], "m");
        }
        HeatingInputs.positive("coil outer radius", outerRadius, "m");
        HeatingInputs.positive("empty coil inductance", emptyInductance, "H");
        HeatingInputs.nonNegative("coil resistance", resistance, "Ω");
    }

    @Override
    public double[] radii() {
        return radii.clone();
    }

    @Override
    public double[] lifts() {
        return lifts.clone();
    }

    /** Number of rings (turns). */
    public int rings() {
        return radii.length;
    }
}
