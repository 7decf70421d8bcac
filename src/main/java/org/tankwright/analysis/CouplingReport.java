package org.tankwright.analysis;

import java.util.List;

/**
 * Coupling of a link at its nominal placement, and over its envelope.
 *
 * @param mutual        mutual inductance, H (signed)
 * @param k             coupling coefficient M/√(L1 L2) (signed)
 * @param l1            primary inductance in place (with both coils' plates), H
 * @param l2            secondary inductance in place, H
 * @param source        model or measurement that gave M
 * @param kMin          smallest |k| over the envelope (k at nominal when no envelope)
 * @param kMax          largest |k| over the envelope
 * @param kMinAt        where the smallest occurs (text)
 * @param kMaxAt        where the largest occurs (text)
 * @param nullOffset    lateral offset at which M changes sign at the nominal distance, m (NaN when none found)
 * @param sweeps        k, M, L1, L2 against distance and against offset
 * @param notes         validity notes
 */
public record CouplingReport(double mutual, double k, double l1, double l2, String source, double kMin, double kMax,
                             String kMinAt, String kMaxAt, double nullOffset, List<Series> sweeps,
                             List<String> notes) {
}
