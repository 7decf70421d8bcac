package org.tankwright.coupling;

import org.apache.commons.math3.complex.Complex;

/**
 * Magnetic flux density at a point as rms phasors per Cartesian component, in tesla.
 * {@code bRms = √(|Bx|² + |By|² + |Bz|²)}: the rms magnitude of the field vector (valid for
 * any phase relation between the components).
 */
public record PhasorFlux(Complex bx, Complex by, Complex bz) {
    /** rms magnitude of the flux density, tesla. */
    public double bRms() {
        double x = bx.abs();
        double y = by.abs();
        double z = bz.abs();
        return Math.sqrt(x * x + y * y + z * z);
    }

    /** The field of one coil carrying the rms phasor current {@code current} at (x, y, z). */
    public static PhasorFlux of(FilamentSet coil, Complex current, double x, double y, double z) {
        double[] b = new double[3];
        coil.fluxDensity(x, y, z, b);
        return new PhasorFlux(current.multiply(b[0]), current.multiply(b[1]), current.multiply(b[2]));
    }

    /** The superposition of two fields. */
    public PhasorFlux plus(PhasorFlux o) {
        return new PhasorFlux(bx.add(o.bx), by.add(o.by), bz.add(o.bz));
    }
}
