/**
 * Circuit: the complex phasor (fundamental-harmonic) network of a resonant tank or a two-coil
 * link. A {@link org.tankwright.circuit.Network} is data (nodes, two-terminal elements, coupled
 * coil pairs) solved by modified nodal analysis in {@link org.tankwright.circuit.PhasorSolver};
 * {@link org.tankwright.circuit.Topologies} builds the single series and parallel tanks and the
 * SS, SP, PS, PP links (and LCC variants) on it. Sources by their fundamental
 * ({@link org.tankwright.circuit.Source}), loads including rectifiers and a battery
 * ({@link org.tankwright.circuit.Load}), the stresses of every element at an operating point
 * ({@link org.tankwright.circuit.OperatingPoint}) and sweeps as data series
 * ({@link org.tankwright.circuit.Sweeps}). Values only: coil and coupling results come in as
 * numbers. Engine: no user-interface imports.
 */
package org.tankwright.circuit;
