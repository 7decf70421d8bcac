package org.tankwright.circuit;

/**
 * The networks {@link Topologies} builds: a single series or parallel tank, and two-coil links
 * whose first letter says whether the primary capacitor is in series with (S) or across (P) the
 * primary coil, the second the same for the secondary (Wang, Covic &amp; Stielau, IEEE TIE 51(1), 2004).
 */
public enum Topology {
    SERIES_TANK, PARALLEL_TANK, SS, SP, PS, PP;

    public boolean isLink() {
        return this != SERIES_TANK && this != PARALLEL_TANK;
    }

    /** Whether the primary (or the tank) capacitor is in series with the coil. */
    public boolean primarySeries() {
        return this == SERIES_TANK || this == SS || this == SP;
    }

    /** Whether the secondary capacitor is in series with the secondary coil (links only). */
    public boolean secondarySeries() {
        return this == SS || this == PS;
    }

    /** Parses SS/SP/PS/PP/series/parallel, case-insensitive. */
    public static Topology parse(String text) {
        String t = text == null ? "" : text.strip().toUpperCase(java.util.Locale.ROOT);
        return switch (t) {
            case "SS" -> SS;
            case "SP" -> SP;
            case "PS" -> PS;
            case "PP" -> PP;
            case "SERIES", "SERIES_TANK" -> SERIES_TANK;
            case "PARALLEL", "PARALLEL_TANK" -> PARALLEL_TANK;
            default -> throw new IllegalArgumentException("topology '" + text
                    + "' is not known; allowed: SS, SP, PS, PP, series, parallel");
        };
    }
}
