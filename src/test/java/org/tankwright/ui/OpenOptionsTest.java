package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.cli.Main;

/** The window options of {@code tankwright open}: bad values are usage errors that say what is allowed. */
class OpenOptionsTest {

    @Test
    void aBadSizeOrThemeIsAUsageErrorNamingTheOptionAndWhatIsAllowed(@TempDir Path dir) {
        String out = stderrOf(() -> assertEquals(2, Main.run("open", "--size", "12x", "--snapshot", dir.resolve("a.png").toString())));
        assertTrue(out.contains("--size") && out.contains("12x") && out.contains("WIDTHxHEIGHT"), out);
        out = stderrOf(() -> assertEquals(2, Main.run("open", "--size", "100x100", "--snapshot", dir.resolve("a.png").toString())));
        assertTrue(out.contains("out of range"), out);
        out = stderrOf(() -> assertEquals(2, Main.run("open", "--theme", "purple", "--snapshot", dir.resolve("a.png").toString())));
        assertTrue(out.contains("--theme") && out.contains("light, dark"), out);
        assertFalse(out.contains("Exception"), "no stack trace for a user error");
    }

    private static String stderrOf(Runnable r) {
        PrintStream old = System.err;
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        System.setErr(new PrintStream(buf, true, StandardCharsets.UTF_8));
        try {
            r.run();
        } finally {
            System.setErr(old);
        }
        return buf.toString(StandardCharsets.UTF_8);
    }
}
