package org.tankwright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A small reader of the original SPICE netlist subset, written from the format's rules (SPICE2
 * user's guide, Nagel 1975, from memory): the first line is the title, {@code *} starts a comment,
 * an element line is NAME NODE NODE VALUE (sources: {@code AC} magnitude phase), {@code K} lines
 * couple two inductors, numbers take the scale letters F P N U M (milli) K MEG G T, case-insensitive,
 * and letters after the scale are ignored.
 */
final class NetlistParser {
    record Element(String name, int a, int b, double value) {
    }

    record Netlist(String title, Map<String, Element> elements, String k1, String k2, double k, double acStart,
                   double acStop, int acPoints, boolean ended) {
    }

    private NetlistParser() {
    }

    static Netlist parse(String text) {
        String[] lines = text.split("\\R");
        String title = lines[0];
        Map<String, Element> elements = new LinkedHashMap<>();
        String k1 = null;
        String k2 = null;
        double k = Double.NaN;
        double start = Double.NaN;
        double stop = Double.NaN;
        int points = 0;
        boolean ended = false;
        for (int i = 1; i < lines.length; i++) {
            String line = lines[i].strip();
            if (line.isEmpty() || line.startsWith("*")) {
                continue;
            }
            if (ended) {
                throw new IllegalArgumentException("line after .END: " + line);
            }
            List<String> f = new ArrayList<>(List.of(line.split("\\s+")));
            String head = f.get(0).toUpperCase(Locale.ROOT);
            if (head.equals(".END")) {
                ended = true;
            } else if (head.equals(".AC")) {
                if (!f.get(1).equalsIgnoreCase("LIN")) {
                    throw new IllegalArgumentException("only LIN sweeps are read: " + line);
                }
                points = Integer.parseInt(f.get(2));
                start = number(f.get(3));
                stop = number(f.get(4));
            } else if (head.startsWith("K")) {
                k1 = f.get(1);
                k2 = f.get(2);
                k = number(f.get(3));
            } else if ("RLCVI".indexOf(head.charAt(0)) >= 0) {
                int a = Integer.parseInt(f.get(1));
                int b = Integer.parseInt(f.get(2));
                double v = head.charAt(0) == 'V' || head.charAt(0) == 'I' ? number(f.get(f.indexOf("AC") + 1)) : number(f.get(3));
                if (elements.put(head, new Element(head, a, b, v)) != null) {
                    throw new IllegalArgumentException("element named twice: " + head);
                }
            } else {
                throw new IllegalArgumentException("not in the original subset: " + line);
            }
        }
        return new Netlist(title, elements, k1, k2, k, start, stop, points, ended);
    }

    /** A SPICE number: digits, then an optional scale (MEG before M), then ignored letters. */
    static double number(String s) {
        String u = s.toUpperCase(Locale.ROOT);
        int i = 0;
        while (i < u.length() && ("0123456789.+-".indexOf(u.charAt(i)) >= 0
                || (u.charAt(i) == 'E' && i + 1 < u.length() && ("0123456789+-".indexOf(u.charAt(i + 1)) >= 0)))) {
            i++;
        }
        double mant = Double.parseDouble(u.substring(0, i));
        String rest = u.substring(i);
        double scale = rest.startsWith("MEG") ? 1e6 : rest.startsWith("MIL") ? 25.4e-6
                : rest.isEmpty() ? 1 : switch (rest.charAt(0)) {
                    case 'F' -> 1e-15;
                    case 'P' -> 1e-12;
                    case 'N' -> 1e-9;
                    case 'U' -> 1e-6;
                    case 'M' -> 1e-3;
                    case 'K' -> 1e3;
                    case 'G' -> 1e9;
                    case 'T' -> 1e12;
                    default -> 1;
                };
        return mant * scale;
    }
}
