package org.tankwright.analysis;

import org.tankwright.units.Dimension;

/**
 * The worst value of one quantity over the operating envelope and where it occurs.
 *
 * @param quantity what ({@code C1 peak voltage})
 * @param element  the element it concerns ({@code C1}), or empty
 * @param value    the worst value, SI
 * @param dim      its dimension
 * @param at       the envelope point that produces it, in words
 */
public record WorstCase(String quantity, String element, double value, Dimension dim, String at) {
}
