package org.tankwright.analysis;

/**
 * A screening estimate of the magnetic flux density near the coils.
 *
 * @param distance   distance from the coils' centre, m (in the winding plane, at the side)
 * @param bRms       rms flux density there, T
 * @param frequency  frequency, Hz
 * @param method     how it was computed
 */
public record ExposureReport(double distance, double bRms, double frequency, String method) {
}
