package org.tankwright.heating;

import org.tankwright.provenance.Provenance;
import java.util.List;

/**
 * Water flow that carries a heat load away at a chosen temperature rise: Q = P/(ρ·c_p·ΔT), with
 * water at 20 °C: ρ = 998.2 kg/m³, c_p = 4182 J/(kg·K) (handbook values, e.g. CRC Handbook;
 * from memory).
 *
 * @param heatLoad        W removed (the work coil's loss, plus any share of the workpiece's radiation it catches)
 * @param temperatureRise K, outlet minus inlet
 * @param volumeFlow      m³/s
 * @param provenance      model and source
 */
public record CoolantFlow(double heatLoad, double temperatureRise, double volumeFlow, Provenance provenance) {
    /** Density of water at 20 °C, kg/m³ (handbook, from memory). */
    public static final double WATER_DENSITY = 998.2;
    /** Specific heat of water at 20 °C, J/(kg·K) (handbook, from memory). */
    public static final double WATER_SPECIFIC_HEAT = 4182.0;

    /** The water flow for a heat load (W) and a temperature rise (K). */
    public static CoolantFlow water(double heatLoad, double temperatureRise) {
        HeatingInputs.nonNegative("coolant heat load", heatLoad, "W");
        if (!(temperatureRise > 0 && temperatureRise <= 80)) {
            throw new IllegalArgumentException("coolant temperature rise " + temperatureRise
                    + " K must lie in (0, 80] K (water must stay well below boiling)");
        }
        double q = heatLoad / (WATER_DENSITY * WATER_SPECIFIC_HEAT * temperatureRise);
        return new CoolantFlow(heatLoad, temperatureRise, q, new Provenance("heat balance of the coolant",
                "P = ρ·c_p·Q·ΔT with handbook water properties at 20 °C", true,
                List.of("the coil's passage must also keep the flow turbulent and the pressure drop within the"
                        + " supply: check the tube bore and length")));
    }

    /** Mass flow, kg/s. */
    public double massFlow() {
        return volumeFlow * WATER_DENSITY;
    }

    /** Volume flow in litres per minute. */
    public double litresPerMinute() {
        return volumeFlow * 60_000.0;
    }
}
