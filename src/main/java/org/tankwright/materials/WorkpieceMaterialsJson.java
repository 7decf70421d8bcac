package org.tankwright.materials;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads user workpiece materials from our JSON format (documented in docs/models.md, "Workpiece
 * materials file"):
 *
 * <pre>
 * { "format": "tankwright-workpiece-materials", "version": 1,
 *   "materials": [ {
 *     "name": "spring-steel", "description": "...",
 *     "density_kg_per_m3": 7850, "density_source": "...", "upper_limit_C": 1400,
 *     "resistivity_ohm_m":       { "source": "...", "points": [[20, 2.0e-7], [800, 1.15e-6]] },
 *     "specific_heat_J_per_kgK": { "source": "...", "points": [[20, 460], [800, 700]] },
 *     "magnetic": { "curie_C": 760, "curie_source": "...", "shape_s": 0.35,
 *                   "bh_curve": { "source": "...", "points": [[1000, 1.3], [1e5, 2.1]] } } } ] }
 * </pre>
 *
 * Points are [temperature °C, value] or [H A/m, B T]. Instead of {@code bh_curve} a magnetic
 * material may give {@code "saturation_T"}, {@code "initial_mu_r"} and {@code "source"}. Omit
 * {@code magnetic} for a non-magnetic material. Every error names the material and the field.
 */
public final class WorkpieceMaterialsJson {
    /** The value of the "format" member. */
    public static final String FORMAT = "tankwright-workpiece-materials";
    /** The version this reader understands. */
    public static final int VERSION = 1;

    private WorkpieceMaterialsJson() {
    }

    /** Reads the materials of a file handed to us. */
    public static List<WorkpieceMaterial> read(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(r, file.toString());
        }
    }

    /** Reads the materials from text; {@code where} names the origin in error messages. */
    public static List<WorkpieceMaterial> read(Reader reader, String where) {
        JsonElement root;
        try {
            root = JsonParser.parseReader(reader);
        } catch (JsonParseException e) {
            throw new IllegalArgumentException(where + ": not valid JSON (" + e.getMessage() + ")");
        }
        if (!root.isJsonObject()) {
            throw new IllegalArgumentException(where + ": expected a JSON object with \"format\": \"" + FORMAT + "\"");
        }
        JsonObject o = root.getAsJsonObject();
        String format = text(o, "format", where);
        if (!FORMAT.equals(format)) {
            throw new IllegalArgumentException(where + ": \"format\" is '" + format + "'; expected '" + FORMAT + "'");
        }
        double version = number(o, "version", where);
        if (version != VERSION) {
            throw new IllegalArgumentException(where + ": \"version\" " + version + " is not understood; this reader reads "
                    + VERSION);
        }
        JsonElement list = o.get("materials");
        if (list == null || !list.isJsonArray()) {
            throw new IllegalArgumentException(where + ": \"materials\" must be a list of materials");
        }
        List<WorkpieceMaterial> out = new ArrayList<>();
        int i = 0;
        for (JsonElement e : list.getAsJsonArray()) {
            String at = where + ": materials[" + i++ + "]";
            if (!e.isJsonObject()) {
                throw new IllegalArgumentException(at + " must be an object");
            }
            out.add(material(e.getAsJsonObject(), at));
        }
        return out;
    }

    private static WorkpieceMaterial material(JsonObject m, String at) {
        String name = text(m, "name", at);
        String here = at + " (" + name + ")";
        try {
            WorkpieceMagnetization mag = null;
            if (m.has("magnetic")) {
                mag = magnetization(object(m, "magnetic", here), here + ".magnetic");
            }
            return new WorkpieceMaterial(name, optionalText(m, "description"),
                    curve(object(m, "resistivity_ohm_m", here), here + ".resistivity_ohm_m"),
                    curve(object(m, "specific_heat_J_per_kgK", here), here + ".specific_heat_J_per_kgK"),
                    number(m, "density_kg_per_m3", here), optionalText(m, "density_source"),
                    number(m, "upper_limit_C", here), mag);
        } catch (IllegalArgumentException e) {
            throw e.getMessage().startsWith(at) ? e : new IllegalArgumentException(here + ": " + e.getMessage(), e);
        }
    }

    private static WorkpieceMagnetization magnetization(JsonObject g, String at) {
        double curie = number(g, "curie_C", at);
        double s = g.has("shape_s") ? number(g, "shape_s", at) : 0.35;
        if (g.has("bh_curve")) {
            return new WorkpieceMagnetization(curve(object(g, "bh_curve", at), at + ".bh_curve"), curie, s,
                    optionalText(g, "curie_source"));
        }
        if (g.has("saturation_T")) {
            return WorkpieceMagnetization.fromSaturation(number(g, "saturation_T", at), number(g, "initial_mu_r", at),
                    curie, s, optionalText(g, "source"));
        }
        throw new IllegalArgumentException(at + ": give either \"bh_curve\" or \"saturation_T\" with \"initial_mu_r\"");
    }

    private static WorkpieceCurve curve(JsonObject c, String at) {
        JsonElement p = c.get("points");
        if (p == null || !p.isJsonArray() || p.getAsJsonArray().isEmpty()) {
            throw new IllegalArgumentException(at + ".points must be a non-empty list of [x, y] pairs");
        }
        JsonArray a = p.getAsJsonArray();
        double[] x = new double[a.size()];
        double[] y = new double[a.size()];
        for (int i = 0; i < a.size(); i++) {
            JsonElement pair = a.get(i);
            if (!pair.isJsonArray() || pair.getAsJsonArray().size() != 2
                    || !isNumber(pair.getAsJsonArray().get(0)) || !isNumber(pair.getAsJsonArray().get(1))) {
                throw new IllegalArgumentException(at + ".points[" + i + "] is " + pair + "; expected [x, y] numbers");
            }
            x[i] = pair.getAsJsonArray().get(0).getAsDouble();
            y[i] = pair.getAsJsonArray().get(1).getAsDouble();
        }
        try {
            return new WorkpieceCurve(x, y, optionalText(c, "source"));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(at + ": " + e.getMessage(), e);
        }
    }

    private static boolean isNumber(JsonElement e) {
        return e.isJsonPrimitive() && e.getAsJsonPrimitive().isNumber();
    }

    private static JsonObject object(JsonObject o, String key, String at) {
        JsonElement e = o.get(key);
        if (e == null || !e.isJsonObject()) {
            throw new IllegalArgumentException(at + ": \"" + key + "\" must be an object");
        }
        return e.getAsJsonObject();
    }

    private static double number(JsonObject o, String key, String at) {
        JsonElement e = o.get(key);
        if (e == null || !isNumber(e)) {
            throw new IllegalArgumentException(at + ": \"" + key + "\" must be a number; got " + e);
        }
        return e.getAsDouble();
    }

    private static String text(JsonObject o, String key, String at) {
        JsonElement e = o.get(key);
        if (e == null || !e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw new IllegalArgumentException(at + ": \"" + key + "\" must be a text; got " + e);
        }
        return e.getAsString();
    }

    private static String optionalText(JsonObject o, String key) {
        JsonElement e = o.get(key);
        return e != null && e.isJsonPrimitive() ? e.getAsString() : "";
    }
}
