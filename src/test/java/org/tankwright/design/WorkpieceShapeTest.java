package org.tankwright.design;

import org.junit.jupiter.api.Test;
import org.tankwright.design.Enums.WorkpieceShape;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A heater's workpiece is a bar (the default, as in files written before plates) or a plate. */
class WorkpieceShapeTest {
    private static String griddle() throws Exception {
        return Files.readString(Path.of("presets", "griddle-plate-heater.json"));
    }

    private static List<String> problems(String text) {
        DesignException e = assertThrows(DesignException.class, () -> DesignFiles.parse(text, "x.json"));
        return e.problems().stream().map(p -> p.path() + " | " + p.value() + " | " + p.message()).toList();
    }

    @Test
    void olderFilesStayBars() throws Exception {
        Design d = DesignFiles.load(Path.of("presets", "bolt-heater.json"));
        assertEquals(WorkpieceShape.BAR, d.workpiece().shape());
        assertFalse(d.workpiece().isPlate());
        assertNull(d.workpiece().thickness());
    }

    @Test
    void plateReadsAndRoundTrips() throws Exception {
        Design d = DesignFiles.parse(griddle(), "griddle");
        Workpiece w = d.workpiece();
        assertTrue(w.isPlate());
        assertEquals(0.006, w.thickness(), 1e-12);
        assertEquals(0.012, w.gap(), 1e-12);
        assertNull(w.length());
        assertEquals(d, DesignFiles.parse(DesignFiles.toJson(d), "again"));
    }

    @Test
    void plateNeedsThicknessAndGapAndNoBarFields() throws Exception {
        String text = griddle().replace("\"thickness_m\": \"6 mm\", \"gap_m\": \"12 mm\", ",
                "\"length_m\": \"40 mm\", \"inner_diameter_m\": \"5 mm\", ");
        List<String> p = problems(text);
        assertTrue(p.stream().anyMatch(s -> s.startsWith("$.workpiece.thickness_m |  | a plate needs its thickness")), p.toString());
        assertTrue(p.stream().anyMatch(s -> s.startsWith("$.workpiece.gap_m |  | a plate needs its gap")), p.toString());
        assertTrue(p.stream().anyMatch(s -> s.startsWith("$.workpiece.length_m | 0.04 | applies to a bar only")), p.toString());
        assertTrue(p.stream().anyMatch(s -> s.startsWith("$.workpiece.inner_diameter_m | 0.005 | applies to a bar only")), p.toString());
    }

    @Test
    void barNeedsItsLengthAndNoPlateFields() throws Exception {
        String text = Files.readString(Path.of("presets", "small-forge.json"))
                .replace("\"length_m\": \"150 mm\"", "\"gap_m\": \"5 mm\"");
        List<String> p = problems(text);
        assertTrue(p.stream().anyMatch(s -> s.startsWith("$.workpiece.length_m |  | a bar needs its length")), p.toString());
        assertTrue(p.stream().anyMatch(s -> s.startsWith("$.workpiece.gap_m | 0.005 | applies to a plate only")), p.toString());
    }

    @Test
    void unknownShapeListsTheChoices() throws Exception {
        List<String> p = problems(griddle().replace("\"shape\": \"plate\"", "\"shape\": \"sheet\""));
        assertTrue(p.stream().anyMatch(s -> s.startsWith("$.workpiece.shape | sheet") && s.contains("bar") && s.contains("plate")),
                p.toString());
    }
}
