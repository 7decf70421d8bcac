package org.tankwright.units;

/**
 * Physical constants used by every model, in SI units. One place per fact.
 */
public final class Constants {
    /**
     * Magnetic constant µ0 in H/m. We use the classical defined value 4π·10⁻⁷; the 2019 SI value
     * (1.25663706212·10⁻⁶) differs by less than 1·10⁻⁹ relative, far below any model error here.
     */
    public static final double MU0 = 4e-7 * Math.PI;
    /** Electric constant ε0 in F/m (CODATA 2018). */
    public static final double EPS0 = 8.8541878128e-12;
    /** 0 °C in kelvin. */
    public static final double ZERO_CELSIUS_K = 273.15;
    /** The reference temperature of conductor resistivity tables, 20 °C. */
    public static final double REFERENCE_TEMPERATURE_C = 20.0;

    private Constants() {
    }
}
