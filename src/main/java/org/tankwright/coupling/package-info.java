/**
 * Coupling between coils: mutual inductance of filament sets (offset rings, straight segments, ring
 * with segment), Biot–Savart flux density with phasor currents, ferrite backing plates and metal
 * shields by the image method, and the link quantities M, k, L1, L2 swept over gap and lateral
 * offset, the coupling null and the coupling range over a misalignment envelope.
 * Engine: no user-interface imports.
 */
package org.tankwright.coupling;
