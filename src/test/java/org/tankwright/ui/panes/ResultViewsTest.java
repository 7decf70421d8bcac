package org.tankwright.ui.panes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.CoilReport;
import org.tankwright.analysis.CouplingReport;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.analysis.Presets;
import org.tankwright.analysis.Series;
import org.tankwright.charts.ChartStyle;
import org.tankwright.charts.Figure;
import org.tankwright.charts.ResultFigures;
import org.tankwright.checks.Finding;
import org.tankwright.checks.Severity;
import org.tankwright.design.Design;
import org.tankwright.units.Dimension;

/**
 * What the panes and plots make of a result. The result here is assembled by hand with round
 * numbers (not physics): the test is about showing, not computing.
 */
class ResultViewsTest {

    private static final double[] F = {100e3, 120e3, 130e3, 140e3, 160e3};

    private static AnalysisResult result() {
        Design d = Presets.demo();
        CoilReport l1 = new CoilReport("primary", "pad coil", "spiral", 12, 10e-6, "filament", List.of(), 0.02, 0.05, 0.08,
                "litz", List.of(), 100, 5e-12, 20e6, 10.1e-6, 1.2, 0.01, 1e-6, 2e-4, 1e-4, 1.2e-3, List.of());
        CouplingReport k = new CouplingReport(2e-6, 0.25, 10e-6, 8e-6, "filament", 0.1, 0.3, "10 mm", "3 mm", Double.NaN,
                List.of(new Series("k-vs-distance", "k vs distance", "distance", Dimension.LENGTH, "k", Dimension.DIMENSIONLESS,
                        new double[] {0.003, 0.005, 0.01}, new double[] {0.3, 0.25, 0.1}, 0.005)), List.of());
        List<Series> sweeps = List.of(
                new Series("impedance", "|Z|", "frequency", Dimension.FREQUENCY, "|Z|", Dimension.RESISTANCE, F,
                        new double[] {9, 4, 3, 4, 9}, 130e3),
                new Series("phase", "phase", "frequency", Dimension.FREQUENCY, "phase", Dimension.ANGLE, F,
                        new double[] {-60, -20, 5, 30, 60}, 130e3),
                new Series("c1-voltage", "C1 voltage", "frequency", Dimension.FREQUENCY, "voltage", Dimension.VOLTAGE, F,
                        new double[] {20, 40, 60, 40, 20}, 130e3));
        NetworkReport n = new NetworkReport("SS", 130e3, 150e-9, 190e-9, 149e-9, 188e-9, 5, 10.8, 12, 3.1, 0.27, 5, 12.5, 11,
                0.88, 1.2, 1.0, 5.2, 2.0, new double[] {130e3}, false, 0.9, 2.2, 4.5, 0.3, 0.2, Map.of(), sweeps, List.of());
        List<ElementStress> stress = List.of(
                new ElementStress("C1", "primary capacitor", 60, 85, 1.2, 1.7, 0.05, 120, 1.5, "3 mm, 2 Ω", 100, 2),
                new ElementStress("L1", "primary coil", 61, 86, 1.2, 1.7, 0.12, Double.NaN, Double.NaN, "", Double.NaN, Double.NaN));
        List<Finding> findings = List.of(
                new Finding("TW-HV-01", Severity.WARNING, 120, 100, "V", "derating, common practice", "C1", "C1 exceeds its rating",
                        "use a higher-rated part; defer to local codes and licensed practice"),
                new Finding("TW-N-01", Severity.NOTICE, Double.NaN, Double.NaN, "", "", "$.primary.turns", "few turns", ""));
        return new AnalysisResult(d, List.of(l1), k, n, stress, null, List.of(), null, null, findings,
                List.of("fundamental-harmonic analysis"), 1_000_000);
    }

    @Test
    void keyFiguresReadTheResultAndNeverShowNaN() {
        List<Readings.Row> rows = Readings.of(result());
        assertEquals("10.0 µH", value(rows, "L pad coil"));
        assertEquals("100", value(rows, "Q pad coil"));
        assertEquals("0.250", value(rows, "k"));
        assertEquals("150 nF", value(rows, "C1 (primary)"));
        assertEquals("88.0 %", value(rows, "efficiency"));
        assertTrue(rows.stream().noneMatch(r -> r.value().contains("NaN") || r.value().contains("n/a")));
        assertNull(Readings.missing(result()), "nothing applicable is missing");
    }

    @Test
    void severalZeroPhaseFrequenciesAreNumbered() throws Exception {
        // the robot pad is bifurcated: three zero-phase frequencies near 85 kHz
        List<Readings.Row> rows = Readings.of(org.tankwright.analysis.Analysis.run(
                org.tankwright.analysis.Presets.load("warehouse-robot-pad"), org.tankwright.analysis.Analysis.Scope.OPERATING_POINT));
        List<String> names = rows.stream().map(Readings.Row::quantity).filter(q -> q.startsWith("zero-phase")).toList();
        assertTrue(names.size() > 1, names.toString());
        assertEquals("zero-phase frequency 1 of " + names.size(), names.get(0));
        assertEquals(names.size(), names.stream().distinct().count(), "each row has its own name: " + names);
    }

    @Test
    void stressRowsTakeTheWorstCaseAndRateTheMargin() {
        List<StressPane.Row> rows = StressPane.rowsOf(result());
        assertEquals(2, rows.size());
        StressPane.Row c1 = rows.get(0);
        assertEquals(120, c1.vPeak(), "the envelope's worst peak, not the nominal 85 V");
        assertEquals(-0.2, c1.margin(), 1e-12, "120 V against a 100 V rating is 20 % over");
        assertEquals("OVER RATING", c1.status());
        assertEquals("no rating", rows.get(1).status());
    }

    @Test
    void findingsPointToTheirFields() {
        assertEquals("$.compensation.c1_F", ChecksPane.fieldOf("C1"));
        assertEquals("$.primary.turns", ChecksPane.fieldOf("$.primary.turns"));
        assertNull(ChecksPane.fieldOf("D"));
        String line = ChecksPane.describe(result().findings().get(0));
        assertTrue(line.contains("120") && line.contains("100") && line.contains("common practice") && line.contains("local codes"), line);
    }

    @Test
    void plotsAreDrawnFromTheResultsSeriesByTheirQuantities() {
        List<Figure> figures = ResultFigures.all(result(), ChartStyle.paper());
        Figure impedance = figures.get(0);
        assertTrue(impedance.present());
        assertEquals(2, impedance.chart().getXYPlot().getDatasetCount(), "magnitude left, phase right");
        assertFalse(figures.get(1).present(), "no power or efficiency series in this result");
        assertTrue(figures.get(1).notShown().startsWith("Not computed for this design"));
        assertTrue(figures.get(2).present(), "capacitor voltage");
        assertTrue(figures.get(3).present(), "k against distance");
        assertFalse(figures.get(4).present(), "no envelope map");
    }

    private static String value(List<Readings.Row> rows, String quantity) {
        return rows.stream().filter(r -> r.quantity().equals(quantity)).findFirst().orElseThrow().value();
    }
}
