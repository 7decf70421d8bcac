package org.tankwright.cli;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Re-tune on the command line; arithmetic from ω² = 1/(LC) and k = √(1 − Lshort/Lopen). */
class RetuneCommandTest {

    @Test
    void measuredFrequencyGivesLNeededCAndTrim() {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "retune", "--design-frequency", "100k", "--capacitance", "100n",
                "--measured-frequency", "95k", "--json");
        assertEquals(ExitCodes.OK, st[0], out[1]);
        JsonObject o = JsonParser.parseString(out[0]).getAsJsonObject();
        assertEquals(1 / Math.pow(2 * Math.PI * 95e3, 2) / 100e-9, o.get("inductance_H").getAsDouble(), 1e-15);
        assertEquals(90.25e-9, o.get("capacitance_needed_F").getAsDouble(), 1e-17);
        assertEquals(-9.75e-9, o.get("trim_F").getAsDouble(), 1e-17);
        assertTrue(o.get("action").getAsString().contains("series"));
        assertTrue(o.getAsJsonArray("trim_parts").size() >= 1);
        assertFalse(o.has("k"));
    }

    @Test
    void couplingFromTwoReadings() {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "retune", "--l-open", "100u", "--l-short", "84u", "--json");
        assertEquals(ExitCodes.OK, st[0], out[1]);
        assertEquals(0.4, JsonParser.parseString(out[0]).getAsJsonObject().get("k").getAsDouble(), 1e-12, "√(1 − 0.84)");
        out = ValidateCommandTest.run(st, "retune", "--l-open", "100u");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertTrue(out[1].contains("--l-short"), out[1]);
        out = ValidateCommandTest.run(st, "retune", "--design-frequency", "100k", "--capacitance", "100n",
                "--measured-frequency", "95k", "--measured-inductance", "20u");
        assertEquals(ExitCodes.USAGE, st[0]);
    }
}
