package org.tankwright.capacitors;

import java.util.Arrays;
import java.util.stream.Collectors;

/**
 * Capacitor dielectrics, with the defaults the part model falls back on when a catalogue row
 * leaves a field out. Loss exponents and temperature coefficients are typical values recalled
 * from general datasheet knowledge ("from memory"), not a standard.
 *
 * <p>Loss law: {@code tan δ(f) = tan δ(f0)·(f/f0)^lossExponent}. Polypropylene and polyester
 * datasheets quote tan δ limits rising with frequency (the electrode and contact resistance
 * grows in importance), which the exponent carries; C0G and mica losses are nearly flat.
 */
public enum Dielectric {
    C0G("c0g", "C0G/NP0 class-1 ceramic", 1, 0.0, 0.0, 30.0, true),
    POLYPROPYLENE("polypropylene", "polypropylene film", 1, 0.35, -200.0, 100.0, true),
    POLYESTER("polyester", "polyester (PET) film", 1, 0.3, 400.0, 200.0, false),
    MICA("mica", "silver mica", 1, 0.0, 50.0, 50.0, true),
    CLASS2_CERAMIC("class2-ceramic", "class-2 ceramic (X7R and similar)", 2, 0.1, 0.0, 1500.0, false);

    private final String key;
    private final String description;
    private final int ceramicClass;
    private final double lossExponent;
    private final double typicalTempcoPpmPerK;
    private final double tempcoSpreadPpmPerK;
    private final boolean suitsResonantTank;

    Dielectric(String key, String description, int ceramicClass, double lossExponent,
               double typicalTempcoPpmPerK, double tempcoSpreadPpmPerK, boolean suitsResonantTank) {
        this.key = key;
        this.description = description;
        this.ceramicClass = ceramicClass;
        this.lossExponent = lossExponent;
        this.typicalTempcoPpmPerK = typicalTempcoPpmPerK;
        this.tempcoSpreadPpmPerK = tempcoSpreadPpmPerK;
        this.suitsResonantTank = suitsResonantTank;
    }

    /** The name used in catalogue files. */
    public String key() {
        return key;
    }

    public String description() {
        return description;
    }

    /** True for class-2 ceramics: capacitance drifts with DC bias, AC voltage, temperature and age. */
    public boolean isClass2() {
        return ceramicClass == 2;
    }

    /** Exponent α of the loss law tan δ ∝ f^α used to carry a quoted tan δ to another frequency. */
    public double lossExponent() {
        return lossExponent;
    }

    /** Typical temperature coefficient (ppm/K) used when a part gives none (class 2: not linear, 0 here). */
    public double typicalTempcoPpmPerK() {
        return typicalTempcoPpmPerK;
    }

    /**
     * Half-width of the tempco scatter between parts, ppm/K: C0G 0 ± 30 ppm/K is the EIA class-1
     * code's definition; the others are typical (from memory). Class 2 is not linear
     * (±15 % over −55 … 125 °C for X7R): ±1500 ppm/K is a crude linear stand-in.
     */
    public double tempcoSpreadPpmPerK() {
        return tempcoSpreadPpmPerK;
    }

    /** Whether the dielectric is a usual choice for a high-Q resonant tank (common practice). */
    public boolean suitsResonantTank() {
        return suitsResonantTank;
    }

    /** Parses a catalogue key (case-insensitive; "np0" is accepted for C0G). */
    public static Dielectric parse(String text) {
        String t = text == null ? "" : text.trim().toLowerCase(java.util.Locale.ROOT);
        if (t.equals("np0") || t.equals("c0g/np0")) {
            return C0G;
        }
        for (Dielectric d : values()) {
            if (d.key.equals(t)) {
                return d;
            }
        }
        throw new IllegalArgumentException("dielectric '" + text + "' is not known; allowed: "
                + Arrays.stream(values()).map(Dielectric::key).collect(Collectors.joining(", ")) + " (or np0)");
    }
}
