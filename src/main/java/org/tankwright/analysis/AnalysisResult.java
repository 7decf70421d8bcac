package org.tankwright.analysis;

import org.tankwright.design.Design;

/**
 * Everything one run of the pipeline found for one design, immutable. Every face (window,
 * command line, sheet) shows this and computes nothing of its own.
 *
 * @param design       the design that was analysed
 * @param computeNanos how long the analysis took
 */
public record AnalysisResult(Design design, long computeNanos) {
}
