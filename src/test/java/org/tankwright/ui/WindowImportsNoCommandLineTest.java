package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * docs/architecture.md: the window may use analysis, charts, report and design, never the
 * command line (which starts the window, so the dependency runs one way only).
 */
class WindowImportsNoCommandLineTest {

    @Test
    void noWindowSourceNamesTheCommandLinePackage() throws IOException {
        Path ui = Path.of("src/main/java/org/tankwright/ui");
        List<String> offenders = new ArrayList<>();
        int scanned = 0;
        try (Stream<Path> files = Files.walk(ui)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                scanned++;
                String code = Files.readString(f).replaceAll("(?s)/\\*.*?\\*/|//[^\\n]*", "");
                if (code.contains("org.tankwright.cli")) {
                    offenders.add(f.toString());
                }
            }
        }
        assertTrue(scanned > 20, "the scan sees the window's sources");
        assertEquals(List.of(), offenders, "window sources that use the command-line package");
    }
}
