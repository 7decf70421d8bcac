package org.tankwright.report;

import org.tankwright.design.DesignFiles;

import org.tankwright.report.TunedNetwork.Kind;
import org.tankwright.report.TunedNetwork.Part;

import org.tankwright.analysis.AnalysisResult;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.util.Locale;

/**
 * The tuned network as a SPICE-format netlist in the common original subset: a title line,
 * two-terminal elements named by role, a {@code K} line for the coupling, an {@code .AC} line at
 * the operating frequency and {@code .END}. Values carry SPICE scale letters, with {@code MEG}
 * for mega because SPICE reads {@code M} as milli. The source's AC magnitude is the fundamental's
 * rms value, so every AC answer of a simulator is rms too.
 */
public final class SpiceNetlist {
    private static final String[] SCALE = {"F", "P", "N", "U", "M", "", "K", "MEG", "G", "T"};

    private SpiceNetlist() {
    }

    /** The netlist text, lines ending in newline. */
    public static String write(TunedNetwork net, String title) {
        StringBuilder sb = new StringBuilder();
        sb.append(title.replaceAll("[\\r\\n]+", " ").strip()).append('\n');
        sb.append("* tuned ").append(net.topology().token()).append(" network at the operating point (")
                .append(value(net.frequency())).append("HZ); AC magnitudes are rms\n");
        sb.append("* inductors: first node is the start (dotted) terminal\n");
        for (Part p : net.parts()) {
            sb.append("* ").append(p.name()).append(": ").append(p.role()).append('\n');
        }
        for (Part p : net.parts()) {
            if (!Double.isFinite(p.value())) {
                throw new IllegalArgumentException(p.name() + " (" + p.role() + ") has no value in the result, "
                        + "and a netlist needs every element's value");
            }
            sb.append(p.name()).append(' ').append(p.a()).append(' ').append(p.b()).append(' ');
            if (p.kind() == Kind.VOLTAGE_SOURCE || p.kind() == Kind.CURRENT_SOURCE) {
                sb.append("AC ").append(value(p.value())).append(" 0");
            } else {
                sb.append(value(p.value()));
            }
            sb.append('\n');
        }
        if (net.isLink() && Double.isFinite(net.coupling())) {
            if (net.reversed()) {
                sb.append("* k was negative: L2 is written end to start so that K stays positive\n");
            }
            sb.append("K12 L1 L2 ").append(plain(net.coupling())).append('\n');
        }
        String f = value(net.frequency());
        sb.append(".AC LIN 1 ").append(f).append(' ').append(f).append('\n');
        sb.append(".END\n");
        return sb.toString();
    }

    /** Writes the netlist of a result's tuned network, titled with the design's name (atomically). */
    public static void write(AnalysisResult r, Path file) throws IOException {
        DesignFiles.replaceAtomically(file, write(TunedNetwork.of(r), r.design().name()));
    }

    /** A value with a SPICE scale letter and up to 6 significant digits: {@code 47N}, {@code 1.5MEG}, {@code 12.5M} (milli). */
    public static String value(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("a netlist value must be finite, not " + v);
        }
        if (v == 0) {
            return "0";
        }
        int exp3 = (int) Math.floor(Math.log10(Math.abs(v)) / 3.0) * 3;
        if (exp3 < -15 || exp3 > 12) {
            return String.format(Locale.ROOT, "%.6E", v);
        }
        BigDecimal mant = new BigDecimal(v / Math.pow(10, exp3)).round(new MathContext(6, RoundingMode.HALF_EVEN));
        if (mant.abs().compareTo(BigDecimal.valueOf(1000)) >= 0 && exp3 < 12) {
            exp3 += 3;
            mant = new BigDecimal(v / Math.pow(10, exp3)).round(new MathContext(6, RoundingMode.HALF_EVEN));
        }
        return mant.stripTrailingZeros().toPlainString() + SCALE[exp3 / 3 + 5];
    }

    private static String plain(double v) {
        return new BigDecimal(v).round(new MathContext(6, RoundingMode.HALF_EVEN)).stripTrailingZeros().toPlainString();
    }
}
