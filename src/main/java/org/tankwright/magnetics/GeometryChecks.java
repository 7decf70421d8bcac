package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.materials.Checks;
import org.tankwright.materials.Conductor;

/** Checks shared by the coil geometries; each message names the field, the value and what is allowed. */
final class GeometryChecks {
    private GeometryChecks() {
    }

    /** Starts a problem list with the turn count and the conductor's own checks. */
    static List<String> start(int turns, int minTurns, Conductor conductor) {
        List<String> p = new ArrayList<>();
        if (turns < minTurns) {
            p.add("turns = " + turns + ": must be a whole number of at least " + minTurns);
        }
        if (conductor == null) {
            p.add("wire: missing; give a conductor");
        } else {
            p.addAll(conductor.problems());
        }
        return p;
    }

    static void positive(List<String> p, String field, double v) {
        Checks.positive(p, field, v);
    }

    /** Pitch check: the conductor must fit between turns. */
    static void pitchFits(List<String> p, double pitch, Conductor c, String how) {
        if (c != null && c.problems().isEmpty() && pitch < c.footprintWidth() * (1 - 1e-9)) {
            p.add("pitch = " + Checks.m(pitch) + " (" + how + "): the wire (" + Checks.m(c.footprintWidth())
                    + " across) is thicker than the pitch; the pitch must be at least the wire's outer size");
        }
    }

    static void noTrace(List<String> p, Conductor c, String kind) {
        if (c instanceof Conductor.Trace) {
            p.add("wire = PCB trace: a " + kind + " is wound from round wire, litz or tube, not a trace");
        }
    }
}
