package org.tankwright.cli;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tankwright.tuning.TextbookCompensation;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code tankwright tune}: the JSON contract of issue 5, the table, and errors without stack traces. */
class TuneCommandTest {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private PrintStream oldOut;
    private PrintStream oldErr;

    @BeforeEach
    void capture() {
        oldOut = System.out;
        oldErr = System.err;
        System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
        System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    @AfterEach
    void restore() {
        System.setOut(oldOut);
        System.setErr(oldErr);
    }

    private int run(String... args) {
        return Main.run(args);
    }

    private JsonObject json(String... args) {
        assertEquals(0, run(args), () -> "stderr: " + err);
        return JsonParser.parseString(out.toString(StandardCharsets.UTF_8)).getAsJsonObject();
    }

    @Test
    void linkJsonHasEveryKeyInSi() {
        JsonObject o = json("tune", "--topology", "SS", "--l1", "120 µH", "--l2", "80uH", "--k", "0.2", "--r1", "0.1",
                "--r2", "80m", "--load", "20", "--rectifier", "cap", "--frequency", "85 kHz", "--vdc", "400",
                "--bridge", "full", "--duty", "0.9", "--json");
        for (String key : new String[]{"c1_F", "c2_F", "c1_textbook_F", "c2_textbook_F", "input_impedance_ohm",
                "input_phase_deg", "p_in_W", "p_out_W", "efficiency", "i_source_A", "i_dc_A", "i_l1_A", "i_l2_A",
                "v_l1_V", "v_l2_V", "v_c1_V", "v_c2_V", "i_c1_A", "i_c2_A", "v_c1_peak_V", "v_c2_peak_V",
                "load_ac_ohm", "zero_phase_frequencies_Hz", "efficiency_max", "load_optimal_ohm"}) {
            assertTrue(o.has(key), "missing key " + key);
        }
        double w = 2 * Math.PI * 85e3;
        assertEquals(TextbookCompensation.c1(org.tankwright.circuit.Topology.SS,
                org.tankwright.circuit.LinkValues.fromCoupling(120e-6, 80e-6, 0.2, 0, 0), w, 1), o.get("c1_textbook_F").getAsDouble(), 1e-20);
        assertEquals(1 / (w * w * 80e-6), o.get("c2_F").getAsDouble(), 1e-20);
        // default target phase with a bridge: 10° inductive
        assertEquals(10, o.get("input_phase_deg").getAsDouble(), 1e-6);
        assertEquals(20 * 8 / (Math.PI * Math.PI), o.get("load_ac_ohm").getAsDouble(), 1e-12, "Steigerwald 1988 8RL/π²");
        assertTrue(o.getAsJsonObject("input_impedance_ohm").has("re"));
        double eff = o.get("efficiency").getAsDouble();
        assertTrue(eff > 0 && eff < 1, "efficiency as a fraction");
        assertEquals(o.get("p_out_W").getAsDouble() / o.get("p_in_W").getAsDouble(), eff, 1e-12);
        JsonArray zp = o.getAsJsonArray("zero_phase_frequencies_Hz");
        for (int i = 0; i < zp.size(); i++) {
            double f = zp.get(i).getAsDouble();
            assertTrue(f >= 85e3 / 2 && f <= 170e3);
        }
    }

    @Test
    void targetPhaseAndFixedCapacitors() {
        JsonObject o = json("tune", "--topology", "SP", "--l1", "120u", "--l2", "80u", "--m", "20u", "--r1", "0.1",
                "--r2", "0.1", "--load", "50", "--frequency", "85k", "--vin", "100", "--target-phase", "5", "--json");
        assertEquals(5, o.get("input_phase_deg").getAsDouble(), 1e-6);
        out.reset();
        JsonObject fixed = json("tune", "--topology", "SP", "--l1", "120u", "--l2", "80u", "--m", "20u", "--r1", "0.1",
                "--r2", "0.1", "--load", "50", "--frequency", "85k", "--vin", "100", "--c1", "33n", "--c2", "44n", "--json");
        assertEquals(33e-9, fixed.get("c1_F").getAsDouble(), 1e-21);
        assertEquals(44e-9, fixed.get("c2_F").getAsDouble(), 1e-21);
    }

    @Test
    void singleTankForms() {
        JsonObject o = json("tune", "--topology", "series", "--l", "22u", "--r", "0.5", "--c", "47n", "--vin", "10", "--json");
        double f0 = 1 / (2 * Math.PI * Math.sqrt(22e-6 * 47e-9));
        assertEquals(f0, o.get("resonant_frequency_Hz").getAsDouble(), 1e-6 * f0);
        assertEquals(Math.sqrt(22e-6 / 47e-9) / 0.5 * 10, o.get("v_c1_V").getAsDouble(), 1e-6, "common practice: V_C = Q·V");
        out.reset();
        JsonObject p = json("tune", "--topology", "parallel", "--l", "22u", "--r", "0.05", "--f0", "150k", "--iin", "2", "--json");
        assertTrue(p.get("v_c1_V").getAsDouble() > 0);
        out.reset();
        assertEquals(0, run("tune", "--topology", "parallel", "--l", "22u", "--r", "0.05", "--f0", "150k", "--iin", "2"));
        String table = out.toString(StandardCharsets.UTF_8);
        assertTrue(table.contains("C1") && table.contains("Caution"));
    }

    @Test
    void userErrorsNameTheOptionWithoutStackTrace() {
        assertEquals(ExitCodes.USAGE, run("tune", "--topology", "XY", "--l1", "1u"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--topology"));
        err.reset();
        assertEquals(ExitCodes.USAGE, run("tune", "--topology", "SS", "--l1", "12 furlongs", "--l2", "1u", "--k", "0.1",
                "--load", "5", "--frequency", "85k", "--vin", "10"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--l1"));
        err.reset();
        assertEquals(ExitCodes.INVALID_INPUT, run("tune", "--topology", "SS", "--l1", "1u", "--l2", "1u", "--m", "2u",
                "--load", "5", "--frequency", "85k", "--vin", "10"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("mutual inductance"));
        assertFalse(err.toString(StandardCharsets.UTF_8).contains("at org."), "no stack trace");
        err.reset();
        // a lossless series tank at resonance shorts the source: refused, with the reason
        assertEquals(ExitCodes.REFUSED, run("tune", "--topology", "series", "--l", "2u", "--f0", "150k", "--vin", "10"));
        String msg = err.toString(StandardCharsets.UTF_8);
        assertTrue(msg.contains("singular") && !msg.contains("Exception"), msg);
    }
}
