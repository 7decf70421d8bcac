package org.tankwright.coupling;

/**
 * The coupling a link sees over its misalignment envelope.
 *
 * @param gapMin     envelope's smallest gap, metres
 * @param gapMax     envelope's largest gap, metres
 * @param offsetMax  envelope's largest lateral offset, metres
 * @param lowest     the placement of smallest (most negative) k found
 * @param highest    the placement of largest k found
 * @param gridPoints placements on the search grid (before refinement)
 */
public record CouplingRange(double gapMin, double gapMax, double offsetMax, CouplingResult lowest,
                            CouplingResult highest, int gridPoints) {
    /** True when k changes sign inside the envelope (a coupling null lies within it). */
    public boolean containsNull() {
        return lowest.k() <= 0 && highest.k() >= 0;
    }

    /** Smallest |k| over the envelope: 0 when a null lies inside it. */
    public double smallestMagnitude() {
        if (containsNull()) {
            return 0;
        }
        return lowest.k() > 0 ? lowest.k() : -highest.k();
    }

    /** Largest |k| over the envelope. */
    public double largestMagnitude() {
        return Math.max(Math.abs(lowest.k()), Math.abs(highest.k()));
    }
}
