package org.tankwright.circuit;

/**
 * A drive by its fundamental. {@code value} is the rms voltage (SINE), the DC bus voltage
 * (FULL_BRIDGE, HALF_BRIDGE) or the rms current (CURRENT). {@code duty} is the phase-shift duty D
 * of a bridge, the fraction of each half-period in which its output is non-zero (1 = square wave).
 * {@code resistance} is the series source resistance of a voltage drive (must be 0 for CURRENT).
 *
 * <p>Fundamentals (Fourier series of a square or quasi-square wave): full bridge
 * (2√2/π)·Vdc·sin(πD/2) rms; half bridge half of that, with a DC bias of Vdc/2 on its series
 * blocking capacitor.
 */
public record Source(Kind kind, double value, double duty, double resistance) {

    /** The kinds of drive. */
    public enum Kind { SINE, FULL_BRIDGE, HALF_BRIDGE, CURRENT }

    /** (2√2/π): rms fundamental of a ±1 square wave. */
    public static final double SQUARE_FUNDAMENTAL = 2 * Math.sqrt(2) / Math.PI;

    public Source {
        if (kind == null) {
            throw new IllegalArgumentException("source kind is missing");
        }
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("source value " + value + " must be finite and ≥ 0");
        }
        if (!(duty > 0 && duty <= 1)) {
            throw new IllegalArgumentException("duty " + duty + " must be in (0, 1]");
        }
        if (!(resistance >= 0) || Double.isInfinite(resistance)) {
            throw new IllegalArgumentException("source resistance " + resistance + " Ω must be finite and ≥ 0");
        }
        if (kind == Kind.CURRENT && resistance != 0) {
            throw new IllegalArgumentException("a current-fed source is ideal here: source resistance must be 0, got " + resistance);
        }
    }

    public static Source sine(double vRms) {
        return new Source(Kind.SINE, vRms, 1, 0);
    }

    public static Source fullBridge(double vdc, double duty) {
        return new Source(Kind.FULL_BRIDGE, vdc, duty, 0);
    }

    public static Source halfBridge(double vdc) {
        return new Source(Kind.HALF_BRIDGE, vdc, 1, 0);
    }

    public static Source current(double iRms) {
        return new Source(Kind.CURRENT, iRms, 1, 0);
    }

    public Source withResistance(double rs) {
        return new Source(kind, value, duty, rs);
    }

    public Source withValue(double v) {
        return new Source(kind, v, duty, resistance);
    }

    public Source withDuty(double d) {
        return new Source(kind, value, d, resistance);
    }

    public boolean isBridge() {
        return kind == Kind.FULL_BRIDGE || kind == Kind.HALF_BRIDGE;
    }

    public boolean isCurrentFed() {
        return kind == Kind.CURRENT;
    }

    /** The rms fundamental: volts for a voltage drive, amperes for a current drive. */
    public double fundamentalRms() {
        return switch (kind) {
            case SINE, CURRENT -> value;
            case FULL_BRIDGE -> SQUARE_FUNDAMENTAL * value * Math.sin(Math.PI * duty / 2);
            case HALF_BRIDGE -> 0.5 * SQUARE_FUNDAMENTAL * value * Math.sin(Math.PI * duty / 2);
        };
    }

    /** The DC voltage a half bridge leaves on its series blocking capacitor (Vdc/2); 0 otherwise. */
    public double seriesCapacitorBias() {
        return kind == Kind.HALF_BRIDGE ? value / 2 : 0;
    }

    /** The voltage step each switch node makes (Vdc for either bridge), for the ZVS charge. */
    public double switchedVoltage() {
        return isBridge() ? value : 0;
    }

    /** A one-line description of the drive model. */
    public String model() {
        return switch (kind) {
            case SINE -> "sine voltage source, rms";
            case CURRENT -> "current-fed source, rms";
            case FULL_BRIDGE -> "full bridge fundamental (2√2/π)·Vdc·sin(πD/2) (Fourier series of a quasi-square wave)";
            case HALF_BRIDGE -> "half bridge fundamental (√2/π)·Vdc·sin(πD/2), blocking-capacitor bias Vdc/2";
        };
    }
}
