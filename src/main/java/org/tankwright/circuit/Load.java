package org.tankwright.circuit;

/**
 * What the secondary (or a tank) feeds. Linear loads become an AC resistance at the secondary
 * terminals; a battery is a voltage sink solved by iteration in {@link OperatingPoint}.
 */
public sealed interface Load {

    /** Output filter of a bridge rectifier. */
    enum Filter { CAPACITIVE, INDUCTIVE }

    /** Ratio R_ac/R_dc of a full-bridge rectifier with capacitive output filter, 8/π² (Steigerwald 1988). */
    double CAPACITIVE_RATIO = 8 / (Math.PI * Math.PI);
    /** Ratio R_ac/R_dc with inductive output filter, π²/8 (Steigerwald 1988). */
    double INDUCTIVE_RATIO = Math.PI * Math.PI / 8;

    /** Whether the load is linear (a fixed AC resistance). */
    boolean isLinear();

    /** The AC resistance at the secondary terminals (linear loads only; 0 = short, +∞ = open). */
    double acResistance();

    /** The model's name and source. */
    String model();

    /**
     * A warning when the load model does not hold behind this secondary (a capacitive filter wants
     * a series-tuned secondary, an inductive filter a parallel-tuned one), or null.
     */
    default String mismatch(Topology topology) {
        Filter f = filter();
        if (f == null || !topology.isLink()) {
            return null;
        }
        if (f == Filter.CAPACITIVE && !topology.secondarySeries()) {
            return "a capacitive-filter rectifier behind a parallel-tuned secondary: the 8RL/π² equivalent assumes "
                    + "a sinusoidal current source (series-tuned secondary); results are doubtful";
        }
        if (f == Filter.INDUCTIVE && topology.secondarySeries()) {
            return "an inductive-filter rectifier behind a series-tuned secondary: the π²RL/8 equivalent assumes "
                    + "a sinusoidal voltage source (parallel-tuned secondary); results are doubtful";
        }
        return null;
    }

    /** The rectifier's output filter, or null for a plain AC load. */
    default Filter filter() {
        return null;
    }

    /** A resistance at the secondary terminals, in AC ohms. */
    record Resistor(double ohms) implements Load {
        public Resistor {
            if (!(ohms >= 0)) {
                throw new IllegalArgumentException("load resistance " + ohms + " Ω must be ≥ 0 (0 = short, ∞ = open)");
            }
        }

        public boolean isLinear() {
            return true;
        }

        public double acResistance() {
            return ohms;
        }

        public String model() {
            return "AC resistance at the secondary terminals";
        }
    }

    /** A full-bridge rectifier feeding a DC resistance through a capacitive or inductive filter. */
    record Rectifier(Filter kind, double dcOhms) implements Load {
        public Rectifier {
            if (kind == null) {
                throw new IllegalArgumentException("rectifier filter is missing (capacitive or inductive)");
            }
            if (!(dcOhms >= 0)) {
                throw new IllegalArgumentException("DC load resistance " + dcOhms + " Ω must be ≥ 0");
            }
        }

        public boolean isLinear() {
            return true;
        }

        public double acResistance() {
            return dcOhms * (kind == Filter.CAPACITIVE ? CAPACITIVE_RATIO : INDUCTIVE_RATIO);
        }

        @Override
        public Filter filter() {
            return kind;
        }

        public String model() {
            return kind == Filter.CAPACITIVE
                    ? "bridge rectifier, capacitive filter: R_ac = 8·R_dc/π² (Steigerwald, IEEE TPEL 3(2), 1988)"
                    : "bridge rectifier, inductive filter: R_ac = π²·R_dc/8 (Steigerwald, IEEE TPEL 3(2), 1988)";
        }
    }

    /**
     * A battery at its charge voltage behind a bridge rectifier with capacitive filter: the
     * rectifier input voltage is a square wave of ±Vbat in phase with the current, fundamental
     * (2√2/π)·Vbat rms. Solved as a voltage sink, not a fixed resistor.
     */
    record Battery(double volts) implements Load {
        public Battery {
            if (!(volts > 0) || Double.isInfinite(volts)) {
                throw new IllegalArgumentException("battery voltage " + volts + " V must be positive and finite");
            }
        }

        public boolean isLinear() {
            return false;
        }

        public double acResistance() {
            throw new UnsupportedOperationException("a battery has no fixed AC resistance; solve the operating point");
        }

        /** rms fundamental of the rectifier input voltage. */
        public double fundamentalRms() {
            return Source.SQUARE_FUNDAMENTAL * volts;
        }

        @Override
        public Filter filter() {
            return Filter.CAPACITIVE;
        }

        public String model() {
            return "battery as a voltage sink behind a capacitive-filter bridge rectifier, fundamental (2√2/π)·Vbat "
                    + "in phase with the current (Steigerwald 1988 waveform assumption)";
        }
    }
}
