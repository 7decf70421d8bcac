package org.tankwright.analysis;

import org.junit.jupiter.api.Test;
import org.tankwright.design.Design;
import org.tankwright.design.DesignFiles;
import org.tankwright.heating.FrequencyAdvice;
import org.tankwright.heating.ReferenceDepth;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A plate heater goes through the one heater pipeline; mismatched coil and workpiece shapes are refused by name. */
class PlateHeaterTest {
    private static String griddle() throws Exception {
        return Files.readString(Path.of("presets", "griddle-plate-heater.json"));
    }

    private static Design parse(String text) throws Exception {
        return DesignFiles.parse(text, "test.json");
    }

    @Test
    void spiralWithABarNamesTheWorkpieceShape() throws Exception {
        String text = griddle().replace("\"shape\": \"plate\", ", "")
                .replace("\"thickness_m\": \"6 mm\", \"gap_m\": \"12 mm\"", "\"length_m\": \"60 mm\"")
                .replace("\"diameter_m\": \"300 mm\"", "\"diameter_m\": \"20 mm\"");
        AnalysisException e = assertThrows(AnalysisException.class, () -> Analysis.run(parse(text)));
        assertTrue(e.getMessage().startsWith("$.workpiece.shape") && e.getMessage().contains("$.primary.shape"), e.getMessage());
        assertTrue(e.invalidInput());
    }

    @Test
    void solenoidWithAPlateNamesTheWorkpieceShape() throws Exception {
        String text = Files.readString(Path.of("presets", "small-forge.json"))
                .replace("\"material\": \"carbon-steel\", \"diameter_m\": \"25 mm\", \"length_m\": \"150 mm\"",
                        "\"shape\": \"plate\", \"material\": \"carbon-steel\", \"diameter_m\": \"200 mm\", \"thickness_m\": \"5 mm\","
                                + " \"gap_m\": \"10 mm\"");
        AnalysisException e = assertThrows(AnalysisException.class, () -> Analysis.run(parse(text)));
        assertTrue(e.getMessage().startsWith("$.workpiece.shape") && e.getMessage().contains("solenoid"), e.getMessage());
    }

    @Test
    void plateBarelyWiderThanTheCoilIsFlagged() throws Exception {
        // coil outer radius 100 mm, rings about 13.5 mm above the plate: a 220 mm plate overhangs by 10 mm only
        HeaterReport small = Analysis.run(parse(griddle().replace("\"diameter_m\": \"300 mm\"", "\"diameter_m\": \"220 mm\"")))
                .heater();
        assertTrue(small.notes().stream().anyMatch(n -> n.contains("infinite-plate model overstates")), small.notes().toString());
        HeaterReport big = Analysis.run(Presets.load("griddle-plate-heater")).heater();
        assertFalse(big.notes().stream().anyMatch(n -> n.contains("infinite-plate model overstates")), big.notes().toString());
    }

    @Test
    void singleLoopOverAPlateSolves() throws Exception {
        String text = griddle().replace("\"shape\": \"spiral\",\n    \"turns\": 20,", "\"shape\": \"loop\",\n    \"turns\": 1,")
                .replace("\"diameter_m\": \"200 mm\",\n    \"inner_diameter_m\": \"50 mm\",", "\"diameter_m\": \"150 mm\",");
        HeaterReport h = Analysis.run(parse(text)).heater();
        assertTrue(h.cold().workResistance() > 0 && h.cold().inductance() > 0, h.cold().toString());
    }

    @Test
    void squareSpiralOverAPlateUsesEqualAreaRingsAndSaysSo() throws Exception {
        String text = griddle().replace("\"shape\": \"spiral\",", "\"shape\": \"square-spiral\",");
        AnalysisResult r = Analysis.run(parse(text));
        HeaterReport round = Analysis.run(Presets.load("griddle-plate-heater")).heater();
        assertTrue(r.heater().notes().stream().anyMatch(n -> n.contains("ring of equal area")), r.heater().notes().toString());
        // a square of the same across-flats size encloses 4/π more area per turn: it couples more to the plate
        assertTrue(r.heater().cold().workResistance() > round.cold().workResistance());
    }

    @Test
    void rectangularSpiralOverAPlateIsRefusedByName() throws Exception {
        String text = griddle().replace("\"shape\": \"spiral\",", "\"shape\": \"rect-spiral\",")
                .replace("\"diameter_m\": \"200 mm\",\n    \"inner_diameter_m\": \"50 mm\",",
                        "\"width_m\": \"300 mm\", \"height_m\": \"250 mm\", \"inner_width_m\": \"100 mm\", \"inner_height_m\": \"50 mm\",");
        AnalysisException e = assertThrows(AnalysisException.class, () -> Analysis.run(parse(text)));
        assertTrue(e.getMessage().startsWith("$.workpiece.shape") && e.getMessage().contains("rect-spiral"), e.getMessage());
    }

    @Test
    void plateAdviceBandEdgesAreTwoAndFourReferenceDepths() {
        // reference depth δ = √(2ρ/(ωµ0µr)) (Jackson §5.18): at the band's lower edge t = 2δ, at the upper t = 4δ
        FrequencyAdvice a = FrequencyAdvice.forPlate(0.006, 1.7e-7, 100, 30e3);
        assertEquals(0.003, ReferenceDepth.of(1.7e-7, a.lowFrequency(), 100), 1e-12);
        assertEquals(0.0015, ReferenceDepth.of(1.7e-7, a.highFrequency(), 100), 1e-12);
        assertEquals(FrequencyAdvice.Verdict.ABOVE_BAND, a.verdict(), "a 6 mm steel plate is thick at 30 kHz");
    }
}
