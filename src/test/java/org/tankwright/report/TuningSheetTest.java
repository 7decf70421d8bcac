package org.tankwright.report;

import com.google.gson.JsonObject;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ResultFixtures;
import org.tankwright.checks.Checks;
import org.tankwright.checks.Finding;
import org.tankwright.design.DesignFiles;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class TuningSheetTest {
    private static final SheetInfo INFO = new SheetInfo("fixture.json", "2026-12-02", "test");

    /** The sheet's text, with no-break spaces and line breaks as plain spaces. */
    static String text(PDDocument doc) throws IOException {
        return normal(new PDFTextStripper().getText(doc));
    }

    static String normal(String s) {
        return s.replace('\u00A0', ' ').replaceAll("\\s+", " ");
    }

    private static final Map<String, PDDocument> BUILT = new HashMap<>();

    /** The sheet of a result on a paper, built once per test class (the documents are read, never changed). */
    static synchronized PDDocument sheet(AnalysisResult r, Paper p) {
        return BUILT.computeIfAbsent(r.design().name() + "/" + r.findings().size() + "/" + p, k -> TuningSheet.build(r, p, INFO));
    }

    @AfterAll
    static void close() throws IOException {
        for (PDDocument d : BUILT.values()) {
            d.close();
        }
        BUILT.clear();
    }

    @ParameterizedTest
    @EnumSource(Paper.class)
    void linkSheetHasEverySectionInOrderWithTheSafetyBoxFirst(Paper paper) throws IOException {
        PDDocument doc = sheet(ReportFixtures.ssLinkFull(), paper);
        String t = text(doc);
        String[] order = {"Tuning sheet: Fixture SS pad", "SAFETY", "DANGER TW-HV-01", "WARNING TW-EX-02",
            "Follow your local electrical codes", "Tuned network", "Coil L1", "Coil L2", "Capacitor banks: build list",
            "Element stresses", "Expected bench readings", "Step 1: low voltage into a dummy load", "Step 2: full power",
            "Trip levels", "Bench procedure", "Re-tune table", "Plots", "Input impedance",
            "Capacitor voltage", "Coupling", "Field near the coils",
            "Findings of the checks", "Local codes and licensed practice"};
        int at = -1;
        for (String s : order) {
            int i = t.indexOf(s, at + 1);
            assertTrue(i > at, "'" + s + "' comes after the previous section");
            at = i;
        }
        assertTrue(t.contains("page 1 of " + doc.getNumberOfPages()));
        assertTrue(t.contains("page " + doc.getNumberOfPages() + " of " + doc.getNumberOfPages()));
        assertEquals(paper.size().getWidth(), doc.getPage(0).getMediaBox().getWidth(), 0.01);
    }

    @Test
    void numbersOnTheSheetAreTheJsonExportsToThePrintedPrecision() throws IOException {
        AnalysisResult r = ReportFixtures.ssLinkFull();
        JsonObject j = ResultJson.tree(r);
        JsonObject net = j.getAsJsonObject("network");
        JsonObject coil1 = j.getAsJsonArray("coils").get(0).getAsJsonObject();
        JsonObject coil2 = j.getAsJsonArray("coils").get(1).getAsJsonObject();
        JsonObject bank1 = j.getAsJsonArray("banks").get(0).getAsJsonObject();
        JsonObject c1 = j.getAsJsonArray("stresses").get(0).getAsJsonObject();
        JsonObject env = j.getAsJsonObject("envelope");
        PDDocument doc = sheet(r, Paper.A4);
        String t = text(doc);
        printed(t, net.get("frequency_Hz").getAsDouble(), Dimension.FREQUENCY, Fmt.BUILD);
        printed(t, net.get("source_current_A").getAsDouble(), Dimension.CURRENT, Fmt.READING);
        printed(t, net.get("power_out_W").getAsDouble(), Dimension.POWER, Fmt.READING);
        printed(t, net.get("efficiency").getAsDouble(), Dimension.FRACTION, Fmt.READING);
        printed(t, net.get("c1_textbook_F").getAsDouble(), Dimension.CAPACITANCE, Fmt.BUILD);
        printed(t, coil1.get("inductance_H").getAsDouble(), Dimension.INDUCTANCE, Fmt.BUILD);
        printed(t, coil2.get("inductance_H").getAsDouble(), Dimension.INDUCTANCE, Fmt.BUILD);
        printed(t, coil1.get("resistance_ac_ohm").getAsDouble(), Dimension.RESISTANCE, Fmt.READING);
        printed(t, coil1.get("self_resonance_Hz").getAsDouble(), Dimension.FREQUENCY, Fmt.READING);
        printed(t, bank1.get("capacitance_F").getAsDouble(), Dimension.CAPACITANCE, Fmt.BUILD);
        printed(t, bank1.get("part_voltage_peak_V").getAsDouble(), Dimension.VOLTAGE, Fmt.READING);
        printed(t, bank1.get("stored_energy_J").getAsDouble(), Dimension.ENERGY, Fmt.READING);
        printed(t, c1.get("voltage_rms_V").getAsDouble(), Dimension.VOLTAGE, Fmt.READING);
        printed(t, env.get("trip_current_A").getAsDouble(), Dimension.CURRENT, Fmt.READING);
        printed(t, j.getAsJsonObject("exposure").get("b_rms_T").getAsDouble(), Dimension.FLUX_DENSITY, Fmt.READING);
        assertTrue(t.contains("k 0.2500"), "coupling on the schematic");
        assertTrue(t.contains(TuningSheet.grouped(TuningSheet.checksum(r.design()))), "checksum in groups of eight");
    }

    /** The value, formatted as the sheet prints it, is on the sheet and reads back within its printed precision. */
    private static void printed(String text, double json, Dimension d, int sig) {
        String s = Quantities.format(json, d, sig);
        assertTrue(text.contains(s), s + " is on the sheet");
        double back = d == Dimension.FRACTION ? Double.parseDouble(s.replace(" %", "")) / 100 : Quantities.parse(s, d);
        assertEquals(json, back, Math.abs(json) * 0.5 * Math.pow(10, 1 - sig) * 1.0001, s + " against " + json);
    }

    @Test
    void safetyBoxCarriesEveryGeneralCautionAndTheDeferralBeforeTheFirstSection() throws IOException {
        for (AnalysisResult r : List.of(ReportFixtures.ssLinkFull(), ResultFixtures.measuredTank())) {
            String t = text(sheet(r, Paper.A4));
            int firstSection = t.indexOf("Tuned network");
            for (String caution : Checks.cautions()) {
                int at = t.indexOf(normal(caution));
                assertTrue(at > 0 && at < firstSection, "caution in the safety box: " + caution);
            }
            assertTrue(t.indexOf(Finding.DEFERRAL) < firstSection);
            assertTrue(t.lastIndexOf(Finding.DEFERRAL) > t.indexOf("Local codes and licensed practice"), "and again at the end");
        }
    }

    @Test
    void checksumIsTheSha256OfTheSavedDesign() throws Exception {
        AnalysisResult r = ResultFixtures.ssLink();
        // FIPS 180-4 SHA-256 as the Java runtime provides it, over the design file's UTF-8 text
        byte[] h = MessageDigest.getInstance("SHA-256").digest(DesignFiles.toJson(r.design()).getBytes(StandardCharsets.UTF_8));
        assertEquals(HexFormat.of().formatHex(h), TuningSheet.checksum(r.design()));
        assertEquals(64, TuningSheet.checksum(r.design()).length());
    }

    @ParameterizedTest
    @EnumSource(Paper.class)
    void heaterSheetHasColdAndHotColumnsAndNoLinkSections(Paper paper) throws IOException {
        AnalysisResult r = ResultFixtures.heater();
        PDDocument doc = sheet(r, paper);
        String t = text(doc);
        assertTrue(t.contains("Heater: cold and hot operating points"));
        assertTrue(t.contains("Expected cold Expected hot"));
        assertTrue(t.contains("Step 2: full power, workpiece cold and then hot"));
        assertTrue(t.contains(Quantities.format(r.heater().hot().resonantFrequency(), Dimension.FREQUENCY, Fmt.BUILD)));
        assertTrue(t.contains(Quantities.format(r.heater().cold().power(), Dimension.POWER, Fmt.READING)));
        assertTrue(t.contains("I1 source"), "a current-fed tank shows a current source");
        for (String absent : new String[] {"Coil L2", "Trip levels", "Plots", "Findings of the checks", "L1,short", "split"}) {
            assertFalse(t.contains(absent), absent + " does not apply to a heater");
        }
        assertTrue(t.contains("SAFETY"));
    }

    @ParameterizedTest
    @EnumSource(Paper.class)
    void singleTankSheetLeavesOutWhatDoesNotApply(Paper paper) throws IOException {
        AnalysisResult r = ResultFixtures.measuredTank();
        PDDocument doc = sheet(r, paper);
        String t = text(doc);
        for (String present : new String[] {"SAFETY", "Tuned network", "Coil L1", "Expected bench readings", "Re-tune table",
            "Local codes and licensed practice"}) {
            assertTrue(t.contains(present), present);
        }
        for (String absent : new String[] {"Coil L2", "Capacitor banks", "Trip levels", "Plots", "Heater", "Field near",
            "dummy load", "Findings of the checks"}) {
            assertFalse(t.contains(absent), absent + " does not apply to a measured series tank");
        }
    }

    @ParameterizedTest
    @EnumSource(Paper.class)
    void everyGlyphLiesInsideThePageMarginsAndNoPageIsBlank(Paper paper) throws IOException {
        for (AnalysisResult r : List.of(ReportFixtures.ssLinkFull(), ResultFixtures.heater(), ResultFixtures.measuredTank())) {
            assertLaidOut(sheet(r, paper), paper, r.design().name());
        }
    }

    @Test
    void largeBanksAreDrawnShortenedWithTheirCountsWrittenOut() throws IOException {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.seriesCount = 7;
        p.parallelCount = 12;
        p.dielectric = "polypropylene film, 2000 V DC, 5 % tolerance, self-healing, for resonant circuits";
        AnalysisResult r = p.build();
        try (PDDocument doc = TuningSheet.build(r, Paper.LETTER, INFO)) {
            String t = text(doc);
            assertTrue(t.contains("7 in series \u00D7 12 strings in parallel"), "counts written beside the drawing");
            assertTrue(t.contains("84 parts"));
            assertLaidOut(doc, Paper.LETTER, "large banks");
            assertEquals(List.of(), overlaps(doc), "large banks");
        }
    }

    @ParameterizedTest
    @EnumSource(Paper.class)
    void noTwoGlyphsOverlap(Paper paper) throws IOException {
        for (AnalysisResult r : List.of(ReportFixtures.ssLinkFull(), ResultFixtures.heater(), ResultFixtures.measuredTank())) {
            assertEquals(List.of(), overlaps(sheet(r, paper)), r.design().name());
        }
    }

    @Test
    void theOverlapCheckSeesTwoWordsPrintedOnTopOfEachOther() throws IOException {
        try (PDDocument doc = new PDDocument()) {
            org.apache.pdfbox.pdmodel.PDPage page = new org.apache.pdfbox.pdmodel.PDPage();
            doc.addPage(page);
            var font = new org.apache.pdfbox.pdmodel.font.PDType1Font(org.apache.pdfbox.pdmodel.font.Standard14Fonts.FontName.HELVETICA);
            try (var cs = new org.apache.pdfbox.pdmodel.PDPageContentStream(doc, page)) {
                for (String word : new String[] {"first", "other"}) {
                    cs.beginText();
                    cs.setFont(font, 10);
                    cs.newLineAtOffset(100, 500);
                    cs.showText(word);
                    cs.endText();
                }
            }
            assertFalse(overlaps(doc).isEmpty());
        }
    }

    /** Places where two glyphs cover a good part of each other (neighbouring letters only touch). */
    static List<String> overlaps(PDDocument doc) throws IOException {
        List<List<float[]>> pages = new ArrayList<>();
        PDFTextStripper s = new PDFTextStripper() {
            @Override
            protected void startPage(org.apache.pdfbox.pdmodel.PDPage page) {
                pages.add(new ArrayList<>());
            }

            @Override
            protected void writeString(String text, List<TextPosition> glyphs) {
                for (TextPosition g : glyphs) {
                    if (!g.getUnicode().isBlank()) {
                        pages.get(pages.size() - 1).add(new float[] {g.getXDirAdj(), g.getYDirAdj() - g.getHeightDir(),
                            g.getWidthDirAdj(), g.getHeightDir()});
                    }
                }
            }
        };
        s.getText(doc);
        List<String> found = new ArrayList<>();
        for (int p = 0; p < pages.size(); p++) {
            List<float[]> boxes = pages.get(p);
            boxes.sort((u, v) -> Float.compare(u[1], v[1]));
            for (int i = 0; i < boxes.size(); i++) {
                float[] a = boxes.get(i);
                for (int j = i + 1; j < boxes.size() && boxes.get(j)[1] < a[1] + a[3]; j++) {
                    float[] b = boxes.get(j);
                    float ox = Math.min(a[0] + a[2], b[0] + b[2]) - Math.max(a[0], b[0]);
                    float oy = Math.min(a[1] + a[3], b[1] + b[3]) - Math.max(a[1], b[1]);
                    if (ox > 0.4f * Math.min(a[2], b[2]) && oy > 0.4f * Math.min(a[3], b[3])) {
                        found.add("page " + (p + 1) + " at " + a[0] + "," + a[1]);
                    }
                }
            }
        }
        return found;
    }

    /** Every glyph inside the page margins, and every page with more than its running head and foot. */
    static void assertLaidOut(PDDocument doc, Paper paper, String what) throws IOException {
        float w = paper.size().getWidth();
        float h = paper.size().getHeight();
        List<String> outside = new ArrayList<>();
        List<Integer> perPage = new ArrayList<>();
        PDFTextStripper s = new PDFTextStripper() {
            int count;

            @Override
            protected void startPage(org.apache.pdfbox.pdmodel.PDPage page) {
                count = 0;
            }

            @Override
            protected void endPage(org.apache.pdfbox.pdmodel.PDPage page) {
                perPage.add(count);
            }

            @Override
            protected void writeString(String text, List<TextPosition> glyphs) {
                for (TextPosition g : glyphs) {
                    count++;
                    if (g.getXDirAdj() < 30 || g.getXDirAdj() + g.getWidthDirAdj() > w - 30
                            || g.getYDirAdj() < 30 || g.getYDirAdj() > h - 20) {
                        outside.add(g.getUnicode() + "@" + g.getXDirAdj() + "," + g.getYDirAdj());
                    }
                }
            }
        };
        s.getText(doc);
        assertEquals(List.of(), outside, "glyphs outside the margins of " + what);
        assertEquals(doc.getNumberOfPages(), perPage.size());
        for (int i = 0; i < perPage.size(); i++) {
            // a page with only its running head and foot holds well under 120 glyphs
            assertTrue(perPage.get(i) > 120, "page " + (i + 1) + " of " + what + " has content");
        }
    }

    @Test
    void writeGoesThroughATemporaryFileAndLeavesOnlyThePdf(@org.junit.jupiter.api.io.TempDir Path dir) throws IOException {
        Path pdf = dir.resolve("sheet.pdf");
        TuningSheet.write(ResultFixtures.measuredTank(), pdf, Paper.LETTER, INFO);
        try (PDDocument doc = org.apache.pdfbox.Loader.loadPDF(pdf.toFile())) {
            assertTrue(text(doc).contains("Fixture measured tank"));
        }
        try (var files = Files.list(dir)) {
            assertEquals(List.of(pdf), files.toList());
        }
    }
}
