package org.tankwright.cli;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.tankwright.coupling.RingKernel;
import org.tankwright.units.Constants;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CoupleCommandTest {
    private static final String[] TWO_LOOPS = {"couple", "--a-shape", "loop", "--a-turns", "1", "--a-diameter", "100mm", "--a-wire", "1mm",
            "--b-shape", "loop", "--b-turns", "1", "--b-diameter", "80mm", "--b-wire", "1mm"};

    record Run(int status, String out, String err) {
    }

    static Run run(String... args) {
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
            int status = Main.run(args);
            return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
    }

    private static String[] with(String[] base, String... more) {
        String[] all = new String[base.length + more.length];
        System.arraycopy(base, 0, all, 0, base.length);
        System.arraycopy(more, 0, all, base.length, more.length);
        return all;
    }

    @Test
    void jsonOfTwoLoopsMatchesMaxwellAndGroverLoopInductance() {
        Run r = run(with(TWO_LOOPS, "--distance", "30mm", "--json"));
        assertEquals(0, r.status(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        // Maxwell's coaxial-ring formula (Treatise §701) at 30 mm between planes
        double maxwell = RingKernel.coaxial(0.05, 0.04, 0.03);
        assertEquals(maxwell, o.get("mutual_H").getAsDouble(), 1e-9 * maxwell);
        // round-wire loop µ0 R (ln(8R/a) − 2 + 1/4), Grover 1946 (uniform current)
        double la = Constants.MU0 * 0.05 * (Math.log(8 * 0.05 / 0.0005) - 1.75);
        assertEquals(la, o.get("inductance_a_H").getAsDouble(), 1e-3 * la);
        double k = o.get("k").getAsDouble();
        assertEquals(o.get("mutual_H").getAsDouble() / Math.sqrt(la * o.get("inductance_b_H").getAsDouble()), k, 1e-3 * k);
        assertEquals(0.029, o.get("gap_m").getAsDouble(), 1e-12, "gap = distance − wire diameter");
    }

    @Test
    void gapSweepAsJsonAndCsv() {
        Run r = run(with(TWO_LOOPS, "--gap-sweep", "10mm,50mm,5", "--offset-sweep", "0,40mm,3", "--json"));
        assertEquals(0, r.status(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertEquals(15, o.getAsJsonArray("sweep").size());
        JsonObject first = o.getAsJsonArray("sweep").get(0).getAsJsonObject();
        assertEquals(0.01, first.get("gap_m").getAsDouble(), 1e-12);
        for (String key : new String[] {"gap_m", "offset_m", "mutual_H", "k"}) {
            assertTrue(first.has(key), key);
        }
        Run c = run(with(TWO_LOOPS, "--gap-sweep", "10mm,50mm,5", "--csv"));
        assertEquals(0, c.status(), c.err());
        String[] lines = c.out().trim().split("\\R");
        assertEquals("gap_m,offset_m,mutual_H,k,inductance_a_H,inductance_b_H", lines[0]);
        assertEquals(6, lines.length);
    }

    @Test
    void nullEnvelopeAndPlatesInText() {
        Run r = run(with(TWO_LOOPS, "--gap", "10mm", "--null", "--envelope", "10mm,40mm,120mm",
                "--a-plate", "ferrite", "--a-plate-mu", "1000", "--a-plate-spacing", "2mm"));
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("coupling null"), r.out());
        assertTrue(r.out().contains("a coupling null lies inside the envelope"), r.out());
        assertTrue(r.out().contains("with plate images"), r.out());
        Run shield = run(with(TWO_LOOPS, "--gap", "10mm", "--b-plate", "metal", "--b-plate-spacing", "5mm", "--b-frequency", "100kHz", "--json"));
        assertEquals(0, shield.status(), shield.err());
        double ohm = JsonParser.parseString(shield.out()).getAsJsonObject().get("shield_resistance_b_ohm").getAsDouble();
        assertTrue(ohm > 0 && ohm < 1, "added resistance " + ohm);
    }

    @Test
    void badInputGetsClearMessagesAndStatus() {
        Run missing = run(with(TWO_LOOPS));
        assertEquals(ExitCodes.USAGE, missing.status());
        assertTrue(missing.err().contains("--distance or --gap"), missing.err());
        Run badUnit = run(with(TWO_LOOPS, "--gap", "10 kg"));
        assertEquals(ExitCodes.USAGE, badUnit.status());
        assertTrue(badUnit.err().contains("--gap"), badUnit.err());
        Run overlap = run(with(TWO_LOOPS, "--distance", "0.5mm"));
        assertEquals(ExitCodes.INVALID_INPUT, overlap.status());
        assertTrue(overlap.err().contains("overlap"), overlap.err());
        Run badCoil = run("couple", "--a-shape", "loop", "--a-turns", "1", "--a-diameter", "-5mm", "--a-wire", "1mm",
                "--b-shape", "loop", "--b-turns", "1", "--b-diameter", "80mm", "--b-wire", "1mm", "--gap", "1cm");
        assertEquals(ExitCodes.INVALID_INPUT, badCoil.status());
        assertTrue(badCoil.err().contains("coil a"), badCoil.err());
        Run badPlate = run(with(TWO_LOOPS, "--gap", "1cm", "--b-plate", "wood"));
        assertEquals(ExitCodes.USAGE, badPlate.status());
        assertTrue(badPlate.err().contains("--b-plate"), badPlate.err());
        assertTrue(!badPlate.err().contains("Exception"), badPlate.err());
    }

    @Test
    void squareSpiralsUseSegmentSums() {
        Run r = run("couple", "--a-shape", "square-spiral", "--a-turns", "3", "--a-diameter", "80mm", "--a-inner-diameter", "50mm",
                "--a-wire", "1mm", "--b-shape", "loop", "--b-turns", "1", "--b-diameter", "60mm", "--b-wire", "1mm",
                "--gap", "15mm", "--offset", "5mm,5mm", "--json");
        assertEquals(0, r.status(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertTrue(o.get("model").getAsString().startsWith("filament sum"));
        double k = o.get("k").getAsDouble();
        assertTrue(k > 0 && k < 1, "k = " + k);
    }

    @Test
    void fieldOfALoopOnItsAxis() {
        Run r = run("field", "--shape", "loop", "--turns", "1", "--diameter", "100mm", "--wire", "1mm", "--current", "10A",
                "--at", "0,0,30mm", "--json");
        assertEquals(0, r.status(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        // on the axis of a loop: B = µ0 I R² / (2 (R² + z²)^{3/2}) (textbook Biot–Savart result)
        double b = Constants.MU0 * 10 * 0.0025 / (2 * Math.pow(0.0025 + 0.0009, 1.5));
        assertEquals(b, o.get("b_rms_T").getAsDouble(), 1e-12 * b);
        assertEquals(b, o.getAsJsonObject("b_T").get("z").getAsDouble(), 1e-12 * b);
        assertEquals(0, o.getAsJsonObject("b_T").get("x").getAsDouble(), 1e-18);
        Run onWire = run("field", "--shape", "loop", "--turns", "1", "--diameter", "100mm", "--wire", "1mm", "--current", "10A",
                "--at", "50mm,0,0");
        assertEquals(ExitCodes.INVALID_INPUT, onWire.status());
        Run text = run("field", "--shape", "spiral", "--turns", "5", "--diameter", "100mm", "--inner-diameter", "40mm", "--wire", "1mm",
                "--current", "2A", "--at", "10mm,0,20mm");
        assertEquals(0, text.status(), text.err());
        assertTrue(text.out().contains("Caution"), text.out());
    }
}
