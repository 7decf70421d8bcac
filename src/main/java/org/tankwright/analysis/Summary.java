package org.tankwright.analysis;

import org.tankwright.checks.Checks;
import org.tankwright.checks.Finding;
import org.tankwright.checks.Severity;
import org.tankwright.design.Design;
import org.tankwright.design.Token;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

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
                .append(q(d.frequency(), Dimension.FREQUENCY)).append(")\n");
        if (d.description() != null) {
            sb.append(wrap(d.description(), 96)).append('\n');
        }
        sb.append("\nCoils\n");
        for (CoilReport c : r.coils()) {
            sb.append(String.format(Locale.ROOT, "  %-10s %-14s L %-10s R_ac %-10s Q %-6s SRF %-10s (%s; models spread %s)%n",
                    c.role(), c.shape(), q(c.inductance(), Dimension.INDUCTANCE), q(c.resistanceAc(), Dimension.RESISTANCE),
                    Quantities.number(c.q(), 3), Double.isFinite(c.selfResonance()) ? q(c.selfResonance(), Dimension.FREQUENCY) : "n/a",
                    c.inductanceSource(), Quantities.format(c.spread(), Dimension.FRACTION, 2)));
        }
        CouplingReport k = r.coupling();
        if (k != null) {
            sb.append(String.format(Locale.ROOT, "\nCoupling  M %s  k %s  (L1 %s, L2 %s in place); |k| from %s to %s over the envelope%n",
                    q(k.mutual(), Dimension.INDUCTANCE), Quantities.number(k.k(), 3), q(k.l1(), Dimension.INDUCTANCE),
                    q(k.l2(), Dimension.INDUCTANCE), Quantities.number(k.kMin(), 3), Quantities.number(k.kMax(), 3)));
        }
        NetworkReport n = r.network();
        sb.append("\nTuned network\n");
        sb.append("  C1 ").append(q(n.c1(), Dimension.CAPACITANCE)).append(" (textbook ").append(q(n.c1Textbook(), Dimension.CAPACITANCE)).append(")");
        if (Double.isFinite(n.c2())) {
            sb.append("   C2 ").append(q(n.c2(), Dimension.CAPACITANCE));
        }
        sb.append(String.format(Locale.ROOT, "%n  input phase %s°, source current %s, input power %s",
                Quantities.number(n.inputPhaseDeg(), 3), q(n.sourceCurrent(), Dimension.CURRENT), q(n.powerIn(), Dimension.POWER)));
        if (Double.isFinite(n.powerOut())) {
            sb.append(", output ").append(q(n.powerOut(), Dimension.POWER)).append(" at ")
                    .append(q(n.outputVoltage(), Dimension.VOLTAGE)).append(", efficiency ")
                    .append(Quantities.format(n.efficiency(), Dimension.FRACTION, 3));
        }
        sb.append('\n');
        HeaterReport h = r.heater();
        if (h != null) {
            sb.append("\nHeater       cold                hot\n");
            row(sb, "temperature", q(h.cold().temperature(), Dimension.TEMPERATURE), q(h.hot().temperature(), Dimension.TEMPERATURE));
            row(sb, "frequency", q(h.cold().resonantFrequency(), Dimension.FREQUENCY), q(h.hot().resonantFrequency(), Dimension.FREQUENCY));
            row(sb, "work power", q(h.cold().power(), Dimension.POWER), q(h.hot().power(), Dimension.POWER));
            row(sb, "coil current", q(h.cold().coilCurrent(), Dimension.CURRENT), q(h.hot().coilCurrent(), Dimension.CURRENT));
            row(sb, "cap. voltage", q(h.cold().capacitorVoltage(), Dimension.VOLTAGE), q(h.hot().capacitorVoltage(), Dimension.VOLTAGE));
            sb.append("  heating time about ").append(Double.isFinite(h.heatingTime()) ? q(h.heatingTime(), Dimension.TIME) : "never (see notes)")
                    .append(Double.isFinite(h.coolantFlow()) ? ", coolant " + Quantities.number(h.coolantFlow() * 60000, 3) + " L/min"
                            : ", no coolant (not a tube)").append('\n');
        }
        sb.append("\nStress (rms unless peak)          V rms       V peak      I rms       loss        worst V peak\n");
        List<String> explained = new ArrayList<>();
        for (ElementStress s : r.stresses()) {
            String role = s.role();
            int open = role.indexOf(" (");
            if (open > 0 && role.endsWith(")")) {
                explained.add("  " + s.id() + ": " + role.substring(open + 2, role.length() - 1));
                role = role.substring(0, open);
            }
            sb.append(String.format(Locale.ROOT, "  %-3s %-28s %-11s %-11s %-11s %-11s %s%n", s.id(), trim(role, 28),
                    q(s.voltageRms(), Dimension.VOLTAGE), q(s.voltagePeak(), Dimension.VOLTAGE), q(s.currentRms(), Dimension.CURRENT),
                    q(s.loss(), Dimension.POWER), q(s.worstVoltagePeak(), Dimension.VOLTAGE)));
        }
        for (String e : explained) {
            sb.append(e).append('\n');
        }
        for (BankReport b : r.banks()) {
            sb.append("  bank ").append(b.id()).append(": ").append(b.seriesCount()).append(" in series × ")
                    .append(b.parallelCount()).append(" in parallel of ").append(b.part())
                    .append(b.trim().isEmpty() ? "" : ", trim " + b.trim()).append(" = ").append(q(b.capacitance(), Dimension.CAPACITANCE)).append('\n');
        }
        if (r.exposure() != null) {
            sb.append("\nField at ").append(q(r.exposure().distance(), Dimension.LENGTH)).append(": ")
                    .append(q(r.exposure().bRms(), Dimension.FLUX_DENSITY)).append(" rms (screening estimate)\n");
        }
        sb.append("\nChecks: ");
        for (Severity s : Severity.values()) {
            long count = r.findings().stream().filter(f -> f.severity() == s).count();
            sb.append(count).append(' ').append(s.word()).append(s == Severity.NOTICE ? "\n" : ", ");
        }
        for (Finding f : r.findings()) {
            if (f.severity() != Severity.NOTICE) {
                sb.append("  ").append(f.severity().word().toUpperCase(Locale.ROOT)).append(' ').append(f.id()).append(' ')
                        .append(f.element()).append(": ").append(f.message()).append('\n');
            }
        }
        sb.append('\n').append(wrap(Checks.cautions().get(Checks.cautions().size() - 1), 96)).append('\n');
        return sb.toString();
    }

    private static void row(StringBuilder sb, String what, String cold, String hot) {
        sb.append(String.format(Locale.ROOT, "  %-12s %-19s %s%n", what, cold, hot));
    }

    private static String trim(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 1) + "…";
    }

    private static String q(double v, Dimension d) {
        return Double.isFinite(v) ? Quantities.format(v, d, 3) : "—";
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
