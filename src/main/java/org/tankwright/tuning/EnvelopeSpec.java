package org.tankwright.tuning;

/**
 * The operating envelope a design must survive: the coupling range (with L1, L2 moving; one axis,
 * a {@link CouplingPath}, or two, a {@link CouplingSurface} such as gap × offset), the load
 * range in the design load's own unit (AC Ω for a resistor, DC Ω behind a rectifier, volts for a
 * battery), the drive frequency range, the coil temperature range (the coils' AC resistances,
 * entered at {@code referenceC}, scale by 1 + α·(T − referenceC)), the control, the grid density
 * per axis, and the margin of the trip levels above the worst normal value.
 *
 * <p>Temperature scaling with the DC temperature coefficient is exact while the resistance is
 * DC-like and an upper bound when skin effect dominates (R_ac then grows only as √ρ).
 */
public record EnvelopeSpec(CouplingSurface coupling, boolean twoCouplingAxes, double loadMin, double loadMax, double frequencyMin,
                           double frequencyMax, double temperatureMinC, double temperatureMaxC, double alpha,
                           double referenceC, ControlSpec control, int gridPerAxis, double tripMargin) {

    /** Temperature coefficient of resistance of annealed copper at 20 °C, 1/K (IEC 60028, from memory). */
    public static final double COPPER_ALPHA = 3.93e-3;
    /** Default margin of a trip level above the worst value in normal operation (common practice, 10 %). */
    public static final double DEFAULT_TRIP_MARGIN = 0.10;

    public EnvelopeSpec {
        if (coupling == null || control == null) {
            throw new IllegalArgumentException("coupling path and control are required");
        }
        range("load", loadMin, loadMax, true);
        range("frequency", frequencyMin, frequencyMax, true);
        range("temperature", temperatureMinC, temperatureMaxC, false);
        if (!(alpha >= 0) || Double.isInfinite(alpha)) {
            throw new IllegalArgumentException("temperature coefficient " + alpha + " /K must be finite and ≥ 0");
        }
        if (gridPerAxis < 2 || gridPerAxis > 50) {
            throw new IllegalArgumentException("grid points per axis " + gridPerAxis + " must be between 2 and 50");
        }
        if (!(tripMargin >= 0 && tripMargin < 10)) {
            throw new IllegalArgumentException("trip margin " + tripMargin + " must be a fraction in [0, 10)");
        }
    }

    private static void range(String what, double a, double b, boolean positive) {
        if (!Double.isFinite(a) || !Double.isFinite(b) || a > b || (positive && !(a > 0))) {
            throw new IllegalArgumentException(what + " range " + a + " .. " + b + " must be finite, ordered"
                    + (positive ? " and positive (open and short loads are evaluated as faults)" : ""));
        }
    }

    /** A spec at one frequency and temperature (20 °C, copper), 5 points per axis, 10 % trip margin. */
    public static EnvelopeSpec of(CouplingPath coupling, double loadMin, double loadMax, double frequency,
                                  ControlSpec control) {
        return new EnvelopeSpec((sPath, t) -> coupling.at(sPath), false, loadMin, loadMax, frequency, frequency, 20, 20,
                COPPER_ALPHA, 20, control, 5, DEFAULT_TRIP_MARGIN);
    }

    /** The same over a two-axis coupling range (e.g. gap × offset). */
    public static EnvelopeSpec of(CouplingSurface coupling, double loadMin, double loadMax, double frequency,
                                  ControlSpec control) {
        return new EnvelopeSpec(coupling, true, loadMin, loadMax, frequency, frequency, 20, 20, COPPER_ALPHA, 20,
                control, 5, DEFAULT_TRIP_MARGIN);
    }

    public EnvelopeSpec withFrequencyRange(double a, double b) {
        return new EnvelopeSpec(coupling, twoCouplingAxes, loadMin, loadMax, a, b, temperatureMinC, temperatureMaxC, alpha, referenceC,
                control, gridPerAxis, tripMargin);
    }

    public EnvelopeSpec withTemperatureRange(double a, double b) {
        return new EnvelopeSpec(coupling, twoCouplingAxes, loadMin, loadMax, frequencyMin, frequencyMax, a, b, alpha, referenceC,
                control, gridPerAxis, tripMargin);
    }

    public EnvelopeSpec withGrid(int n) {
        return new EnvelopeSpec(coupling, twoCouplingAxes, loadMin, loadMax, frequencyMin, frequencyMax, temperatureMinC, temperatureMaxC,
                alpha, referenceC, control, n, tripMargin);
    }

    /** The temperature at which the coil resistances were entered, and their temperature coefficient (1/K). */
    public EnvelopeSpec withResistanceTemperature(double newReferenceC, double newAlpha) {
        return new EnvelopeSpec(coupling, twoCouplingAxes, loadMin, loadMax, frequencyMin, frequencyMax, temperatureMinC,
                temperatureMaxC, newAlpha, newReferenceC, control, gridPerAxis, tripMargin);
    }

    /** The margin of the trip levels above the worst normal values (a fraction). */
    public EnvelopeSpec withTripMargin(double margin) {
        return new EnvelopeSpec(coupling, twoCouplingAxes, loadMin, loadMax, frequencyMin, frequencyMax, temperatureMinC,
                temperatureMaxC, alpha, referenceC, control, gridPerAxis, margin);
    }
}
