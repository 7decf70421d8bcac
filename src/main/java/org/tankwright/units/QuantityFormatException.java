package org.tankwright.units;

/** Text that is not a valid quantity of the expected dimension; the message says what is allowed. */
public class QuantityFormatException extends IllegalArgumentException {
    private final String input;
    private final Dimension expected;

    public QuantityFormatException(String input, Dimension expected, String reason) {
        super(reason);
        this.input = input;
        this.expected = expected;
    }

    /** The text that was rejected. */
    public String input() {
        return input;
    }

    /** The dimension the field expects. */
    public Dimension expected() {
        return expected;
    }
}
