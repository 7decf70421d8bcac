package org.tankwright.coupling;

import java.util.List;

/**
 * Where a number came from: the model's name, its published source, whether the inputs lie inside
 * the model's validity range, and notes (approximations made, warnings) for the user.
 */
public record Provenance(String model, String source, boolean withinValidity, List<String> notes) {
    public Provenance {
        notes = List.copyOf(notes);
    }
}
