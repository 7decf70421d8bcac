package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Helpers for the per-rule tests: the findings of one rule on a result. */
final class RuleTestSupport {
    private RuleTestSupport() {
    }

    /** The findings the engine gives for rule {@code id}. */
    static List<Finding> of(AnalysisResult r, String id) {
        return Checks.run(r).stream().filter(f -> f.id().equals(id)).toList();
    }

    /** Asserts that rule {@code id} fires on {@code r}, returns its first finding on {@code element} (or the first). */
    static Finding fires(AnalysisResult r, String id, String element) {
        List<Finding> fs = of(r, id);
        assertFalse(fs.isEmpty(), id + " should fire; found " + Checks.run(r).stream().map(Finding::id).toList());
        Finding f = element == null ? fs.get(0)
                : fs.stream().filter(x -> element.equals(x.element())).findFirst().orElse(null);
        assertTrue(f != null, id + " should concern " + element + "; found " + fs);
        assertFalse(f.source().isBlank(), "every finding names its limit's source");
        return f;
    }

    /** Asserts that rule {@code id} fires with severity {@code s}. */
    static Finding fires(AnalysisResult r, String id, String element, Severity s) {
        Finding f = fires(r, id, element);
        assertEquals(s, f.severity(), f.toString());
        return f;
    }

    /** Asserts that rule {@code id} stays quiet on {@code r}. */
    static void quiet(AnalysisResult r, String id) {
        List<Finding> fs = of(r, id);
        assertTrue(fs.isEmpty(), id + " should stay quiet; found " + fs);
    }
}
