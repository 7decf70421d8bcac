package org.tankwright.capacitors;

import java.util.List;

/**
 * Outcome of a bank search.
 *
 * @param banks          feasible banks, best first (fewest parts, then least deviation, then price, then margin)
 * @param verdicts       for each bank, why it ranks where it does against the best ("best" for the first)
 * @param nearMisses     infeasible banks with fewer parts than the best (or the closest ones when none is
 *                       feasible), one per limiting check: why fewer parts will not do
 * @param rejectedParts  parts excluded before the search, with the reason
 * @param evaluated      layouts evaluated
 * @param bounds         the search bounds in words
 */
public record BankSearchResult(List<CapacitorBank> banks, List<String> verdicts, List<CapacitorBank> nearMisses,
                               List<PartRejection> rejectedParts, long evaluated, String bounds) {

    /** A part left out of the search and why. */
    public record PartRejection(String partId, String reason) {
    }

    /** The best bank, or null when none is feasible. */
    public CapacitorBank best() {
        return banks.isEmpty() ? null : banks.get(0);
    }
}
