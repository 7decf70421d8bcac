package org.tankwright.design;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Presets;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Every shipped preset is a test: each validates, is listed in the index and bundled in the jar. */
class PresetsTest {
    @Test
    void everyPresetFileValidatesAndIsIndexed() throws Exception {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("presets"))) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(files.isEmpty());
        List<String> index = Presets.names();
        for (Path f : files) {
            Design d = DesignFiles.load(f);
            assertFalse(d.name().isBlank());
            assertTrue(d.description() != null && d.description().length() > 40, f + " must say who would start from it");
            String name = f.getFileName().toString().replace(".json", "");
            assertTrue(index.contains(name), name + " must be listed in presets/index.txt");
        }
        assertEquals(files.size(), index.size(), "index and folder must agree");
        for (String n : index) {
            assertEquals(DesignFiles.load(Path.of("presets", n + ".json")), Presets.load(n));
        }
    }
}
