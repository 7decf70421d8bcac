package org.tankwright.analysis;

/**
 * The pipeline cannot produce a result for this design. {@link #invalidInput()} tells a bad
 * design (a geometry that does not fit: the user must change the design) from a computation
 * that was refused (outside what the models can do).
 */
public class AnalysisException extends RuntimeException {
    private final boolean invalidInput;

    public AnalysisException(String message, boolean invalidInput) {
        super(message);
        this.invalidInput = invalidInput;
    }

    /** A design problem the user must fix, as opposed to a refused computation. */
    public boolean invalidInput() {
        return invalidInput;
    }
}
