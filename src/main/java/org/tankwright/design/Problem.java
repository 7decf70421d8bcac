package org.tankwright.design;

/** One thing wrong in a design: where (a JSON path such as {@code $.primary.turns}), the bad value and what is allowed. */
public record Problem(String path, String value, String message) {
    @Override
    public String toString() {
        return path + ": " + (value == null || value.isEmpty() ? "" : value + ": ") + message;
    }
}
