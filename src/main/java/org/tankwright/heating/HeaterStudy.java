package org.tankwright.heating;

import org.tankwright.materials.WorkpieceCurve;
import org.tankwright.materials.WorkpieceMaterial;

/**
 * Everything the heater models say about one heater, in one value: cold and hot operating points,
 * frequency advice at each, workpiece mass, heating time (with the power following the temperature)
 * and the coolant flow for the coil's loss.
 *
 * @param envelope      cold and hot operating points, shifts and worst cases
 * @param coldAdvice    frequency advice with the cold workpiece at the cold point's frequency
 * @param hotAdvice     frequency advice with the hot workpiece at the hot point's frequency (governs through-heating)
 * @param workpieceMass kg
 * @param heatingTime   cold to hot at the set coil current
 * @param coolant       water flow for the larger of the two coil losses
 */
public record HeaterStudy(HeaterEnvelope envelope, FrequencyAdvice coldAdvice, FrequencyAdvice hotAdvice,
                          double workpieceMass, HeatingTime.Estimate heatingTime, CoolantFlow coolant) {
    /** Temperature samples of the power curve for the heating time. */
    public static final int POWER_SAMPLES = 12;

    /**
     * Runs the heater models.
     *
     * @param coil            the work coil (L0, R_coil, turns, length, inner diameter)
     * @param bar             workpiece geometry
     * @param material        workpiece material
     * @param coldC           cold temperature, °C
     * @param hotC            hot temperature, °C
     * @param tankCapacitance F
     * @param coilCurrent     rms coil current, A
     * @param loss            loss allowance for the heating time
     * @param coolantRiseK    allowed coolant temperature rise, K
     */
    public static HeaterStudy run(WorkCoil coil, BarGeometry bar, WorkpieceMaterial material, double coldC,
                                  double hotC, double tankCapacitance, double coilCurrent, LossAllowance loss,
                                  double coolantRiseK) {
        HeaterEnvelope env = HeaterOperatingPoints.solve(coil, bar, material, coldC, hotC, tankCapacitance, coilCurrent);
        double d = bar.outerDiameter();
        double mass = bar.mass(material.density());
        WorkpieceCurve power = HeaterOperatingPoints.powerCurve(coil, bar, material, coldC, hotC, tankCapacitance,
                coilCurrent, POWER_SAMPLES);
        HeatingTime.Estimate time = HeatingTime.estimate(mass, material, coldC, hotC, power::valueAt, loss);
        double coilLoss = Math.max(env.cold().load().coilLoss(), env.hot().load().coilLoss());
        return new HeaterStudy(env, FrequencyAdvice.forPoint(env.cold(), d), FrequencyAdvice.forPoint(env.hot(), d),
                mass, time, CoolantFlow.water(coilLoss, coolantRiseK));
    }
}
