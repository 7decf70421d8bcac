package org.tankwright.report;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.tankwright.analysis.AnalysisResult;

import java.io.ByteArrayOutputStream;
import java.util.Arrays;

/**
 * Benchmark, not a test: how long one tuning sheet takes to lay out and save (in memory), and
 * the CSV, JSON and netlist exports, for the SS link fixture with sweeps. {@code main()}; prints
 * the median and the fastest of the timed runs after a warm-up.
 */
public final class SheetBench {
    private SheetBench() {
    }

    public static void main(String[] args) throws Exception {
        AnalysisResult r = ReportFixtures.ssLinkFull();
        SheetInfo info = new SheetInfo("bench", "2026-12-02", "bench");
        int warm = 5;
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 20;
        double[] sheet = new double[runs];
        double[] exports = new double[runs];
        for (int i = -warm; i < runs; i++) {
            long t0 = System.nanoTime();
            try (PDDocument doc = TuningSheet.build(r, Paper.A4, info)) {
                doc.save(new ByteArrayOutputStream());
            }
            long t1 = System.nanoTime();
            int n = ResultJson.text(r).length() + SpiceNetlist.write(TunedNetwork.of(r), "bench").length();
            for (var s : SeriesCsv.all(r).values()) {
                n += SeriesCsv.csv(s).length();
            }
            long t2 = System.nanoTime();
            if (i >= 0 && n > 0) {
                sheet[i] = (t1 - t0) / 1e6;
                exports[i] = (t2 - t1) / 1e6;
            }
        }
        Arrays.sort(sheet);
        Arrays.sort(exports);
        System.out.printf("sheet (layout + save, SS link with plots): median %.1f ms, fastest %.1f ms over %d runs%n",
                sheet[runs / 2], sheet[0], runs);
        System.out.printf("exports (JSON + netlist + CSV text): median %.2f ms, fastest %.2f ms%n", exports[runs / 2], exports[0]);
    }
}
