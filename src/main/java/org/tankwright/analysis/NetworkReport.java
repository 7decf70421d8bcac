package org.tankwright.analysis;

import java.util.List;
import java.util.Map;

/**
 * The tuned network at its operating point (fundamental-harmonic phasor analysis). For a single
 * tank or a heater the secondary values are NaN. rms values unless a name says peak.
 *
 * @param topology            SS, SP, PS, PP, series or parallel
 * @param frequency           drive frequency, Hz
 * @param c1                  primary (tank) capacitance used, F
 * @param c2                  secondary capacitance used, F (NaN for a single tank)
 * @param c1Textbook          lossless textbook primary value, F
 * @param c2Textbook          textbook secondary value 1/(ω²L2), F
 * @param targetPhaseDeg      input phase the primary was tuned for, degrees (positive inductive)
 * @param sourceVoltage       rms fundamental of the source voltage, V (NaN for a current-fed source)
 * @param busVoltage          DC bus voltage of a bridge, V (NaN otherwise)
 * @param inputResistance     real part of the input impedance, Ω
 * @param inputReactance      imaginary part of the input impedance, Ω
 * @param inputPhaseDeg       arg(V/I) at the source, degrees (positive inductive)
 * @param powerIn             power from the source, W
 * @param powerOut            power into the load, W
 * @param efficiency          powerOut/powerIn
 * @param sourceCurrent       rms current at the source or bridge output, A
 * @param dcCurrent           DC bus current of a bridge, A (NaN otherwise)
 * @param outputVoltage       load voltage: rms AC for a resistor, DC behind a rectifier, V
 * @param loadAc              AC resistance the secondary sees, Ω
 * @param zeroPhaseFrequencies every zero-phase frequency in [f/2, 2f], Hz
 * @param bifurcated          more than one zero-phase frequency near the design frequency
 * @param efficiencyMax       best efficiency over the load at the design frequency
 * @param loadOptimal         the load that gives it, Ω (AC ohms at the secondary terminals)
 * @param loadedQ             loaded Q of the tank the source drives (fundamental-harmonic validity)
 * @param turnOffCurrent      bridge current at switch turn-off, A (positive helps zero-voltage switching)
 * @param zvsRequiredCurrent  current needed to swing the switch node within the dead time, 2·Coss·Vdc/t_dead, A
 * @param keys                the operating point under the keys of {@code tankwright tune --json}
 * @param sweeps              impedance, phase, power, efficiency, capacitor voltages against frequency; against load and coupling
 * @param notes               validity notes and flags (rectifier mismatch, fundamental-harmonic validity)
 */
public record NetworkReport(String topology, double frequency, double c1, double c2, double c1Textbook,
                            double c2Textbook, double targetPhaseDeg, double sourceVoltage, double busVoltage,
                            double inputResistance, double inputReactance, double inputPhaseDeg, double powerIn,
                            double powerOut, double efficiency, double sourceCurrent, double dcCurrent,
                            double outputVoltage, double loadAc, double[] zeroPhaseFrequencies, boolean bifurcated,
                            double efficiencyMax, double loadOptimal, double loadedQ, double turnOffCurrent,
                            double zvsRequiredCurrent, Map<String, Object> keys, List<Series> sweeps,
                            List<String> notes) {

    /** Whether the fundamental-harmonic analysis is trustworthy (loaded Q of about 3 or more, common practice). */
    public boolean fundamentalValid() {
        return loadedQ >= 3.0;
    }
}
