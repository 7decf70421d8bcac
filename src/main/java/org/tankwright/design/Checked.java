package org.tankwright.design;

/** A section of the design that checks rules across its own fields, after each field passed its range check. */
public interface Checked {
    /** Adds a problem for every rule broken; {@code path} is this section's JSON path. */
    void check(Problems p, String path);
}
