package org.tankwright.design;

import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The reference table of the design format, generated from the records' {@link Field}
 * descriptions, so that docs/design-file.md cannot drift from the code.
 */
public final class FormatReference {
    private FormatReference() {
    }

    /** Markdown tables, one per section, in the order they appear in a file. */
    public static String markdown() {
        StringBuilder sb = new StringBuilder();
        Set<Class<? extends Record>> seen = new LinkedHashSet<>();
        List<Class<? extends Record>> queue = new ArrayList<>(List.of(Design.class));
        while (!queue.isEmpty()) {
            Class<? extends Record> type = queue.remove(0);
            if (!seen.add(type)) {
                continue;
            }
            sb.append("### ").append(type == Design.class ? "top level" : "`" + sectionName(type) + "`").append("\n\n");
            sb.append("| key | value | allowed | default | meaning |\n|---|---|---|---|---|\n");
            for (RecordComponent c : type.getRecordComponents()) {
                Field f = c.getAnnotation(Field.class);
                Class<?> t = c.getType();
                String value;
                if (Record.class.isAssignableFrom(t)) {
                    @SuppressWarnings("unchecked")
                    Class<? extends Record> rt = (Class<? extends Record>) t;
                    queue.add(rt);
                    value = "object (`" + sectionName(rt) + "`)";
                } else if (t.isEnum()) {
                    List<String> toks = new ArrayList<>();
                    for (Object e : t.getEnumConstants()) {
                        toks.add("`" + Token.of((Enum<?>) e) + "`");
                    }
                    value = "one of " + String.join(", ", toks);
                } else if (t == String.class) {
                    value = "text";
                } else if (t == Boolean.class || t == boolean.class) {
                    value = "true / false";
                } else if (t == Integer.class || t == int.class || t == Long.class || t == long.class) {
                    value = "whole number";
                } else {
                    value = f == null || f.dim().symbol().isEmpty() ? "number" : "number in " + f.dim().symbol();
                }
                boolean numeric = !Record.class.isAssignableFrom(t) && !t.isEnum() && t != String.class
                        && t != Boolean.class && t != boolean.class;
                String allowed = f != null && numeric ? RecordCodec.range(f) : "";
                String required = f != null && (f.required() || (t.isPrimitive() && f.def().isEmpty())) ? "required" : "";
                String def = f == null || f.def().isEmpty() ? required : f.def();
                sb.append("| `").append(RecordCodec.key(c)).append("` | ").append(value).append(" | ")
                        .append(allowed).append(" | ").append(def).append(" | ")
                        .append(f == null ? "" : f.doc()).append(" |\n");
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private static String sectionName(Class<?> type) {
        return type.getSimpleName().replaceAll("([a-z])([A-Z])", "$1_$2").toLowerCase(java.util.Locale.ROOT);
    }

    /** Prints the reference (used to refresh docs/design-file.md). */
    public static void main(String[] args) {
        System.out.print(markdown());
    }
}
