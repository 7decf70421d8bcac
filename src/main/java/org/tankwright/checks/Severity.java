package org.tankwright.checks;

/**
 * Severity of a finding, following the intent of the signal words of ANSI Z535 / ISO 3864:
 * {@code DANGER}, {@code WARNING} and {@code CAUTION} for harm to people (by how likely and how
 * bad), {@code NOTICE} for harm to equipment or a design flaw that hurts no one.
 */
public enum Severity {
    DANGER, WARNING, CAUTION, NOTICE;

    /** The word as written in files and JSON. */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
