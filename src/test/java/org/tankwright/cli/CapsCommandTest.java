package org.tankwright.cli;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CapsCommandTest {

    @Test
    void jsonListsBanksBestFirstWithTheAgreedKeys() {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "caps", "--target", "47n", "--vrms", "400", "--irms", "5",
                "--frequency", "100k", "--json");
        assertEquals(ExitCodes.OK, st[0], out[1]);
        JsonObject o = JsonParser.parseString(out[0]).getAsJsonObject();
        JsonArray banks = o.getAsJsonArray("banks");
        assertTrue(banks.size() >= 2);
        int lastCount = 0;
        for (var e : banks) {
            JsonObject b = e.getAsJsonObject();
            for (String key : new String[]{"capacitance_F", "parts", "part_count", "part_voltage_V", "part_voltage_rating_V",
                    "part_current_A", "part_current_rating_A", "part_srf_Hz"}) {
                assertTrue(b.has(key), key + " missing");
            }
            assertTrue(Math.abs(b.get("capacitance_F").getAsDouble() / 47e-9 - 1) <= 0.02);
            assertTrue(b.get("part_voltage_V").getAsDouble() <= b.get("part_voltage_rating_V").getAsDouble());
            assertTrue(b.get("part_current_A").getAsDouble() <= b.get("part_current_rating_A").getAsDouble());
            assertTrue(b.get("part_srf_Hz").getAsDouble() >= 3 * 100e3);
            assertTrue(b.get("part_count").getAsInt() >= lastCount, "best first: fewest parts first");
            lastCount = b.get("part_count").getAsInt();
        }
        assertEquals("best", banks.get(0).getAsJsonObject().get("verdict").getAsString());
    }

    @Test
    void eSeriesTemplateAndDeratingFile(@TempDir Path dir) throws Exception {
        Path rules = dir.resolve("derating.json");
        Files.writeString(rules, "{\"current_fraction\": 0.5}");
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "caps", "--target", "100n", "--vrms", "300", "--frequency", "50k",
                "--e-series", "E12", "--template", "pp-film-1600v", "--derating", rules.toString(), "--json");
        assertEquals(ExitCodes.OK, st[0], out[1]);
        JsonObject o = JsonParser.parseString(out[0]).getAsJsonObject();
        assertEquals(0.5, o.getAsJsonObject("derating").get("current_fraction").getAsDouble(), 0);
        JsonObject best = o.getAsJsonArray("banks").get(0).getAsJsonObject();
        assertEquals(0.5 * 12, best.get("part_current_rating_A").getAsDouble(), 1e-9, "template 12 A × 0.5");
    }

    @Test
    void errorsExitWithTheRightStatusAndNoStackTrace(@TempDir Path dir) throws Exception {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "caps", "--target", "47 kHz", "--vrms", "400", "--frequency", "100k");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertTrue(out[1].contains("--target"), out[1]);
        out = ValidateCommandTest.run(st, "caps", "--target", "47n", "--frequency", "100k");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertTrue(out[1].contains("--vrms"), out[1]);
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "id,capacitance_F\nA,-1n\n");
        out = ValidateCommandTest.run(st, "caps", "--target", "47n", "--vrms", "400", "--frequency", "100k", "--catalogue", bad.toString());
        assertEquals(ExitCodes.INVALID_INPUT, st[0]);
        assertTrue(out[1].contains("row 2"), out[1]);
        // 20 kV across 47 nF: nothing in the demo catalogue fits within 3 in series
        out = ValidateCommandTest.run(st, "caps", "--target", "47n", "--vrms", "20k", "--frequency", "100k", "--max-series", "3", "--max-parallel", "4");
        assertEquals(ExitCodes.REFUSED, st[0]);
        assertTrue(out[0].contains("Fewer parts do not fit") || out[1].contains("no bank"), out[0]);
        assertFalse(out[1].contains("Exception"), out[1]);
    }
}
