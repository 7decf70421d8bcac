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
            // real presets once the pipeline tunes them, the test fixtures until then
            AnalysisResult link = Analysis.run(Presets.load("desk-lamp-pad"));
            AnalysisResult heater = Analysis.run(Presets.load("bolt-heater"));
            boolean real = link.network() != null && heater.network() != null;
            TuningSheet.write(real ? link : ReportFixtures.ssLinkFull(), docs.resolve("link-sheet-a4.pdf"), Paper.A4,
                    new SheetInfo(real ? "desk-lamp-pad.json" : "fixture: SS link", "2026-12-02", "0.1.0"));
            TuningSheet.write(real ? heater : ResultFixtures.heater(), docs.resolve("heater-sheet-letter.pdf"), Paper.LETTER,
                    new SheetInfo(real ? "bolt-heater.json" : "fixture: bar heater", "2026-12-02", "0.1.0"));
            System.out.println(real ? "samples from the presets" : "samples from the test fixtures");
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
