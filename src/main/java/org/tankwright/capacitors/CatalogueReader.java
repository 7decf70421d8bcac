package org.tankwright.capacitors;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.JsonPrimitive;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Reads parts catalogues: our JSON format and CSV with a header row (see docs/catalogue.md).
 * Both share one row reader, so a field means the same in both. Numbers are SI; text cells may
 * carry units ("4.7n", "5%", "630 V"), read by the units parser. Every problem is collected and
 * reported together, each naming the row, the field, the value and what is allowed.
 */
public final class CatalogueReader {
    /** Field → dimension of its value (null: text). Order is the CSV column order we write. */
    static final Map<String, Dimension> FIELDS = new LinkedHashMap<>();

    static {
        FIELDS.put("id", null);
        FIELDS.put("description", null);
        FIELDS.put("capacitance_F", Dimension.CAPACITANCE);
        FIELDS.put("tolerance", Dimension.FRACTION);
        FIELDS.put("dielectric", null);
        FIELDS.put("tempco_ppm_per_K", Dimension.DIMENSIONLESS);
        FIELDS.put("tan_delta", Dimension.FRACTION);
        FIELDS.put("tan_delta_frequency_Hz", Dimension.FREQUENCY);
        FIELDS.put("tan_delta_exponent", Dimension.DIMENSIONLESS);
        FIELDS.put("esr_ohm", Dimension.RESISTANCE);
        FIELDS.put("esr_frequency_Hz", Dimension.FREQUENCY);
        FIELDS.put("esl_H", Dimension.INDUCTANCE);
        FIELDS.put("dc_rating_V", Dimension.VOLTAGE);
        FIELDS.put("ac_rating_V", Dimension.VOLTAGE);
        FIELDS.put("ac_rating_table", null);
        FIELDS.put("current_rating_A", Dimension.CURRENT);
        FIELDS.put("dvdt_V_per_s", Dimension.VOLTAGE_RATE);
        FIELDS.put("max_dissipation_W", Dimension.POWER);
        FIELDS.put("max_case_temperature_degC", Dimension.TEMPERATURE);
        FIELDS.put("price", Dimension.DIMENSIONLESS);
        FIELDS.put("note", null);
    }

    private static final List<String> REQUIRED = List.of("id", "capacitance_F", "tolerance", "dielectric",
            "esl_H", "dc_rating_V", "current_rating_A");

    private CatalogueReader() {
    }

    /** The bundled demo catalogue (a classpath resource, so it works from the jar anywhere). */
    public static Catalogue demo() {
        try (InputStream in = CatalogueReader.class.getResourceAsStream(Catalogue.DEMO_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("demo catalogue resource missing: " + Catalogue.DEMO_RESOURCE);
            }
            return readJson(new String(in.readAllBytes(), StandardCharsets.UTF_8), "demo catalogue");
        } catch (IOException e) {
            throw new IllegalStateException("demo catalogue unreadable: " + e.getMessage(), e);
        }
    }

    /** Reads a file: ".csv" as CSV, anything else as our JSON format. */
    public static Catalogue read(Path file) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        String name = file.getFileName().toString();
        return name.toLowerCase(Locale.ROOT).endsWith(".csv") ? readCsv(text, name) : readJson(text, name);
    }

    /** Reads our JSON format; {@code source} names the file in messages. */
    public static Catalogue readJson(String json, String source) {
        JsonElement root;
        try {
            root = JsonParser.parseString(json);
        } catch (RuntimeException e) {
            throw new CatalogueException(source + ": not valid JSON (" + e.getMessage() + ")");
        }
        if (!root.isJsonObject()) {
            throw new CatalogueException(source + ": expected a JSON object with \"format\": \"" + Catalogue.FORMAT + "\"");
        }
        JsonObject o = root.getAsJsonObject();
        String format = o.has("format") && o.get("format").isJsonPrimitive() ? o.get("format").getAsString() : null;
        if (!Catalogue.FORMAT.equals(format)) {
            throw new CatalogueException(source + ": format = " + format + ": expected \"" + Catalogue.FORMAT + "\"");
        }
        JsonElement v = o.get("version");
        if (v == null || !v.isJsonPrimitive() || !v.getAsJsonPrimitive().isNumber() || v.getAsInt() != Catalogue.VERSION) {
            throw new CatalogueException(source + ": version = " + v + ": this program reads version " + Catalogue.VERSION);
        }
        if (!o.has("parts") || !o.get("parts").isJsonArray()) {
            throw new CatalogueException(source + ": \"parts\" must be a list of part objects");
        }
        List<Map<String, Object>> rows = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        JsonArray arr = o.getAsJsonArray("parts");
        for (int i = 0; i < arr.size(); i++) {
            if (!arr.get(i).isJsonObject()) {
                problems.add("part " + (i + 1) + ": expected an object, got " + arr.get(i));
                rows.add(null);
                continue;
            }
            Map<String, Object> row = new LinkedHashMap<>();
            for (Map.Entry<String, JsonElement> e : arr.get(i).getAsJsonObject().entrySet()) {
                row.put(e.getKey(), jsonValue(e.getValue()));
            }
            rows.add(row);
        }
        return new Catalogue(text(o, "name"), text(o, "currency"), text(o, "note"), parts(rows, "part", problems, source));
    }

    private static String text(JsonObject o, String key) {
        return o.has(key) && o.get(key).isJsonPrimitive() ? o.get(key).getAsString() : "";
    }

    private static Object jsonValue(JsonElement e) {
        if (e.isJsonArray()) {
            List<Object> list = new ArrayList<>();
            for (JsonElement x : e.getAsJsonArray()) {
                list.add(x.isJsonObject() ? x.getAsJsonObject() : x);
            }
            return list;
        }
        if (e.isJsonNull()) {
            return null;
        }
        if (e.isJsonPrimitive()) {
            JsonPrimitive p = e.getAsJsonPrimitive();
            return p.isNumber() ? (Object) p.getAsDouble() : p.getAsString();
        }
        return e.toString();
    }

    /**
     * Reads CSV with a header row naming the fields (same names as the JSON). Cells may be
     * quoted ("..."); {@code ac_rating_table} is "frequency:voltage" pairs separated by ';'.
     */
    public static Catalogue readCsv(String csv, String source) {
        List<List<String>> lines = Csv.parse(csv);
        if (lines.isEmpty()) {
            throw new CatalogueException(source + ": empty; expected a header row naming the fields " + FIELDS.keySet());
        }
        List<String> header = lines.get(0);
        List<Map<String, Object>> rows = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (int r = 1; r < lines.size(); r++) {
            List<String> cells = lines.get(r);
            if (cells.size() == 1 && cells.get(0).isBlank()) {
                continue;
            }
            if (cells.size() != header.size()) {
                problems.add("row " + (r + 1) + ": " + cells.size() + " cells, the header has " + header.size());
                rows.add(null);
                continue;
            }
            Map<String, Object> row = new LinkedHashMap<>();
            for (int c = 0; c < header.size(); c++) {
                String cell = cells.get(c).trim();
                if (!cell.isEmpty()) {
                    row.put(header.get(c).trim(), cell);
                }
            }
            rows.add(row);
        }
        return new Catalogue(source, "", "imported from CSV", parts(rows, "row", problems, source));
    }

    private static List<CapacitorPart> parts(List<Map<String, Object>> rows, String noun, List<String> problems, String source) {
        List<CapacitorPart> parts = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        for (int i = 0; i < rows.size(); i++) {
            Map<String, Object> row = rows.get(i);
            if (row == null) {
                continue;
            }
            // CSV rows are numbered as lines (header is line 1); JSON parts from 1
            String where = noun.equals("row") ? "row " + (i + 2) : "part " + (i + 1);
            RowReader rr = new RowReader(row, where, problems);
            CapacitorPart p = rr.part();
            if (p != null) {
                if (!ids.add(p.id())) {
                    problems.add(where + ": id = " + p.id() + ": already used by an earlier part; ids must be unique");
                } else {
                    parts.add(p);
                }
            }
        }
        if (!problems.isEmpty()) {
            throw new CatalogueException(source + ": " + problems.size() + " problem(s):\n  " + String.join("\n  ", problems));
        }
        if (parts.isEmpty()) {
            throw new CatalogueException(source + ": no parts");
        }
        return parts;
    }

    /** Reads one row, adding problems instead of throwing. */
    private static final class RowReader {
        private final Map<String, Object> row;
        private final String where;
        private final List<String> problems;
        private final int before;

        RowReader(Map<String, Object> row, String where, List<String> problems) {
            this.row = row;
            this.where = where;
            this.problems = problems;
            this.before = problems.size();
        }

        CapacitorPart part() {
            for (String key : row.keySet()) {
                if (!FIELDS.containsKey(key)) {
                    problems.add(where + ": field '" + key + "' is not known; allowed: " + FIELDS.keySet());
                }
            }
            for (String key : REQUIRED) {
                if (row.get(key) == null) {
                    problems.add(where + ": field " + key + " is missing; it is required");
                }
            }
            boolean hasTan = row.get("tan_delta") != null;
            boolean hasEsr = row.get("esr_ohm") != null;
            if (hasTan == hasEsr) {
                problems.add(where + ": give exactly one of tan_delta (with tan_delta_frequency_Hz) or esr_ohm"
                        + " (with esr_frequency_Hz); got " + (hasTan ? "both" : "neither"));
            }
            if (problems.size() > before) {
                return null;
            }
            String id = String.valueOf(row.get("id")).trim();
            Dielectric dielectric;
            try {
                dielectric = Dielectric.parse(String.valueOf(row.get("dielectric")));
            } catch (IllegalArgumentException e) {
                problems.add(where + ": dielectric: " + e.getMessage());
                return null;
            }
            double c = number("capacitance_F", Double.NaN);
            CapacitorPart.Builder b = CapacitorPart.builder(id, c, dielectric)
                    .description(text("description")).note(text("note"))
                    .tolerance(number("tolerance", Double.NaN))
                    .esl(number("esl_H", Double.NaN))
                    .dcRating(number("dc_rating_V", Double.NaN))
                    .currentRating(number("current_rating_A", Double.NaN))
                    .acRating(optional("ac_rating_V")).dvdtRating(optional("dvdt_V_per_s"))
                    .maxDissipation(optional("max_dissipation_W")).maxCaseTemperature(optional("max_case_temperature_degC"))
                    .price(optional("price")).acRatingTable(table());
            if (row.get("tempco_ppm_per_K") != null) {
                b.tempcoPpmPerK(number("tempco_ppm_per_K", 0));
            }
            if (row.get("tan_delta_exponent") != null) {
                b.lossExponent(number("tan_delta_exponent", 0));
            }
            if (hasTan) {
                b.tanDelta(number("tan_delta", Double.NaN), number("tan_delta_frequency_Hz", 1e3));
            } else {
                b.esr(number("esr_ohm", Double.NaN), number("esr_frequency_Hz", 1e3));
            }
            if (problems.size() > before) {
                return null;
            }
            try {
                return b.build();
            } catch (IllegalArgumentException e) {
                problems.add(where + ": " + e.getMessage());
                return null;
            }
        }

        private String text(String key) {
            Object v = row.get(key);
            return v == null ? "" : String.valueOf(v);
        }

        private Double optional(String key) {
            return row.get(key) == null ? null : number(key, Double.NaN);
        }

        private double number(String key, double fallback) {
            Object v = row.get(key);
            if (v == null) {
                return fallback;
            }
            if (v instanceof Double d) {
                return d;
            }
            if (!(v instanceof String s)) {
                problems.add(where + ": " + key + " = " + v + ": must be a number");
                return Double.NaN;
            }
            try {
                return Quantities.parse(s, FIELDS.get(key));
            } catch (IllegalArgumentException e) {
                problems.add(where + ": " + key + " = " + s + ": " + e.getMessage());
                return Double.NaN;
            }
        }

        private List<AcRatingPoint> table() {
            Object v = row.get("ac_rating_table");
            List<AcRatingPoint> out = new ArrayList<>();
            if (v == null) {
                return out;
            }
            try {
                if (v instanceof List<?> list) {
                    for (Object e : list) {
                        if (!(e instanceof JsonObject jo) || !jo.has("frequency_Hz") || !jo.has("voltage_V")) {
                            throw new IllegalArgumentException("each entry must be {\"frequency_Hz\": f, \"voltage_V\": v}, got " + e);
                        }
                        out.add(new AcRatingPoint(jo.get("frequency_Hz").getAsDouble(), jo.get("voltage_V").getAsDouble()));
                    }
                } else {
                    for (String pair : String.valueOf(v).split(";")) {
                        String[] fv = pair.split(":");
                        if (fv.length != 2) {
                            throw new IllegalArgumentException("'" + pair + "' is not frequency:voltage (e.g. 100k:300)");
                        }
                        out.add(new AcRatingPoint(Quantities.parse(fv[0].trim(), Dimension.FREQUENCY),
                                Quantities.parse(fv[1].trim(), Dimension.VOLTAGE)));
                    }
                }
            } catch (RuntimeException e) {
                problems.add(where + ": ac_rating_table = " + v + ": " + e.getMessage());
            }
            return out;
        }
    }
}
