package org.tankwright.tuning;

/**
 * What the controller holds and with what: the {@link Knob} it turns (the source amplitude, i.e.
 * the bus voltage of a bridge, the rms of a sine source or of a current source; or the
 * phase-shift duty of a full bridge), the {@link Quantity} it holds (output power or output
 * voltage; a battery's voltage is fixed, so hold its power) at {@code target}, and the largest
 * amplitude it may use ({@code amplitudeMax}; for DUTY the limit is D = 1 and the amplitude is the
 * design's source value).
 */
public record ControlSpec(Knob knob, Quantity quantity, double target, double amplitudeMax) {

    /** The control variable. */
    public enum Knob { AMPLITUDE, DUTY }

    /** The held output. */
    public enum Quantity { OUTPUT_POWER, OUTPUT_VOLTAGE }

    public ControlSpec {
        if (knob == null || quantity == null) {
            throw new IllegalArgumentException("control knob and held quantity are required");
        }
        if (!(target > 0) || Double.isInfinite(target)) {
            throw new IllegalArgumentException("control target " + target + " must be positive and finite");
        }
        if (knob == Knob.AMPLITUDE && (!(amplitudeMax > 0) || Double.isInfinite(amplitudeMax))) {
            throw new IllegalArgumentException("maximum source amplitude " + amplitudeMax + " must be positive and finite");
        }
    }
}
