package org.tankwright.analysis;

import java.util.List;

/**
 * The operating envelope: every point searched, the worst case of each stress, and the trip
 * levels a controller needs.
 *
 * @param points              how many envelope points were solved
 * @param worst               the worst value of each stress and where
 * @param tripCurrent         primary over-current trip level, A rms
 * @param tripVoltage         output over-voltage trip level, V
 * @param unreachable         points where the output target cannot be reached, in words
 * @param removedReceiverCurrent primary current with the receiver removed (SS), A; NaN when not applicable
 * @param openLoadVoltage     output voltage with the load open (SP/PP), V; NaN when not applicable
 * @param map                 a quantity over distance × offset for the envelope map (may be null)
 */
public record EnvelopeReport(int points, List<WorstCase> worst, double tripCurrent, double tripVoltage,
                             List<String> unreachable, double removedReceiverCurrent, double openLoadVoltage,
                             EnvelopeMap map) {

    /**
     * A map of one quantity over distance (rows) × offset (columns).
     *
     * @param quantity what the values are
     * @param distances row coordinates, m
     * @param offsets   column coordinates, m
     * @param values    values[row][column]
     */
    public record EnvelopeMap(String quantity, double[] distances, double[] offsets, double[][] values) {
    }
}
