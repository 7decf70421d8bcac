package org.tankwright.design;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import org.tankwright.units.QuantityFormatException;

import java.lang.reflect.Constructor;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Reads and writes the design's records as JSON, driven by each component's {@link Field}
 * description. Reading checks every value (type, unit, range, required) and collects every
 * problem with its JSON path instead of stopping at the first. Numbers may be written as SI
 * numbers or as text with units ({@code "22 µH"}), which goes through the one units parser.
 */
public final class RecordCodec {
    private RecordCodec() {
    }

    /** The JSON key of a record component. */
    public static String key(RecordComponent c) {
        Field f = c.getAnnotation(Field.class);
        if (f != null && !f.key().isEmpty()) {
            return f.key();
        }
        String snake = c.getName().replaceAll("([a-z0-9])([A-Z])", "$1_$2").toLowerCase(Locale.ROOT);
        Dimension d = f == null ? Dimension.DIMENSIONLESS : f.dim();
        return d.keySuffix().isEmpty() ? snake : snake + "_" + d.keySuffix();
    }

    /** Reads a record of type {@code type} from {@code obj}; problems go to {@code p}; returns null if any were found in it. */
    public static <T extends Record> T read(Class<T> type, JsonObject obj, String path, Problems p) {
        RecordComponent[] comps = type.getRecordComponents();
        Object[] args = new Object[comps.length];
        boolean fieldFailed = false;
        Set<String> known = new LinkedHashSet<>();
        for (int i = 0; i < comps.length; i++) {
            RecordComponent c = comps[i];
            String key = key(c);
            known.add(key);
            int before = p.list().size();
            args[i] = readValue(c, obj.get(key), path + "." + key, p);
            // A nested section whose only problems are its own cross-field rules still counts as read,
            // so that this section's rules run too and every problem is reported at once.
            if (p.list().size() > before && !(Record.class.isAssignableFrom(c.getType()) && args[i] != null)) {
                fieldFailed = true;
            }
        }
        for (String k : obj.keySet()) {
            if (!known.contains(k)) {
                p.add(path + "." + k, null, "is not a known key here; allowed: " + String.join(", ", known));
            }
        }
        if (fieldFailed) {
            return null;
        }
        T value = construct(type, comps, args);
        if (value instanceof Checked checked) {
            checked.check(p, path);
        }
        return value;
    }

    private static Object readValue(RecordComponent c, JsonElement el, String path, Problems p) {
        Field f = c.getAnnotation(Field.class);
        Class<?> t = c.getType();
        boolean hasDefault = f != null && !f.def().isEmpty();
        if (el == null || el instanceof JsonNull) {
            if (hasDefault) {
                return fromText(t, f, f.def(), path, p);
            }
            if ((f != null && f.required()) || t.isPrimitive()) {
                p.add(path, null, "is required" + (f == null || f.doc().isEmpty() ? "" : " (" + f.doc() + ")"));
            }
            return t.isPrimitive() ? primitiveZero(t) : null;
        }
        if (Record.class.isAssignableFrom(t)) {
            if (!el.isJsonObject()) {
                p.add(path, el.toString(), "must be an object");
                return null;
            }
            @SuppressWarnings("unchecked")
            Class<? extends Record> rt = (Class<? extends Record>) t;
            return read(rt, el.getAsJsonObject(), path, p);
        }
        if (!el.isJsonPrimitive()) {
            p.add(path, el.toString(), "must be a single value");
            return t.isPrimitive() ? primitiveZero(t) : null;
        }
        JsonPrimitive prim = el.getAsJsonPrimitive();
        if (t == String.class) {
            if (!prim.isString()) {
                p.add(path, prim.toString(), "must be text");
                return null;
            }
            return prim.getAsString();
        }
        if (t == Boolean.class || t == boolean.class) {
            if (!prim.isBoolean()) {
                p.add(path, prim.toString(), "must be true or false");
                return t.isPrimitive() ? false : null;
            }
            return prim.getAsBoolean();
        }
        if (t.isEnum()) {
            if (!prim.isString()) {
                p.add(path, prim.toString(), "must be one of " + tokens(t));
                return null;
            }
            return fromText(t, f, prim.getAsString(), path, p);
        }
        // numbers: a JSON number (SI) or text with units
        if (prim.isNumber()) {
            return checkNumber(t, f, prim.getAsDouble(), prim.toString(), path, p);
        }
        if (prim.isString()) {
            return fromText(t, f, prim.getAsString(), path, p);
        }
        p.add(path, prim.toString(), "must be a number");
        return t.isPrimitive() ? primitiveZero(t) : null;
    }

    private static Object fromText(Class<?> t, Field f, String text, String path, Problems p) {
        if (t == String.class) {
            return text;
        }
        if (t == Boolean.class || t == boolean.class) {
            return Boolean.parseBoolean(text);
        }
        if (t.isEnum()) {
            for (Object constant : t.getEnumConstants()) {
                if (Token.of((Enum<?>) constant).equalsIgnoreCase(text.strip())) {
                    return constant;
                }
            }
            p.add(path, text, "must be one of " + tokens(t));
            return null;
        }
        Dimension d = f == null ? Dimension.DIMENSIONLESS : f.dim();
        try {
            double v = Quantities.parse(text, d);
            return checkNumber(t, f, v, text, path, p);
        } catch (QuantityFormatException e) {
            String quoted = "'" + text + "' ";
            String msg = e.getMessage();
            p.add(path, text, msg.startsWith(quoted) ? msg.substring(quoted.length()) : msg);
            return t.isPrimitive() ? primitiveZero(t) : null;
        }
    }

    private static Object checkNumber(Class<?> t, Field f, double v, String shown, String path, Problems p) {
        if (!Double.isFinite(v)) {
            p.add(path, shown, "must be a finite number");
            return t.isPrimitive() ? primitiveZero(t) : null;
        }
        boolean integral = t == int.class || t == Integer.class || t == long.class || t == Long.class;
        if (integral && v != Math.rint(v)) {
            p.add(path, shown, "must be a whole number");
            return t.isPrimitive() ? primitiveZero(t) : null;
        }
        if (f != null) {
            boolean low = f.minExclusive() ? v <= f.min() : v < f.min();
            if (low || v > f.max()) {
                p.add(path, shown, "must be " + range(f));
            }
        }
        if (t == int.class || t == Integer.class) {
            return (int) v;
        }
        if (t == long.class || t == Long.class) {
            return (long) v;
        }
        return v;
    }

    /** The allowed range of a field in words, e.g. "> 0 m" or "from -60 to 400 °C". */
    public static String range(Field f) {
        String unit = f.dim().symbol().isEmpty() ? "" : " " + f.dim().symbol();
        boolean hasMin = f.min() != Double.NEGATIVE_INFINITY;
        boolean hasMax = f.max() != Double.POSITIVE_INFINITY;
        String min = fmt(f.min());
        String max = fmt(f.max());
        if (hasMin && hasMax) {
            return (f.minExclusive() ? "above " + min + " and at most " : "from " + min + " to ") + max + unit;
        }
        if (hasMin) {
            return (f.minExclusive() ? "> " : "≥ ") + min + unit;
        }
        if (hasMax) {
            return "≤ " + max + unit;
        }
        return "a finite number" + unit;
    }

    private static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }

    private static String tokens(Class<?> enumType) {
        return Arrays.stream(enumType.getEnumConstants()).map(c -> Token.of((Enum<?>) c))
                .collect(Collectors.joining(", "));
    }

    private static Object primitiveZero(Class<?> t) {
        if (t == int.class) {
            return 0;
        }
        if (t == long.class) {
            return 0L;
        }
        if (t == boolean.class) {
            return false;
        }
        return 0.0;
    }

    private static <T extends Record> T construct(Class<T> type, RecordComponent[] comps, Object[] args) {
        try {
            Class<?>[] types = Arrays.stream(comps).map(RecordComponent::getType).toArray(Class<?>[]::new);
            Constructor<T> ctor = type.getDeclaredConstructor(types);
            return ctor.newInstance(args);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot build " + type.getSimpleName(), e);
        }
    }

    /** Writes a record as a JSON object: SI numbers, enum tokens, absent values left out. */
    public static JsonObject write(Record r) {
        JsonObject o = new JsonObject();
        for (RecordComponent c : r.getClass().getRecordComponents()) {
            Object v;
            try {
                v = c.getAccessor().invoke(r);
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException(e);
            }
            if (v == null) {
                continue;
            }
            o.add(key(c), toJson(v));
        }
        return o;
    }

    private static JsonElement toJson(Object v) {
        if (v instanceof Record rec) {
            return write(rec);
        }
        if (v instanceof Enum<?> e) {
            return new JsonPrimitive(Token.of(e));
        }
        if (v instanceof Number n) {
            return new JsonPrimitive(n);
        }
        if (v instanceof Boolean b) {
            return new JsonPrimitive(b);
        }
        if (v instanceof List<?> list) {
            JsonArray a = new JsonArray();
            list.forEach(x -> a.add(toJson(x)));
            return a;
        }
        return new JsonPrimitive(String.valueOf(v));
    }

    /** Every field of a record type with its key, for documentation and editors. */
    public static List<RecordComponent> fields(Class<? extends Record> type) {
        return new ArrayList<>(Arrays.asList(type.getRecordComponents()));
    }
}
