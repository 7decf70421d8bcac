package org.tankwright.materials;

import org.tankwright.units.Constants;

/**
 * A conductor metal: resistivity at 20 °C, its linear temperature coefficient and density.
 * ρ(T) = ρ20 (1 + α (T − 20 °C)).
 */
public enum ConductorMaterial {
    /**
     * Annealed copper, IEC 60028 (International Annealed Copper Standard): ρ20 = 1/58 Ω·mm²/m,
     * α20 = 0.00393 /K, density 8890 kg/m³.
     */
    COPPER("copper", 1.0 / 58.0e6, 0.00393, 8890.0, "IEC 60028"),
    /**
     * Hard-drawn aluminium, IEC 60889: ρ20 = 0.028264 Ω·mm²/m, α20 = 0.00403 /K, density 2703 kg/m³.
     */
    ALUMINIUM("aluminium", 2.8264e-8, 0.00403, 2703.0, "IEC 60889");

    private final String label;
    private final double resistivity20;
    private final double alpha;
    private final double density;
    private final String source;

    ConductorMaterial(String label, double resistivity20, double alpha, double density, String source) {
        this.label = label;
        this.resistivity20 = resistivity20;
        this.alpha = alpha;
        this.density = density;
        this.source = source;
    }

    /** Lower-case name used in files and on the command line. */
    public String label() {
        return label;
    }

    /** Resistivity at 20 °C in Ω·m. */
    public double resistivity20() {
        return resistivity20;
    }

    /** Temperature coefficient of resistance at 20 °C, 1/K. */
    public double alpha() {
        return alpha;
    }

    /** Density in kg/m³. */
    public double density() {
        return density;
    }

    /** The standard the values come from. */
    public String source() {
        return source;
    }

    /** Resistivity in Ω·m at {@code celsius}; the linear law holds from about −50 °C to 200 °C. */
    public double resistivity(double celsius) {
        if (!Double.isFinite(celsius) || celsius < -200 || celsius > 600) {
            throw new IllegalArgumentException("winding temperature = " + celsius
                    + " °C: must be a finite value between -200 °C and 600 °C");
        }
        return resistivity20 * (1.0 + alpha * (celsius - Constants.REFERENCE_TEMPERATURE_C));
    }

    /** Parses "copper", "cu", "aluminium", "aluminum", "al" (case-insensitive). */
    public static ConductorMaterial parse(String text) {
        String t = text == null ? "" : text.trim().toLowerCase(java.util.Locale.ROOT);
        switch (t) {
            case "copper", "cu" -> {
                return COPPER;
            }
            case "aluminium", "aluminum", "al" -> {
                return ALUMINIUM;
            }
            default -> throw new IllegalArgumentException("material = '" + text
                    + "': allowed are copper (cu) and aluminium (al)");
        }
    }
}
