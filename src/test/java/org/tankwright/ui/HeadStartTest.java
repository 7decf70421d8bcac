package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Presets;
import org.tankwright.design.Design;

/** The head start answers the window's first request for its own design once, and nothing else. */
class HeadStartTest {

    @Test
    void servesItsOwnDesignOnceAndComputesEverythingElse() throws Exception {
        HeadStart h = HeadStart.begin(null, Presets::demo, true);
        Design d = h.design(null);
        assertEquals(Presets.demo(), d, "the head start reads the demo when no file is given");
        assertNull(h.design(Path.of("other.json")), "a head start for the demo has no design for another file");

        AtomicInteger computed = new AtomicInteger();
        Function<Design, AnalysisResult> counting = x -> {
            computed.incrementAndGet();
            return Analysis.run(x, Analysis.Scope.OPERATING_POINT);
        };
        Function<Design, AnalysisResult> full = h.serve(Analysis.Scope.FULL, counting);
        AnalysisResult first = full.apply(d);
        assertEquals(0, computed.get(), "the first full request for the head start's design is answered from it");
        assertEquals(d, first.design());
        assertEquals(Analysis.Scope.FULL.name(), scopeOf(first), "the head start's full result has the sweeps");

        AnalysisResult second = full.apply(d);
        assertEquals(1, computed.get(), "a second request (an edit back to the same design, a recompute) is computed");
        assertNotSame(first, second);

        Design other = d.withName("another design");
        full.apply(other);
        assertEquals(2, computed.get(), "another design is computed as usual");

        Function<Design, AnalysisResult> preview = h.serve(Analysis.Scope.OPERATING_POINT, counting);
        AnalysisResult p = preview.apply(d);
        assertEquals(2, computed.get(), "the preview is answered from the head start too");
        assertEquals(Analysis.Scope.OPERATING_POINT.name(), scopeOf(p));
    }

    @Test
    void aHeadStartThatCannotReadItsFileLeavesTheWorkToTheOrdinaryPath() {
        HeadStart h = HeadStart.begin(Path.of("missing.json"), () -> {
            throw new java.io.IOException("missing.json: no such file");
        }, false);
        assertNull(h.design(Path.of("missing.json")), "no design: the command reads the file itself and reports the problem");
        Design demo = Presets.demo();
        AnalysisResult r = Analysis.run(demo, Analysis.Scope.OPERATING_POINT);
        assertSame(r, h.serve(Analysis.Scope.FULL, x -> r).apply(demo));
    }

    /** FULL results carry the frequency sweeps; operating-point results do not. */
    private static String scopeOf(AnalysisResult r) {
        boolean sweeps = r.network() != null && r.network().sweeps() != null && !r.network().sweeps().isEmpty();
        return sweeps ? Analysis.Scope.FULL.name() : Analysis.Scope.OPERATING_POINT.name();
    }
}
