package org.tankwright.heating;

import org.tankwright.provenance.Provenance;

/**
 * A work coil with its workpiece at one frequency and coil current, whatever the workpiece's shape:
 * the equivalent series resistance and inductance the tank sees and the field at the work's surface.
 */
public interface CoilLoad {
    /** Hz. */
    double frequency();

    /** rms coil current, A. */
    double coilCurrent();

    /** L0 with no workpiece, H. */
    double emptyInductance();

    /** L with the workpiece, H. */
    double loadedInductance();

    /** Series resistance reflected by the workpiece, Ω. */
    double workResistance();

    /** The coil's own series resistance, Ω. */
    double coilResistance();

    /** rms field strength at the workpiece surface that sets µr, A/m. */
    double surfaceField();

    /** Relative permeability used. */
    double muR();

    /** Resistivity used, Ω·m. */
    double resistivity();

    /** Reference depth, m. */
    double referenceDepth();

    /** Model, source, validity and notes. */
    Provenance provenance();

    /** R_work + R_coil, Ω. */
    default double totalResistance() {
        return workResistance() + coilResistance();
    }

    /** L − L0, H. */
    default double inductanceChange() {
        return loadedInductance() - emptyInductance();
    }
}
