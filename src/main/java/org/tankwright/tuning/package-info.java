/**
 * Tuning: compensation capacitor sizing (the lossless textbook values of Wang, Covic &amp; Stielau
 * 2004 and a numerical solve with losses that moves C1 alone to a target input phase), every
 * zero-phase frequency and the load or coupling at which a design bifurcates, the maximum
 * efficiency and optimal load, and the operating envelope with its control solve, worst-case
 * stresses and trip levels. Built on {@link org.tankwright.circuit}; values only. Engine: no
 * user-interface imports.
 */
package org.tankwright.tuning;
