package org.tankwright.analysis;

/**
 * One AC-resistance model's answer for a coil at the operating frequency, with its provenance.
 *
 * @param name         the model's name ({@code surface-current}, {@code filament-proximity}, {@code medhurst-table} ...)
 * @param resistanceAc the AC resistance, Ω
 * @param source       the published source, or how the model is ours
 * @param valid        whether the case lies inside the model's stated validity range
 * @param note         why it is (or is not) valid, or how it compares with the others
 */
public record ResistanceValue(String name, double resistanceAc, String source, boolean valid, String note) {
}
