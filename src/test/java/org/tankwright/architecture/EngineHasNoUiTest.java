package org.tankwright.architecture;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The house rule: the engine (every package but the faces) imports no Swing, AWT or UI library,
 * and every package says what it is for in a package-info.java.
 */
class EngineHasNoUiTest {
    private static final Path SRC = Path.of("src/main/java/org/tankwright");
    /** The faces: the only packages allowed to use a user-interface library. */
    private static final Set<String> FACES = Set.of("ui", "cli", "charts", "report");
    private static final Pattern UI_IMPORT = Pattern.compile(
            "^\\s*import\\s+(static\\s+)?(javax\\.swing|java\\.awt|com\\.formdev|org\\.jfree|net\\.miginfocom|ModernDocking|io\\.github\\.andrewauclair|org\\.apache\\.pdfbox|de\\.rototor)\\b",
            Pattern.MULTILINE);
    private static final Pattern QUALIFIED_USE = Pattern.compile("\\b(javax\\.swing|java\\.awt)\\.[A-Za-z]");

    @Test
    void engineImportsNoUserInterface() throws IOException {
        List<String> offenders = new ArrayList<>();
        int scanned = 0;
        try (Stream<Path> files = Files.walk(SRC)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String top = SRC.relativize(f).getName(0).toString();
                if (FACES.contains(top)) {
                    continue;
                }
                scanned++;
                String text = Files.readString(f);
                Matcher m = UI_IMPORT.matcher(text);
                if (m.find()) {
                    offenders.add(f + ": " + m.group().strip());
                }
                Matcher q = QUALIFIED_USE.matcher(text.replaceAll("(?s)/\\*.*?\\*/|//[^\\n]*", ""));
                if (q.find()) {
                    offenders.add(f + ": uses " + q.group());
                }
            }
        }
        assertTrue(scanned > 10, "the scan must see the engine sources");
        assertEquals(List.of(), offenders, "engine packages must not use a user-interface library");
    }

    @Test
    void everyPackageHasAPackageInfo() throws IOException {
        List<String> missing = new ArrayList<>();
        try (Stream<Path> dirs = Files.walk(SRC)) {
            for (Path d : dirs.filter(Files::isDirectory).toList()) {
                boolean hasJava;
                try (Stream<Path> s = Files.list(d)) {
                    hasJava = s.anyMatch(p -> p.toString().endsWith(".java"));
                }
                if (hasJava && !Files.exists(d.resolve("package-info.java"))) {
                    missing.add(SRC.relativize(d).toString());
                }
            }
        }
        assertEquals(List.of(), missing, "packages without a package-info.java");
    }
}
