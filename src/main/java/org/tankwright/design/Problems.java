package org.tankwright.design;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** Collects every problem found while reading or checking a design, so all are reported at once. */
public final class Problems {
    private final List<Problem> list = new ArrayList<>();

    /** Records a problem at {@code path}. */
    public void add(String path, Object value, String message) {
        list.add(new Problem(path, value == null ? "" : String.valueOf(value), message));
    }

    public boolean isEmpty() {
        return list.isEmpty();
    }

    public List<Problem> list() {
        return Collections.unmodifiableList(list);
    }
}
