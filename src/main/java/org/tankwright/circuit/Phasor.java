package org.tankwright.circuit;

/** An immutable complex number, used for rms phasors and impedances at the API edge (inner loops use primitive arrays). */
public record Phasor(double re, double im) {
    public static final Phasor ZERO = new Phasor(0, 0);

    public double abs() {
        return Math.hypot(re, im);
    }

    /** Argument in degrees, in (−180, 180]. */
    public double argDeg() {
        return Math.toDegrees(Math.atan2(im, re));
    }

    public Phasor times(Phasor o) {
        return new Phasor(re * o.re - im * o.im, re * o.im + im * o.re);
    }

    public Phasor dividedBy(Phasor o) {
        double d = o.re * o.re + o.im * o.im;
        return new Phasor((re * o.re + im * o.im) / d, (im * o.re - re * o.im) / d);
    }

    public Phasor negate() {
        return new Phasor(-re, -im);
    }
}
