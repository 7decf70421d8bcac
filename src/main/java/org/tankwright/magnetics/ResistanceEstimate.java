package org.tankwright.magnetics;

/**
 * One AC-resistance model's answer at the operating point, with its provenance.
 *
 * @param name         short model name: {@code filament-proximity} (ours, the chosen value) or {@code medhurst-table}
 * @param resistanceAc ohms at the operating frequency and temperature
 * @param source       the model and the publication it rests on
 * @param valid        true when the coil and frequency lie inside the model's validity range
 * @param note         the validity range, or why the coil lies outside it
 */
public record ResistanceEstimate(String name, double resistanceAc, String source, boolean valid, String note) {
}
