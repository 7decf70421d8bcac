package org.tankwright.analysis;

/**
 * One model's answer for a quantity, with its provenance.
 *
 * @param name   the model's name ({@code wheeler}, {@code current-sheet}, {@code filament} ...)
 * @param value  the value in SI units
 * @param source the published source
 * @param valid  whether the case lies inside the model's stated validity range
 * @param note   why it is (or is not) valid, or how far it lies from the reference
 */
public record ModelValue(String name, double value, String source, boolean valid, String note) {
}
