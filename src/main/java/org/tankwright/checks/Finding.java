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
}
