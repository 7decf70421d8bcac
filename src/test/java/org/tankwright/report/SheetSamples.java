package org.tankwright.report;

import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Presets;
import org.tankwright.analysis.ResultFixtures;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes sample sheets (fixtures and presets, A4 and Letter) into a folder, for looking at them
 * (render with {@code pdftoppm -png -r 60}). Not a test: {@code main(folder)}; {@code main("--docs")}
 * rewrites the committed samples in {@code docs/samples}.
 */
public final class SheetSamples {
    private SheetSamples() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length > 0 && args[0].equals("--docs")) {
            // the committed samples: a link on A4 and a heater on Letter
            Path docs = Path.of("docs", "samples");
            Files.createDirectories(docs);
            TuningSheet.write(ReportFixtures.ssLinkFull(), docs.resolve("link-sheet-a4.pdf"), Paper.A4,
                    new SheetInfo("fixture: SS link", "2026-12-02", "0.1.0"));
            TuningSheet.write(ResultFixtures.heater(), docs.resolve("heater-sheet-letter.pdf"), Paper.LETTER,
                    new SheetInfo("fixture: bar heater", "2026-12-02", "0.1.0"));
            return;
        }
        Path dir = Path.of(args.length > 0 ? args[0] : "target/sheets");
        Files.createDirectories(dir);
        SheetInfo info = new SheetInfo("fixture", "2026-12-02", "dev");
        write(ReportFixtures.ssLinkFull(), dir.resolve("ss-link"), info);
        write(ResultFixtures.heater(), dir.resolve("heater"), info);
        write(ResultFixtures.measuredTank(), dir.resolve("tank"), info);
        for (String name : Presets.names()) {
            write(Analysis.run(Presets.load(name)), dir.resolve("preset-" + name), new SheetInfo(name + ".json", "2026-12-02", "dev"));
        }
    }

    private static void write(AnalysisResult r, Path stem, SheetInfo info) throws Exception {
        for (Paper p : Paper.values()) {
            long t0 = System.nanoTime();
            TuningSheet.write(r, Path.of(stem + "-" + p.token() + ".pdf"), p, info);
            System.out.printf("%s-%s.pdf %.0f ms%n", stem, p.token(), (System.nanoTime() - t0) / 1e6);
        }
    }
}
