package org.tankwright.capacitors;

/** Where a number comes from: the model that made it, its source, and whether it is inside the model's validity. */
public record Provenance(String model, String source, String validity) {
}
