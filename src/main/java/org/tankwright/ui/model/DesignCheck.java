package org.tankwright.ui.model;

import java.lang.reflect.RecordComponent;
import java.util.List;
import org.tankwright.design.Checked;
import org.tankwright.design.Design;
import org.tankwright.design.Field;
import org.tankwright.design.Problems;
import org.tankwright.design.RecordCodec;

/**
 * Checks an edited design with the design package's own rules: every required value present and
 * every section's cross-field rules ({@link Checked}), with the same JSON paths the file
 * validator reports. Ranges of single values are checked by the fields before an edit is made.
 * Cheap enough for every keystroke (no JSON round trip).
 */
public final class DesignCheck {

    /** Each record type's components with their JSON keys, looked up once (the key rule uses a regex). */
    private record Part(RecordComponent component, String key, boolean required, boolean nested) { }

    private static final ClassValue<Part[]> PARTS = new ClassValue<>() {
        @Override
        protected Part[] computeValue(Class<?> type) {
            RecordComponent[] comps = type.getRecordComponents();
            Part[] parts = new Part[comps.length];
            for (int i = 0; i < comps.length; i++) {
                Field f = comps[i].getAnnotation(Field.class);
                comps[i].getAccessor().setAccessible(true);
                parts[i] = new Part(comps[i], RecordCodec.key(comps[i]), f != null && f.required(),
                        Record.class.isAssignableFrom(comps[i].getType()));
            }
            return parts;
        }
    };

    private DesignCheck() {
    }

    /** Every problem of {@code d} (empty when it is valid). */
    public static List<org.tankwright.design.Problem> problems(Design d) {
        Problems p = new Problems();
        walk(d, "$", p);
        return p.list();
    }

    private static void walk(Record r, String path, Problems p) {
        for (Part part : PARTS.get(r.getClass())) {
            if (!part.required() && !part.nested()) {
                continue;
            }
            Object v;
            try {
                v = part.component().getAccessor().invoke(r);
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException(e);
            }
            if (v == null && part.required()) {
                p.add(path + "." + part.key(), null, "is required");
            } else if (v instanceof Record child) {
                walk(child, path + "." + part.key(), p);
            }
        }
        if (r instanceof Checked checked) {
            checked.check(p, path);
        }
    }
}
