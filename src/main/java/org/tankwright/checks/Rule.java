package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;

import java.util.List;

/**
 * One design rule or safety check. A rule reads a result and adds zero or more findings; it
 * never throws on a missing section (null report, NaN value): it stays quiet instead. Adding a
 * check is adding one class that implements this and one entry in {@link Checks#RULES}.
 */
public interface Rule {
    /** Our own identifier, {@code TW-} and a letter for the family ({@code V} voltage, {@code C} capacitor, ...). */
    String id();

    /** What the rule checks, in a few words. */
    String title();

    /** Where the rule's limit comes from (a standard, a paper, a datasheet rating or "common practice"). */
    String source();

    /** Adds the rule's findings on {@code r} to {@code out}. */
    void check(AnalysisResult r, List<Finding> out);
}
