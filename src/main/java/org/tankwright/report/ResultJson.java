package org.tankwright.report;

import org.tankwright.design.DesignFiles;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.ModelValue;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.analysis.Series;
import org.tankwright.analysis.WorstCase;
import org.tankwright.checks.Finding;
import org.tankwright.design.RecordCodec;
import org.tankwright.units.Dimension;

import java.io.IOException;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.util.Collection;
import java.util.Locale;
import java.util.Map;

/**
 * The whole result as one JSON object: SI values, every key ending in its unit
 * ({@code inductance_H}, {@code frequency_Hz}, {@code part_dv_dt_V_per_s}), fractions as plain
 * numbers, a value that was not computed as {@code null}. The tuned operating point comes first
 * under the same top-level keys as {@code tankwright tune --json}; the sections follow under
 * {@code coils}, {@code coupling}, {@code network}, {@code stresses}, {@code envelope},
 * {@code banks}, {@code heater}, {@code exposure}, {@code findings} and {@code notes}, and the
 * analysed design under {@code design} as in its file.
 */
public final class ResultJson {
    private static final Gson PRETTY = new GsonBuilder().setPrettyPrinting().disableHtmlEscaping()
            .serializeNulls().create();

    /** The unit of every numeric component of the result's records, by component name. */
    static final Map<String, Dimension> UNITS = Map.ofEntries(
            Map.entry("turns", Dimension.DIMENSIONLESS), Map.entry("inductance", Dimension.INDUCTANCE),
            Map.entry("spread", Dimension.FRACTION), Map.entry("resistanceDc", Dimension.RESISTANCE),
            Map.entry("resistanceAc", Dimension.RESISTANCE), Map.entry("q", Dimension.DIMENSIONLESS),
            Map.entry("selfCapacitance", Dimension.CAPACITANCE), Map.entry("selfResonance", Dimension.FREQUENCY),
            Map.entry("apparentInductance", Dimension.INDUCTANCE), Map.entry("wireLength", Dimension.LENGTH),
            Map.entry("conductorMass", Dimension.MASS), Map.entry("conductorArea", Dimension.AREA),
            Map.entry("skinDepth", Dimension.LENGTH), Map.entry("strandDiameter", Dimension.LENGTH),
            Map.entry("turnPitch", Dimension.LENGTH),
            Map.entry("mutual", Dimension.INDUCTANCE), Map.entry("k", Dimension.DIMENSIONLESS),
            Map.entry("l1", Dimension.INDUCTANCE), Map.entry("l2", Dimension.INDUCTANCE),
            Map.entry("kMin", Dimension.DIMENSIONLESS), Map.entry("kMax", Dimension.DIMENSIONLESS),
            Map.entry("nullOffset", Dimension.LENGTH),
            Map.entry("frequency", Dimension.FREQUENCY), Map.entry("c1", Dimension.CAPACITANCE),
            Map.entry("c2", Dimension.CAPACITANCE), Map.entry("c1Textbook", Dimension.CAPACITANCE),
            Map.entry("c2Textbook", Dimension.CAPACITANCE), Map.entry("targetPhaseDeg", Dimension.ANGLE),
            Map.entry("sourceVoltage", Dimension.VOLTAGE), Map.entry("busVoltage", Dimension.VOLTAGE),
            Map.entry("inputResistance", Dimension.RESISTANCE), Map.entry("inputReactance", Dimension.RESISTANCE),
            Map.entry("inputPhaseDeg", Dimension.ANGLE), Map.entry("powerIn", Dimension.POWER),
            Map.entry("powerOut", Dimension.POWER), Map.entry("efficiency", Dimension.FRACTION),
            Map.entry("sourceCurrent", Dimension.CURRENT), Map.entry("dcCurrent", Dimension.CURRENT),
            Map.entry("outputVoltage", Dimension.VOLTAGE), Map.entry("loadAc", Dimension.RESISTANCE),
            Map.entry("zeroPhaseFrequencies", Dimension.FREQUENCY), Map.entry("efficiencyMax", Dimension.FRACTION),
            Map.entry("loadOptimal", Dimension.RESISTANCE), Map.entry("loadedQ", Dimension.DIMENSIONLESS),
            Map.entry("turnOffCurrent", Dimension.CURRENT), Map.entry("zvsRequiredCurrent", Dimension.CURRENT),
            Map.entry("voltageRms", Dimension.VOLTAGE), Map.entry("voltagePeak", Dimension.VOLTAGE),
            Map.entry("currentRms", Dimension.CURRENT), Map.entry("currentPeak", Dimension.CURRENT),
            Map.entry("loss", Dimension.POWER), Map.entry("worstVoltagePeak", Dimension.VOLTAGE),
            Map.entry("worstCurrentRms", Dimension.CURRENT), Map.entry("voltageRating", Dimension.VOLTAGE),
            Map.entry("currentRating", Dimension.CURRENT),
            Map.entry("tripCurrent", Dimension.CURRENT), Map.entry("tripVoltage", Dimension.VOLTAGE),
            Map.entry("removedReceiverCurrent", Dimension.CURRENT), Map.entry("openLoadVoltage", Dimension.VOLTAGE),
            Map.entry("distances", Dimension.LENGTH), Map.entry("offsets", Dimension.LENGTH),
            Map.entry("target", Dimension.CAPACITANCE), Map.entry("capacitance", Dimension.CAPACITANCE),
            Map.entry("esr", Dimension.RESISTANCE), Map.entry("esl", Dimension.INDUCTANCE),
            Map.entry("partVoltagePeak", Dimension.VOLTAGE), Map.entry("partVoltageRating", Dimension.VOLTAGE),
            Map.entry("partCurrent", Dimension.CURRENT), Map.entry("partCurrentRating", Dimension.CURRENT),
            Map.entry("partLoss", Dimension.POWER), Map.entry("partSrf", Dimension.FREQUENCY),
            Map.entry("partDvDt", Dimension.VOLTAGE_RATE), Map.entry("partDvDtRating", Dimension.VOLTAGE_RATE),
            Map.entry("storedEnergy", Dimension.ENERGY),
            Map.entry("frequencyMin", Dimension.FREQUENCY), Map.entry("frequencyMax", Dimension.FREQUENCY),
            Map.entry("adviceMin", Dimension.FREQUENCY), Map.entry("adviceMax", Dimension.FREQUENCY),
            Map.entry("workpieceMass", Dimension.MASS), Map.entry("heatingTime", Dimension.TIME),
            Map.entry("coolantFlow", Dimension.VOLUME_FLOW),
            Map.entry("temperature", Dimension.TEMPERATURE), Map.entry("muR", Dimension.PERMEABILITY),
            Map.entry("resistivity", Dimension.RESISTIVITY), Map.entry("referenceDepth", Dimension.LENGTH),
            Map.entry("workResistance", Dimension.RESISTANCE), Map.entry("resonantFrequency", Dimension.FREQUENCY),
            Map.entry("power", Dimension.POWER), Map.entry("coilLoss", Dimension.POWER),
            Map.entry("coilEfficiency", Dimension.FRACTION), Map.entry("coilCurrent", Dimension.CURRENT),
            Map.entry("capacitorVoltage", Dimension.VOLTAGE), Map.entry("capacitorCurrent", Dimension.CURRENT),
            Map.entry("surfaceField", Dimension.FIELD_STRENGTH),
            Map.entry("distance", Dimension.LENGTH), Map.entry("bRms", Dimension.FLUX_DENSITY),
            Map.entry("computeNanos", Dimension.TIME));

    private ResultJson() {
    }

    /** The result as a JSON tree. */
    public static JsonObject tree(AnalysisResult r) {
        JsonObject o = new JsonObject();
        if (r.network() != null && r.network().keys() != null) {
            for (Map.Entry<String, Object> e : r.network().keys().entrySet()) {
                o.add(e.getKey(), any(e.getValue()));
            }
        }
        o.addProperty("design_name", r.design().name());
        for (RecordComponent c : AnalysisResult.class.getRecordComponents()) {
            String name = c.getName();
            if (name.equals("design") || name.equals("computeNanos")) {
                continue;
            }
            o.add(snake(name), any(read(c, r)));
        }
        o.addProperty("compute_time_s", r.computeNanos() * 1e-9);
        o.add("design", RecordCodec.write(r.design()));
        return o;
    }

    /** The result as pretty JSON text. */
    public static String text(AnalysisResult r) {
        return PRETTY.toJson(tree(r)) + "\n";
    }

    /** Writes the JSON text atomically. */
    public static void write(AnalysisResult r, Path file) throws IOException {
        DesignFiles.replaceAtomically(file, text(r));
    }

    /** The key of a numeric component: its name in snake case with its unit's suffix. */
    static String key(String component, Dimension dim) {
        String base = snake(component);
        String suffix = dim == null ? "" : dim.keySuffix();
        return suffix.isEmpty() || base.endsWith("_" + suffix) ? base : base + "_" + suffix;
    }

    /** {@code partDvDt} → {@code part_dv_dt}; spaces and signs become underscores. */
    static String snake(String name) {
        String s = name.replaceAll("([a-z0-9])([A-Z])", "$1_$2").toLowerCase(Locale.ROOT)
                .replaceAll("[^a-z0-9]+", "_");
        return s.replaceAll("^_+|_+$", "");
    }

    private static JsonElement any(Object v) {
        if (v == null) {
            return JsonNull.INSTANCE;
        }
        if (v instanceof Double d) {
            return number(d);
        }
        if (v instanceof Number n) {
            return new JsonPrimitive(n);
        }
        if (v instanceof Boolean b) {
            return new JsonPrimitive(b);
        }
        if (v instanceof CharSequence || v instanceof Enum<?>) {
            return new JsonPrimitive(v.toString());
        }
        if (v instanceof double[] a) {
            return array(a);
        }
        if (v instanceof double[][] a) {
            JsonArray out = new JsonArray();
            for (double[] row : a) {
                out.add(array(row));
            }
            return out;
        }
        if (v instanceof Collection<?> list) {
            JsonArray out = new JsonArray();
            list.forEach(x -> out.add(any(x)));
            return out;
        }
        if (v instanceof Map<?, ?> map) {
            JsonObject out = new JsonObject();
            map.forEach((k, x) -> out.add(String.valueOf(k), any(x)));
            return out;
        }
        if (v instanceof Record rec) {
            return record(rec);
        }
        return new JsonPrimitive(v.toString());
    }

    private static JsonObject record(Record rec) {
        JsonObject o = new JsonObject();
        if (rec instanceof Series s) {
            return series(s);
        }
        for (RecordComponent c : rec.getClass().getRecordComponents()) {
            String name = c.getName();
            Object v = read(c, rec);
            if (rec instanceof NetworkReport && name.equals("keys")) {
                continue;
            }
            if (v instanceof Double || v instanceof double[] || v instanceof double[][]) {
                o.add(key(name, dimensionOf(rec, name)), any(v));
            } else {
                o.add(snake(name), any(v));
            }
        }
        if (rec instanceof ElementStress e) {
            o.add("margin", number(e.margin()));
        } else if (rec instanceof NetworkReport n) {
            o.addProperty("fundamental_valid", n.fundamentalValid());
        }
        return o;
    }

    /** The unit of a numeric component; the few whose unit travels with the record are resolved here. */
    private static Dimension dimensionOf(Record rec, String name) {
        if (rec instanceof WorstCase w && name.equals("value")) {
            return w.dim();
        }
        if (rec instanceof ModelValue && name.equals("value")) {
            return Dimension.INDUCTANCE;
        }
        if (rec instanceof Finding f && (name.equals("value") || name.equals("limit"))) {
            Dimension d = Fmt.dimensionOfSymbol(f.unit());
            return d != null ? d : Dimension.DIMENSIONLESS;
        }
        return UNITS.get(name);
    }

    private static JsonObject series(Series s) {
        JsonObject o = new JsonObject();
        o.addProperty("id", s.id());
        o.addProperty("title", s.title());
        o.addProperty("x_label", s.xLabel());
        o.addProperty("x_unit", s.xDim() == null ? "" : s.xDim().symbol());
        o.addProperty("y_label", s.yLabel());
        o.addProperty("y_unit", s.yDim() == null ? "" : s.yDim().symbol());
        o.add(key("marker_x", s.xDim()), number(s.markerX()));
        o.add(SeriesCsv.column(s.xLabel(), s.xDim()), array(s.x()));
        o.add(SeriesCsv.column(s.yLabel(), s.yDim()), array(s.y()));
        return o;
    }

    private static JsonArray array(double[] a) {
        JsonArray out = new JsonArray(a.length);
        for (double d : a) {
            out.add(number(d));
        }
        return out;
    }

    private static JsonElement number(double d) {
        return Double.isFinite(d) ? new JsonPrimitive(d) : JsonNull.INSTANCE;
    }

    private static Object read(RecordComponent c, Object owner) {
        try {
            return c.getAccessor().invoke(owner);
        } catch (IllegalAccessException | InvocationTargetException e) {
            throw new IllegalStateException("cannot read " + c.getName() + " of " + owner.getClass().getSimpleName(), e);
        }
    }
}
