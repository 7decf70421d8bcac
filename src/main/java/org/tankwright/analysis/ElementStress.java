package org.tankwright.analysis;

/**
 * The stress on one element at the operating point, and at the worst point of the envelope.
 *
 * @param id           element name as on the schematic ({@code C1}, {@code L1}, {@code C2}, {@code L2}, {@code RL}, {@code S} bridge switch, {@code D} rectifier diode)
 * @param role         what it is, in words
 * @param voltageRms   rms voltage across it, V
 * @param voltagePeak  peak voltage (√2·rms plus any DC bias), V
 * @param currentRms   rms current through it, A
 * @param currentPeak  peak current, A
 * @param loss         dissipated power, W
 * @param worstVoltagePeak peak voltage at the worst envelope point, V (NaN without an envelope)
 * @param worstCurrentRms  rms current at the worst envelope point, A (NaN without an envelope)
 * @param worstAt      where the worst point lies (text), empty without an envelope
 * @param voltageRating derated voltage rating (peak), V; NaN when unknown
 * @param currentRating derated rms current rating, A; NaN when unknown
 */
public record ElementStress(String id, String role, double voltageRms, double voltagePeak, double currentRms,
                            double currentPeak, double loss, double worstVoltagePeak, double worstCurrentRms,
                            String worstAt, double voltageRating, double currentRating) {

    /** The smallest margin to a rating, as a fraction (0.25 = 25 % headroom; negative = over); NaN without ratings. */
    public double margin() {
        double v = Double.isNaN(voltageRating) ? Double.NaN
                : 1.0 - Math.max(voltagePeak, Double.isNaN(worstVoltagePeak) ? 0 : worstVoltagePeak) / voltageRating;
        double i = Double.isNaN(currentRating) ? Double.NaN
                : 1.0 - Math.max(currentRms, Double.isNaN(worstCurrentRms) ? 0 : worstCurrentRms) / currentRating;
        if (Double.isNaN(v)) {
            return i;
        }
        return Double.isNaN(i) ? v : Math.min(v, i);
    }
}
