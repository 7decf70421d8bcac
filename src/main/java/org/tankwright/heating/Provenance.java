package org.tankwright.heating;

import java.util.List;

/**
 * Where a heating number comes from: the model that made it, its published source, whether the
 * inputs lie inside the model's validity range, and notes (assumptions and warnings) for the user.
 *
 * @param model  the model's name
 * @param source the published source or derivation
 * @param valid  whether the inputs lie inside the validity range
 * @param notes  assumptions and warnings, in words for the user
 */
public record Provenance(String model, String source, boolean valid, List<String> notes) {
    public Provenance {
        notes = List.copyOf(notes);
    }

    /** A provenance with no notes. */
    public static Provenance of(String model, String source) {
        return new Provenance(model, source, true, List.of());
    }

    /** The validity verdict in words. */
    public String verdict() {
        return valid ? "within validity range" : "outside validity range";
    }
}
