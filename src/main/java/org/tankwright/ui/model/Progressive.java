package org.tankwright.ui.model;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Design;

import java.util.function.Function;

/**
 * A pipeline that gives a quick preview of a design (its operating point) before the full result
 * (sweeps and the operating envelope): the window shows an edit at once and fills in the rest.
 */
public interface Progressive extends Function<Design, AnalysisResult> {
    /** The quick result shown first. */
    AnalysisResult preview(Design d);
}
