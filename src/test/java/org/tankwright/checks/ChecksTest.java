package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Presets;
import org.tankwright.analysis.ResultFixtures;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ChecksTest {
    @Test
    void findingsAreSortedBySeverityThenId() {
        List<Finding> fs = Checks.run(ResultFixtures.ssLink());
        assertTrue(fs.size() > 5, fs.toString());
        for (int i = 1; i < fs.size(); i++) {
            Finding a = fs.get(i - 1);
            Finding b = fs.get(i);
            assertTrue(a.severity().compareTo(b.severity()) < 0
                    || (a.severity() == b.severity() && a.id().compareTo(b.id()) <= 0), a.id() + " before " + b.id());
        }
        assertEquals(Severity.DANGER, fs.get(0).severity());
    }

    @Test
    void everyFindingIsComplete() {
        for (AnalysisResult r : List.of(ResultFixtures.ssLink(), ResultFixtures.heater(), ResultFixtures.measuredTank())) {
            for (Finding f : Checks.run(r)) {
                assertTrue(f.id().startsWith("TW-"), f.id());
                assertFalse(f.source().isBlank(), f.id() + " names its source");
                assertFalse(f.element().isBlank(), f.id() + " names its element");
                assertFalse(f.message().isBlank(), f.id());
                assertFalse(f.action().isBlank(), f.id());
                assertFalse(f.message().contains("NaN") || f.action().contains("NaN"), f.toString());
                boolean serious = f.severity() == Severity.DANGER || f.severity() == Severity.WARNING;
                assertEquals(serious, f.action().endsWith(Finding.DEFERRAL), f.id() + ": deferral on dangers and warnings");
            }
        }
    }

    @Test
    void ruleIdsAreUniqueAndRulesAreListedInIdOrder() {
        Set<String> ids = new HashSet<>();
        String previous = "";
        for (Rule r : Checks.RULES) {
            assertTrue(ids.add(r.id()), "duplicate " + r.id());
            assertTrue(r.id().compareTo(previous) > 0, r.id() + " after " + previous);
            previous = r.id();
            assertFalse(r.title().isBlank());
            assertFalse(r.source().isBlank(), r.id() + " names its limit's source");
        }
    }

    @Test
    void everyRuleIsDescribedInTheSafetyDoc() throws Exception {
        String doc = java.nio.file.Files.readString(java.nio.file.Path.of("docs/safety.md"));
        for (Rule r : Checks.RULES) {
            assertTrue(doc.contains("| " + r.id() + " |"), r.id() + " missing from docs/safety.md");
        }
    }

    @Test
    void emptyResultGivesNoFindingsAndNoFailures() {
        // The pipeline's sections may be null or NaN while the engines are incomplete: rules stay quiet.
        AnalysisResult r = Analysis.run(Presets.demo());
        List<Finding> fs = Checks.run(r);
        assertTrue(fs.stream().noneMatch(f -> f.message().contains("could not run")), fs.toString());
    }

    @Test
    void measuredLowVoltageTankHasNothingAboveNotice() {
        assertTrue(Checks.run(ResultFixtures.measuredTank()).stream().allMatch(f -> f.severity() == Severity.NOTICE));
        assertFalse(Checks.anyDanger(Checks.run(ResultFixtures.measuredTank())));
        assertTrue(Checks.anyDanger(Checks.run(ResultFixtures.ssLink())));
    }

    @Test
    void attachFillsTheResultsFindings() {
        AnalysisResult r = ResultFixtures.ssLink();
        AnalysisResult withFindings = Checks.attach(r);
        assertEquals(Checks.run(r), withFindings.findings());
        assertEquals(r.network(), withFindings.network());
    }

    @Test
    void cautionsEndWithTheDeferral() {
        List<String> c = Checks.cautions();
        assertTrue(c.size() >= 6);
        assertEquals(Finding.DEFERRAL, c.get(c.size() - 1));
        assertTrue(c.stream().anyMatch(s -> s.contains("implant")));
        assertTrue(c.stream().anyMatch(s -> s.contains("rings")));
    }

    @Test
    void textGroupsBySeverityAndJsonWritesNullForMissingValues() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.class2 = true;
        List<Finding> fs = Checks.run(p.build());
        String text = FindingsReport.text(fs);
        assertTrue(text.indexOf("DANGER") < text.indexOf("WARNING") && text.indexOf("WARNING") < text.indexOf("NOTICE"), text);
        var json = FindingsReport.json(fs);
        var c06 = json.getAsJsonArray("findings").asList().stream().map(e -> e.getAsJsonObject())
                .filter(o -> o.get("id").getAsString().equals("TW-C06")).findFirst().orElseThrow();
        assertTrue(c06.get("value").isJsonNull());
        assertEquals("notice", c06.get("severity").getAsString());
        assertEquals(fs.size(), json.getAsJsonArray("findings").size());
    }
}
