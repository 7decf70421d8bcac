package org.tankwright.design;

import java.util.List;
import java.util.stream.Collectors;

/** A design file that cannot be used, with every problem found in it. */
public class DesignException extends Exception {
    private final List<Problem> problems;

    public DesignException(String message, List<Problem> problems) {
        super(message + (problems.isEmpty() ? "" : ":\n" + problems.stream()
                .map(p -> "  " + p).collect(Collectors.joining("\n"))));
        this.problems = List.copyOf(problems);
    }

    public List<Problem> problems() {
        return problems;
    }
}
