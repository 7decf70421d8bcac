package org.tankwright.cli;

import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ToleranceRun;
import org.tankwright.design.Design;
import org.tankwright.design.Tolerances;
import org.tankwright.design.DesignFiles;
import org.tankwright.tolerance.CancelToken;
import org.tankwright.tolerance.Corners;
import org.tankwright.tolerance.OutcomeStats;
import org.tankwright.tolerance.StudyResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

/** {@code tankwright tolerance FILE}: Monte Carlo over part tolerances; distributions, yield and worst corners. */
@Command(name = "tolerance", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = "Monte Carlo study of a design over capacitor, inductance, coupling and load tolerances and "
                + "capacitor temperature drift: the spread of resonant frequency, output power, efficiency and C1 voltage, "
                + "the yield against the design's limits, and the worst corners.")
public final class ToleranceCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", description = "design file (.json)")
    Path file;

    @Option(names = "--samples", paramLabel = "N", description = "number of samples (default: the design's, else 2000)")
    Integer samples;

    @Option(names = "--seed", paramLabel = "S", description = "random seed (default: the design's, else 1)")
    Long seed;

    @Option(names = "--json", description = "print the summary as JSON (SI values)")
    boolean json;

    @Option(names = "--csv", paramLabel = "FILE", description = "write every sample (parameters and outcomes) as CSV")
    Path csv;

    @Override
    public Integer call() throws IOException {
        Design d = DesignArgs.load(file);
        if (samples != null && (samples < 10 || samples > 1_000_000)) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--samples: " + samples + " must be from 10 to 1000000");
        }
        Tolerances t = ToleranceRun.tolerances(d);
        AnalysisResult base = Analysis.run(d, Analysis.Scope.OPERATING_POINT);
        StudyResult r = ToleranceRun.run(base, samples != null ? samples : t.samples(), seed != null ? seed : t.seed(),
                new CancelToken(), (done, total) -> { });
        if (csv != null) {
            StringBuilder sb = new StringBuilder();
            r.writeCsv(sb);
            DesignFiles.replaceAtomically(csv, sb.toString());
        }
        if (json) {
            CliSupport.printJson(json(r));
        } else {
            System.out.print(text(d, r));
        }
        return ExitCodes.OK;
    }

    static Map<String, Object> json(StudyResult r) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("samples", r.completed());
        o.put("seed", r.seed());
        o.put("yield", r.overallYield());
        o.put("invalid_samples", r.invalidSamples());
        Map<String, Object> outs = new LinkedHashMap<>();
        for (OutcomeStats s : r.outcomes()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("nominal", finite(s.nominal()));
            m.put("mean", finite(s.mean()));
            m.put("std", finite(s.std()));
            m.put("min", finite(s.min()));
            m.put("max", finite(s.max()));
            m.put("percentiles", s.percentiles());
            if (s.limit() != null) {
                m.put("limit_min", finite(s.limit().min()));
                m.put("limit_max", finite(s.limit().max()));
                m.put("yield", s.yield());
            }
            outs.put(s.name(), m);
        }
        o.put("outcomes", outs);
        List<Map<String, Object>> corners = new java.util.ArrayList<>();
        for (Corners.Extreme e : r.corners().extremes()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("outcome", e.outcome());
            m.put("low", finite(e.low()));
            m.put("low_setting", e.lowSetting());
            m.put("high", finite(e.high()));
            m.put("high_setting", e.highSetting());
            corners.add(m);
        }
        o.put("corners", corners);
        o.put("corner_method", r.corners().method());
        o.put("model", r.model());
        return o;
    }

    private static Object finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    static String text(Design d, StudyResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "Tolerance study of \"%s\": %d samples (seed %d), overall yield %.1f %%%n%n",
                d.name(), r.completed(), r.seed(), 100 * r.overallYield()));
        sb.append(String.format(Locale.ROOT, "  %-24s %12s %12s %12s %12s %12s %8s%n", "outcome", "nominal", "mean", "std", "min", "max", "yield"));
        for (OutcomeStats s : r.outcomes()) {
            sb.append(String.format(Locale.ROOT, "  %-24s %12.5g %12.5g %12.4g %12.5g %12.5g %8s%n", s.name(), s.nominal(),
                    s.mean(), s.std(), s.min(), s.max(), s.limit() == null ? "" : String.format(Locale.ROOT, "%.1f %%", 100 * s.yield())));
        }
        sb.append("\nWorst corners (").append(r.corners().method()).append(")\n");
        for (Corners.Extreme e : r.corners().extremes()) {
            sb.append(String.format(Locale.ROOT, "  %-24s low %.5g at %s%n  %-24s high %.5g at %s%n", e.outcome(), e.low(),
                    e.lowSetting(), "", e.high(), e.highSetting()));
        }
        return sb.toString();
    }
}
