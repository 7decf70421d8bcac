package org.tankwright.report;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.analysis.ResultFixtures;
import org.tankwright.analysis.Series;

import java.io.IOException;
import java.lang.reflect.RecordComponent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ExportsTest {

    @Test
    void oneCsvPerSeriesWithUnitsInTheHeaderAndExactValues(@TempDir Path dir) throws IOException {
        AnalysisResult r = ReportFixtures.ssLinkFull();
        List<Path> files = SeriesCsv.write(r, dir);
        List<Series> all = new ArrayList<>(r.network().sweeps());
        all.addAll(r.coupling().sweeps());
        assertEquals(all.size(), files.size());
        for (Series s : all) {
            List<String> lines = Files.readAllLines(dir.resolve(s.id() + ".csv"));
            assertEquals(s.size() + 1, lines.size(), s.id());
            String[] header = lines.get(0).split(",");
            assertEquals(2, header.length);
            assertTrue(header[0].endsWith("_" + s.xDim().keySuffix()), header[0]);
            if (!s.yDim().keySuffix().isEmpty()) {
                assertTrue(header[1].endsWith("_" + s.yDim().keySuffix()), header[1]);
            }
            for (int i = 0; i < s.size(); i++) {
                String[] cells = lines.get(i + 1).split(",", -1);
                assertEquals(s.x()[i], Double.parseDouble(cells[0]), 0.0, s.id() + " x row " + i);
                assertEquals(s.y()[i], Double.parseDouble(cells[1]), 0.0, s.id() + " y row " + i);
            }
        }
        assertEquals("frequency_Hz,impedance_ohm", Files.readAllLines(dir.resolve("impedance-vs-frequency.csv")).get(0));
        try (var left = Files.list(dir)) {
            assertTrue(left.allMatch(p -> p.toString().endsWith(".csv")), "no temporary files left");
        }
    }

    @Test
    void missingValuesAreEmptyCellsAndDuplicateIdsGetTheirOwnFile() {
        Series s = new Series("v", "v", "frequency", org.tankwright.units.Dimension.FREQUENCY, "C1 voltage",
                org.tankwright.units.Dimension.VOLTAGE, new double[] {1, 2}, new double[] {3, Double.NaN}, Double.NaN);
        assertEquals("frequency_Hz,c1_voltage_V\n1.0,3.0\n2.0,\n", SeriesCsv.csv(s));
        AnalysisResult r = ResultFixtures.ssLink();
        NetworkReport n = r.network();
        NetworkReport twice = new NetworkReport(n.topology(), n.frequency(), n.c1(), n.c2(), n.c1Textbook(), n.c2Textbook(),
                n.targetPhaseDeg(), n.sourceVoltage(), n.busVoltage(), n.inputResistance(), n.inputReactance(),
                n.inputPhaseDeg(), n.powerIn(), n.powerOut(), n.efficiency(), n.sourceCurrent(), n.dcCurrent(),
                n.outputVoltage(), n.loadAc(), n.zeroPhaseFrequencies(), n.bifurcated(), n.efficiencyMax(),
                n.loadOptimal(), n.loadedQ(), n.turnOffCurrent(), n.zvsRequiredCurrent(), n.keys(), List.of(s, s), n.notes());
        AnalysisResult r2 = new AnalysisResult(r.design(), r.coils(), r.coupling(), twice, r.stresses(), r.envelope(),
                r.banks(), r.heater(), r.exposure(), r.findings(), r.notes(), r.computeNanos());
        assertEquals(List.of("v", "v-2"), new ArrayList<>(SeriesCsv.all(r2).keySet()));
    }

    @Test
    void jsonHasUnitSuffixedKeysSiValuesAndNullForNaN() {
        AnalysisResult r = ResultFixtures.heater();
        JsonObject j = JsonParser.parseString(ResultJson.text(r)).getAsJsonObject();
        JsonObject net = j.getAsJsonObject("network");
        assertEquals(r.network().frequency(), net.get("frequency_Hz").getAsDouble(), 0.0);
        assertTrue(net.get("source_voltage_V").isJsonNull(), "NaN is written as null");
        assertEquals(r.network().efficiency(), net.get("efficiency").getAsDouble(), 0.0);
        JsonObject cold = j.getAsJsonObject("heater").getAsJsonObject("cold");
        assertEquals(r.heater().cold().temperature(), cold.get("temperature_degC").getAsDouble(), 0.0);
        assertEquals(r.heater().cold().surfaceField(), cold.get("surface_field_A_per_m").getAsDouble(), 0.0);
        assertEquals(r.banks().get(0).partDvDt(), j.getAsJsonArray("banks").get(0).getAsJsonObject()
                .get("part_dv_dt_V_per_s").getAsDouble(), 0.0);
        assertTrue(j.get("coupling").isJsonNull(), "a heater has no coupling section");
        assertEquals(r.design().name(), j.getAsJsonObject("design").get("name").getAsString());
        JsonArray stresses = j.getAsJsonArray("stresses");
        assertEquals(r.stresses().size(), stresses.size());
        assertTrue(stresses.get(0).getAsJsonObject().has("voltage_rms_V"));
        assertFalse(ResultJson.text(r).contains("NaN"));
    }

    @Test
    void networkKeysSitAtTheTopLevelAsInTheTuneCommand() {
        AnalysisResult r = ResultFixtures.ssLink();
        NetworkReport n = r.network();
        Map<String, Object> keys = new LinkedHashMap<>();
        keys.put("topology", "ss");
        keys.put("c1_F", n.c1());
        keys.put("zero_phase_frequencies_Hz", n.zeroPhaseFrequencies());
        keys.put("bifurcated", false);
        NetworkReport withKeys = new NetworkReport(n.topology(), n.frequency(), n.c1(), n.c2(), n.c1Textbook(), n.c2Textbook(),
                n.targetPhaseDeg(), n.sourceVoltage(), n.busVoltage(), n.inputResistance(), n.inputReactance(),
                n.inputPhaseDeg(), n.powerIn(), n.powerOut(), n.efficiency(), n.sourceCurrent(), n.dcCurrent(),
                n.outputVoltage(), n.loadAc(), n.zeroPhaseFrequencies(), n.bifurcated(), n.efficiencyMax(),
                n.loadOptimal(), n.loadedQ(), n.turnOffCurrent(), n.zvsRequiredCurrent(), keys, n.sweeps(), n.notes());
        AnalysisResult r2 = new AnalysisResult(r.design(), r.coils(), r.coupling(), withKeys, r.stresses(), r.envelope(),
                r.banks(), r.heater(), r.exposure(), r.findings(), r.notes(), r.computeNanos());
        JsonObject j = ResultJson.tree(r2);
        assertEquals("ss", j.get("topology").getAsString());
        assertEquals(n.c1(), j.get("c1_F").getAsDouble(), 0.0);
        assertEquals(n.frequency(), j.getAsJsonArray("zero_phase_frequencies_Hz").get(0).getAsDouble(), 0.0);
        assertFalse(j.getAsJsonObject("network").has("keys"), "the keys are not repeated inside the network section");
    }

    /** Every number of the result's records has a unit in the table, so a new field cannot slip out without a suffix. */
    @Test
    void everyNumericFieldOfTheResultHasItsUnit() {
        Set<String> missing = new HashSet<>();
        Deque<Class<?>> todo = new ArrayDeque<>(List.of(AnalysisResult.class));
        Set<Class<?>> seen = new HashSet<>();
        Set<String> carried = Set.of("value", "limit", "values", "x", "y", "markerX");
        while (!todo.isEmpty()) {
            Class<?> c = todo.pop();
            if (!seen.add(c) || !c.isRecord() || !c.getPackageName().startsWith("org.tankwright.analysis")
                    && !c.getPackageName().startsWith("org.tankwright.checks")) {
                continue;
            }
            for (RecordComponent rc : c.getRecordComponents()) {
                Class<?> t = rc.getType();
                if ((t == double.class || t == double[].class || t == double[][].class)
                        && !ResultJson.UNITS.containsKey(rc.getName()) && !carried.contains(rc.getName())) {
                    missing.add(c.getSimpleName() + "." + rc.getName());
                }
                if (t.isRecord()) {
                    todo.push(t);
                }
                if (rc.getGenericType() instanceof java.lang.reflect.ParameterizedType pt
                        && pt.getActualTypeArguments()[0] instanceof Class<?> arg) {
                    todo.push(arg);
                }
            }
            for (Class<?> inner : c.getDeclaredClasses()) {
                todo.push(inner);
            }
        }
        assertEquals(Set.of(), missing);
    }
}
