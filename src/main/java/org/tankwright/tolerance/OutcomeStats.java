package org.tankwright.tolerance;

import java.util.Map;

/**
 * Distribution of one outcome over the completed samples (finite values only).
 *
 * @param name         outcome name
 * @param nominal      the outcome at nominal parameters and the reference temperature
 * @param mean         sample mean
 * @param std          sample standard deviation (n − 1)
 * @param min          smallest value
 * @param max          largest value
 * @param percentiles  "p0.1", "p1", "p5", "p50", "p95", "p99", "p99.9" → value (linear interpolation between order statistics)
 * @param histogram    counts in equal bins
 * @param limit        the user's limit, or null
 * @param yield        share of completed samples within the limit (1 without a limit)
 * @param lowest       the sample with the smallest value
 * @param highest      the sample with the largest value
 */
public record OutcomeStats(String name, double nominal, double mean, double std, double min, double max,
                          Map<String, Double> percentiles, Histogram histogram, Limit limit, double yield,
                          Sample lowest, Sample highest) {
}
