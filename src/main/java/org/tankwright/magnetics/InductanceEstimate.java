package org.tankwright.magnetics;

/**
 * One inductance model's answer with its provenance.
 *
 * @param name       short model name: wheeler, current-sheet, rosa, filament, mohan-wheeler, mohan-current-sheet, loop
 * @param inductance henries
 * @param source     the publication the formula comes from
 * @param valid      true when the coil lies inside the model's stated validity range
 * @param note       the validity range, or why the coil lies outside it
 */
public record InductanceEstimate(String name, double inductance, String source, boolean valid, String note) {
}
