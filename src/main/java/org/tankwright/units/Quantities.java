package org.tankwright.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The one parser and the one formatter of engineering quantities. Every face turns text into
 * numbers here and numbers into text here.
 *
 * <p>Accepted: {@code 4.7n}, {@code 4n7}, {@code 4.7 nF}, {@code 100k}, {@code 100 kHz},
 * {@code 22 µH}, {@code 22 uH}, {@code 0.1 Ω}, {@code 0.1 ohm}, {@code 4R7} (resistance),
 * {@code 2.5 mm}, {@code 1e-6}, {@code -3 dB}, {@code 2%}. Prefixes are case-sensitive: {@code m}
 * milli, {@code M} and {@code meg} mega, {@code u}, {@code µ} (U+00B5) and {@code μ} (U+03BC)
 * micro. In a length field a lone {@code m} means metres.
 */
public final class Quantities {
    private static final Pattern NUMBER =
            Pattern.compile("^([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)(.*)$");
    /** "4n7" style: digits, a prefix letter in place of the decimal point, digits, then an optional unit. */
    private static final Pattern INFIX =
            Pattern.compile("^([+-]?\\d+)(meg|[fpnuµμmkMGTR])(\\d+)(.*)$");

    private static final String[] PREFIXES = {"meg", "f", "p", "n", "u", "\u00B5", "\u03BC", "m", "c", "k", "M", "G", "T"};
    private static final double[] FACTORS = {1e6, 1e-15, 1e-12, 1e-9, 1e-6, 1e-6, 1e-6, 1e-3, 1e-2, 1e3, 1e6, 1e9, 1e12};
    private static final String[] FORMAT_PREFIXES = {"f", "p", "n", "\u00B5", "m", "", "k", "M", "G", "T"};

    private Quantities() {
    }

    /**
     * Parses {@code text} as a quantity of dimension {@code dim} and returns it in the internal
     * unit (SI; °C, degrees, dB and plain fractions as stated in {@link Dimension}).
     *
     * @throws QuantityFormatException naming the text and what is allowed
     */
    public static double parse(String text, Dimension dim) {
        if (text == null || text.isBlank()) {
            throw fail(text, dim, "is empty");
        }
        String s = text.strip().replace('\u2212', '-');
        double value;
        String rest;
        Matcher infix = INFIX.matcher(s);
        if (infix.matches() && acceptsInfix(infix.group(2), dim)) {
            String prefix = infix.group(2);
            double mant = Double.parseDouble(infix.group(1) + "." + infix.group(3));
            double pf = "R".equals(prefix) ? 1.0 : prefixFactor(prefix);
            String unit = infix.group(4).strip();
            double uf = unit.isEmpty() ? 1.0 : plainUnitFactor(unit, dim);
            if (Double.isNaN(uf)) {
                throw wrongUnit(text, dim, unit);
            }
            value = mant * pf * uf;
            return checkFinite(text, dim, value);
        }
        Matcher m = NUMBER.matcher(s);
        if (!m.matches()) {
            throw fail(text, dim, "is not a number");
        }
        value = Double.parseDouble(m.group(1));
        rest = m.group(2).strip();
        double factor = unitFactor(rest, dim);
        if (Double.isNaN(factor)) {
            throw wrongUnit(text, dim, rest);
        }
        return checkFinite(text, dim, value * factor);
    }

    private static boolean acceptsInfix(String prefix, Dimension dim) {
        if ("R".equals(prefix)) {
            return dim == Dimension.RESISTANCE;
        }
        return dim.prefixable() && !"c".equals(prefix);
    }

    private static double checkFinite(String text, Dimension dim, double v) {
        if (!Double.isFinite(v)) {
            throw fail(text, dim, "is out of range");
        }
        return v;
    }

    /** Factor for the text after the number, or NaN when it is not a unit of {@code dim}. */
    private static double unitFactor(String rest, Dimension dim) {
        if (rest.isEmpty()) {
            return 1.0;
        }
        double plain = plainUnitFactor(rest, dim);
        if (!Double.isNaN(plain)) {
            return plain;
        }
        if (!dim.prefixable()) {
            return Double.NaN;
        }
        for (int i = 0; i < PREFIXES.length; i++) {
            String p = PREFIXES[i];
            if ("c".equals(p) && dim != Dimension.LENGTH) {
                continue;
            }
            if (rest.startsWith(p)) {
                String unit = rest.substring(p.length()).strip();
                if (unit.isEmpty() && !"c".equals(p)) {
                    return FACTORS[i];
                }
                double uf = plainUnitFactor(unit, dim);
                if (!unit.isEmpty() && !Double.isNaN(uf)) {
                    return FACTORS[i] * uf;
                }
            }
        }
        return Double.NaN;
    }

    private static double plainUnitFactor(String unit, Dimension dim) {
        Double f = dim.units().get(unit);
        return f == null ? Double.NaN : f;
    }

    private static double prefixFactor(String prefix) {
        for (int i = 0; i < PREFIXES.length; i++) {
            if (PREFIXES[i].equals(prefix)) {
                return FACTORS[i];
            }
        }
        throw new IllegalStateException("unknown prefix " + prefix);
    }

    private static QuantityFormatException wrongUnit(String text, Dimension dim, String unit) {
        for (Dimension other : dim.others()) {
            if (!Double.isNaN(unitFactor(unit, other)) && !unit.isEmpty()) {
                return fail(text, dim, "has a unit of " + other.noun() + " ('" + unit + "')");
            }
        }
        if (dim.prefixable() && unit.startsWith("K")) {
            return fail(text, dim, "has an unknown unit '" + unit + "' (prefixes are case-sensitive: k is kilo)");
        }
        if (dim.prefixable() && unit.startsWith("U")) {
            return fail(text, dim, "has an unknown unit '" + unit + "' (prefixes are case-sensitive: u or µ is micro)");
        }
        return fail(text, dim, "has an unknown unit '" + unit + "'");
    }

    private static QuantityFormatException fail(String text, Dimension dim, String what) {
        String expected = "expected a " + dim.noun()
                + (dim.symbol().isEmpty() ? "" : " in " + dim.symbol())
                + (dim.prefixable() ? " with an optional SI prefix" : "")
                + ", e.g. " + dim.example();
        String shown = text == null ? "" : text;
        return new QuantityFormatException(shown, dim, "'" + shown + "' " + what + ": " + expected);
    }

    /** Formats an internal value with engineering prefixes and {@code sig} significant digits, e.g. "4.70 nF". */
    public static String format(double value, Dimension dim, int sig) {
        if (!Double.isFinite(value)) {
            return "n/a";
        }
        if (dim == Dimension.FRACTION) {
            return number(value * 100.0, sig) + " %";
        }
        String unit = dim.symbol();
        if (dim == Dimension.MASS && Math.abs(value) < 1.0 && value != 0.0) {
            return number(value * 1e3, sig) + " g";
        }
        if (!dim.prefixable() || value == 0.0) {
            String n = number(value, sig);
            return unit.isEmpty() ? n : n + sep(unit) + unit;
        }
        int exp3 = (int) Math.floor(Math.log10(Math.abs(value)) / 3.0) * 3;
        exp3 = Math.max(-15, Math.min(12, exp3));
        if (dim == Dimension.LENGTH) {
            exp3 = Math.max(-6, Math.min(3, exp3));
        }
        BigDecimal mant = new BigDecimal(value / Math.pow(10, exp3)).round(new MathContext(sig, RoundingMode.HALF_EVEN));
        if (mant.abs().compareTo(BigDecimal.valueOf(1000)) >= 0 && exp3 < 12 && !(dim == Dimension.LENGTH && exp3 >= 3)) {
            exp3 += 3;
            mant = new BigDecimal(value / Math.pow(10, exp3)).round(new MathContext(sig, RoundingMode.HALF_EVEN));
        }
        String prefix = FORMAT_PREFIXES[exp3 / 3 + 5];
        return plain(padded(mant, sig)) + " " + prefix + unit;
    }

    /** A plain number rounded to {@code sig} significant digits, without a unit. */
    public static String number(double value, int sig) {
        if (!Double.isFinite(value)) {
            return "n/a";
        }
        if (value == 0.0) {
            return plain(BigDecimal.ZERO.setScale(Math.max(0, sig - 1)));
        }
        BigDecimal bd = new BigDecimal(value).round(new MathContext(sig, RoundingMode.HALF_EVEN));
        double abs = Math.abs(value);
        if (abs >= 1e9 || abs < 1e-6) {
            return bd.stripTrailingZeros().toString().replace("E+", "e").replace("E", "e");
        }
        return plain(padded(bd, sig));
    }

    /** Keeps trailing zeros so that the number shows {@code sig} significant digits. */
    private static BigDecimal padded(BigDecimal bd, int sig) {
        if (bd.signum() == 0) {
            return bd.setScale(Math.max(0, sig - 1));
        }
        int scale = Math.max(bd.scale(), sig - bd.precision() + bd.scale());
        return bd.setScale(Math.max(0, scale));
    }

    private static String plain(BigDecimal bd) {
        return bd.toPlainString();
    }

    private static String sep(String unit) {
        return "°".equals(unit) ? "" : " ";
    }

    /** Accepted unit spellings of a dimension, for tooltips and help texts. */
    public static Map<String, Double> unitsOf(Dimension dim) {
        return dim.units();
    }
}
