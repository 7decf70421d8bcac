package org.tankwright.materials;

/**
 * A material a workpiece can be made of: electrical resistivity and specific heat against
 * temperature, density, the temperature the tables and the solid state end at, and — for a
 * ferromagnet — its magnetization curve and Curie point. Every value carries its source.
 *
 * @param name           the name users type (lower case, hyphens), e.g. {@code carbon-steel}
 * @param description    one line for people
 * @param resistivity    resistivity in Ω·m against temperature in °C
 * @param specificHeat   specific heat in J/(kg·K) against temperature in °C
 * @param density        density in kg/m³ at 20 °C
 * @param densitySource  where the density comes from
 * @param upperLimitC    melting (solidus) or otherwise the highest sensible temperature, °C
 * @param magnetization  the magnetic behaviour, or {@code null} for a non-magnetic material (µr = 1)
 */
public record WorkpieceMaterial(String name, String description, WorkpieceCurve resistivity,
                                WorkpieceCurve specificHeat, double density, String densitySource,
                                double upperLimitC, WorkpieceMagnetization magnetization) {

    public WorkpieceMaterial {
        if (name == null || !name.matches("[a-z0-9][a-z0-9-]*")) {
            throw new IllegalArgumentException("material name '" + name
                    + "' must be lower-case letters, digits and hyphens, e.g. carbon-steel");
        }
        if (resistivity == null || specificHeat == null) {
            throw new IllegalArgumentException("material " + name + " needs a resistivity table and a specific-heat table");
        }
        for (double rho : resistivity.ys()) {
            if (!(rho > 1e-9 && rho < 1.0)) {
                throw new IllegalArgumentException("material " + name + ": resistivity " + rho
                        + " Ω·m must lie between 1e-9 and 1 Ω·m");
            }
        }
        for (double c : specificHeat.ys()) {
            if (!(c > 10 && c < 20000)) {
                throw new IllegalArgumentException("material " + name + ": specific heat " + c
                        + " J/(kg·K) must lie between 10 and 20000");
            }
        }
        if (!(density > 100 && density < 25000)) {
            throw new IllegalArgumentException("material " + name + ": density " + density
                    + " kg/m³ must lie between 100 and 25000");
        }
        if (!(upperLimitC > 20 && upperLimitC < 4000)) {
            throw new IllegalArgumentException("material " + name + ": upper temperature " + upperLimitC
                    + " °C must lie between 20 and 4000 °C");
        }
        description = description == null ? "" : description;
        densitySource = densitySource == null ? "" : densitySource;
    }

    /** Resistivity in Ω·m at a temperature in °C (table, linearly interpolated). */
    public double resistivityAt(double temperatureC) {
        return resistivity.valueAt(temperatureC);
    }

    /** Specific heat in J/(kg·K) at a temperature in °C (table, linearly interpolated). */
    public double specificHeatAt(double temperatureC) {
        return specificHeat.valueAt(temperatureC);
    }

    /** Whether the material is ferromagnetic at this temperature. */
    public boolean magneticAt(double temperatureC) {
        return magnetization != null && magnetization.magneticAt(temperatureC);
    }

    /** Relative permeability at a peak surface field strength (A/m) and a temperature (°C); 1 if non-magnetic. */
    public double relativePermeability(double hPeak, double temperatureC) {
        return magnetization == null ? 1.0 : magnetization.relativePermeability(hPeak, temperatureC);
    }

    /** The Curie point in °C, or NaN for a non-magnetic material. */
    public double curiePointC() {
        return magnetization == null ? Double.NaN : magnetization.curieC();
    }

    /** Whether the temperature lies inside the resistivity table and below the upper limit. */
    public boolean temperatureInRange(double temperatureC) {
        return resistivity.covers(temperatureC) && temperatureC <= upperLimitC;
    }
}
