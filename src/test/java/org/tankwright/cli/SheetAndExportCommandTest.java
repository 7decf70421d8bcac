package org.tankwright.cli;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.Presets;
import org.tankwright.report.SpiceNetlist;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

class SheetAndExportCommandTest {
    private static final Path DEMO = Path.of("presets", Presets.DEMO + ".json");

    @Test
    void sheetWritesAPdfOnTheChosenPaper(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("out.pdf");
        assertEquals(ExitCodes.OK, Main.run("sheet", DEMO.toString(), "-o", pdf.toString(), "--paper", "letter"));
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertEquals(792f, doc.getPage(0).getMediaBox().getHeight(), 0.01, "US Letter is 11 in tall");
        }
    }

    @Test
    void sheetRefusesAnUnknownPaperAndAMissingFile(@TempDir Path dir) {
        assertEquals(ExitCodes.USAGE, Main.run("sheet", DEMO.toString(), "-o", dir.resolve("a.pdf").toString(), "--paper", "legal"));
        assertEquals(ExitCodes.INVALID_INPUT, Main.run("sheet", dir.resolve("none.json").toString(), "-o", dir.resolve("b.pdf").toString()));
        assertEquals(ExitCodes.USAGE, Main.run("sheet", DEMO.toString()));
        assertFalse(Files.exists(dir.resolve("a.pdf")));
    }

    @Test
    void exportWritesCsvAndJson(@TempDir Path dir) throws Exception {
        Path json = dir.resolve("result.json");
        assertEquals(ExitCodes.OK, Main.run("export", DEMO.toString(), "--csv", dir.resolve("csv").toString(), "--json", json.toString()));
        assertTrue(Files.isDirectory(dir.resolve("csv")));
        String text = Files.readString(json);
        assertTrue(text.contains("\"design_name\""));
        assertFalse(text.contains("NaN"));
    }

    @Test
    void exportNeedsSomethingToWrite() {
        assertEquals(ExitCodes.USAGE, Main.run("export", DEMO.toString()));
    }

    @Test
    void exportWritesTheNetlistOnceThePipelineTunesTheDesign(@TempDir Path dir) throws Exception {
        assumeTrue(Analysis.run(Presets.demo()).network() != null, "the pipeline does not tune designs yet");
        Path cir = dir.resolve("demo.cir");
        assertEquals(ExitCodes.OK, Main.run("export", DEMO.toString(), "--netlist", cir.toString()));
        String text = Files.readString(cir);
        assertTrue(text.contains(".AC LIN 1 "));
        assertTrue(text.strip().endsWith(".END"));
        assertEquals(text, SpiceNetlist.write(org.tankwright.report.TunedNetwork.of(Analysis.run(Presets.demo())),
                Presets.demo().name()));
    }
}
