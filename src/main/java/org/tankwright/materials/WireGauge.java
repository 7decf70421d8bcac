package org.tankwright.materials;

import java.util.Locale;

/**
 * American Wire Gauge per ASTM B258: d = 0.127 mm × 92^((36 − n)/39), with 0 = "1/0",
 * −1 = "2/0", −2 = "3/0", −3 = "4/0" (0000).
 */
public final class WireGauge {
    /** Thickest gauge handled (4/0 = 0000). */
    public static final int MIN_AWG = -3;
    /** Thinnest gauge handled. */
    public static final int MAX_AWG = 56;

    private WireGauge() {
    }

    /** Bare diameter in metres of AWG {@code n}. */
    public static double awgDiameter(int n) {
        if (n < MIN_AWG || n > MAX_AWG) {
            throw new IllegalArgumentException("AWG " + n + ": allowed gauges are 4/0 (-3) to " + MAX_AWG);
        }
        return 0.127e-3 * Math.pow(92.0, (36.0 - n) / 39.0);
    }

    /** True when the text names an AWG size ("AWG18", "18awg", "awg 4/0", "AWG0000"). */
    public static boolean looksLikeAwg(String text) {
        return text != null && text.toLowerCase(Locale.ROOT).contains("awg");
    }

    /** Parses an AWG size into its gauge number (4/0 → −3). */
    public static int parseAwg(String text) {
        String t = text.toLowerCase(Locale.ROOT).replace("awg", "").replace("#", "").trim();
        try {
            int n;
            if (t.endsWith("/0")) {
                n = 1 - Integer.parseInt(t.substring(0, t.length() - 2).trim());
            } else if (t.matches("0{2,4}")) {
                n = 1 - t.length();
            } else {
                n = Integer.parseInt(t);
            }
            awgDiameter(n);
            return n;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("wire = '" + text
                    + "': an AWG size is written like AWG18, AWG4/0 or AWG0000 (gauges 4/0 to 56)");
        }
    }
}
