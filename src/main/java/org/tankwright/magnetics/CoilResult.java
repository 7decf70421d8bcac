package org.tankwright.magnetics;

import java.util.List;

/**
 * Everything the coil model says about one coil at one operating point. SI units: H, Ω, F, Hz, m, kg,
 * A/m², °C for the temperature.
 *
 * @param kind                  geometry kind (solenoid, spiral, ...)
 * @param inductance            the chosen low-frequency inductance (uniform current in the conductor), H
 * @param chosenModel           name of the model that gave {@link #inductance()}: the most accurate valid one
 * @param models                every applicable inductance model side by side
 * @param modelSpread           (largest − smallest)/chosen over the valid models
 * @param inductanceAtFrequency inductance with the conductor's internal inductance reduced by skin effect, H
 * @param apparentInductance    what an LCR meter reads at the frequency: L_f/(1 − (f/f_SR)²), H
 * @param resistanceDc          DC resistance at the temperature, Ω
 * @param resistanceAc          AC resistance at the frequency and temperature (skin + proximity), Ω
 * @param resistanceAcSkin      skin-effect part, Ω
 * @param resistanceAcProximity proximity part, Ω
 * @param resistanceModel       how the AC resistance was found (models and sources)
 * @param resistanceModels      every AC-resistance model that applies, side by side: ours first (the chosen
 *                              value, {@link #resistanceAc()}), then cross-checks such as Medhurst's table
 * @param skinDepth             skin depth in the conductor metal, m
 * @param q                     ω L_f / R_ac
 * @param selfCapacitance       self-capacitance estimate, F
 * @param selfResonance         self-resonant frequency estimate 1/(2π√(L C)), Hz
 * @param capacitanceModel      how the self-capacitance was estimated
 * @param resonanceMargin       f_SR / f (above 1 below self-resonance)
 * @param wireLength            conductor length in the winding, m
 * @param conductorMass         metal mass, kg
 * @param currentDensity        rms current density at the given current, uniform over the metal, A/m²
 * @param currentDensityAc      rms current density over the metal's effective AC area (A·R_dc/R_skin), A/m²
 * @param frequency             Hz
 * @param temperature           °C
 * @param current               rms A
 * @param qCurve                Q, R_ac and apparent inductance over frequency
 * @param warnings              cautions: near self-resonance, model limits
 */
public record CoilResult(String kind, double inductance, String chosenModel, List<InductanceEstimate> models,
        double modelSpread, double inductanceAtFrequency, double apparentInductance, double resistanceDc,
        double resistanceAc, double resistanceAcSkin, double resistanceAcProximity, String resistanceModel,
        List<ResistanceEstimate> resistanceModels,
        double skinDepth, double q, double selfCapacitance, double selfResonance, String capacitanceModel,
        double resonanceMargin, double wireLength, double conductorMass, double currentDensity,
        double currentDensityAc, double frequency, double temperature, double current, List<QPoint> qCurve,
        List<String> warnings) {

    /** One point of the Q curve. */
    public record QPoint(double frequency, double resistanceAc, double q, double apparentInductance) {
    }
}
