package org.tankwright.design;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.analysis.Presets;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class DesignFilesTest {

    private static String demoText() throws IOException {
        return Files.readString(Path.of("presets", Presets.DEMO + ".json"));
    }

    @Test
    void reportsEveryProblemAtOnceWithItsPath() throws Exception {
        String text = demoText()
                .replace("\"turns\": 14", "\"turns\": 0")                         // 1: range
                .replace("\"diameter_m\": \"56 mm\"", "\"diameter_m\": \"56 kHz\"") // 2: wrong unit
                .replace("\"topology\": \"SS\"", "\"topology\": \"XY\"")            // 3: unknown choice
                .replace("\"vdc_V\": 12", "\"vdc_V\": -12")                         // 4: negative
                .replace("\"offset_x_m\": 0", "\"offset_x_mm\": 0");                // 5: unknown key
        DesignException e = assertThrows(DesignException.class, () -> DesignFiles.parse(text, "five.json"));
        List<String> paths = e.problems().stream().map(Problem::path).toList();
        assertEquals(5, e.problems().size(), e.getMessage());
        assertTrue(paths.contains("$.primary.turns"), paths.toString());
        assertTrue(paths.contains("$.primary.diameter_m"), paths.toString());
        assertTrue(paths.contains("$.compensation.topology"), paths.toString());
        assertTrue(paths.contains("$.source.vdc_V"), paths.toString());
        assertTrue(paths.contains("$.placement.offset_x_mm"), paths.toString());
        Problem unit = e.problems().stream().filter(p -> p.path().equals("$.primary.diameter_m")).findFirst().orElseThrow();
        assertEquals("56 kHz", unit.value());
        assertTrue(unit.message().contains("length in m"), unit.message());
    }

    @Test
    void crossFieldRulesNameTheField() {
        String text = "{\"format\":\"tankwright-design\",\"version\":2,\"name\":\"x\",\"kind\":\"link\",\"frequency_Hz\":1e5,"
                + "\"primary\":{\"shape\":\"measured\",\"inductance_H\":\"10u\"},"
                + "\"compensation\":{\"topology\":\"SS\"},\"source\":{\"kind\":\"sine\",\"vrms_V\":10}}";
        DesignException e = assertThrows(DesignException.class, () -> DesignFiles.parse(text, "x"));
        List<String> paths = e.problems().stream().map(Problem::path).toList();
        assertTrue(paths.containsAll(List.of("$.primary.resistance_ohm", "$.secondary", "$.placement", "$.load")), paths.toString());
    }

    @Test
    void refusesANewerVersionClearly() {
        String text = "{\"format\":\"tankwright-design\",\"version\":99,\"name\":\"x\"}";
        DesignException e = assertThrows(DesignException.class, () -> DesignFiles.parse(text, "new.json"));
        assertTrue(e.getMessage().contains("newer Tankwright"), e.getMessage());
    }

    @Test
    void refusesSomethingThatIsNotADesign() {
        assertThrows(DesignException.class, () -> DesignFiles.parse("[1,2]", "a"));
        assertThrows(DesignException.class, () -> DesignFiles.parse("{\"format\":\"other\",\"version\":1}", "b"));
        DesignException e = assertThrows(DesignException.class, () -> DesignFiles.parse("{\"format\": ", "c"));
        assertTrue(e.getMessage().contains("not valid JSON"));
    }

    @Test
    void migratesVersionOne() throws Exception {
        Design current = DesignFiles.parse(demoText(), "demo");
        com.google.gson.JsonObject o = com.google.gson.JsonParser.parseString(DesignFiles.toJson(current)).getAsJsonObject();
        com.google.gson.JsonArray coils = new com.google.gson.JsonArray();
        coils.add(o.remove("primary"));
        coils.add(o.remove("secondary"));
        o.add("coils", coils);
        o.add("drive_frequency_Hz", o.remove("frequency_Hz"));
        o.addProperty("version", 1);
        Design migrated = DesignFiles.parse(o.toString(), "v1");
        assertEquals(current, migrated);
    }

    @Test
    void roundTripsThroughJson() throws Exception {
        Design d = DesignFiles.parse(demoText(), "demo");
        assertEquals(d, DesignFiles.parse(DesignFiles.toJson(d), "again"));
        assertEquals(0.056, d.primary().diameter(), 1e-15);
        assertEquals(130e3, d.frequency(), 1e-9);
    }

    @Test
    void savingKeepsABackupAndIsAtomic(@TempDir Path dir) throws Exception {
        Design d = DesignFiles.parse(demoText(), "demo");
        Path f = dir.resolve("pad.json");
        DesignFiles.save(d, f);
        DesignFiles.save(d.withName("second"), f);
        assertEquals("second", DesignFiles.load(f).name());
        assertEquals(d.name(), DesignFiles.load(DesignFiles.backupOf(f)).name());
    }

    @Test
    void exportsReplaceAtomicallyWithoutABackup(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("sweep.csv");
        DesignFiles.replaceAtomically(f, "a,b\n");
        DesignFiles.replaceAtomically(f, "c,d\n");
        assertEquals("c,d\n", Files.readString(f));
        try (var s = Files.list(dir)) {
            assertEquals(List.of(f), s.toList(), "no backup and no temporary file");
        }
    }

    @Test
    void aWriteThatFailsPartWayLeavesTheOldFileIntact(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("pad.json");
        Files.writeString(f, demoText());
        byte[] before = Files.readAllBytes(f);
        IOException e = assertThrows(IOException.class, () -> DesignFiles.writeAtomically(f, out -> {
            out.write("{\"format\": \"tankwright-design\", \"half".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full (simulated)");
        }));
        assertEquals("disk full (simulated)", e.getMessage());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(f)), "the old file must be unchanged");
        try (var s = Files.list(dir)) {
            assertEquals(List.of(f), s.toList(), "no temporary file may be left behind");
        }
    }
}
