/**
 * Numerics: special functions the physical models share (Kelvin functions and the Bessel functions
 * of complex argument they come from). Pure functions of doubles; no model knowledge, no I/O.
 */
package org.tankwright.numerics;
