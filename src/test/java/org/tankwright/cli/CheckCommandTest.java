package org.tankwright.cli;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.tankwright.analysis.ResultFixtures;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CheckCommandTest {
    private static String capture(java.util.function.Function<PrintStream, Integer> run, int[] status) {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        status[0] = run.apply(new PrintStream(b, true, StandardCharsets.UTF_8));
        return b.toString(StandardCharsets.UTF_8);
    }

    @Test
    void dangerExitsFive() {
        // The SS fixture runs from a non-isolated 400 V mains bus (IEC 61140) at kilovolt tank voltages.
        int[] st = new int[1];
        String text = capture(out -> CheckCommand.report(ResultFixtures.ssLink(), false, out), st);
        assertEquals(ExitCodes.DANGER, st[0]);
        assertTrue(text.indexOf("DANGER") < text.indexOf("WARNING"), text);
        assertTrue(text.contains("General cautions"), text);
    }

    @Test
    void noDangerExitsZero() {
        int[] st = new int[1];
        capture(out -> CheckCommand.report(ResultFixtures.measuredTank(), false, out), st);
        assertEquals(ExitCodes.OK, st[0]);
        capture(out -> CheckCommand.report(ResultFixtures.heater(), true, out), st);
        assertEquals(ExitCodes.OK, st[0], "the 48 V heater has warnings but no danger");
    }

    @Test
    void jsonListsFindingsWithSeverityWordsAndNullForMissingValues() {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.class2 = true; // TW-C06 has no value
        int[] st = new int[1];
        String json = capture(out -> CheckCommand.report(p.build(), true, out), st);
        JsonObject o = JsonParser.parseString(json).getAsJsonObject();
        assertEquals(ExitCodes.DANGER, st[0]);
        var findings = o.getAsJsonArray("findings");
        assertTrue(findings.size() > 5);
        for (var e : findings) {
            JsonObject f = e.getAsJsonObject();
            for (String k : new String[] {"id", "severity", "value", "limit", "unit", "source", "element", "message", "action"}) {
                assertTrue(f.has(k), k + " missing in " + f);
            }
            assertTrue(java.util.Set.of("danger", "warning", "caution", "notice").contains(f.get("severity").getAsString()));
        }
        assertTrue(findings.asList().stream().anyMatch(e -> e.getAsJsonObject().get("value").isJsonNull()));
        assertFalse(json.contains("NaN"), json);
        assertEquals("danger", findings.get(0).getAsJsonObject().get("severity").getAsString());
    }

    @Test
    void commandRunsOnTheDemoPreset() {
        // Wiring: `tankwright check FILE --json` loads, analyses and prints an object with findings.
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "check", "presets/desk-lamp-pad.json", "--json");
        assertTrue(st[0] == ExitCodes.OK || st[0] == ExitCodes.DANGER, out[1]);
        assertTrue(JsonParser.parseString(out[0]).getAsJsonObject().has("findings"), out[0]);
        String[] missing = ValidateCommandTest.run(st, "check", "no-such-file.json");
        assertEquals(ExitCodes.INVALID_INPUT, st[0]);
        assertFalse(missing[1].contains("Exception"), missing[1]);
    }
}
