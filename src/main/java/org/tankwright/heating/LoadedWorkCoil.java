package org.tankwright.heating;

import org.tankwright.provenance.Provenance;

/**
 * A work coil with its workpiece at one frequency and coil current: the equivalent series
 * resistance and inductance the tank sees, and what they mean.
 *
 * @param frequency         Hz
 * @param coilCurrent       rms coil current, A
 * @param emptyInductance   L0 (no workpiece), H
 * @param loadedInductance  L with the workpiece, H (goes into the network solver)
 * @param workResistance    series resistance reflected by the workpiece, Ω
 * @param coilResistance    the coil's own resistance, Ω
 * @param surfaceField      rms axial field at the workpiece surface, A/m
 * @param heatedLength      length of workpiece inside the coil, m
 * @param bar               the bar's field solution at that surface field (per metre)
 * @param muIterations      evaluations used to make µr and the surface field agree (0 if µr is fixed)
 * @param provenance        model, source, validity, notes
 */
public record LoadedWorkCoil(double frequency, double coilCurrent, double emptyInductance, double loadedInductance,
                             double workResistance, double coilResistance, double surfaceField, double heatedLength,
                             BarResponse bar, int muIterations, Provenance provenance) implements CoilLoad {

    /** L − L0, H: negative when the workpiece's eddy currents push flux out, positive when its µr pulls flux in. */
    public double inductanceChange() {
        return loadedInductance - emptyInductance;
    }

    /** R_work + R_coil, Ω: the series resistance of the loaded coil. */
    public double totalResistance() {
        return workResistance + coilResistance;
    }

    /** Power into the workpiece, R_work·I², W. */
    public double workPower() {
        return workResistance * coilCurrent * coilCurrent;
    }

    /** Loss in the coil, R_coil·I², W. */
    public double coilLoss() {
        return coilResistance * coilCurrent * coilCurrent;
    }

    /** Coil efficiency R_work/(R_work + R_coil). */
    public double efficiency() {
        double r = totalResistance();
        return r > 0 ? workResistance / r : 0.0;
    }

    /** ωL/(R_work + R_coil): the loaded coil's Q. */
    public double qualityFactor() {
        double r = totalResistance();
        return r > 0 ? 2 * Math.PI * frequency * loadedInductance / r : Double.MAX_VALUE;
    }

    /** rms voltage across the loaded coil, I·|R + jωL|, V. */
    public double coilVoltage() {
        return coilCurrent * Math.hypot(totalResistance(), 2 * Math.PI * frequency * loadedInductance);
    }

    /** The relative permeability used. */
    public double muR() {
        return bar.muR();
    }

    /** The resistivity used, Ω·m. */
    public double resistivity() {
        return bar.resistivity();
    }

    /** The reference depth, m. */
    public double referenceDepth() {
        return bar.referenceDepth();
    }
}
