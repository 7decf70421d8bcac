package org.tankwright.analysis;

import java.util.List;

/**
 * What the coil model found for one coil at the operating frequency and temperature.
 *
 * @param role              {@code primary}, {@code secondary} or {@code work coil}
 * @param label             the coil's label from the design
 * @param shape             the geometry's token ({@code spiral}, ... or {@code measured})
 * @param turns             number of turns (NaN for a measured coil)
 * @param inductance        the inductance used by the network, H (chosen model, with backing and
 *                          measured overrides applied)
 * @param inductanceSource  which model or measurement gave {@code inductance}
 * @param models            every applicable free-space inductance model side by side
 * @param spread            (max − min)/chosen over the valid models, a fraction
 * @param resistanceDc      DC resistance at the winding temperature, Ω (NaN when measured)
 * @param resistanceAc      series AC resistance at the operating frequency, Ω
 * @param resistanceModel   how the AC resistance was obtained
 * @param resistanceModels  every AC-resistance model that applies, side by side, the chosen one first
 *                          (empty when the coil is measured)
 * @param q                 ωL/R_ac
 * @param selfCapacitance   estimated self-capacitance, F (NaN when unknown)
 * @param selfResonance     estimated self-resonant frequency, Hz (NaN when unknown)
 * @param apparentInductance what an LCR meter reads at the operating frequency, L/(1 − (f/f_SR)²)
 * @param wireLength        conductor length, m (NaN when measured)
 * @param conductorMass     conductor mass, kg (NaN when measured)
 * @param conductorArea     conductor cross-section carrying current, m² (NaN when measured)
 * @param skinDepth         skin depth in the conductor at the operating frequency, m
 * @param strandDiameter    litz strand diameter, m (NaN when not litz)
 * @param turnPitch         turn-to-turn pitch, m (NaN when unknown)
 * @param notes             validity notes and warnings of the model
 */
public record CoilReport(String role, String label, String shape, double turns, double inductance,
                         String inductanceSource, List<ModelValue> models, double spread, double resistanceDc,
                         double resistanceAc, String resistanceModel, List<ResistanceValue> resistanceModels, double q, double selfCapacitance,
                         double selfResonance, double apparentInductance, double wireLength, double conductorMass,
                         double conductorArea, double skinDepth, double strandDiameter, double turnPitch,
                         List<String> notes) {
}
