package org.tankwright.capacitors;

/**
 * The duty of the worst-placed part of one kind in a bank, against its derated ratings. Limits
 * that the part does not state are {@code Double.POSITIVE_INFINITY}.
 *
 * @param role              "main" or "trim"
 * @param part              the part
 * @param count             how many of this part the bank holds
 * @param voltageRms        AC rms across the part, V
 * @param dcVoltage         DC across the part, V
 * @param peakVoltage       DC + AC peak across the part, V
 * @param currentRms        rms current, A
 * @param dissipation       I²·ESR, W
 * @param dvdt              steepest dV/dt, V/s
 * @param voltageRmsLimit   rms AC allowed after derating, from the AC rating and the DC rating less DC bias
 * @param peakVoltageLimit  derated DC rating, V
 * @param currentLimit      derated current rating, A
 * @param dissipationLimit  derated dissipation limit, W
 * @param dvdtLimit         derated dV/dt rating, V/s
 * @param srf               the part's self-resonant frequency, Hz
 * @param srfLimit          the least SRF allowed (srf factor × operating frequency), Hz
 * @param worstMargin       1 − the largest stress/limit ratio (negative: over a limit)
 * @param limitingCheck     name of the check with the least margin
 */
public record PartDuty(String role, CapacitorPart part, int count, double voltageRms, double dcVoltage,
                       double peakVoltage, double currentRms, double dissipation, double dvdt,
                       double voltageRmsLimit, double peakVoltageLimit, double currentLimit,
                       double dissipationLimit, double dvdtLimit, double srf, double srfLimit,
                       double worstMargin, String limitingCheck) {

    /** True when every check is within its derated limit. */
    public boolean withinLimits() {
        return worstMargin >= 0;
    }
}
