package org.tankwright.heating;

/**
 * The heater at one workpiece temperature, resonating with the tank capacitor at the set coil
 * current (parallel tank: the capacitor carries the coil current and sits across the coil).
 *
 * @param label            "cold" or "hot"
 * @param temperatureC     uniform workpiece temperature, °C
 * @param magnetic         whether the workpiece is ferromagnetic at this temperature
 * @param tankCapacitance  F
 * @param load             the loaded coil at the resonant frequency
 */
public record OperatingPoint(String label, double temperatureC, boolean magnetic, double tankCapacitance,
                             LoadedWorkCoil load) {

    /** Resonant frequency 1/(2π·√(L·C)) with the loaded L at that frequency, Hz. */
    public double resonantFrequency() {
        return load.frequency();
    }

    /** Capacitor voltage of a parallel tank at the set coil current ≈ coil voltage, V rms. */
    public double capacitorVoltage() {
        return load.coilVoltage();
    }

    /** Capacitor current of the parallel tank, V·ω·C, A rms (≈ the coil current when Q is high). */
    public double capacitorCurrent() {
        return capacitorVoltage() * 2 * Math.PI * resonantFrequency() * tankCapacitance;
    }

    /** Reactive power the capacitor handles, V·I, var. */
    public double tankReactivePower() {
        return load.coilVoltage() * load.coilCurrent();
    }

    /** Resistance a parallel tank presents at resonance, L/(C·R), Ω. */
    public double parallelTankResistance() {
        return load.loadedInductance() / (tankCapacitance * load.totalResistance());
    }

    /** Current the inverter supplies to a parallel tank for the set tank current, I/Q, A rms. */
    public double supplyCurrent() {
        return load.coilCurrent() / load.qualityFactor();
    }
}
