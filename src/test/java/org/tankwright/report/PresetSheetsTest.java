package org.tankwright.report;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Presets;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Every bundled preset gets a sheet on both paper sizes, with its header and safety box. */
class PresetSheetsTest {

    @Test
    void everyPresetMakesASheetOnBothPapers() throws Exception {
        int checked = 0;
        for (String name : Presets.names()) {
            AnalysisResult r = Analysis.run(Presets.load(name));
            for (Paper paper : Paper.values()) {
                try (PDDocument doc = TuningSheet.build(r, paper, new SheetInfo(name + ".json", "2026-12-02", "test"))) {
                    String t = TuningSheetTest.text(doc);
                    assertTrue(t.contains("Tuning sheet: " + r.design().name()), name);
                    assertTrue(t.contains("SAFETY"), name + " has its safety box");
                    assertTrue(t.contains("Follow your local electrical codes"), name + " defers to local codes");
                    assertEquals(paper.size().getHeight(), doc.getPage(0).getMediaBox().getHeight(), 0.01);
                    TuningSheetTest.assertLaidOut(doc, paper, name);
                    assertEquals(List.of(), TuningSheetTest.overlaps(doc), name);
                }
            }
            checked++;
        }
        assertEquals(Presets.names().size(), checked);
        assertTrue(checked >= 1);
    }
}
