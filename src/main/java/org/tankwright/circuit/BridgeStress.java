package org.tankwright.circuit;

/**
 * The inverter's view at an operating point. Turn-off currents are the instantaneous currents
 * (with the sign that charges the switch node towards zero voltage) at the edges of the bridge
 * voltage: {@code turnOffLeading} where the voltage pulse ends, {@code turnOffLagging} where it
 * starts (equal for a square wave). With a sine current i = √2·I·sin(θ − φ) lagging by φ and
 * a pulse of width πD centred on the fundamental's crest: leading √2·I·sin(π(1−D)/2 + φ),
 * lagging √2·I·sin(φ − π(1−D)/2).
 *
 * @param switchRms     rms current of one switch (each conducts half the period: I/√2)
 * @param zvsRequired   2·Coss·Vdc/t_dead, 0 when Coss or dead time was not given
 * @param zvsMargin     min(turn-off currents) − zvsRequired; ZVS holds when it is ≥ 0
 */
public record BridgeStress(double switchRms, double turnOffLeading, double turnOffLagging, double zvsRequired,
                           double zvsMargin, boolean zvs, boolean partsGiven) {

    /** Computes the bridge stress from the rms current, its lag φ behind the bridge voltage, and the drive. */
    public static BridgeStress of(double iRms, double lagRad, Source source, BridgeParts parts) {
        double ip = Math.sqrt(2) * iRms;
        double edge = Math.PI * (1 - source.duty()) / 2;
        double leading = ip * Math.sin(edge + lagRad);
        double lagging = ip * Math.sin(lagRad - edge);
        double required = parts.zvsCurrent(source.switchedVoltage());
        double margin = Math.min(leading, lagging) - required;
        boolean zvs = Math.min(leading, lagging) > 0 && margin >= 0;
        return new BridgeStress(iRms / Math.sqrt(2), leading, lagging, required, margin, zvs, parts.given());
    }
}
