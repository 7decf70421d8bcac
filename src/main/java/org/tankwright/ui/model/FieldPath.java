package org.tankwright.ui.model;

import java.lang.reflect.Constructor;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.tankwright.design.Field;
import org.tankwright.design.RecordCodec;

/**
 * A path from the design down to one value ({@code $.compensation.c1_F}): reads it and makes a
 * copy of the whole design with that one value replaced. The records stay immutable.
 */
public final class FieldPath {

    private final List<RecordComponent> steps;
    private final String json;

    private FieldPath(List<RecordComponent> steps) {
        this.steps = List.copyOf(steps);
        StringBuilder sb = new StringBuilder("$");
        for (RecordComponent c : steps) {
            sb.append('.').append(RecordCodec.key(c));
        }
        this.json = sb.toString();
    }

    /** The root path (the design itself). */
    public static FieldPath root() {
        return new FieldPath(List.of());
    }

    /** This path extended by component {@code c}. */
    public FieldPath then(RecordComponent c) {
        List<RecordComponent> s = new ArrayList<>(steps);
        s.add(c);
        return new FieldPath(s);
    }

    /** This path extended by the component named {@code name} of record type {@code type}. */
    public FieldPath then(Class<? extends Record> type, String name) {
        for (RecordComponent c : type.getRecordComponents()) {
            if (c.getName().equals(name)) {
                return then(c);
            }
        }
        throw new IllegalArgumentException(type.getSimpleName() + " has no component " + name);
    }

    /** The last component (the value's own description), or null for the root. */
    public RecordComponent leaf() {
        return steps.isEmpty() ? null : steps.get(steps.size() - 1);
    }

    /** The last component's {@link Field} description, or null. */
    public Field field() {
        RecordComponent c = leaf();
        return c == null ? null : c.getAnnotation(Field.class);
    }

    /** The JSON path, as the validator writes it: {@code $.primary.wire.diameter_m}. */
    public String json() {
        return json;
    }

    /** The value at this path in {@code root}, or null when it or a section on the way is absent. */
    public Object get(Object root) {
        Object v = root;
        for (RecordComponent c : steps) {
            if (v == null) {
                return null;
            }
            v = read(v, c);
        }
        return v;
    }

    /** A copy of {@code root} with the value at this path replaced by {@code value}. */
    @SuppressWarnings("unchecked")
    public <T extends Record> T with(T root, Object value) {
        return (T) replace(root, 0, value);
    }

    private Object replace(Object node, int depth, Object value) {
        if (depth == steps.size()) {
            return value;
        }
        if (node == null) {
            throw new IllegalStateException("section " + json() + " is absent at step " + depth);
        }
        Record r = (Record) node;
        RecordComponent[] comps = r.getClass().getRecordComponents();
        Object[] args = new Object[comps.length];
        for (int i = 0; i < comps.length; i++) {
            args[i] = read(r, comps[i]);
            if (same(comps[i], steps.get(depth))) {
                args[i] = replace(args[i], depth + 1, value);
            }
        }
        try {
            Class<?>[] types = Arrays.stream(comps).map(RecordComponent::getType).toArray(Class<?>[]::new);
            Constructor<?> ctor = r.getClass().getDeclaredConstructor(types);
            return ctor.newInstance(args);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot copy " + r.getClass().getSimpleName(), e);
        }
    }

    /** RecordComponent has no equals of its own: each lookup makes a new object. */
    private static boolean same(RecordComponent a, RecordComponent b) {
        return a.getName().equals(b.getName()) && a.getDeclaringRecord() == b.getDeclaringRecord();
    }

    private static Object read(Object record, RecordComponent c) {
        try {
            return c.getAccessor().invoke(record);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot read " + c.getName(), e);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FieldPath p && p.json().equals(json());
    }

    @Override
    public int hashCode() {
        return json().hashCode();
    }

    @Override
    public String toString() {
        return json();
    }
}
