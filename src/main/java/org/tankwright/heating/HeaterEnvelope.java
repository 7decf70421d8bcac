package org.tankwright.heating;

import java.util.List;

/**
 * Cold and hot operating points of one heater, what shifts between them and which is the worst
 * case for each quantity a component is rated by.
 *
 * @param cold       workpiece at its starting temperature (magnetic steel: below the Curie point)
 * @param hot        workpiece at its final temperature (steel: above the Curie point)
 * @param worstCases one entry per rated quantity
 */
public record HeaterEnvelope(OperatingPoint cold, OperatingPoint hot, List<WorstCase> worstCases) {
    public HeaterEnvelope {
        worstCases = List.copyOf(worstCases);
    }

    /** Which point. */
    public enum Point { COLD, HOT }

    /**
     * The worse of the two points for one quantity.
     *
     * @param quantity what is rated, in words
     * @param unit     its unit symbol
     * @param cold     value at the cold point
     * @param hot      value at the hot point
     * @param worst    the point that is worse
     * @param why      why that direction is worse
     */
    public record WorstCase(String quantity, String unit, double cold, double hot, Point worst, String why) {
    }

    /** f_hot − f_cold, Hz: its sign is the sign of −(L_hot − L_cold). */
    public double frequencyShift() {
        return hot.resonantFrequency() - cold.resonantFrequency();
    }

    /** L_hot − L_cold, H. */
    public double inductanceShift() {
        return hot.load().loadedInductance() - cold.load().loadedInductance();
    }

    /** P_hot/P_cold at the same coil current. */
    public double powerRatioAtSameCurrent() {
        return hot.load().workPower() / cold.load().workPower();
    }

    /** P_hot/P_cold at the same capacitor voltage (a voltage-limited tank): each power scaled by (V_cold/V)². */
    public double powerRatioAtSameVoltage() {
        double v = cold.capacitorVoltage() / hot.capacitorVoltage();
        return powerRatioAtSameCurrent() * v * v;
    }

    /**
     * P_hot/P_cold for a series tank driven at resonance by the same bridge voltage V: the tank current is
     * V/(R_work + R_coil), so P = R_work·V²/(R_work + R_coil)².
     */
    public double powerRatioSeriesTankSameDrive() {
        return seriesPowerPerVoltSquared(hot) / seriesPowerPerVoltSquared(cold);
    }

    private static double seriesPowerPerVoltSquared(OperatingPoint p) {
        double r = p.load().totalResistance();
        return p.load().workResistance() / (r * r);
    }

    /** The lowest resonant frequency the driver must reach, Hz. */
    public double driverMinimumFrequency() {
        return Math.min(cold.resonantFrequency(), hot.resonantFrequency());
    }

    /** The highest resonant frequency the driver must reach, Hz. */
    public double driverMaximumFrequency() {
        return Math.max(cold.resonantFrequency(), hot.resonantFrequency());
    }
}
