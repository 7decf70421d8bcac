package org.tankwright.magnetics;

import java.util.List;
import org.tankwright.materials.Checks;
import org.tankwright.materials.Conductor;

/** Fit checks shared by the planar spirals (outer/inner sizes at the conductor's edges). */
final class PlanarChecks {
    private PlanarChecks() {
    }

    /** Checks that inner &lt; outer and that the turns fit at a pitch no smaller than the conductor width. */
    static void fit(List<String> p, String field, double outer, double inner, int turns, Conductor c) {
        double w = c.footprintWidth();
        double band = 0.5 * (outer - inner);
        if (inner >= outer) {
            p.add("inner " + field + " = " + Checks.m(inner) + ": must be smaller than the outer " + field + " "
                    + Checks.m(outer));
            return;
        }
        if (band < w * (1 - 1e-9)) {
            p.add("inner " + field + " = " + Checks.m(inner) + ": leaves a winding band of " + Checks.m(band)
                    + ", narrower than the wire (" + Checks.m(w) + "); at most " + Checks.m(outer - 2 * w)
                    + " is allowed");
            return;
        }
        if (turns > 1) {
            double pitch = (band - w) / (turns - 1);
            GeometryChecks.pitchFits(p, pitch, c, "((outer - inner)/2 - wire)/(turns - 1)");
        } else if (band > 1.5 * w) {
            p.add("inner " + field + " = " + Checks.m(inner) + ": a single turn fills only " + Checks.m(w) + " of the "
                    + Checks.m(band) + " band; give inner = outer - 2 x wire (" + Checks.m(outer - 2 * w)
                    + ") or use a loop");
        }
    }
}
