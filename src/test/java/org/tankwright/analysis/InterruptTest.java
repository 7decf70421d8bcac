package org.tankwright.analysis;

import org.junit.jupiter.api.Test;
import org.tankwright.design.Design;

import java.util.concurrent.CancellationException;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** An analysis that is no longer wanted stops when its thread is interrupted; an uninterrupted one is unaffected. */
class InterruptTest {
    @Test
    void anInterruptedAnalysisStopsAndLeavesTheFlagSet() throws Exception {
        Design d = Presets.load("warehouse-robot-pad");
        Thread.currentThread().interrupt();
        try {
            assertThrows(CancellationException.class, () -> Analysis.run(d, Analysis.Scope.FULL));
            assertTrue(Thread.currentThread().isInterrupted(), "the flag stays for the caller");
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void anInterruptionLeavesNothingBehind() throws Exception {
        Design d = Presets.load("warehouse-robot-pad");
        AnalysisResult before = Analysis.run(d, Analysis.Scope.FULL);
        Thread.currentThread().interrupt();
        try {
            assertThrows(CancellationException.class, () -> Analysis.run(d, Analysis.Scope.FULL));
        } finally {
            Thread.interrupted();
        }
        AnalysisResult after = Analysis.run(d, Analysis.Scope.FULL);
        assertEquals(before.network().c1(), after.network().c1(), 0.0);
        assertEquals(before.network().powerOut(), after.network().powerOut(), 0.0);
        assertEquals(before.findings().size(), after.findings().size());
    }
}
