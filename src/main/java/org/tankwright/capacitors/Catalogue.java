package org.tankwright.capacitors;

import java.util.List;

/**
 * A parts catalogue: named list of capacitor parts (format {@value #FORMAT}, version {@value #VERSION}).
 *
 * @param name      catalogue name
 * @param currency  what prices are counted in
 * @param note      where the data comes from
 * @param parts     the parts, ids unique
 */
public record Catalogue(String name, String currency, String note, List<CapacitorPart> parts) {
    /** Format name written in every catalogue file. */
    public static final String FORMAT = "tankwright-capacitor-catalogue";
    /** Current format version. */
    public static final int VERSION = 1;
    /** Classpath location of the bundled demo catalogue. */
    public static final String DEMO_RESOURCE = "/presets/parts/demo-catalogue.json";

    public Catalogue {
        parts = List.copyOf(parts);
        name = name == null ? "" : name;
        currency = currency == null ? "" : currency;
        note = note == null ? "" : note;
    }

    /** The part with that id, or null. */
    public CapacitorPart part(String id) {
        for (CapacitorPart p : parts) {
            if (p.id().equals(id)) {
                return p;
            }
        }
        return null;
    }
}
