package org.tankwright.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ValidateCommandTest {
    /** Runs the command line capturing standard output and error. */
    static String[] run(int[] status, String... args) {
        PrintStream out = System.out;
        PrintStream err = System.err;
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(o, true));
            System.setErr(new PrintStream(e, true));
            status[0] = Main.run(args);
        } finally {
            System.setOut(out);
            System.setErr(err);
        }
        return new String[] {o.toString(), e.toString()};
    }

    @Test
    void listsAllFiveProblemsAndExitsThree(@TempDir Path dir) throws Exception {
        String text = Files.readString(Path.of("presets/desk-lamp-pad.json"))
                .replace("\"turns\": 14", "\"turns\": -3")
                .replace("\"inner_diameter_m\": \"20 mm\"", "\"inner_diameter_m\": \"20 mH\"")
                .replace("\"kind\": \"full-bridge\"", "\"kind\": \"triangle\"")
                .replace("\"resistance_ohm\": \"2.5 Ω\"", "\"resistance_ohm\": \"NaN\"")
                .replace("\"distance_m\": \"10 mm\"", "\"distance_m\": true");
        Path f = dir.resolve("bad.json");
        Files.writeString(f, text);
        int[] st = new int[1];
        String[] out = run(st, "validate", f.toString());
        assertEquals(ExitCodes.INVALID_INPUT, st[0]);
        assertTrue(out[0].contains("5 problems"), out[0]);
        for (String path : new String[] {"$.primary.turns", "$.primary.inner_diameter_m", "$.source.kind",
                "$.load.resistance_ohm", "$.placement.distance_m"}) {
            assertTrue(out[0].contains(path), path + " missing in\n" + out[0]);
        }
        assertFalse(out[1].contains("Exception"), out[1]);
    }

    @Test
    void everyPresetIsValid() throws Exception {
        try (var s = Files.list(Path.of("presets"))) {
            String[] args = s.filter(p -> p.toString().endsWith(".json")).map(Path::toString).toArray(String[]::new);
            String[] all = new String[args.length + 1];
            all[0] = "validate";
            System.arraycopy(args, 0, all, 1, args.length);
            int[] st = new int[1];
            String[] out = run(st, all);
            assertEquals(ExitCodes.OK, st[0], out[0]);
        }
    }

    @Test
    void usageErrorsExitTwoWithoutAStackTrace() {
        int[] st = new int[1];
        String[] out = run(st, "validate", "--no-such-option");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertFalse(out[1].contains("at org."), out[1]);
        run(st, "no-such-command");
        assertEquals(ExitCodes.USAGE, st[0]);
    }

    @Test
    void missingFileIsInvalidInput() {
        int[] st = new int[1];
        String[] out = run(st, "validate", "/nonexistent/design.json");
        assertEquals(ExitCodes.INVALID_INPUT, st[0]);
        assertTrue(out[0].contains("no such file"));
    }

    @Test
    void helpAndVersionWork() {
        int[] st = new int[1];
        String[] out = run(st, "--version");
        assertEquals(0, st[0]);
        assertTrue(out[0].startsWith("tankwright "), out[0]);
        out = run(st, "validate", "--help");
        assertEquals(0, st[0]);
        assertTrue(out[0].contains("Usage: tankwright validate"), out[0]);
    }
}
