package org.tankwright.checks;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.util.List;

/** Findings as text grouped by severity, and as JSON: shared by the command line and the sheet. */
public final class FindingsReport {
    private FindingsReport() {
    }

    /** The findings grouped by severity, most severe first, each with value, limit, source, element and action. */
    public static String text(List<Finding> findings) {
        StringBuilder sb = new StringBuilder();
        if (findings.isEmpty()) {
            sb.append("No findings.\n");
        }
        for (Severity s : Severity.values()) {
            List<Finding> group = findings.stream().filter(f -> f.severity() == s).toList();
            if (group.isEmpty()) {
                continue;
            }
            sb.append(s.name()).append(" (").append(group.size()).append(")\n");
            for (Finding f : group) {
                sb.append("  ").append(f.id()).append("  ").append(f.element() == null ? "" : f.element());
                if (f.hasValue()) {
                    sb.append("  ").append(quantity(f.value(), f.unit()));
                    if (f.hasLimit()) {
                        sb.append(" (limit ").append(quantity(f.limit(), f.unit())).append(')');
                    }
                }
                sb.append('\n');
                sb.append("      ").append(f.message()).append('\n');
                sb.append("      What to do: ").append(f.action()).append('\n');
                sb.append("      Limit from: ").append(f.source()).append('\n');
            }
        }
        return sb.toString();
    }

    /** A value with its unit through the one formatter when the unit is one of ours, else as a plain number. */
    public static String quantity(double v, String unit) {
        Dimension d = dimension(unit);
        if (d == Dimension.VOLUME_FLOW) {
            return Quantities.number(v * 6e4, 3) + " L/min";
        }
        if (d != null) {
            return Quantities.format(v, d, 3);
        }
        if (unit == null || unit.isEmpty()) {
            return Quantities.number(v, 3);
        }
        return engineering(v) + unit;
    }

    /** A number with an SI prefix and a trailing space, for units the formatter does not know ({@code "59.1 µ"}). */
    private static String engineering(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return Quantities.number(v, 3) + " ";
        }
        String[] prefixes = {"p", "n", "µ", "m", "", "k", "M", "G"};
        int e = (int) Math.floor(Math.log10(Math.abs(v)) / 3);
        e = Math.max(-4, Math.min(3, e));
        return Quantities.number(v / Math.pow(10, 3 * e), 3) + " " + prefixes[e + 4];
    }

    private static Dimension dimension(String unit) {
        if (unit == null || unit.isEmpty()) {
            return null;
        }
        for (Dimension d : Dimension.values()) {
            if (d.symbol().equals(unit)) {
                return d;
            }
        }
        return null;
    }

    /**
     * The findings as {@code {"findings": [{id, severity, value, limit, unit, source, element,
     * message, action}], "counts": {...}}}; SI values, {@code null} for a missing value or limit.
     */
    public static JsonObject json(List<Finding> findings) {
        JsonArray list = new JsonArray();
        for (Finding f : findings) {
            JsonObject o = new JsonObject();
            o.addProperty("id", f.id());
            o.addProperty("severity", f.severity().word());
            o.add("value", number(f.value()));
            o.add("limit", number(f.limit()));
            o.addProperty("unit", f.unit());
            o.addProperty("source", f.source());
            o.addProperty("element", f.element());
            o.addProperty("message", f.message());
            o.addProperty("action", f.action());
            list.add(o);
        }
        JsonObject counts = new JsonObject();
        for (Severity s : Severity.values()) {
            counts.addProperty(s.word(), findings.stream().filter(f -> f.severity() == s).count());
        }
        JsonObject root = new JsonObject();
        root.add("findings", list);
        root.add("counts", counts);
        return root;
    }

    private static JsonElement number(double x) {
        return Double.isFinite(x) ? new JsonPrimitive(x) : JsonNull.INSTANCE;
    }
}
