package org.tankwright.heating;

import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/** What a workpiece is made of, as the field model needs it: a resistivity and a µr(H) rule. */
public sealed interface WorkpieceMedium {

    /** Resistivity in Ω·m. */
    double resistivity();

    /** Relative permeability at a peak surface field strength in A/m. */
    double relativePermeability(double hPeak);

    /** Whether µr depends on the field (and must be iterated with it). */
    boolean fieldDependent();

    /** One line for people: the material and temperature, or the fixed values. */
    String describe();

    /** Why the temperature lies outside the material's tables, or null when it does not (or nothing is tabulated). */
    default String rangeWarning() {
        if (this instanceof OfMaterial m && !m.material().temperatureInRange(m.temperatureC())) {
            return "temperature " + Quantities.format(m.temperatureC(), Dimension.TEMPERATURE, 4) + " lies outside "
                    + m.material().name() + "'s table or above its upper limit "
                    + Quantities.format(m.material().upperLimitC(), Dimension.TEMPERATURE, 4);
        }
        return null;
    }

    /** A material from the table at a uniform temperature. */
    record OfMaterial(WorkpieceMaterial material, double temperatureC) implements WorkpieceMedium {
        public OfMaterial {
            if (material == null) {
                throw new IllegalArgumentException("a workpiece medium needs a material");
            }
            if (!(temperatureC >= -273.15) || Double.isInfinite(temperatureC)) {
                throw new IllegalArgumentException("workpiece temperature " + temperatureC
                        + " °C must be a finite number above absolute zero");
            }
        }

        @Override
        public double resistivity() {
            return material.resistivityAt(temperatureC);
        }

        @Override
        public double relativePermeability(double hPeak) {
            return material.relativePermeability(hPeak, temperatureC);
        }

        @Override
        public boolean fieldDependent() {
            return material.magneticAt(temperatureC);
        }

        @Override
        public String describe() {
            return material.name() + " at " + temperatureC + " °C";
        }
    }

    /** A fixed resistivity and relative permeability (no iteration). */
    record Fixed(double resistivity, double muR) implements WorkpieceMedium {
        public Fixed {
            HeatingInputs.positive("resistivity", resistivity, "Ω·m");
            HeatingInputs.atLeastOne("relative permeability", muR);
        }

        @Override
        public double relativePermeability(double hPeak) {
            return muR;
        }

        @Override
        public boolean fieldDependent() {
            return false;
        }

        @Override
        public String describe() {
            return "ρ = " + resistivity + " Ω·m, µr = " + muR;
        }
    }
}
