package org.tankwright.analysis;

import org.tankwright.design.Design;
import org.tankwright.design.Token;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/** A plain-text summary of a result, for terminals (the headless start and {@code tankwright solve}). */
public final class Summary {
    private Summary() {
    }

    /** The summary as lines of text. */
    public static String text(AnalysisResult r) {
        Design d = r.design();
        StringBuilder sb = new StringBuilder();
        sb.append(d.name()).append("  (").append(Token.of(d.kind())).append(", ")
                .append(d.compensation().topology().token()).append(" at ")
                .append(Quantities.format(d.frequency(), Dimension.FREQUENCY, 4)).append(")\n");
        if (d.description() != null) {
            sb.append(wrap(d.description(), 90)).append('\n');
        }
        return sb.toString();
    }

    static String wrap(String s, int width) {
        StringBuilder out = new StringBuilder();
        int col = 0;
        for (String w : s.split("\\s+")) {
            if (col > 0 && col + w.length() + 1 > width) {
                out.append('\n');
                col = 0;
            } else if (col > 0) {
                out.append(' ');
                col++;
            }
            out.append(w);
            col += w.length();
        }
        return out.toString();
    }
}
