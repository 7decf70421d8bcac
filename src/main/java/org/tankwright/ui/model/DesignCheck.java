package org.tankwright.ui.model;

import java.util.List;
import org.tankwright.design.Design;
import org.tankwright.design.DesignException;
import org.tankwright.design.DesignFiles;
import org.tankwright.design.Problem;

/** Checks an edited design with the one validator, the same that reads files. */
public final class DesignCheck {

    private DesignCheck() {
    }

    /** Every problem of {@code d} (empty when it is valid). */
    public static List<Problem> problems(Design d) {
        try {
            DesignFiles.parse(DesignFiles.toJson(d), "the edited design");
            return List.of();
        } catch (DesignException e) {
            return e.problems();
        }
    }
}
