package org.tankwright.tolerance;

import org.apache.commons.math3.random.RandomGenerator;

/** How a parameter scatters about its nominal value, as a relative deviation. */
public sealed interface Spread permits Spread.Fixed, Spread.Uniform, Spread.Normal {

    /** A relative deviation drawn from the distribution. */
    double draw(RandomGenerator rng);

    /** The relative deviation at the tolerance edge (the corner value); 0 for a fixed parameter. */
    double tolerance();

    /** No scatter. */
    record Fixed() implements Spread {
        @Override
        public double draw(RandomGenerator rng) {
            return 0;
        }

        @Override
        public double tolerance() {
            return 0;
        }
    }

    /** Uniform within ±tolerance. */
    record Uniform(double tolerance) implements Spread {
        public Uniform {
            check(tolerance);
        }

        @Override
        public double draw(RandomGenerator rng) {
            return tolerance * (2 * rng.nextDouble() - 1);
        }
    }

    /** Normal with σ = tolerance/3 (not truncated: 0.27 % of draws fall outside the tolerance). */
    record Normal(double tolerance) implements Spread {
        public Normal {
            check(tolerance);
        }

        @Override
        public double draw(RandomGenerator rng) {
            return tolerance / 3 * rng.nextGaussian();
        }
    }

    private static void check(double t) {
        if (!(t >= 0 && t < 1)) {
            throw new IllegalArgumentException("tolerance = " + t + ": must be a fraction in [0, 1) (5% = 0.05)");
        }
    }
}
