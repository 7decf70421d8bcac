package org.tankwright.capacitors;

/**
 * The electrical stress a capacitor bank must carry, as the network solver predicts it.
 *
 * @param voltageRms    AC voltage across the bank, V rms
 * @param voltagePeak   AC peak across the bank, V (0: √2 × rms, a sinusoid)
 * @param dcBias        DC voltage across the bank, V (≥ 0)
 * @param currentRms    rms current through the bank, A
 * @param frequency     operating frequency, Hz
 * @param dvdt          steepest dV/dt across the bank, V/s (0: that of the sinusoid, 2πf × peak)
 */
public record BankStress(double voltageRms, double voltagePeak, double dcBias, double currentRms,
                         double frequency, double dvdt) {

    public BankStress {
        nonNegative("vrms", voltageRms, "volts rms");
        nonNegative("vpeak", voltagePeak, "volts");
        nonNegative("vdc_bias", dcBias, "volts");
        nonNegative("irms", currentRms, "amperes rms");
        nonNegative("dvdt", dvdt, "volts per second");
        if (!(frequency > 0) || !Double.isFinite(frequency)) {
            throw new IllegalArgumentException("frequency = " + frequency + ": must be a positive number of hertz");
        }
        if (voltageRms == 0 && currentRms == 0) {
            throw new IllegalArgumentException("stress: give the bank's rms voltage or rms current (both are 0)");
        }
        if (voltagePeak > 0 && voltagePeak < voltageRms) {
            throw new IllegalArgumentException("vpeak = " + voltagePeak + " V is below vrms = " + voltageRms
                    + " V: the peak of an AC wave is at least its rms");
        }
    }

    /** A sinusoidal stress: peak √2 × rms, dV/dt of the sinusoid. */
    public static BankStress sinusoidal(double voltageRms, double currentRms, double dcBias, double frequency) {
        return new BankStress(voltageRms, 0, dcBias, currentRms, frequency, 0);
    }

    /** Crest factor peak/rms (√2 when not given). */
    public double crestFactor() {
        return voltagePeak > 0 && voltageRms > 0 ? voltagePeak / voltageRms : Math.sqrt(2);
    }

    private static void nonNegative(String name, double v, String unit) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " = " + v + ": must be zero or a positive number of " + unit);
        }
    }
}
