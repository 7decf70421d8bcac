package org.tankwright.heating;

import org.tankwright.materials.WorkpieceCurve;
import org.tankwright.materials.WorkpieceMaterial;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * Solves a heater's cold and hot operating points: at each workpiece temperature the tank
 * resonates at f = 1/(2π·√(L(f)·C)) (L the loaded coil's inductance, which itself depends on f,
 * found by fixed-point iteration), at the set rms coil current. This is the high-Q tank
 * approximation (resonance where the coil's reactance equals the capacitor's); the lead's network
 * solver refines it with the R and L returned here.
 */
public final class HeaterOperatingPoints {
    private static final int MAX_ITERATIONS = 200;

    private HeaterOperatingPoints() {
    }

    /**
     * Cold and hot points.
     *
     * @param coil            the work coil
     * @param bar             the workpiece geometry
     * @param material        the workpiece material
     * @param coldC           starting temperature, °C
     * @param hotC            final temperature, °C
     * @param tankCapacitance F
     * @param coilCurrent     rms coil (tank) current, A
     */
    public static HeaterEnvelope solve(WorkCoil coil, BarGeometry bar, WorkpieceMaterial material, double coldC,
                                       double hotC, double tankCapacitance, double coilCurrent) {
        if (!(hotC > coldC)) {
            throw new IllegalArgumentException("hot temperature " + hotC + " °C must be above the cold temperature "
                    + coldC + " °C");
        }
        OperatingPoint cold = point("cold", coil, bar, material, coldC, tankCapacitance, coilCurrent);
        OperatingPoint hot = point("hot", coil, bar, material, hotC, tankCapacitance, coilCurrent);
        return new HeaterEnvelope(cold, hot, worstCases(cold, hot));
    }

    /** One operating point at a temperature. */
    public static OperatingPoint point(String label, WorkCoil coil, BarGeometry bar, WorkpieceMaterial material,
                                       double temperatureC, double tankCapacitance, double coilCurrent) {
        HeatingInputs.positive("tank capacitance", tankCapacitance, "F");
        WorkpieceMedium medium = new WorkpieceMedium.OfMaterial(material, temperatureC);
        double f = resonance(coil.emptyInductance(), tankCapacitance);
        boolean done = false;
        for (int i = 0; i < MAX_ITERATIONS && !done; i++) {
            double next = resonance(WorkpieceLoad.inCoil(coil, bar, medium, f, coilCurrent).loadedInductance(),
                    tankCapacitance);
            done = Math.abs(next - f) <= 1e-10 * f;
            f = next;
        }
        if (!done) {
            throw new IllegalStateException("the " + label + " point's resonance f = 1/(2π√(L(f)·C)) did not settle in "
                    + MAX_ITERATIONS + " steps (last " + f + " Hz): the load changes the inductance too strongly");
        }
        LoadedWorkCoil load = WorkpieceLoad.inCoil(coil, bar, medium, f, coilCurrent);
        return new OperatingPoint(label, temperatureC, material.magneticAt(temperatureC), tankCapacitance, load);
    }

    /**
     * Power into the workpiece against its temperature at the set coil current, each temperature at its
     * own resonance with the tank: a table (°C → W) to hand to {@link HeatingTime}. Samples are evenly
     * spaced, plus points just either side of a Curie point in the range.
     */
    public static WorkpieceCurve powerCurve(WorkCoil coil, BarGeometry bar, WorkpieceMaterial material, double fromC,
                                            double toC, double tankCapacitance, double coilCurrent, int samples) {
        if (!(toC > fromC) || samples < 2) {
            throw new IllegalArgumentException("power curve needs a temperature range (from " + fromC + " °C to " + toC
                    + " °C) and at least 2 samples (got " + samples + ")");
        }
        TreeSet<Double> temps = new TreeSet<>();
        for (int i = 0; i < samples; i++) {
            temps.add(fromC + (toC - fromC) * i / (samples - 1));
        }
        double curie = material.curiePointC();
        if (curie > fromC && curie < toC) {
            temps.add(Math.max(fromC, curie - 0.5));
            temps.add(Math.min(toC, curie + 0.5));
        }
        double[] t = new double[temps.size()];
        double[] p = new double[temps.size()];
        int k = 0;
        for (double temp : temps) {
            t[k] = temp;
            p[k++] = point("sample", coil, bar, material, temp, tankCapacitance, coilCurrent).load().workPower();
        }
        return new WorkpieceCurve(t, p, "heater operating points at the set coil current");
    }

    private static double resonance(double inductance, double capacitance) {
        return 1.0 / (2 * Math.PI * Math.sqrt(inductance * capacitance));
    }

    private static List<HeaterEnvelope.WorstCase> worstCases(OperatingPoint cold, OperatingPoint hot) {
        List<HeaterEnvelope.WorstCase> list = new ArrayList<>();
        list.add(higherIsWorse("capacitor voltage at the set coil current", "V", cold.capacitorVoltage(),
                hot.capacitorVoltage(), "the capacitor bank's voltage rating"));
        list.add(higherIsWorse("tank reactive power at the set coil current", "var", cold.tankReactivePower(),
                hot.tankReactivePower(), "the capacitor bank's reactive-power rating"));
        double vRef = cold.capacitorVoltage();
        double iCold = vRef / (2 * Math.PI * cold.resonantFrequency() * cold.load().loadedInductance());
        double iHot = vRef / (2 * Math.PI * hot.resonantFrequency() * hot.load().loadedInductance());
        list.add(higherIsWorse("coil current at the cold point's capacitor voltage", "A", iCold, iHot,
                "a voltage-limited tank drives more current through a smaller reactance: coil, lead and capacitor"
                        + " current ratings"));
        list.add(higherIsWorse("series-tank current per volt of bridge drive at resonance, 1/(R_work + R_coil)", "A/V",
                1 / cold.load().totalResistance(), 1 / hot.load().totalResistance(),
                "a series tank's current at a given bridge voltage: coil, capacitor and switch current ratings"));
        list.add(lowerIsWorse("coil efficiency", "", cold.load().efficiency(), hot.load().efficiency(),
                "more of the input heats the coil and its coolant per watt into the work"));
        list.add(lowerIsWorse("power into the workpiece at the set coil current", "W", cold.load().workPower(),
                hot.load().workPower(), "the heating time and the inverter's power at that point"));
        list.add(higherIsWorse("inverter current for the set tank current (parallel tank, I/Q)", "A",
                cold.supplyCurrent(), hot.supplyCurrent(), "the inverter's current rating"));
        list.add(higherIsWorse("resonant frequency", "Hz", cold.resonantFrequency(), hot.resonantFrequency(),
                "switching loss in the inverter and skin loss in coil and capacitors rise with frequency"));
        return list;
    }

    private static HeaterEnvelope.WorstCase higherIsWorse(String q, String unit, double cold, double hot, String why) {
        return new HeaterEnvelope.WorstCase(q, unit, cold, hot,
                hot > cold ? HeaterEnvelope.Point.HOT : HeaterEnvelope.Point.COLD, why);
    }

    private static HeaterEnvelope.WorstCase lowerIsWorse(String q, String unit, double cold, double hot, String why) {
        return new HeaterEnvelope.WorstCase(q, unit, cold, hot,
                hot < cold ? HeaterEnvelope.Point.HOT : HeaterEnvelope.Point.COLD, why);
    }
}
