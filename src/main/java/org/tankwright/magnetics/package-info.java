/**
 * Magnetics: coil geometries, their decomposition into filaments, elliptic-integral kernels, self inductance, AC resistance, Q and self-resonance of one coil. Engine: no user-interface imports.
 */
package org.tankwright.magnetics;
