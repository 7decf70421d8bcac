package org.tankwright.capacitors;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Derating rules for capacitors in a tank: data, not code. Every default is common practice
 * (usual design margins for film and class-1 ceramic parts), not a standard; change them to
 * suit the parts' datasheets and the application.
 *
 * @param peakVoltageFraction  DC bias + AC peak on a part ≤ this × its DC rating
 * @param acVoltageFraction    AC rms on a part ≤ this × its AC rating at the operating frequency
 * @param currentFraction      rms current ≤ this × the current rating
 * @param dissipationFraction  I²·ESR ≤ this × the part's dissipation limit
 * @param dvdtFraction         dV/dt ≤ this × the pulse rating
 * @param srfFactor            the part's SRF must be ≥ this × the operating frequency
 * @param parallelImbalance    extra share of current the worst string of a paralleled bank may
 *                             take through layout and ESL differences (0.15 = 15 % above its
 *                             capacitive share)
 * @param allowClass2          whether class-2 ceramics may be used at all (they are flagged either way)
 */
public record DeratingRules(double peakVoltageFraction, double acVoltageFraction, double currentFraction,
                            double dissipationFraction, double dvdtFraction, double srfFactor,
                            double parallelImbalance, boolean allowClass2) {

    /** Common-practice defaults. */
    public static final DeratingRules COMMON_PRACTICE =
            new DeratingRules(0.8, 0.8, 0.8, 0.8, 0.5, 3.0, 0.15, false);

    public DeratingRules {
        fraction("peak_voltage_fraction", peakVoltageFraction);
        fraction("ac_voltage_fraction", acVoltageFraction);
        fraction("current_fraction", currentFraction);
        fraction("dissipation_fraction", dissipationFraction);
        fraction("dvdt_fraction", dvdtFraction);
        if (!(srfFactor >= 1 && srfFactor <= 100)) {
            throw new IllegalArgumentException("derating srf_factor = " + srfFactor + ": must lie in [1, 100]");
        }
        if (!(parallelImbalance >= 0 && parallelImbalance <= 1)) {
            throw new IllegalArgumentException("derating parallel_imbalance = " + parallelImbalance + ": must lie in [0, 1]");
        }
    }

    private static void fraction(String name, double v) {
        if (!(v > 0 && v <= 1)) {
            throw new IllegalArgumentException("derating " + name + " = " + v + ": must be a fraction in (0, 1]");
        }
    }

    /** The rules as a JSON-ready map (snake_case keys, the same as {@link #fromJson} reads). */
    public Map<String, Object> toMap() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("peak_voltage_fraction", peakVoltageFraction);
        m.put("ac_voltage_fraction", acVoltageFraction);
        m.put("current_fraction", currentFraction);
        m.put("dissipation_fraction", dissipationFraction);
        m.put("dvdt_fraction", dvdtFraction);
        m.put("srf_factor", srfFactor);
        m.put("parallel_imbalance", parallelImbalance);
        m.put("allow_class2", allowClass2);
        return m;
    }

    /** Reads rules from JSON; a key left out keeps the common-practice default; unknown keys are refused. */
    public static DeratingRules fromJson(String json) {
        JsonElement root;
        try {
            root = JsonParser.parseString(json);
        } catch (RuntimeException e) {
            throw new IllegalArgumentException("derating rules: not valid JSON (" + e.getMessage() + ")");
        }
        if (!root.isJsonObject()) {
            throw new IllegalArgumentException("derating rules: expected a JSON object with keys "
                    + COMMON_PRACTICE.toMap().keySet());
        }
        JsonObject o = root.getAsJsonObject();
        Map<String, Object> d = COMMON_PRACTICE.toMap();
        for (String key : o.keySet()) {
            if (!d.containsKey(key)) {
                throw new IllegalArgumentException("derating rules: key '" + key + "' is not known; allowed: " + d.keySet());
            }
        }
        return new DeratingRules(num(o, "peak_voltage_fraction", d), num(o, "ac_voltage_fraction", d),
                num(o, "current_fraction", d), num(o, "dissipation_fraction", d), num(o, "dvdt_fraction", d),
                num(o, "srf_factor", d), num(o, "parallel_imbalance", d),
                o.has("allow_class2") ? bool(o, "allow_class2") : (Boolean) d.get("allow_class2"));
    }

    private static double num(JsonObject o, String key, Map<String, Object> defaults) {
        if (!o.has(key)) {
            return (Double) defaults.get(key);
        }
        JsonElement e = o.get(key);
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isNumber()) {
            throw new IllegalArgumentException("derating rules: " + key + " = " + e + ": must be a number");
        }
        return e.getAsDouble();
    }

    private static boolean bool(JsonObject o, String key) {
        JsonElement e = o.get(key);
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isBoolean()) {
            throw new IllegalArgumentException("derating rules: " + key + " = " + e + ": must be true or false");
        }
        return e.getAsBoolean();
    }
}
