package org.tankwright.units;

import java.util.List;
import java.util.Map;

/**
 * The physical dimension a field expects, with its SI unit symbol and the unit spellings the
 * parser accepts. Values are SI inside; the exceptions, stated here once: temperatures are °C,
 * angles are degrees, decibels are dB, fractions are plain numbers (2 % = 0.02).
 */
public enum Dimension {
    LENGTH("length", "m", "m", true, Map.of("m", 1.0, "in", 0.0254, "mil", 2.54e-5)),
    INDUCTANCE("inductance", "H", "H", true, Map.of("H", 1.0)),
    CAPACITANCE("capacitance", "F", "F", true, Map.of("F", 1.0)),
    RESISTANCE("resistance", "Ω", "ohm", true, Map.of("\u03A9", 1.0, "\u2126", 1.0, "ohm", 1.0, "ohms", 1.0, "Ohm", 1.0)),
    FREQUENCY("frequency", "Hz", "Hz", true, Map.of("Hz", 1.0, "hz", 1.0)),
    VOLTAGE("voltage", "V", "V", true, Map.of("V", 1.0, "Vrms", 1.0, "Vdc", 1.0)),
    CURRENT("current", "A", "A", true, Map.of("A", 1.0, "Arms", 1.0)),
    POWER("power", "W", "W", true, Map.of("W", 1.0)),
    ENERGY("energy", "J", "J", true, Map.of("J", 1.0)),
    TIME("time", "s", "s", true, Map.of("s", 1.0, "min", 60.0, "h", 3600.0)),
    TEMPERATURE("temperature", "°C", "degC", false, Map.of("°C", 1.0, "℃", 1.0, "degC", 1.0, "C", 1.0)),
    ANGLE("angle", "°", "deg", false, Map.of("°", 1.0, "deg", 1.0, "rad", 180.0 / Math.PI)),
    FRACTION("fraction", "", "", false, Map.of("%", 0.01, "ppm", 1e-6)),
    DECIBEL("level", "dB", "dB", false, Map.of("dB", 1.0)),
    DIMENSIONLESS("number", "", "", false, Map.of()),
    FLUX_DENSITY("magnetic flux density", "T", "T", true, Map.of("T", 1.0, "G", 1e-4)),
    FIELD_STRENGTH("magnetic field strength", "A/m", "A_per_m", true, Map.of("A/m", 1.0)),
    RESISTIVITY("resistivity", "Ω·m", "ohm_m", true,
            Map.of("\u03A9·m", 1.0, "\u03A9m", 1.0, "\u03A9·cm", 0.01, "µ\u03A9·cm", 1e-8, "uohm*cm", 1e-8, "ohm·m", 1.0, "ohm*m", 1.0, "ohm m", 1.0, "ohm-m", 1.0)),
    MASS("mass", "kg", "kg", false, Map.of("kg", 1.0, "g", 1e-3, "mg", 1e-6, "t", 1e3)),
    VOLUME_FLOW("volume flow", "m³/s", "m3_per_s", false, Map.of("m³/s", 1.0, "m3/s", 1.0, "L/min", 1e-3 / 60, "l/min", 1e-3 / 60)),
    AREA("area", "m²", "m2", false, Map.of("m²", 1.0, "m2", 1.0, "mm²", 1e-6, "mm2", 1e-6)),
    CURRENT_DENSITY("current density", "A/m²", "A_per_m2", false, Map.of("A/m²", 1.0, "A/m2", 1.0, "A/mm²", 1e6, "A/mm2", 1e6)),
    VOLTAGE_RATE("voltage rate", "V/s", "V_per_s", false, Map.of("V/s", 1.0, "V/\u00B5s", 1e6, "V/us", 1e6)),
    PERMEABILITY("relative permeability", "", "", false, Map.of());

    private final String noun;
    private final String symbol;
    private final String keySuffix;
    private final boolean prefixable;
    private final Map<String, Double> units;

    Dimension(String noun, String symbol, String keySuffix, boolean prefixable, Map<String, Double> units) {
        this.noun = noun;
        this.symbol = symbol;
        this.keySuffix = keySuffix;
        this.prefixable = prefixable;
        this.units = units;
    }

    /** What the quantity is called in messages ("inductance"). */
    public String noun() {
        return noun;
    }

    /** The unit symbol shown to users ("H", "Ω", "°C"); empty for plain numbers. */
    public String symbol() {
        return symbol;
    }

    /** The ASCII suffix used in JSON keys ("H" in {@code inductance_H}); empty for plain numbers. */
    public String keySuffix() {
        return keySuffix;
    }

    /** Whether SI prefixes (n, µ, m, k, M...) may stand before the unit. */
    public boolean prefixable() {
        return prefixable;
    }

    /** Accepted unit spellings and their factor to the internal unit. */
    public Map<String, Double> units() {
        return units;
    }

    /** A short example of valid input, for messages. */
    public String example() {
        return switch (this) {
            case LENGTH -> "2.5 mm";
            case INDUCTANCE -> "22 µH";
            case CAPACITANCE -> "4.7 nF or 4n7";
            case RESISTANCE -> "0.1 Ω or 0.1 ohm";
            case FREQUENCY -> "100 kHz";
            case VOLTAGE -> "12 V";
            case CURRENT -> "5 A";
            case POWER -> "10 W";
            case ENERGY -> "1 J";
            case TIME -> "200 ns";
            case TEMPERATURE -> "20 °C";
            case ANGLE -> "10 deg";
            case FRACTION -> "2% or 0.02";
            case DECIBEL -> "-3 dB";
            case DIMENSIONLESS, PERMEABILITY -> "1.5";
            case FLUX_DENSITY -> "27 µT";
            case FIELD_STRENGTH -> "20 kA/m";
            case RESISTIVITY -> "1.72e-8 ohm·m";
            case MASS -> "0.5 kg";
            case VOLUME_FLOW -> "2 L/min";
            case AREA -> "1.5 mm²";
            case CURRENT_DENSITY -> "5 A/mm²";
            case VOLTAGE_RATE -> "100 V/µs";
        };
    }

    /** Dimensions other than this one, in declaration order, for diagnosing a wrong unit. */
    List<Dimension> others() {
        return java.util.Arrays.stream(values()).filter(d -> d != this).toList();
    }
}
