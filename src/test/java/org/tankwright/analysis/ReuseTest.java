package org.tankwright.analysis;

import org.junit.jupiter.api.Test;
import org.tankwright.design.Coil;
import org.tankwright.design.Design;
import org.tankwright.design.Placement;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

/**
 * The analysis keeps its last coil models and compiled coil pairs between runs: a result must not
 * depend on what was analysed before (the pipeline stays a pure function of the design).
 */
class ReuseTest {

    private static Design withDistance(Design d, double distance) {
        Placement p = d.placement();
        return new Design(d.name(), d.description(), d.kind(), d.frequency(), d.primary(), d.secondary(),
                new Placement(distance, p.offsetX(), p.offsetY(), p.mutual(), p.k()), d.compensation(), d.source(),
                d.load(), d.workpiece(), d.capacitors(), d.envelope(), d.tolerances(), d.safety());
    }

    private static Design withSecondaryTurns(Design d, double turns) {
        Coil s = d.secondary().withTurns(turns);
        return new Design(d.name(), d.description(), d.kind(), d.frequency(), d.primary(), s, d.placement(),
                d.compensation(), d.source(), d.load(), d.workpiece(), d.capacitors(), d.envelope(), d.tolerances(), d.safety());
    }

    private static void assertSame(AnalysisResult expected, AnalysisResult actual, String what) {
        assertEquals(expected.coupling().mutual(), actual.coupling().mutual(), 0, what + ": M");
        assertEquals(expected.coupling().l1(), actual.coupling().l1(), 0, what + ": L1 in place");
        assertEquals(expected.coupling().l2(), actual.coupling().l2(), 0, what + ": L2 in place");
        assertEquals(expected.coils().get(0).resistanceAc(), actual.coils().get(0).resistanceAc(), 0, what + ": R1");
        assertEquals(expected.network().c1(), actual.network().c1(), 0, what + ": C1");
        assertEquals(expected.network().powerIn(), actual.network().powerIn(), 0, what + ": input power");
        assertEquals(expected.network().zeroPhaseFrequencies().length, actual.network().zeroPhaseFrequencies().length,
                what + ": zero-phase frequencies");
    }

    @Test
    void aDesignAnalysedAgainAfterOthersGivesTheSameResult() throws Exception {
        Design pad = Presets.load("warehouse-robot-pad");
        AnalysisResult first = Analysis.run(pad, Analysis.Scope.OPERATING_POINT);
        AnalysisResult moved = Analysis.run(withDistance(pad, 0.18), Analysis.Scope.OPERATING_POINT);
        AnalysisResult rewound = Analysis.run(withSecondaryTurns(pad, 4), Analysis.Scope.OPERATING_POINT);
        AnalysisResult again = Analysis.run(pad, Analysis.Scope.OPERATING_POINT);
        assertSame(first, again, "the pad again");
        assertNotEquals(first.coupling().mutual(), moved.coupling().mutual(), "a new distance is solved, not reused");
        assertNotEquals(first.coupling().l2(), rewound.coupling().l2(), "a new secondary is solved, not reused");
        assertNotEquals(first.coils().get(1).inductance(), rewound.coils().get(1).inductance(), "a new coil model");
    }

    @Test
    void theOperatingPointOfTheFullSolveIsTheOperatingPointAlone() throws Exception {
        // the full solve fills the caches with the envelope's placements; the operating point must not change
        Design lamp = Presets.load("desk-lamp-pad");
        AnalysisResult alone = Analysis.run(lamp, Analysis.Scope.OPERATING_POINT);
        AnalysisResult full = Analysis.run(lamp, Analysis.Scope.FULL);
        assertEquals(alone.coupling().mutual(), full.coupling().mutual(), 0, "M at the nominal place");
        assertEquals(alone.coupling().k(), full.coupling().k(), 0, "k at the nominal place");
    }
}
