/**
 * Performance measurement of the whole program, behind {@code tankwright bench}: timed runs with
 * warm-up and medians of the analysis, sweeps, coupling, tolerance study, bank search and the
 * window start, and the slow direct references they are compared with (Neumann's double integral
 * for mutual inductance, the exhaustive bank search). A face-like tool: it uses the engine, never
 * the other way round, and touches no window code (the window start is timed in a child JVM).
 */
package org.tankwright.bench;
