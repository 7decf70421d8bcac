package org.tankwright.capacitors;

/** Where a trim part sits in a bank. */
public enum TrimPosition {
    /** Across the whole bank: adds its capacitance, sees the bank voltage. */
    PARALLEL("parallel"),
    /** In series with the whole bank: lowers the capacitance, carries the bank current. */
    SERIES("series");

    private final String key;

    TrimPosition(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
