/**
 * Figures in the window: chart views with crosshair readout and copy/save, fed by the charts package.
 */
package org.tankwright.ui.plots;
