package org.tankwright.capacitors;

/** One point of a part's AC voltage rating against frequency: rms volts allowed at {@code frequency}. */
public record AcRatingPoint(double frequency, double voltageRms) {
    public AcRatingPoint {
        if (!(frequency > 0) || !Double.isFinite(frequency)) {
            throw new IllegalArgumentException("ac rating table frequency_Hz = " + frequency + ": must be a positive number of hertz");
        }
        if (!(voltageRms > 0) || !Double.isFinite(voltageRms)) {
            throw new IllegalArgumentException("ac rating table voltage_V = " + voltageRms + ": must be a positive number of volts rms");
        }
    }
}
