package org.tankwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.util.Map;
import org.junit.jupiter.api.Test;

class CoilCommandTest {

    private static String[] run(int[] status, String... args) {
        return ValidateCommandTest.run(status, args);
    }

    @Test
    void jsonCarriesTheDocumentedKeys() {
        int[] status = new int[1];
        String[] out = run(status, "coil", "--shape", "solenoid", "--turns", "20", "--diameter", "50 mm",
                "--length", "40mm", "--wire", "1mm", "--wire-outer", "1.1mm", "--frequency", "100k", "--json");
        assertEquals(0, status[0], out[1]);
        JsonObject o = JsonParser.parseString(out[0]).getAsJsonObject();
        for (String key : new String[] {"inductance_H", "models", "resistance_dc_ohm", "resistance_ac_ohm", "q",
                "self_capacitance_F", "self_resonance_Hz", "apparent_inductance_H", "wire_length_m"}) {
            assertTrue(o.has(key), "missing " + key);
        }
        JsonArray models = o.getAsJsonArray("models");
        boolean sawWheeler = false;
        boolean sawSheet = false;
        boolean sawFilament = false;
        for (JsonElement e : models) {
            JsonObject m = e.getAsJsonObject();
            assertTrue(m.has("name") && m.has("inductance_H") && m.has("source") && m.has("valid"));
            sawWheeler |= m.get("name").getAsString().equals("wheeler");
            sawSheet |= m.get("name").getAsString().equals("current-sheet");
            sawFilament |= m.get("name").getAsString().equals("filament");
        }
        assertTrue(sawWheeler && sawSheet && sawFilament);
        // AC resistance models side by side, the chosen value first: at 100 kHz the 1 mm wire's radius is 2.4 skin
        // depths, below the surface-current model's validity, so skin + proximity is chosen; then the others
        JsonArray rModels = o.getAsJsonArray("resistance_models");
        assertEquals(3, rModels.size());
        JsonObject ours = rModels.get(0).getAsJsonObject();
        assertEquals("filament-proximity", ours.get("name").getAsString());
        assertEquals(o.get("resistance_ac_ohm").getAsDouble(), ours.get("resistance_ac_ohm").getAsDouble(), 0);
        JsonObject surface = rModels.get(1).getAsJsonObject();
        assertEquals("surface-current", surface.get("name").getAsString());
        assertFalse(surface.get("valid").getAsBoolean());
        JsonObject med = rModels.get(2).getAsJsonObject();
        assertEquals("medhurst-table", med.get("name").getAsString());
        assertTrue(med.has("source") && med.has("valid") && med.has("note"));
        assertFalse(med.get("valid").getAsBoolean(), "1 mm wire at 100 kHz: skin effect not developed");
        // 20 turns, 50 mm mean diameter, 40 mm long: Nagaoka sheet K_N(1.25) µ0πR²N²/ℓ ≈ 15.7 µH
        assertEquals(15.6e-6, o.get("inductance_H").getAsDouble(), 0.3e-6);
        for (Map.Entry<String, JsonElement> e : o.entrySet()) {
            assertFalse(e.getValue().toString().contains("NaN"), e.getKey());
        }
    }

    @Test
    void tableForEveryShape() {
        String[][] cases = {
                {"--shape", "multilayer", "--turns", "60", "--layers", "3", "--diameter", "20mm", "--wire", "AWG22",
                        "--wire-outer", "0.7mm"},
                {"--shape", "spiral", "--turns", "12", "--diameter", "200mm", "--inner-diameter", "80mm", "--wire",
                        "litz:400x0.071mm", "--wire-outer", "1.9mm", "--frequency", "85kHz"},
                {"--shape", "hex-spiral", "--turns", "6", "--diameter", "40mm", "--inner-diameter", "10mm", "--wire",
                        "trace:1mm/1oz", "--frequency", "6.78MHz"},
                {"--shape", "rect-spiral", "--turns", "10", "--width", "300mm", "--height", "200mm", "--inner-width",
                        "200mm", "--wire", "litz:200x0.1mm"},
                {"--shape", "loop", "--diameter", "100mm", "--wire", "tube:6mm/1mm", "--material", "aluminium"},
        };
        for (String[] c : cases) {
            String[] args = new String[c.length + 1];
            args[0] = "coil";
            System.arraycopy(c, 0, args, 1, c.length);
            int[] status = new int[1];
            String[] out = run(status, args);
            assertEquals(0, status[0], String.join(" ", c) + ": " + out[1]);
            assertTrue(out[0].contains("inductance (chosen)") && out[0].contains("self-resonance"), out[0]);
            assertFalse(out[0].contains("NaN") || out[0].contains("n/a"), out[0]);
        }
    }

    /** Bad geometry: exit 3 with a message naming the field, the value and what is allowed; never a NaN. */
    @Test
    void badGeometryExitsThreeWithClearMessage() {
        String[][] cases = {
                {"--turns", "0", "--diameter", "50mm", "--pitch", "2mm", "--wire", "1mm"},
                {"--turns", "10", "--diameter", "-50mm", "--pitch", "2mm", "--wire", "1mm"},
                {"--turns", "10", "--diameter", "50mm", "--pitch", "1mm", "--wire", "1.5mm"},
                {"--turns", "10", "--diameter", "NaN", "--pitch", "2mm", "--wire", "1mm"},
        };
        String[] expected = {"turns = 0", "diameter = -50.00 mm", "thicker than the pitch", "diameter"};
        for (int i = 0; i < cases.length; i++) {
            String[] args = new String[cases[i].length + 3];
            args[0] = "coil";
            args[1] = "--shape";
            args[2] = "solenoid";
            System.arraycopy(cases[i], 0, args, 3, cases[i].length);
            int[] status = new int[1];
            String[] out = run(status, args);
            assertEquals(3, status[0], "status for " + String.join(" ", args));
            assertTrue(out[1].contains(expected[i]), out[1]);
            assertFalse(out[1].contains("Exception"), out[1]);
            assertTrue(out[0].isEmpty(), out[0]);
        }
    }

    @Test
    void usageErrorsExitTwo() {
        int[] status = new int[1];
        String[] out = run(status, "coil", "--shape", "solenoid", "--turns", "10", "--diameter", "50mm", "--wire", "1mm");
        assertEquals(2, status[0]);
        assertTrue(out[1].contains("--length or --pitch"), out[1]);
        out = run(status, "coil", "--shape", "blob", "--wire", "1mm");
        assertEquals(2, status[0]);
        assertTrue(out[1].contains("allowed are solenoid"), out[1]);
        out = run(status, "coil", "--shape", "loop", "--diameter", "5 kHz", "--wire", "1mm");
        assertEquals(2, status[0]);
        assertTrue(out[1].contains("--diameter"), out[1]);
    }
}
