package org.tankwright.heating;

import org.tankwright.provenance.Provenance;

/**
 * A flat work coil over its plate at one frequency and coil current.
 *
 * @param frequency        Hz
 * @param coilCurrent      rms coil current, A
 * @param emptyInductance  L0 (no plate), H
 * @param loadedInductance L0 + Im ΔZ/ω, H
 * @param workResistance   Re ΔZ, Ω
 * @param coilResistance   the coil's own resistance, Ω
 * @param surfaceField     rms tangential field at the plate surface at the ring radius where it is largest, A/m
 * @param muR              relative permeability used
 * @param resistivity      Ω·m used
 * @param referenceDepth   m
 * @param thickness        plate thickness, m
 * @param muIterations     evaluations used to make µr and the surface field agree (0 if µr is fixed)
 * @param provenance       model, source, validity, notes
 */
public record LoadedPlateCoil(double frequency, double coilCurrent, double emptyInductance, double loadedInductance,
                              double workResistance, double coilResistance, double surfaceField, double muR,
                              double resistivity, double referenceDepth, double thickness, int muIterations,
                              Provenance provenance) implements CoilLoad {

    /** Power into the plate, R_work·I², W. */
    public double workPower() {
        return workResistance * coilCurrent * coilCurrent;
    }

    /** Plate thickness over reference depth. */
    public double thicknessOverDepth() {
        return thickness / referenceDepth;
    }
}
