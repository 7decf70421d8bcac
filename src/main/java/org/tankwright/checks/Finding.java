package org.tankwright.checks;

/**
 * One design-rule or safety finding.
 *
 * @param id       our own identifier of the rule ({@code TW-HV-01} style)
 * @param severity danger, warning, caution or notice
 * @param value    the computed value (SI), NaN when the rule has none
 * @param limit    the limit it was held to (SI), NaN when none
 * @param unit     the unit of value and limit ({@code V}, {@code T}...), empty when none
 * @param source   where the limit comes from: a standard, a paper, a datasheet rating or "common practice"
 * @param element  the element or design field it concerns ({@code C1}, {@code $.primary.wire}), so a face can go to it
 * @param message  what was found, in words
 * @param action   what to do about it (dangers and warnings end with the deferral to local codes)
 */
public record Finding(String id, Severity severity, double value, double limit, String unit, String source,
                      String element, String message, String action) {

    /**
     * The deferral every danger and warning ends with (and the general cautions too).
     */
    public static final String DEFERRAL = "Follow your local electrical codes and have the work checked by a licensed"
            + " professional; this screening does not replace them.";

    /** A finding whose action ends with {@link #DEFERRAL} when the severity is danger or warning. */
    public static Finding of(String id, Severity severity, double value, double limit, String unit, String source,
                             String element, String message, String action) {
        String a = action;
        if ((severity == Severity.DANGER || severity == Severity.WARNING) && !a.endsWith(DEFERRAL)) {
            a = a.isEmpty() ? DEFERRAL : a + " " + DEFERRAL;
        }
        return new Finding(id, severity, value, limit, unit, source, element, message, a);
    }

    /** Whether the finding carries a computed value. */
    public boolean hasValue() {
        return Double.isFinite(value);
    }

    /** Whether the finding carries a limit. */
    public boolean hasLimit() {
        return Double.isFinite(limit);
    }
}
