package org.tankwright.capacitors;

/** A catalogue that cannot be read; the message lists every problem with its row, field, value and what is allowed. */
public final class CatalogueException extends IllegalArgumentException {
    public CatalogueException(String message) {
        super(message);
    }
}
