package org.tankwright.heating;

import org.tankwright.units.Constants;

/** How much of the heating power a workpiece loses to its surroundings while it heats: a stated allowance. */
public sealed interface LossAllowance {

    /** Heat lost per second (W) at a workpiece temperature (°C) while {@code inputPower} (W) goes in. */
    double loss(double inputPower, double temperatureC);

    /** A plain statement of the allowance for people. */
    String describe();

    /** A fixed fraction of the input power (radiation, convection, conduction into fixtures, all together). */
    record Fraction(double fraction) implements LossAllowance {
        public Fraction {
            HeatingInputs.fraction("loss allowance", fraction);
        }

        @Override
        public double loss(double inputPower, double temperatureC) {
            return fraction * inputPower;
        }

        @Override
        public String describe() {
            return "loss allowance " + fraction * 100 + " % of the input power";
        }
    }

    /**
     * Radiation ε·σ·A·(T⁴ − Ta⁴) plus natural convection h·A·(T − Ta) from an outer surface A;
     * σ = 5.670374419·10⁻⁸ W/(m²·K⁴) (CODATA 2018). Typical values (common practice): ε ≈ 0.8 for
     * oxidized steel, 0.1 for bright aluminium or copper; h ≈ 10–25 W/(m²·K) in still air.
     *
     * @param area                   m²
     * @param emissivity             0–1
     * @param convectionCoefficient  h, W/(m²·K)
     * @param ambientC               °C
     */
    record Surface(double area, double emissivity, double convectionCoefficient, double ambientC)
            implements LossAllowance {
        /** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018). */
        public static final double STEFAN_BOLTZMANN = 5.670374419e-8;

        public Surface {
            HeatingInputs.positive("surface area", area, "m²");
            if (!(emissivity >= 0 && emissivity <= 1)) {
                throw new IllegalArgumentException("emissivity " + emissivity + " must lie between 0 and 1");
            }
            HeatingInputs.nonNegative("convection coefficient", convectionCoefficient, "W/(m²·K)");
            HeatingInputs.finite("ambient temperature", ambientC, "°C");
        }

        @Override
        public double loss(double inputPower, double temperatureC) {
            double t = temperatureC + Constants.ZERO_CELSIUS_K;
            double ta = ambientC + Constants.ZERO_CELSIUS_K;
            return emissivity * STEFAN_BOLTZMANN * area * (t * t * t * t - ta * ta * ta * ta)
                    + convectionCoefficient * area * (temperatureC - ambientC);
        }

        @Override
        public String describe() {
            return "radiation (ε = " + emissivity + ") and convection (h = " + convectionCoefficient
                    + " W/(m²·K)) from " + area + " m² to " + ambientC + " °C surroundings";
        }
    }
}
