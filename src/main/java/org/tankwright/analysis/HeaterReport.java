package org.tankwright.analysis;

import java.util.List;

/**
 * An induction heater's cold and hot operating points.
 *
 * @param cold            the operating point with the workpiece cold
 * @param hot             the operating point with the workpiece hot
 * @param frequencyMin    lowest frequency the driver must reach from cold to hot, Hz
 * @param frequencyMax    highest frequency the driver must reach, Hz
 * @param adviceMin       lower end of the frequency range where the workpiece is several reference depths thick
 *                        (a bar's diameter, a plate's thickness; see {@code heating.FrequencyAdvice}), Hz
 * @param adviceMax       upper end of that range, Hz
 * @param workpieceMass   kg
 * @param heatingTime     estimated time from cold to hot at the average power, s
 * @param coolantFlow     water flow the work coil needs for its loss at the chosen rise, m³/s (NaN when the coil is not a tube)
 * @param notes           approximations used and their validity
 */
public record HeaterReport(HeaterPoint cold, HeaterPoint hot, double frequencyMin, double frequencyMax,
                           double adviceMin, double adviceMax, double workpieceMass, double heatingTime,
                           double coolantFlow, List<String> notes) {

    /**
     * One heater operating point.
     *
     * @param temperature      workpiece temperature, °C
     * @param muR              relative permeability used (after the µr(H) iteration)
     * @param resistivity      workpiece resistivity, Ω·m
     * @param referenceDepth   m
     * @param workResistance   workpiece resistance reflected into the coil, Ω
     * @param inductance       loaded coil inductance, H
     * @param resonantFrequency the tank's resonant frequency with this load, Hz
     * @param power            power into the workpiece, W
     * @param coilLoss         loss in the work coil, W
     * @param coilEfficiency   R_work/(R_work + R_coil)
     * @param coilCurrent      rms work-coil current, A
     * @param capacitorVoltage rms tank capacitor voltage, V
     * @param capacitorCurrent rms tank capacitor current, A
     * @param surfaceField     rms field strength at the workpiece surface, A/m (bar: axial; plate: tangential, under the
     *                         turn where it peaks)
     */
    public record HeaterPoint(double temperature, double muR, double resistivity, double referenceDepth,
                              double workResistance, double inductance, double resonantFrequency, double power,
                              double coilLoss, double coilEfficiency, double coilCurrent, double capacitorVoltage,
                              double capacitorCurrent, double surfaceField) {
    }
}
