package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;

/**
 * Where a coil is evaluated: frequency (Hz), winding temperature (°C) and rms current (A, for the
 * current density; 0 when unknown).
 */
public record OperatingPoint(double frequency, double temperature, double current) {

    /** Empty when valid; otherwise messages naming the field, its value and what is allowed. */
    public List<String> problems() {
        List<String> p = new ArrayList<>();
        if (!(frequency > 0) || Double.isInfinite(frequency)) {
            p.add("frequency = " + frequency + " Hz: must be a finite frequency greater than 0");
        }
        if (!(temperature >= -200 && temperature <= 600)) {
            p.add("temperature = " + temperature + " °C: must lie between -200 °C and 600 °C");
        }
        if (!(current >= 0) || Double.isInfinite(current)) {
            p.add("current = " + current + " A: must be a finite rms current of 0 A or more");
        }
        return p;
    }
}
