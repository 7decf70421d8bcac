package org.tankwright.tolerance;

/**
 * One varied quantity: {@code value = nominal·(1 + spread)·(1 + tempco·(T − T_ref))}, the
 * temperature coefficient itself drawn uniformly within ±{@code tempcoSpreadPerK} of
 * {@code tempcoPerK}.
 *
 * @param name              unique name
 * @param nominal           nominal value (any unit; the model decides)
 * @param spread            distribution of the relative deviation
 * @param tempcoPerK        temperature coefficient, 1/K (ppm/K × 10⁻⁶)
 * @param tempcoSpreadPerK  half-width of the tempco's own uniform scatter, 1/K
 */
public record Parameter(String name, double nominal, Spread spread, double tempcoPerK, double tempcoSpreadPerK) {
    public Parameter {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("parameter name must be a non-empty text");
        }
        if (!Double.isFinite(nominal)) {
            throw new IllegalArgumentException("parameter " + name + ": nominal = " + nominal + ": must be a finite number");
        }
        if (spread == null) {
            throw new IllegalArgumentException("parameter " + name + ": spread missing");
        }
        if (!Double.isFinite(tempcoPerK) || Math.abs(tempcoPerK) > 0.1) {
            throw new IllegalArgumentException("parameter " + name + ": tempco = " + tempcoPerK + " /K: must lie within ±0.1 /K");
        }
        if (!(tempcoSpreadPerK >= 0 && tempcoSpreadPerK <= 0.1)) {
            throw new IllegalArgumentException("parameter " + name + ": tempco spread = " + tempcoSpreadPerK + " /K: must lie in [0, 0.1]");
        }
    }

    public static Parameter uniform(String name, double nominal, double tolerance) {
        return new Parameter(name, nominal, new Spread.Uniform(tolerance), 0, 0);
    }

    public static Parameter normal(String name, double nominal, double tolerance) {
        return new Parameter(name, nominal, new Spread.Normal(tolerance), 0, 0);
    }

    public static Parameter fixed(String name, double nominal) {
        return new Parameter(name, nominal, new Spread.Fixed(), 0, 0);
    }

    /** The same parameter drifting with temperature, tempco given in ppm/K (spread ± ppm/K). */
    public Parameter withTempcoPpm(double ppmPerK, double spreadPpmPerK) {
        return new Parameter(name, nominal, spread, ppmPerK * 1e-6, spreadPpmPerK * 1e-6);
    }

    /** The value at relative deviation d, tempco tc and temperature offset dT. */
    double value(double d, double tc, double dT) {
        return nominal * (1 + d) * (1 + tc * dT);
    }
}
