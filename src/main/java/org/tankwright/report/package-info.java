/**
 * The exported faces of one analysis result: the printable tuning sheet for the bench (PDF, with
 * vector schematics and charts), CSV of every data series, the whole result as JSON, and a
 * SPICE-format netlist of the tuned network. Computes no physics of its own beyond scaling and
 * re-stating what the result holds.
 */
package org.tankwright.report;
