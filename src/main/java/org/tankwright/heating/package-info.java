/**
 * Induction heating: the workpiece and the work coil as the tank sees them. Reference depth; the
 * exact eddy-current power of a solid or hollow round bar in an axial field (Bessel functions of
 * complex argument); the bar inside a finite work coil with a gap (magnetic-circuit approximation),
 * giving the loaded coil's series resistance and inductance, power and coil efficiency with µr(H)
 * iterated on the surface field; a flat plate below a flat spiral work coil (coaxial rings over a
 * conducting layer, Dodd &amp; Deeds' integral); cold and hot operating points with a tank capacitor; heating time,
 * coolant flow and frequency advice. Values in, immutable records out, each with its provenance.
 * Engine: no user-interface imports.
 */
package org.tankwright.heating;
