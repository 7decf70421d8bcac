package org.tankwright.tolerance;

/**
 * Operating temperatures, drawn uniformly per sample and shared by every parameter of that sample.
 *
 * @param minC        lowest, °C
 * @param maxC        highest, °C
 * @param referenceC  temperature the nominal values hold at, °C
 */
public record TemperatureRange(double minC, double maxC, double referenceC) {
    /** 25 °C only: no drift. */
    public static final TemperatureRange REFERENCE_ONLY = new TemperatureRange(25, 25, 25);

    public TemperatureRange {
        if (!Double.isFinite(minC) || !Double.isFinite(maxC) || !Double.isFinite(referenceC) || minC > maxC
                || minC < -273.15) {
            throw new IllegalArgumentException("temperature range " + minC + " … " + maxC + " °C (reference "
                    + referenceC + " °C): need −273.15 ≤ min ≤ max, all finite");
        }
    }
}
