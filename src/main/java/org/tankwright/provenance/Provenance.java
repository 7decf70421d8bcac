package org.tankwright.provenance;

import java.util.List;

/**
 * Where a number came from: the model's name, its published source (or "ours", "common practice"),
 * whether the inputs lie inside the model's validity range, and notes for the user (the range
 * itself, approximations made, warnings).
 *
 * @param model  the model's name
 * @param source the published source, or how the model is ours
 * @param valid  true when the inputs lie inside the model's validity range
 * @param notes  the range, approximations and warnings, in words
 */
public record Provenance(String model, String source, boolean valid, List<String> notes) {
    public Provenance {
        notes = List.copyOf(notes);
    }

    /** A provenance inside its validity, with no notes. */
    public static Provenance of(String model, String source) {
        return new Provenance(model, source, true, List.of());
    }

    /** A provenance inside its validity whose range is stated in words. */
    public static Provenance ranged(String model, String source, String validity) {
        return new Provenance(model, source, true, List.of(validity));
    }

    /** The validity verdict in words. */
    public String verdict() {
        return valid ? "within validity range" : "outside validity range";
    }

    /** The range and notes in words, or the verdict when there are none. */
    public String validity() {
        return notes.isEmpty() ? verdict() : String.join("; ", notes);
    }
}
