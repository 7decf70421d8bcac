package org.tankwright.tolerance;

import java.util.List;
import java.util.Map;

/**
 * The outcomes at the tolerance corners: every parameter at +tolerance or −tolerance (and the
 * temperature at either end of its range, tempcos at their nominal values). All 2^k corners when
 * k ≤ {@value ToleranceStudy#MAX_FACTORIAL_DIMENSIONS}, else one dimension at a time (then the
 * extremes found are not guaranteed).
 *
 * @param method   "all 2^k corners" or "one at a time"
 * @param count    corners evaluated
 * @param extremes per outcome, its lowest and highest corner
 */
public record Corners(String method, int count, List<Extreme> extremes) {

    /**
     * @param outcome     outcome name
     * @param low         lowest corner value
     * @param lowSetting  parameter name → relative deviation used (and "temperature_C")
     * @param high        highest corner value
     * @param highSetting likewise
     */
    public record Extreme(String outcome, double low, Map<String, Double> lowSetting, double high,
                          Map<String, Double> highSetting) {
    }
}
