/**
 * Figures built from an {@code AnalysisResult} with JFreeChart: impedance, power, efficiency and
 * capacitor voltage against frequency, coupling against gap and offset, the operating envelope
 * map and tolerance histograms. Shared by the workbench window and the exported sheet; no
 * physics here, only drawing what the result holds.
 */
package org.tankwright.charts;
